using System.Text.Json;
using AngleSharp.Html.Parser;
using BinEnergy.Cli;
using BinEnergy.Core.Loads;
using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Text;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting.Batch;

/// <summary>
/// The cross-climate report over a batch-shaped folder (the six real files and the four demo
/// climates, two variants, split into three shards): the figures equal the study's own, the
/// statistics equal a hand computation, the page is valid HTML with the cautions, and folder
/// mistakes are clear errors.
/// </summary>
public sealed class BatchReportTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-batch-report-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static (int Code, string Out, string Err) Cli(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private string Out(string name = "out")
    {
        string path = Path.Combine(folder, name);
        Directory.CreateDirectory(path);
        return path;
    }

    [Fact]
    public async Task ThreeShards_GiveEveryClimateOnce_WithTheStudysHourlyFigures()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 3);
        var report = await BatchReport.ReadAsync(output);

        Assert.Equal(3, report.Annual.Parts.Count);
        Assert.Equal(3, report.Climates.Parts.Count);
        Assert.Equal(CrossClimateStudy.Climates.Count * 2, report.Rows.Count);
        Assert.Equal(["recovery", "no-recovery"], report.Variants);

        // Each row's heating is the run's own hourly annual heating, converted to kBtu (1 kBtu = 1,055,055.85262 J, the IT Btu).
        foreach (var c in CrossClimateStudy.Run.Cases)
        {
            var row = report.Rows.Single(r => r.Climate == c.Case.Climate.Name && r.Variant == c.Case.Variant.Name);
            Assert.Equal(c.OutdoorAir.Annual[IntegrationMethod.Hourly].Loads.Heating.Joules / 1_055_055.85262, row.Values["heating_kbtu"], 6);
        }

        // The scatter's degree-days come from the climates table: Chicago's daily-mean HDD65 is 6,325 F-day (inspect's figure).
        Assert.Equal(6325, report.DegreeDays["tmy3-725300"].Heating, 0);
    }

    [Fact]
    public async Task NationalTable_IsTheQuartilesOfTheClimates_ByHand()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 2);
        var report = await BatchReport.ReadAsync(output);
        var national = report.National();
        int i = Enumerable.Range(0, national.RowCount).Single(r => national["figure"].Texts[r] == "Heating" && national["variant"].Texts[r] == "no-recovery");

        // Type-7 quantiles by hand (Hyndman and Fan 1996, definition 7): h = (n - 1) p, interpolate between order statistics.
        var values = CrossClimateStudy.Run.Cases.Where(c => c.Case.Variant.Name == "no-recovery")
            .Select(c => c.OutdoorAir.Annual[IntegrationMethod.Hourly].Loads.Heating.Joules / 1_055_055.85262).Order().ToArray();
        double Q(double p)
        {
            double h = (values.Length - 1) * p;
            int lo = (int)Math.Floor(h);
            return lo + 1 < values.Length ? values[lo] + (h - lo) * (values[lo + 1] - values[lo]) : values[lo];
        }

        Assert.Equal(values.Length, national["climates"].Integers[i]);
        Assert.Equal(values[0], national["min"].Numbers[i], 6);
        Assert.Equal(Q(0.25), national["lower_quartile"].Numbers[i], 6);
        Assert.Equal(Q(0.5), national["median"].Numbers[i], 6);
        Assert.Equal(Q(0.75), national["upper_quartile"].Numbers[i], 6);
        Assert.Equal(values.Average(), national["mean"].Numbers[i], 6);
        Assert.Equal(values[^1], national["max"].Numbers[i], 6);

        // Recovery lowers heating in every climate, so its median is lower (common practice: recovery pre-heats the outdoor air).
        int j = Enumerable.Range(0, national.RowCount).Single(r => national["figure"].Texts[r] == "Heating" && national["variant"].Texts[r] == "recovery");
        Assert.True(national["median"].Numbers[j] < national["median"].Numbers[i]);
    }

    [Fact]
    public async Task Ranking_ListsTheTenHighestAndLowest_InOrder()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 3);
        var report = await BatchReport.ReadAsync(output);
        var ranking = report.Ranking();
        var rows = Enumerable.Range(0, ranking.RowCount).Where(r => ranking["figure"].Texts[r] == "Heating" && ranking["variant"].Texts[r] == "recovery").ToList();
        var high = rows.Where(r => ranking["end"].Texts[r] == "highest").Select(r => (ranking["climate"].Texts[r], ranking["value"].Numbers[r])).ToList();
        var low = rows.Where(r => ranking["end"].Texts[r] == "lowest").Select(r => ranking["climate"].Texts[r]).ToList();
        Assert.Equal(10, high.Count);
        Assert.Equal(10, low.Count);
        Assert.True(high.Zip(high.Skip(1)).All(p => p.First.Item2 >= p.Second.Item2));

        // The coldest record heats most: the Alaska TMY3 file (703165) beats Chicago; the hot humid Gulf coast file (722040) heats least of the real files.
        Assert.Equal("tmy3-703165", high[0].Item1);
        Assert.True(low.IndexOf("tmy3-722040") < low.IndexOf("tmy3-725300"));
    }

    [Fact]
    public async Task Charts_DrawEveryClimate_AndAreSavedForReview()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 3);
        var report = await BatchReport.ReadAsync(output);
        var charts = report.Charts();
        foreach (var (_, chart) in charts)
        {
            ChartReview.Save(chart, "cross-climate");
        }

        var heatingBox = charts.Single(c => c.Chart.FileStem == "distribution-heating").Chart;
        Assert.Equal(CrossClimateStudy.Climates.Count, heatingBox.SeriesLabelled("recovery").Count);
        var box = heatingBox.SeriesLabelled("recovery box").Y;
        Assert.Equal(report.ValuesOf(report.Figures[0], "recovery").Min(x => x.Value), box[0], 6);
        Assert.Equal(report.ValuesOf(report.Figures[0], "recovery").Max(x => x.Value), box[4], 6);

        var scatter = charts.Single(c => c.Chart.FileStem == "heating-against-heating-degree-days").Chart;
        var points = scatter.SeriesLabelled("no-recovery");
        Assert.Equal(CrossClimateStudy.Climates.Count, points.Count);
        int chicago = points.X.ToList().FindIndex(x => Math.Abs(x - 6325) < 1);
        Assert.True(chicago >= 0);

        Assert.Contains(charts, c => c.Chart.FileStem == "cooling-latent-against-cooling-degree-days");
        Assert.DoesNotContain(charts, c => c.Chart.FileStem == "cooling-latent-against-heating-degree-days");
    }

    [Fact]
    public void Command_WritesAValidReportAndSummary_WithTheCautions()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 3);
        var (code, stdout, err) = Cli("batch-report", output);
        Assert.True(code == 0, err);
        Assert.Contains("Heating", stdout, StringComparison.Ordinal);

        string html = File.ReadAllText(Path.Combine(output, "report.html"));
        var errors = new List<string>();
        var parser = new HtmlParser();
        parser.Error += (_, e) => errors.Add(e.ToString()!);
        var doc = parser.ParseDocument(html);
        Assert.Empty(errors);
        foreach (string caution in Cautions.Report)
        {
            Assert.Contains(caution, doc.Body!.TextContent, StringComparison.Ordinal);
        }

        // Heating, sensible and latent cooling and cost (the study humidifies nothing and gives no carbon factors, so those
        // figures are zero everywhere and left out): four distributions and five scatters (cost against both degree-days).
        Assert.Equal(9, doc.QuerySelectorAll("figure.chart img").Length);

        // Ten climates: the highest and lowest ten overlap, so each figure and variant gets one list of all ten, highest first.
        var heating = doc.QuerySelectorAll("table").Single(t => t.QuerySelector("caption")?.TextContent == "Heating, recovery: every climate, highest first (kBtu)");
        var names = heating.QuerySelectorAll("tbody tr").Select(r => r.Children[1].TextContent).ToList();
        Assert.Equal(CrossClimateStudy.Climates.Count, names.Distinct().Count());
        Assert.Equal("tmy3-703165", names[0]);
        Directory.CreateDirectory(ChartReview.Folder);
        File.WriteAllText(Path.Combine(ChartReview.Folder, "..", "batch-report-sample.html"), html);

        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(output, "summary.json")));
        var root = summary.RootElement;
        Assert.Equal(CrossClimateStudy.Run.Study.Hash, root.GetProperty("study_sha256").GetString());
        Assert.Equal(CrossClimateStudy.Climates.Count, root.GetProperty("climates").GetInt32());
        Assert.Equal(3, root.GetProperty("annual_parts").GetInt32());
        Assert.Equal(4 * 2, root.GetProperty("national").GetArrayLength());
        Assert.Contains(Cautions.TooLittleAir, root.GetProperty("cautions").EnumerateArray().Select(c => c.GetString()));
    }

    [Fact]
    public void Command_NoTables_IsAClearError()
    {
        var (code, _, err) = Cli("batch-report", Out());
        Assert.Equal(3, code);
        Assert.Contains("no tables/ folder", err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);

        (code, _, err) = Cli("batch-report", Path.Combine(folder, "missing"));
        Assert.Equal(3, code);
        Assert.Contains("no such folder", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Command_MissingClimatesTable_IsAClearError_AndWritesNothing()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 2, tables: ["annual"]);
        var (code, _, err) = Cli("batch-report", output);
        Assert.Equal(3, code);
        Assert.Contains("climates table is missing", err, StringComparison.Ordinal);
        Assert.False(File.Exists(Path.Combine(output, "report.html")));
        Assert.False(File.Exists(Path.Combine(output, "summary.json")));
    }

    [Fact]
    public void Command_MixedStudies_AreRefused_NamingThePart()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 3, hashOfShard: s => s == 2 ? new string('e', 64) : CrossClimateStudy.Run.Study.Hash);
        var (code, _, err) = Cli("batch-report", output);
        Assert.Equal(3, code);
        Assert.Contains(Path.Combine("tables", "annual", "shard=2", "part-0000.parquet"), err, StringComparison.Ordinal);
        Assert.Contains("another study", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Command_AFileThatIsNotParquet_IsNamed()
    {
        string output = Out();
        BatchFolder.Write(CrossClimateStudy.Run, output, shards: 2);
        File.WriteAllText(Path.Combine(output, "tables", "annual", "shard=1", "part-0000.parquet"), "climate,variant\n");
        var (code, _, err) = Cli("batch-report", output);
        Assert.Equal(3, code);
        Assert.Contains("shard=1", err, StringComparison.Ordinal);
        Assert.Contains("not a readable Parquet file", err, StringComparison.Ordinal);
    }
}
