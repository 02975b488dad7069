using BinEnergy.Core.Errors;
using BinEnergy.Core.Weather.Synthesis;

namespace BinEnergy.Tests.Synthesis;

/// <summary>The monthly-statistics file: both unit systems read alike, and every mistake is named.</summary>
public class MonthlyClimateReaderTests
{
    private const string Rows = """
        1,10.0,0.0,-3.0,4.0
        2,11.0,1.0,-2.0,4.0
        3,13.0,3.0,0.0,3.5
        4,16.0,6.0,2.0,3.0
        5,20.0,10.0,6.0,3.0
        6,24.0,14.0,10.0,2.5
        7,27.0,17.0,13.0,2.0
        8,26.0,16.0,13.0,2.0
        9,22.0,12.0,9.0,2.5
        10,17.0,7.0,4.0,3.0
        11,13.0,3.0,0.0,3.5
        12,10.0,0.0,-3.0,4.0
        """;

    private const string Good = "# name: Testborough\n# elevation_m: 150\n# latitude: 45\n# note: invented\n"
        + "month,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k\n" + Rows + "\n";

    private static MonthlyClimateException Fails(string text)
    {
        var e = Assert.Throws<MonthlyClimateException>(() => MonthlyClimateReader.Parse(text, "site.csv"));
        Assert.IsAssignableFrom<InputDataException>(e);
        Assert.StartsWith("site.csv", e.Message);
        return e;
    }

    [Fact]
    public void GoodFile_Reads()
    {
        var c = MonthlyClimateReader.Parse(Good, "site.csv");
        Assert.Equal("Testborough", c.Name);
        Assert.Equal(150, c.ElevationM);
        Assert.Equal(45, c.Latitude);
        Assert.Null(c.Longitude);
        Assert.Equal(12, c.Months.Count);
        Assert.Equal(new MonthStatistics(7, 27, 17, 13, 2), c.Months[6]);
    }

    [Fact]
    public void IpColumns_ReadAsTheSameClimate()
    {
        // 150 m = 492.13 ft; 10 C = 50 F; 4 K = 7.2 F degrees (exact conversions).
        string ip = "# name: Testborough\n# elevation_ft: 492.126\n# latitude: 45\n"
            + "month,drybulb_max_f,drybulb_min_f,dewpoint_f,daily_mean_sd_f\n"
            + string.Join('\n', Rows.Split('\n').Select(l =>
            {
                var p = l.Split(',').Select(s => double.Parse(s, System.Globalization.CultureInfo.InvariantCulture)).ToArray();
                return FormattableString.Invariant($"{p[0]},{p[1] * 1.8 + 32},{p[2] * 1.8 + 32},{p[3] * 1.8 + 32},{p[4] * 1.8}");
            }));
        var si = MonthlyClimateReader.Parse(Good, "site.csv");
        var fromIp = MonthlyClimateReader.Parse(ip, "site.csv");
        Assert.Equal(si.ElevationM, fromIp.ElevationM, 0.001);
        for (int m = 0; m < 12; m++)
        {
            Assert.Equal(si.Months[m].DryBulbMaxC, fromIp.Months[m].DryBulbMaxC, 1e-9);
            Assert.Equal(si.Months[m].DryBulbMinC, fromIp.Months[m].DryBulbMinC, 1e-9);
            Assert.Equal(si.Months[m].DewPointC, fromIp.Months[m].DewPointC, 1e-9);
            Assert.Equal(si.Months[m].DailyMeanSpreadK, fromIp.Months[m].DailyMeanSpreadK, 1e-9);
        }
    }

    [Fact]
    public void ByteOrderMarkAndCrLf_AndMonthNames_AreRead()
    {
        string text = "\uFEFF" + Good.Replace("\n", "\r\n").Replace("\r\n7,", "\r\nJuly,");
        var c = MonthlyClimateReader.Parse(text, "site.csv");
        Assert.Equal(27, c.Months[6].DryBulbMaxC);
    }

    [Fact]
    public void EveryCommittedSample_Reads()
    {
        foreach (var (name, _) in SampleClimates.All)
        {
            var c = SampleClimates.Climate(name);
            Assert.Equal(12, c.Months.Count);
        }
    }

