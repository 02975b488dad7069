using AngleSharp.Html.Parser;

namespace BinEnergy.Tests.Batch;

/// <summary>
/// <c>--charts-for</c>: the named climates, and only they, get the per-climate charts <c>run</c> draws (the same images
/// for the same climate), embedded in the cross-climate report, whichever shard ran them; a name that matches no input is
/// an error naming it with its close matches, before anything is written.
/// </summary>
public sealed class BatchChartsTests
{
    private static List<string> Figures(string report) =>
        new HtmlParser().ParseDocument(File.ReadAllText(report)).QuerySelectorAll("figure[data-chart]").Select(e => e.GetAttribute("data-chart")!).ToList();

    [Fact]
    public void ChartsFor_DrawsTheNamedClimatesOnly_WithTheImagesRunDraws()
    {
        using var f = new BatchFolder(3);
        string run = Path.Combine(f.Path, "run"), batch = Path.Combine(f.Path, "batch");
        var (code, _, err) = BatchFolder.Cli("run", f.Study, "--out", run);
        Assert.True(code == 0, err);
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.StationList(3), "--out", batch, "--charts-for", "Brinmoor");
        Assert.True(code == 0, err);

        // The run's charts of Brinmoor (its weather, and each variant's: brinmoor-VARIANT), byte for byte; no chart of the two other climates.
        var fromRun = Directory.GetFiles(Path.Combine(run, "charts"), "*-brinmoor*.png").Select(p => Path.GetFileName(p)).Order(StringComparer.Ordinal).ToList();
        var fromBatch = Directory.GetFiles(Path.Combine(batch, "charts"), "*.png").Select(p => Path.GetFileName(p)).Order(StringComparer.Ordinal).ToList();
        Assert.True(fromRun.Count >= 6, "run draws bin hours, load by bin, psychrometric, economizer, monthly and method-check charts per climate");
        Assert.Equal(fromRun, fromBatch);
        foreach (string name in fromBatch)
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(run, "charts", name)), File.ReadAllBytes(Path.Combine(batch, "charts", name)));
        }

        // The report embeds them after the cross-climate charts.
        var figures = Figures(Path.Combine(batch, "report.html"));
        Assert.Equal(fromBatch.Select(n => Path.GetFileNameWithoutExtension(n)), figures.Where(c => c.Contains("-brinmoor", StringComparison.Ordinal)).Order(StringComparer.Ordinal));
        Assert.Contains(figures, c => c.StartsWith("distribution-", StringComparison.Ordinal));
        Assert.DoesNotContain(figures, c => c.Contains("-aster-flats", StringComparison.Ordinal) || c.Contains("-calder-reach", StringComparison.Ordinal));

        // A rerun with --force and other names replaces them.
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.StationList(3), "--out", batch, "--force", "--charts-for", "Aster Flats");
        Assert.True(code == 0, err);
        Assert.All(Directory.GetFiles(Path.Combine(batch, "charts"), "*.png"), p => Assert.Contains("-aster-flats", Path.GetFileName(p), StringComparison.Ordinal));
    }

    [Fact]
    public void ChartsFor_FromTwoShards_AreInTheReportOfBatchReport()
    {
        using var f = new BatchFolder(4);
        string batch = Path.Combine(f.Path, "batch");
        // Files without a station list: the names are "site (id)"; the ids name them too. Part 0 holds station-00 and -02, part 1 station-01 and -03.
        foreach (string shard in new[] { "0/2", "1/2" })
        {
            var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", batch, "--shard", shard, "--charts-for", "station-02,Dunhollow (station-03)");
            Assert.True(code == 0, err);
        }

        var (c, _, e) = BatchFolder.Cli("batch-report", batch);
        Assert.True(c == 0, e);
        var figures = Figures(Path.Combine(batch, "report.html"));
        Assert.Contains("bin-hours-station-02", figures);
        Assert.Contains("bin-hours-dunhollow-station-03", figures);
        Assert.Equal(2, figures.Count(x => x.StartsWith("bin-hours-", StringComparison.Ordinal)));
        Assert.Contains("Charts: Calder Reach (station-02)", File.ReadAllText(Path.Combine(batch, "report.html")), StringComparison.Ordinal);
    }

    [Fact]
    public void ChartsFor_UnknownNames_AreAnErrorWithCloseMatches_AndNothingIsWritten()
    {
        using var f = new BatchFolder(3);
        string batch = Path.Combine(f.Path, "batch");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.StationList(3), "--out", batch, "--charts-for", "Brinmor,Aster Flats,Zanzibar");
        Assert.Equal(3, code);
        Assert.Contains("--charts-for: 2 names match no input: 'Brinmor' (close: 'Brinmoor'); 'Zanzibar' (nothing close)", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(batch));

        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", batch, "--charts-for", "station-1");
        Assert.Equal(3, code);
        Assert.Contains("no input is named 'station-1' (close: 'station-01', 'station-00', 'station-02')", err, StringComparison.Ordinal);
    }
}
