namespace BinEnergy.Tests.Batch;

/// <summary>
/// <c>batch</c> against <c>run</c>: the same study on the same climates gives the same rows, read back by DuckDB (an
/// outside reader) from the batch's Hive-partitioned parts and from the run's single files; four shards together give
/// exactly the rows of one unsharded batch, whether the shard comes from --shard, a Slurm array or a Kubernetes index.
/// </summary>
public sealed class BatchRunTests
{
    private static readonly Dictionary<string, string[]> Order = new()
    {
        ["annual"] = ["climate", "variant", "year", "method"],
        ["bins"] = ["climate", "variant", "method", "bin_low_f"],
        ["monthly"] = ["climate", "variant", "method", "month"],
        ["economizer"] = ["climate", "variant", "year", "method", "control"],
        ["peaks"] = ["climate", "variant", "condition"],
    };

    [Fact]
    public void Report_DoesNotDependOnTheOrderOfTheInputs()
    {
        // The parts hold the climates in the order the workers finish them; the report and the summary list and draw them
        // in climate order, so the same inputs in another order give the same report (apart from the time it was run).
        using var f = new BatchFolder(6);
        string list = f.StationList(6);
        string[] lines = File.ReadAllLines(list);
        string reversed = Path.Combine(f.Path, "reversed.csv");
        File.WriteAllLines(reversed, [lines[0], .. lines.Skip(1).Reverse()]);
        string a = Path.Combine(f.Path, "a"), b = Path.Combine(f.Path, "b");
        Assert.Equal(0, BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", a).Code);
        Assert.Equal(0, BatchFolder.Cli("batch", f.Study, "--weather", reversed, "--out", b).Code);

        static string[] Report(string folder) => [.. File.ReadAllLines(Path.Combine(folder, "report.html"))
            .Select(l => l.Replace(folder, "OUT", StringComparison.Ordinal)).Where(l => !l.Contains("UTC", StringComparison.Ordinal))];
        Assert.Equal(Report(a), Report(b));
        Assert.Equal(File.ReadAllText(Path.Combine(a, "summary.json")).Replace(a, "OUT", StringComparison.Ordinal),
            File.ReadAllText(Path.Combine(b, "summary.json")).Replace(b, "OUT", StringComparison.Ordinal).Replace("reversed.csv", "stations.csv", StringComparison.Ordinal));
    }

    [Fact]
    public void Batch_RowsReadByDuckDbWithHivePartitions_EqualARunOfTheSameClimates()
    {
        using var f = new BatchFolder(6);
        string run = Path.Combine(f.Path, "run"), batch = Path.Combine(f.Path, "batch");
        var (code, _, err) = BatchFolder.Cli("run", f.Study, "--out", run);
        Assert.True(code == 0, err);
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.StationList(6), "--out", batch, "--rows-per-part", "500");
        Assert.True(code == 0, err);

        var fromRun = BatchFolder.Read(run, hive: false, Order);
        var fromBatch = BatchFolder.Read(batch, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            var expected = BatchFolder.Rows(fromRun[table]);
            var seen = BatchFolder.Rows(fromBatch[table], "shard", "region");
            Assert.True(expected.Count > 0, table);
            Assert.Equal(expected, seen);

            // Columns typed as the run's, with the station list's attribute and the partition after them, no casts needed.
            var columns = fromBatch[table].columns.Select(c => (c.name, c.type)).ToList();
            Assert.Equal(fromRun[table].columns.Select(c => (c.name, c.type)).Concat([("region", "VARCHAR"), ("shard", "BIGINT")]), columns);
        }

        // Each climate's attribute is on each of its rows: even-numbered invented stations are "north".
        foreach (var row in fromBatch["annual"].all!)
        {
            int i = BatchFolder.Names.ToList().IndexOf(row["climate"].GetString()!);
            Assert.Equal(i % 2 == 0 ? "north" : "south", row["region"].GetString());
        }

        // 500 rows a part: the bins table (about 25 bins x 3 methods x 3 variants a climate) fills a part every climate or two.
        var summary = BatchFolder.Summary(Path.Combine(batch, "summary.json")).GetProperty("batch");
        Assert.Equal(6, summary.GetProperty("done").GetInt32());
        Assert.Equal(fromBatch["annual"].rows, summary.GetProperty("rows").GetProperty("annual").GetInt32());
        Assert.True(summary.GetProperty("parts").GetInt32() >= 2, "several parts");
        Assert.Equal("Harbor office ventilation options", fromBatch["annual"].metadata["binenergy.study"]);

        // The batch ends with its cross-climate report: report.html, and one summary.json with the figures beside the counts.
        Assert.True(File.Exists(Path.Combine(batch, "report.html")));
        var figures = BatchFolder.Summary(Path.Combine(batch, "summary.json"));
        Assert.Equal(6, figures.GetProperty("climates").GetInt32());
        Assert.Equal(fromBatch["annual"].metadata["binenergy.study_sha256"], figures.GetProperty("study_sha256").GetString());

        // Its national heating per variant is the lowest, median and highest of the hourly rows DuckDB reads (six climates:
        // the median is the mean of the third and fourth, Hyndman and Fan 1996 definition 7).
        var hourly = fromBatch["annual"].all!.Where(r => r["method"].GetString() == "hourly").ToList();
        var heating = figures.GetProperty("national").EnumerateArray().Where(n => n.GetProperty("figure").GetString() == "Heating").ToList();
        Assert.Equal(3, heating.Count);
        foreach (var national in heating)
        {
            var values = hourly.Where(r => r["variant"].GetString() == national.GetProperty("variant").GetString()).Select(r => r["heating_kbtu"].GetDouble()).Order().ToList();
            Assert.Equal(6, values.Count);
            Assert.Equal(values[0], national.GetProperty("min").GetDouble(), 6);
            Assert.Equal((values[2] + values[3]) / 2, national.GetProperty("median").GetDouble(), 6);
            Assert.Equal(values[^1], national.GetProperty("max").GetDouble(), 6);
        }
    }

