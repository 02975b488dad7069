using System.Globalization;
using System.Text.Json;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

/// <summary>Outputs that must not overwrite each other or change with the machine's culture.</summary>
public sealed class OutputSafetyTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-output-safety-").FullName;

    public OutputSafetyTests()
    {
        ExampleStudy.WriteWeather(folder);
    }

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static (int Code, string Out, string Err) Cli(params string[] args) => Tests.Cli.AirCommandTests.Run(args);

    private string Study(params string[] climateNames)
    {
        string climates = string.Concat(climateNames.Select(n => $"[[climate]]\nname = \"{n}\"\nweather = \"harbor.csv\"\n\n"));
        string text = ExampleStudy.Text.Replace("[[climate]]\nname = \"harbor\"\nweather = \"harbor.csv\"", climates.TrimEnd(), StringComparison.Ordinal);
        Assert.All(climateNames, n => Assert.Contains($"name = \"{n}\"", text, StringComparison.Ordinal));
        string path = Path.Combine(folder, "study.toml");
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void CollidingSlugs_AreTold_Apart()
    {
        var slugs = StudyReport.UniqueSlugs(["A B", "a-b", "東京", "大阪", "a-b-2"]);
        Assert.Equal("a-b", slugs["A B"]);
        Assert.Equal("a-b-2", slugs["a-b"]);
        Assert.Equal("climate", slugs["東京"]); // no Latin letter or digit: the fallback
        Assert.Equal("climate-2", slugs["大阪"]);
        Assert.Equal("a-b-2-2", slugs["a-b-2"]);
        Assert.Equal(5, slugs.Values.Distinct().Count());
    }

    [Fact]
    public void TwoClimatesWhoseNamesMakeTheSameFileName_EachKeepTheirCharts()
    {
        string output = Path.Combine(folder, "out-slugs");
        var (code, _, err) = Cli("run", Study("A B", "a-b"), "--out", output);
        Assert.True(code == 0, err);
        var charts = Directory.GetFiles(Path.Combine(output, "charts"), "bin-hours-*.png").Select(Path.GetFileName).Order().ToList();
        Assert.Equal(["bin-hours-a-b-2.png", "bin-hours-a-b.png"], charts);
        string report = File.ReadAllText(Path.Combine(output, "report.html"));
        Assert.Contains("A B", report, StringComparison.Ordinal);
        Assert.Contains("a-b", report, StringComparison.Ordinal);
    }

    [Fact]
    public void UnderAGermanCulture_NumbersAreWrittenTheSame()
    {
        // de-DE writes 1,1979 for 1.1979: every number the tool writes must use the invariant culture. The tool is
        // built in globalization-invariant mode (Directory.Build.props), so named cultures do not load; a culture
        // with de-DE's separators is made by hand, as a host application embedding the engine could set it.
        var german = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        german.NumberFormat.NumberDecimalSeparator = ",";
        german.NumberFormat.NumberGroupSeparator = ".";
        german.NumberFormat.PercentDecimalSeparator = ",";
        german.NumberFormat.CurrencyDecimalSeparator = ",";
        string study = Study("harbor");
        string invariantOut = Path.Combine(folder, "out-invariant");
        string germanOut = Path.Combine(folder, "out-german");
        var saved = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        (int, string, string) first, second;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.InvariantCulture;
            first = Cli("run", study, "--out", invariantOut);
            CultureInfo.CurrentCulture = german;
            CultureInfo.CurrentUICulture = german;
            second = Cli("run", study, "--out", germanOut);
        }
        finally
        {
            (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = saved;
        }

        Assert.True(first.Item1 == 0, first.Item3);
        Assert.True(second.Item1 == 0, second.Item3);
        static string Words(string text) => System.Text.RegularExpressions.Regex.Replace(text, @"\s+", " "); // the path's length moves line breaks
        Assert.Equal(Words(first.Item2.Replace(invariantOut, germanOut, StringComparison.Ordinal)), Words(second.Item2)); // the terminal summary

        foreach (string table in new[] { "annual", "bins", "monthly", "peaks" })
        {
            Assert.Equal(File.ReadAllText(Path.Combine(invariantOut, "tables", table + ".csv")), File.ReadAllText(Path.Combine(germanOut, "tables", table + ".csv")));
        }

        // summary.json differs only in the run's time; its numbers are JSON numbers with a decimal point.
        using var a = JsonDocument.Parse(File.ReadAllText(Path.Combine(invariantOut, "summary.json")));
        using var b = JsonDocument.Parse(File.ReadAllText(Path.Combine(germanOut, "summary.json")));
        var climate = b.RootElement.GetProperty("climates")[0];
        Assert.Equal(JsonValueKind.Number, climate.GetProperty("dry_air_density_lb_ft3").ValueKind);
        Assert.Equal(a.RootElement.GetProperty("headline").GetRawText(), b.RootElement.GetProperty("headline").GetRawText());
        Assert.Equal(a.RootElement.GetProperty("climates").GetRawText(), b.RootElement.GetProperty("climates").GetRawText());
        Assert.Equal(a.RootElement.GetProperty("case_assumptions").GetRawText(), b.RootElement.GetProperty("case_assumptions").GetRawText());
    }

    [Fact]
    public void ASiteNameWithTerminalEscapes_IsPrintedEscaped()
    {
        // An ESC [2J (clear screen) sequence in the site name of a weather file's metadata.
        var weather = SyntheticWeather.Year(meanC: 11, name: "Harbor\u001b[2J (invented)");
        string path = Path.Combine(folder, "escape.csv");
        using (var writer = new StreamWriter(path))
        {
            OpenLayoutWriter.Write(weather, writer);
        }

        var (code, output, err) = Cli("inspect", path);
        Assert.True(code == 0, err);
        Assert.DoesNotContain('\u001b', output);
        Assert.Contains("Harbor\\x1B[2J", output, StringComparison.Ordinal);
    }

    [Fact]
    public void ErrorMessages_EscapeControlCharacters()
    {
        // A file name with an ESC [2J (clear screen) sequence: the error names it, escaped.
        var (code, _, err) = Cli("inspect", Path.Combine(folder, "missing\u001b[2J.csv"));
        Assert.Equal(3, code);
        Assert.DoesNotContain('\u001b', err);
        Assert.Contains("missing\\x1B[2J.csv", err, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("run")]
    [InlineData("map")]
    public void APasswordListGivenAsAStudyOrMap_IsRefusedWithoutQuotingIt(string asWhat)
    {
        // An invented password-list line: neither the study reader nor the column-map reader may print it back.
        string path = Path.Combine(folder, "accounts.toml");
        File.WriteAllText(path, "fenwarden:x:1042:1042:Fen Warden,,,:/home/fenwarden:/bin/bash\nmarshkeeper:x:1043:1043::/home/marshkeeper:/usr/sbin/nologin\n");
        var (code, _, err) = asWhat == "run"
            ? Cli("run", path, "--out", Path.Combine(folder, "never"))
            : Cli("inspect", Path.Combine(folder, "harbor.csv"), "--map", path);
        Assert.Equal(3, code);
        Assert.Contains("accounts.toml, line 1", err, StringComparison.Ordinal);
        Assert.DoesNotContain("/home/fenwarden", err, StringComparison.Ordinal);
        Assert.DoesNotContain("/bin/bash", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(folder, "never")));
    }
}
