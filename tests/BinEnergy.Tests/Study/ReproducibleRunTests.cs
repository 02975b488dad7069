using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

/// <summary>With SOURCE_DATE_EPOCH set, two runs of the same study write the same bytes, report, charts and tables included.</summary>
public sealed class ReproducibleRunTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-reproducible-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static (int Code, string Err) Run(string study, string output, string epoch)
    {
        var (code, _, err) = CliProcess.Run(["run", study, "--out", output], environment: new Dictionary<string, string> { ["SOURCE_DATE_EPOCH"] = epoch });
        return (code, err);
    }

    private static Dictionary<string, byte[]> Files(string root) =>
        Directory.GetFiles(root, "*", SearchOption.AllDirectories).ToDictionary(f => Path.GetRelativePath(root, f), File.ReadAllBytes);

    [Fact]
    public void TwoRunsWithTheSameEpoch_WriteTheSameBytes()
    {
        ExampleStudy.WriteWeather(folder);

        string study = Path.Combine(folder, "harbor-study.toml");
        File.WriteAllText(study, ExampleStudy.Text);
        string one = Path.Combine(folder, "one"), two = Path.Combine(folder, "two");
        var (code, err) = Run(study, one, "1767225600"); // 2026-01-01T00:00:00Z
        Assert.True(code == 0, err);
        (code, err) = Run(study, two, "1767225600");
        Assert.True(code == 0, err);
        var a = Files(one);
        var b = Files(two);
        Assert.Equal(a.Keys.Order(StringComparer.Ordinal), b.Keys.Order(StringComparer.Ordinal));
        Assert.Contains("report.html", a.Keys);
        Assert.Contains(a.Keys, k => k.EndsWith(".png", StringComparison.Ordinal));
        Assert.All(a, f => Assert.True(f.Value.AsSpan().SequenceEqual(b[f.Key]), $"{f.Key} differs between the two runs"));
        Assert.Contains("2026-01-01", File.ReadAllText(Path.Combine(one, "report.html")), StringComparison.Ordinal);

        var bad = Run(study, Path.Combine(folder, "three"), "yesterday");
        Assert.Equal(3, bad.Code);
        Assert.Contains("SOURCE_DATE_EPOCH is 'yesterday'", bad.Err, StringComparison.Ordinal);
    }
}
