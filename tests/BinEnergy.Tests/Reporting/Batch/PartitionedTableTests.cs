using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Tests.Reporting.Batch;

/// <summary>Reading a batch folder partitioned by a station-list column, and choosing each climate's headline year.</summary>
public sealed class PartitionedTableTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-partitions-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static readonly Dictionary<string, string> Metadata = new()
    {
        ["binenergy.study"] = "Invented partition check",
        ["binenergy.units"] = "ip",
        ["binenergy.study_sha256"] = new string('a', 64),
        ["binenergy.currency"] = "usd",
    };

    private async Task Write(string table, string key, string value, ResultTable rows) =>
        await ParquetTableWriter.WriteAsync(rows, Create(HivePartition.PathFor(Path.Combine(folder, "tables", table), key, value, "part-0000.parquet")), Metadata);

    private static string Create(string path)
    {
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        return path;
    }

    private static ResultTable Annual(params (string Climate, string Year, string Method, double Heating)[] rows)
    {
        var t = new ResultTable("annual").Text("climate").Text("variant").Text("year").Text("method").Number("heating_kbtu");
        foreach (var r in rows)
        {
            t.AddRow(r.Climate, "base", r.Year, r.Method, r.Heating);
        }

        return t;
    }

    private static ResultTable Climates(params (string Climate, double Hdd, double Cdd)[] rows)
    {
        var t = new ResultTable("climates").Text("climate").Text("degree_day_method").Number("heating_degree_days_f_day").Number("cooling_degree_days_f_day");
        foreach (var r in rows)
        {
            t.AddRow(r.Climate, "daily-mean", r.Hdd, r.Cdd);
        }

        return t;
    }

    [Fact]
    public async Task StationListPartitions_AddTheirKeyAsAColumn_AndTheMultiYearMeanIsTheHeadline()
    {
        // Invented climates in two invented regions; "north shore" has a space and "far/west" a slash, escaped in the folder name.
        await Write("annual", "region", "north shore", Annual(("brinmoor", "2020", "hourly", 100), ("brinmoor", "2021", "hourly", 140), ("brinmoor", "mean", "hourly", 120), ("brinmoor", "mean", "bin", 999)));
        await Write("annual", "region", "far/west", Annual(("saltreach", "typical", "hourly", 50), ("saltreach", "typical", "joint-bin", 51)));
        await Write("climates", "region", "north shore", Climates(("brinmoor", 7000, 300)));
        await Write("climates", "region", "far/west", Climates(("saltreach", 2000, 900)));
        Assert.True(Directory.Exists(Path.Combine(folder, "tables", "annual", "region=far%2Fwest")));

        var report = await BatchReport.ReadAsync(folder);
        var annual = report.Annual.Table;
        Assert.Equal(6, annual.RowCount);
        Assert.Equal(["far/west", "far/west", "north shore", "north shore", "north shore", "north shore"], annual["region"].Texts);

        // The hourly method's mean of the complete years, not a single year and not another method.
        var brinmoor = report.Rows.Single(r => r.Climate == "brinmoor");
        Assert.Equal("mean", brinmoor.Year);
        Assert.Equal(120, brinmoor.Values["heating_kbtu"]);
        Assert.Equal(50, report.Rows.Single(r => r.Climate == "saltreach").Values["heating_kbtu"]);
        Assert.Equal((7000, 300), report.DegreeDays["brinmoor"]);
        Assert.Empty(report.Warnings);
    }

    [Fact]
    public async Task AClimateWithoutAClimatesRow_IsLeftOutOfTheScatters_WithAWarning()
    {
        await Write("annual", "shard", "0", Annual(("brinmoor", "typical", "hourly", 100), ("saltreach", "typical", "hourly", 50)));
        await Write("climates", "shard", "0", Climates(("brinmoor", 7000, 300)));
        var report = await BatchReport.ReadAsync(folder);
        Assert.Contains(report.Warnings, w => w.Contains("saltreach", StringComparison.Ordinal) && w.Contains("left out of the degree-day charts", StringComparison.Ordinal));
        var scatter = report.Charts().Single(c => c.Chart.FileStem == "heating-against-heating-degree-days").Chart;
        Assert.Equal([7000.0], scatter.SeriesLabelled("base").X);
    }

    [Fact]
    public async Task PartsWithDifferentColumns_AreRefused_NamingBoth()
    {
        await Write("annual", "shard", "0", Annual(("brinmoor", "typical", "hourly", 100)));
        var other = new ResultTable("annual").Text("climate").Text("variant").Text("year").Text("method").Number("heating_kwh");
        other.AddRow("saltreach", "base", "typical", "hourly", 10.0);
        await Write("annual", "shard", "1", other);
        var e = await Assert.ThrowsAsync<BatchReportException>(() => PartitionedTable.ReadAsync(folder, "annual"));
        Assert.Contains(Path.Combine("tables", "annual", "shard=1", "part-0000.parquet"), e.Message, StringComparison.Ordinal);
        Assert.Contains(Path.Combine("tables", "annual", "shard=0", "part-0000.parquet"), e.Message, StringComparison.Ordinal);
        Assert.Contains("heating_kwh", e.Message, StringComparison.Ordinal);
    }
}
