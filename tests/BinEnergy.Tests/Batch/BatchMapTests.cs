using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Batch;

/// <summary><c>batch --map</c>: files in another layout (real TMY3 files) run through a shipped map; without it every file fails, and a batch where nothing ran exits 3.</summary>
public sealed class BatchMapTests
{
    [Fact]
    public void TmyFilesThroughAGlob_NeedTheMap_AndFailWithExit3WithoutIt()
    {
        using var f = new BatchFolder(1);
        string real = Path.Combine(f.Path, "real");
        Directory.CreateDirectory(real);
        foreach (string name in new[] { "725300TYA.CSV.gz", "722040TYA.CSV.gz" })
        {
            File.Copy(Path.Combine(RepoPaths.Root, "tests", "data", "weather-open", name), Path.Combine(real, name));
        }

        string glob = Path.Combine(real, "*.gz");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", glob, "--out", Path.Combine(f.Path, "without"));
        Assert.Equal(3, code);
        Assert.Contains("no input ran: all 2 were stopped", err, StringComparison.Ordinal);
        Assert.Contains("--map", err, StringComparison.Ordinal);

        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", glob, "--map", "tmy3", "--out", Path.Combine(f.Path, "with"), "--json");
        Assert.True(code == 0, err);
        var batch = BatchFolder.Summary(Path.Combine(f.Path, "with", "summary.json")).GetProperty("batch");
        Assert.Equal(2, batch.GetProperty("done").GetInt32());
        Assert.Equal(0, batch.GetProperty("failed").GetInt32());

        // The report names each weather file and the site it sets under Inputs.
        var inputs = new AngleSharp.Html.Parser.HtmlParser().ParseDocument(File.ReadAllText(Path.Combine(f.Path, "with", "report.html"))).GetElementById("inputs")!.TextContent;
        Assert.Contains("725300TYA.CSV.gz", inputs, StringComparison.Ordinal);
        Assert.Contains("722040TYA.CSV.gz", inputs, StringComparison.Ordinal);
        Assert.Contains("CHICAGO OHARE INTL AP", inputs, StringComparison.Ordinal); // the site name in the file's header

        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", glob, "--map", "tmy4", "--out", Path.Combine(f.Path, "bad"));
        Assert.Equal(3, code);
        Assert.Contains("--map tmy4: not a shipped column map (shipped: ", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(f.Path, "bad")));
    }
}
