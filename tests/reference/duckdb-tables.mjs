// Reads BinEnergy's Parquet result tables with DuckDB (npm @duckdb/node-api), an outside
// reader, and reports what it sees: row counts, column names and types, column sums and the
// files' key-value metadata. Input on stdin: {"folder": "...", "sums": {"annual": ["heating_kbtu"]}}.
import { DuckDBInstance } from '@duckdb/node-api';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

const input = JSON.parse(readFileSync(0, 'utf8'));
const instance = await DuckDBInstance.create(':memory:');
const db = await instance.connect();
const quote = (s) => "'" + s.replaceAll("'", "''") + "'";
const out = {};
for (const [table, columns] of Object.entries(input.sums)) {
  const file = quote(join(input.folder, 'tables', table + '.parquet'));
  const count = await db.runAndReadAll(`SELECT count(*)::INTEGER AS n FROM read_parquet(${file})`);
  const described = await db.runAndReadAll(`DESCRIBE SELECT * FROM read_parquet(${file})`);
  const sums = {};
  for (const c of columns) {
    const r = await db.runAndReadAll(`SELECT sum("${c}")::DOUBLE AS s FROM read_parquet(${file})`);
    sums[c] = r.getRowObjects()[0].s;
  }
  const meta = await db.runAndReadAll(
    `SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata(${file})`);
  out[table] = {
    rows: count.getRowObjects()[0].n,
    columns: described.getRowObjects().map((r) => ({ name: r.column_name, type: r.column_type, nullable: r.null })),
    sums,
    metadata: Object.fromEntries(meta.getRowObjects().map((r) => [r.k, r.v])),
  };
}
process.stdout.write(JSON.stringify(out));
