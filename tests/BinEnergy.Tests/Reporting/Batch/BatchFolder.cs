using BinEnergy.Core.Study;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Tests.Reporting.Batch;

/// <summary>
/// Writes a batch-shaped output folder from a study run: each table split by climate into
/// <c>shards</c> parts, <c>tables/NAME/shard=I/part-0000.parquet</c> (climate i in shard i mod
/// shards), with the metadata a run writes.
/// </summary>
internal static class BatchFolder
{
    public static void Write(StudyRunResult run, string folder, int shards, IReadOnlyList<string>? tables = null, Func<int, string>? hashOfShard = null)
    {
        var climates = run.Study.Climates.Select(c => c.Name).ToList();
        for (int shard = 0; shard < shards; shard++)
        {
            int s = shard;
            var part = run with { Cases = run.Cases.Where(c => climates.IndexOf(c.Case.Climate.Name) % shards == s).ToList() };
            if (part.Cases.Count == 0)
            {
                continue;
            }

            var metadata = new Dictionary<string, string>
            {
                ["binenergy.study"] = run.Study.Name,
                ["binenergy.units"] = StudyTables.Units(run).Name,
                ["binenergy.engine_version"] = run.EngineVersion,
                ["binenergy.study_sha256"] = hashOfShard?.Invoke(shard) ?? run.Study.Hash,
                ["binenergy.currency"] = run.Study.Currency,
            };
            foreach (var table in StudyTables.Build(part, hourly: false).Where(t => tables is null || tables.Contains(t.Name)))
            {
                string path = HivePartition.PathFor(Path.Combine(folder, "tables", table.Name), "shard", shard.ToString(System.Globalization.CultureInfo.InvariantCulture), "part-0000.parquet");
                Directory.CreateDirectory(Path.GetDirectoryName(path)!);
                ParquetTableWriter.WriteAsync(table, path, new Dictionary<string, string>(metadata) { ["binenergy.table"] = table.Name }).GetAwaiter().GetResult();
            }
        }
    }
}
