using System.Diagnostics;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

/// <summary>With SOURCE_DATE_EPOCH set, two runs of the same study write the same bytes, report, charts and tables included.</summary>
public sealed class ReproducibleRunTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-reproducible-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private (int Code, string Err) Run(string study, string output, string? epoch)
    {
        var info = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in new[] { typeof(BinEnergy.Cli.CliApp).Assembly.Location, "run", study, "--out", output })
        {
            info.ArgumentList.Add(a);
        }

        if (epoch is not null)
        {
            info.Environment["SOURCE_DATE_EPOCH"] = epoch;
        }

        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return (process.ExitCode, stderr.Result);
    }

    private static Dictionary<string, byte[]> Files(string root) =>
        Directory.GetFiles(root, "*", SearchOption.AllDirectories).ToDictionary(f => Path.GetRelativePath(root, f), File.ReadAllBytes);

    [Fact]
    public void TwoRunsWithTheSameEpoch_WriteTheSameBytes()
    {
        var weather = SyntheticWeather.Year(meanC: 11, annualSwingK: 13, dailySwingK: 5, spreadK: 3, name: "Harbor (invented)");
        using (var writer = new StreamWriter(Path.Combine(folder, "harbor.csv")))
        {
            OpenLayoutWriter.Write(weather, writer);
        }

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