    [Fact]
    public void FourShards_TogetherGiveExactlyTheRowsOfOneBatch_FromOptionSlurmOrKubernetes()
    {
        using var f = new BatchFolder(10);
        string whole = Path.Combine(f.Path, "whole"), sharded = Path.Combine(f.Path, "sharded");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", whole);
        Assert.True(code == 0, err);
        foreach (int i in new[] { 0, 1 })
        {
            (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", sharded, "--shard", $"{i}/4");
            Assert.True(code == 0, err);
            Assert.False(File.Exists(Path.Combine(sharded, "report.html")), "a shard of several leaves the report to batch-report");
        }

        // A report of half the shards says which have not finished.
        (code, _, err) = BatchFolder.Cli("batch-report", sharded);
        Assert.True(code == 0, err);
        Assert.Contains("2 of 4 shards have not finished (no summary-shard-I-of-4.json for shard 2, 3)", File.ReadAllText(Path.Combine(sharded, "summary.json")), StringComparison.Ordinal);

        // The third part as a Slurm array task (--array=1-4: task 3 is part 2), the fourth as a Kubernetes Indexed Job's index 3.
        var slurm = Support.CliProcess.Run(["batch", f.Study, "--weather", f.Weather, "--out", sharded],
            environment: new Dictionary<string, string> { ["SLURM_ARRAY_TASK_ID"] = "3", ["SLURM_ARRAY_TASK_MIN"] = "1", ["SLURM_ARRAY_TASK_MAX"] = "4" });
        Assert.True(slurm.Code == 0, slurm.Err);
        Assert.Contains("part 2 of 4 (from the Slurm array task 3", slurm.Err, StringComparison.Ordinal);
        var k8s = Support.CliProcess.Run(["batch", f.Study, "--weather", f.Weather, "--out", sharded, "--shards", "4"],
            environment: new Dictionary<string, string> { ["JOB_COMPLETION_INDEX"] = "3" });
        Assert.True(k8s.Code == 0, k8s.Err);
        Assert.Contains("part 3 of 4 (from the Kubernetes Indexed Job's completion index 3", k8s.Err, StringComparison.Ordinal);

        var one = BatchFolder.Read(whole, hive: true, Order);
        var four = BatchFolder.Read(sharded, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            Assert.Equal(BatchFolder.Rows(one[table], "shard"), BatchFolder.Rows(four[table], "shard"));
        }

        // Ten stations over four parts, every fourth from the part's index: 3, 3, 2 and 2 climates, none in two parts.
        var perShard = four["annual"].all!.GroupBy(r => r["shard"].GetInt32()).ToDictionary(g => g.Key, g => g.Select(r => r["climate"].GetString()).Distinct().Count());
        Assert.Equal(new Dictionary<int, int> { [0] = 3, [1] = 3, [2] = 2, [3] = 2 }, perShard);
        Assert.True(File.Exists(Path.Combine(sharded, "manifest-shard-2-of-4.json")));
        Assert.Equal(2, BatchFolder.Summary(Path.Combine(sharded, "summary-shard-3-of-4.json")).GetProperty("batch").GetProperty("done").GetInt32());

        // batch-report over the four shards: the national table and ranking of the one batch, and the shards' counts added up.
        (code, _, err) = BatchFolder.Cli("batch-report", sharded);
        Assert.True(code == 0, err);
        var whole1 = BatchFolder.Summary(Path.Combine(whole, "summary.json"));
        var all4 = BatchFolder.Summary(Path.Combine(sharded, "summary.json"));
        Assert.Equal(whole1.GetProperty("national").GetRawText(), all4.GetProperty("national").GetRawText());
        Assert.Equal(whole1.GetProperty("ranking").GetRawText(), all4.GetProperty("ranking").GetRawText());
        var counts = all4.GetProperty("batch");
        Assert.Equal((10, 10, 0, 4, 4), (counts.GetProperty("files").GetInt32(), counts.GetProperty("done").GetInt32(), counts.GetProperty("failed").GetInt32(),
            counts.GetProperty("shards").GetInt32(), counts.GetProperty("shards_finished").GetInt32()));
        Assert.Equal(whole1.GetProperty("batch").GetProperty("rows").GetRawText(), counts.GetProperty("rows").GetRawText());
        // The report's warnings are the inputs' own, one line per kind with its count (no problem of the report itself).
        var kinds = counts.GetProperty("warnings").EnumerateObject().Select(k => $"{k.Name}: {k.Value.GetInt32()} (each with its climate, file, line and message in tables/warnings).").ToList();
        Assert.Equal(kinds, all4.GetProperty("warnings").EnumerateArray().Select(w => w.GetString()!).ToList());

        // Names from the files: the site name and the file's id.
        Assert.Contains(one["annual"].all!, r => r["climate"].GetString() == "Aster Flats (station-00)");
    }

    [Fact]
    public void PartitionByAStationListColumn_FoldersByItsValues_SameRowsAsByShard()
    {
        using var f = new BatchFolder(4);
        string list = f.StationList(4);
        string byShard = Path.Combine(f.Path, "by-shard"), byRegion = Path.Combine(f.Path, "by-region");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", byShard);
        Assert.True(code == 0, err);
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", byRegion, "--partition-by", "region");
        Assert.True(code == 0, err);

        Assert.True(File.Exists(Path.Combine(byRegion, "tables", "annual", "region=north", "part-0000.parquet")));
        Assert.True(File.Exists(Path.Combine(byRegion, "tables", "annual", "region=south", "part-0000.parquet")));
        Assert.False(Directory.Exists(Path.Combine(byRegion, "tables", "annual", "shard=0")));

        var one = BatchFolder.Read(byShard, hive: true, Order);
        var two = BatchFolder.Read(byRegion, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            Assert.Equal(BatchFolder.Rows(one[table], "shard"), BatchFolder.Rows(two[table]));
        }

        // The region comes from the folder name, once: it is not also a column of the files.
        Assert.Single(two["annual"].columns, c => c.name == "region");

        // A column the list does not have is refused, naming the ones it has.
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", Path.Combine(f.Path, "x"), "--partition-by", "state");
        Assert.Equal(3, code);
        Assert.Contains("the station list has no such column (it has region)", err, StringComparison.Ordinal);
    }
}
