using System.Globalization;
using System.Text.Json;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Cli;

/// <summary>The <c>bins</c> command end to end, on an invented open-layout file and on a real file through its map.</summary>
public class BinsCommandTests
{
    /// <summary>An invented place (Fernhollow, 300 m) written in the open layout, with one hour at exactly 10.0 C.</summary>
    internal static string InventedFile() => Invented.Value;

    // Written once per test run; Lazy makes the test classes that run in parallel share one file.
    private static readonly Lazy<string> Invented = new(WriteInventedFile);

    private static string WriteInventedFile()
    {
        string dir = Path.Combine(Path.GetTempPath(), "binenergy-tests", "loads-" + Environment.ProcessId);
        Directory.CreateDirectory(dir);
        string path = Path.Combine(dir, "fernhollow.csv");
        var year = SyntheticWeather.Year(meanC: 11, pressurePa: 97_700, name: "Fernhollow");
        year.DryBulbC[100] = 10.0;
        var weather = SyntheticWeather.FromColumns(year.DryBulbC, year.HumidityRatio, 97_700, "Fernhollow");
        var site = weather.Site with { ElevationM = 300 };
        var withSite = new HourlyWeather(site, weather.Columns, weather.Quality, weather.Calendar);
        using var writer = new StreamWriter(path + ".tmp");
        OpenLayoutWriter.Write(withSite, writer, ["invented test climate, not a real place"]);
        writer.Close();
        File.Move(path + ".tmp", path, overwrite: true);

        return path;
    }

    [Fact]
    public void Csv_HasTheContractColumns_AscendingRows_AndEveryHour()
    {
        var (code, output, err) = AirCommandTests.Run("bins", InventedFile(), "--occupied", "Mon-Fri 07:00-19:00", "--csv");
        Assert.True(code == 0, err);
        var lines = output.TrimEnd('\n').Split('\n');
        // The study tables' names and units (the same columns the terminal shows, gr/lb included).
        Assert.StartsWith("bin_low_f,bin_high_f,bin_mid_f,hours,hours_occupied,hours_unoccupied,mean_drybulb_f,mean_humidity_ratio_gr_lb,mean_coincident_wetbulb_f,mean_enthalpy_btu_lb,occupied_mean_drybulb_f,", lines[0]);
        var rows = lines.Skip(1).Select(l => l.Split(',')).ToList();
        double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);
        Assert.Equal(8760, rows.Sum(r => int.Parse(r[3], CultureInfo.InvariantCulture)));
        Assert.All(rows, r => Assert.Equal(int.Parse(r[3], CultureInfo.InvariantCulture), int.Parse(r[4], CultureInfo.InvariantCulture) + int.Parse(r[5], CultureInfo.InvariantCulture)));
        Assert.Equal(52 * 60 + 12, rows.Sum(r => int.Parse(r[4], CultureInfo.InvariantCulture))); // 2018: 52 weeks and a Monday (calendar fact)
        for (int i = 1; i < rows.Count; i++)
        {
            Assert.Equal(D(rows[i - 1][1]), D(rows[i][0]));
            Assert.Equal(5.0, D(rows[i][1]) - D(rows[i][0]), 9);
        }

        var fifty = rows.Single(r => r[0] == "50");
        Assert.True(int.Parse(fifty[3], CultureInfo.InvariantCulture) >= 1); // the 10.0 C hour is exactly 50 F: lower edge inclusive
        Assert.InRange(D(fifty[6]), 50.0, 55.0);
        Assert.InRange(D(fifty[7]), 7.0, 140.0); // gr/lb (0.001 to 0.02 lb/lb)
    }

    [Fact]
    public void Json_BySplitAndJoint_KeepTheHours()
    {
        var (code, output, err) = AirCommandTests.Run("bins", InventedFile(), "--by", "month", "--units", "si", "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(8760, root.GetProperty("hours").GetInt32());
        Assert.Equal(2.0, root.GetProperty("bin_width_c").GetDouble());
        var groups = root.GetProperty("groups").EnumerateArray().ToList();
        Assert.Equal(12, groups.Select(g => g.GetProperty("month").GetString()).Distinct().Count());
        Assert.Equal(8760, groups.Sum(g => g.GetProperty("hours").GetInt32()));
        Assert.True(groups[0].TryGetProperty("bin_low_c", out _));
        Assert.Equal(8760, root.GetProperty("hours_by_month").EnumerateArray().Sum(r => r.GetProperty("all").GetInt32()));

        var (code2, joint, _) = AirCommandTests.Run("bins", InventedFile(), "--joint", "--json");
        Assert.Equal(0, code2);
        using var j = JsonDocument.Parse(joint);
        Assert.Equal(8760, j.RootElement.GetProperty("joint").EnumerateArray().Sum(c => c.GetProperty("hours").GetInt32()));
    }

    [Fact]
    public void RealFile_TableRendersThroughItsMap()
    {
        var (code, output, err) = AirCommandTests.Run("bins", RawSiteColumns.PathOf("725300TYA.CSV.gz"), "--map", "tmy3", "--occupied", "Mon-Fri 07:00-19:00; Sat 08:00-13:00");
        Assert.True(code == 0, err);
        Assert.Contains("CHICAGO OHARE", output);
        Assert.Contains("8760", output);
        Assert.Contains("3392", output); // 52 x 65 h + the extra Monday's 12 h
    }

    [Theory]
    [InlineData(new[] { "--occupied", "Mon-Fry 07:00-19:00" }, 2, "character 5")]
    [InlineData(new[] { "--by", "week" }, 2, "--by week: 'week' is not a split; write month or block")]
    [InlineData(new[] { "--csv", "--json" }, 2, "not both")]
    [InlineData(new[] { "--width", "0" }, 2, "--width: 0 F is out of range")]
    [InlineData(new[] { "--holidays", "25/12/2018" }, 2, "YYYY-MM-DD")]
    public void BadOptions_AreUsageErrors(string[] extra, int exitCode, string message)
    {
        var (code, output, err) = AirCommandTests.Run(["bins", InventedFile(), .. extra]);
        Assert.Equal(exitCode, code);
        Assert.Contains(message, err);
        Assert.Equal("", output);
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void MissingFile_IsBadInput()
    {
        var (code, output, err) = AirCommandTests.Run("bins", "/nonexistent/weather.csv");
        Assert.Equal(3, code);
        Assert.Equal("", output);
        Assert.Contains("weather.csv", err);
    }
}