    [Theory]
    [InlineData("", null, null, "no header")]
    [InlineData("# name: X\n# elevation_m: 1\n", null, null, "no header")]
    [InlineData("# elevation_m: 1\nmonth,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k\n", null, "name", "name is missing")]
    [InlineData("# name: X\nmonth,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k\n", null, "elevation_m", "elevation is missing")]
    [InlineData("# name: X\n# elevation_m: 1\n# elevation_ft: 3\nmonth\n", 3, "elevation_ft", "not both")]
    [InlineData("# name: X\n# elevaton_m: 1\nmonth\n", 2, "elevaton_m", "unknown metadata key")]
    [InlineData("# name: X\n# name: Y\nmonth\n", 2, "name", "given twice")]
    [InlineData("# name: X\n# elevation_m: 9000\nmonth\n", 2, "elevation_m", "outside")]
    [InlineData("# name: X\n# elevation_m: high\nmonth\n", 2, "elevation_m", "not a number")]
    [InlineData("# name: X\n# elevation_m: 1\n# latitude: 95\nmonth\n", 3, "latitude", "outside")]
    public void BadMetadata_IsNamed(string text, int? line, string? key, string words)
    {
        var e = Fails(text);
        Assert.Equal(line, e.Line);
        Assert.Equal(key, e.Key);
        Assert.Contains(words, e.Message);
    }

    private static string WithHeader(string header) =>
        "# name: X\n# elevation_m: 1\n" + header + "\n" + Rows + "\n";

    [Theory]
    [InlineData("month;drybulb_max_c;drybulb_min_c;dewpoint_c;daily_mean_sd_k", "month", "semicolons")]
    [InlineData("drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k,month2", "month", "no 'month' column")]
    [InlineData("month,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k,rain_mm", "rain_mm", "unknown column")]
    [InlineData("month,drybulb_max_c,drybulb_min_c,dewpoint_c", "daily_mean_sd_k", "no column for this quantity")]
    [InlineData("month,drybulb_max_c,drybulb_max_f,drybulb_min_c,dewpoint_c,daily_mean_sd_k", "drybulb_max_f", "same as column 'drybulb_max_c'")]
    public void BadHeader_IsNamed(string header, string key, string words)
    {
        var e = Fails(WithHeader(header));
        Assert.Equal(3, e.Line);
        Assert.Equal(key, e.Key);
        Assert.Contains(words, e.Message);
    }

    [Theory]
    [InlineData("3,13.0,3.0,0.0,3.5,9", 8, null, "has 6 fields")]
    [InlineData("3,13,5,3.0,0.0,3.5", 8, null, "has 6 fields")] // a comma as decimal separator
    [InlineData("3,warm,3.0,0.0,3.5", 8, "drybulb_max_c", "'warm' is not a number")]
    [InlineData("3,,3.0,0.0,3.5", 8, "drybulb_max_c", "empty")]
    [InlineData("13,13.0,3.0,0.0,3.5", 8, "month", "not a month")]
    [InlineData("2,13.0,3.0,0.0,3.5", 8, "month", "given twice (also on line 7)")]
    [InlineData("3,3.0,13.0,0.0,3.5", 8, "drybulb_max_c", "must be above the mean daily minimum")]
    [InlineData("3,80.0,3.0,0.0,3.5", 8, "drybulb_max_c", "outside")]
    [InlineData("3,45.0,3.0,0.0,3.5", 8, "drybulb_max_c", "more than 30 K")]
    [InlineData("3,13.0,3.0,9.0,3.5", 8, "dewpoint_c", "cannot hold more water")]
    [InlineData("3,13.0,3.0,0.0,-1", 8, "daily_mean_sd_k", "outside 0 to 15 K")]
    public void BadRow_IsNamed(string row, int line, string? key, string words)
    {
        string text = Good.Replace("\n3,13.0,3.0,0.0,3.5\n", "\n" + row + "\n", StringComparison.Ordinal);
        Assert.NotEqual(Good, text);
        var e = Fails(text);
        Assert.Equal(line, e.Line);
        Assert.Equal(key, e.Key);
        Assert.Contains(words, e.Message);
    }

    [Fact]
    public void MissingMonths_AreListed()
    {
        string text = Good.Replace("\n3,13.0,3.0,0.0,3.5\n", "\n", StringComparison.Ordinal)
            .Replace("\n11,13.0,3.0,0.0,3.5\n", "\n", StringComparison.Ordinal);
        var e = Fails(text);
        Assert.Contains("months 3, 11 are missing", e.Message);
    }

    [Fact]
    public void MissingFile_IsAnInputError()
    {
        var e = Assert.Throws<MonthlyClimateException>(() => MonthlyClimateReader.Read("/no/such/monthly.csv"));
        Assert.Contains("/no/such/monthly.csv", e.Message);
    }
}
