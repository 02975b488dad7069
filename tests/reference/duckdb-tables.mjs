// Reads BinEnergy's Parquet result tables with DuckDB (npm @duckdb/node-api), an outside
// reader, and reports what it sees: row counts, column names and types, column sums and the
// files' key-value metadata. Input on stdin: {"folder": "...", "sums": {"annual": ["heating_kbtu"]}}.
// With "hive": true, a table is every tables/TABLE/**/*.parquet read with hive_partitioning (a batch's
// partitioned parts, partition columns included); "rows": {"annual": ["climate", "variant"]} also returns
// every row of a table, ordered by those columns.
import { DuckDBInstance } from '@duckdb/node-api';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

const input = JSON.parse(readFileSync(0, 'utf8'));
const instance = await DuckDBInstance.create(':memory:');
const db = await instance.connect();
const quote = (s) => "'" + s.replaceAll("'", "''") + "'";
const out = {};
for (const [table, columns] of Object.entries(input.sums)) {
  const files = quote(input.hive ? join(input.folder, 'tables', table, '**', '*.parquet') : join(input.folder, 'tables', table + '.parquet'));
  const file = input.hive ? files + ', hive_partitioning = true' : files;
  const count = await db.runAndReadAll(`SELECT count(*)::INTEGER AS n FROM read_parquet(${file})`);
  const described = await db.runAndReadAll(`DESCRIBE SELECT * FROM read_parquet(${file})`);
  const sums = {};
  for (const c of columns) {
    const r = await db.runAndReadAll(`SELECT sum("${c}")::DOUBLE AS s FROM read_parquet(${file})`);
    sums[c] = r.getRowObjects()[0].s;
  }
  let rows;
  if (input.rows && input.rows[table]) {
    const order = input.rows[table].map((c) => `"${c}"`).join(', ');
    const all = await db.runAndReadAll(`SELECT * FROM read_parquet(${file}) ORDER BY ${order}`);
    rows = all.getRowObjects();
  }
  const meta = await db.runAndReadAll(
    `SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata(${files})`);
  out[table] = {
    rows: count.getRowObjects()[0].n,
    columns: described.getRowObjects().map((r) => ({ name: r.column_name, type: r.column_type, nullable: r.null })),
    sums,
    metadata: Object.fromEntries(meta.getRowObjects().map((r) => [r.k, r.v])),
    ...(rows ? { all: rows } : {}),
  };
}
// Hive partition values DuckDB types as BIGINT come back as BigInt, which JSON has no form for.
process.stdout.write(JSON.stringify(out, (k, v) => (typeof v === 'bigint' ? Number(v) : v)));
