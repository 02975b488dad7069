using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>Column maps: the shipped ones, a user's own, and the errors a bad map gets.</summary>
public sealed class ColumnMapTests
{
    private const string MinimalMap = """
        header_line = 1
        [time]
        column = "t"
        format = "yyyy-MM-dd HH:mm"
        [columns]
        drybulb = { name = "T", unit = "c" }
        rh = { name = "H", unit = "pct" }
        """;

    [Fact]
    public void ShippedMaps_AreTmy3AndPvgis()
    {
        Assert.Contains("tmy3", ColumnMap.ShippedNames);
        Assert.Contains("pvgis", ColumnMap.ShippedNames);
        var tmy3 = ColumnMap.Load("tmy3");
        Assert.True(tmy3.Time.HourEnding);
        Assert.Equal("Dry-bulb (C)", tmy3.Columns[WeatherQuantity.DryBulb].Name);
        Assert.True(ColumnMap.Load("PVGIS").Time.Utc);
    }

    [Fact]
    public void UnknownKey_IsAnErrorSuggestingTheNearestKey()
    {
        var e = Assert.Throws<WeatherDataException>(() => ColumnMap.Parse(MinimalMap.Replace("header_line", "header_lines"), "my.toml"));
        Assert.Equal(WeatherErrorKind.BadMap, e.Kind);
        Assert.Equal("header_lines", e.Column);
        Assert.Contains("did you mean 'header_line'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnknownUnit_IsAnErrorListingTheUnits()
    {
        var e = Assert.Throws<WeatherDataException>(() => ColumnMap.Parse(MinimalMap.Replace("unit = \"c\"", "unit = \"celsius\""), "my.toml"));
        Assert.Equal(WeatherErrorKind.BadMap, e.Kind);
        Assert.Equal("columns.drybulb.unit", e.Column);
        Assert.Contains("c, f, k", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TomlSyntaxError_NamesTheLine()
    {
        var e = Assert.Throws<WeatherDataException>(() => ColumnMap.Parse("header_line = 1\n[time\n", "broken.toml"));
        Assert.Equal(WeatherErrorKind.BadMap, e.Kind);
        Assert.Equal(2, e.Line);
        Assert.StartsWith("broken.toml, line 2", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MissingMap_IsMapNotFound()
    {
        var e = Assert.Throws<WeatherDataException>(() => ColumnMap.Load("no-such-map"));
        Assert.Equal(WeatherErrorKind.MapNotFound, e.Kind);
        Assert.Contains("tmy3", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UserMap_ReadsItsOwnLayout_SemicolonsFahrenheitHourEnding24AndMissingCodes()
    {
        // An invented station export: two header lines with metadata, semicolons, F, hour-ending times with 24:00,
        // -999 for missing, humidity ratio in grains per pound.
        string map = """
            name = "valley-export"
            header_line = 3
            separator = ";"
            missing = ["-999"]
            [time]
            date_column = "day"
            date_format = "dd.MM.yyyy"
            time_column = "hour"
            time_format = "HH:mm"
            hour = "ending"
            [columns]
            drybulb = { name = "temp_F", unit = "f" }
            humidity_ratio = { name = "moisture", unit = "gr/lb" }
            pressure = { name = "baro", unit = "inhg" }
            [metadata]
            name = { line = 1, field = 2 }
            elevation_m = { pattern = '^elev=(\S+)' }
            """;
        var sb = new StringBuilder("station;Cedar Gap\nelev=820\nday;hour;temp_F;moisture;baro\n");
        for (int h = 1; h <= 24; h++)
        {
            string moisture = h == 5 ? "-999" : "56";
            sb.Append($"03.04.2025;{h:00}:00;{(h == 24 ? "50" : "59")};{moisture};27.2\n");
        }

        string dir = TestData.Scratch("user-map");
        string mapPath = Path.Combine(dir, "valley.toml");
        File.WriteAllText(mapPath, map);
        string dataPath = Path.Combine(dir, "valley.txt");
        File.WriteAllText(dataPath, sb.ToString());

        var w = WeatherReader.Read(dataPath, new WeatherReadOptions { Map = ColumnMap.Load(mapPath) });
        Assert.Equal("Cedar Gap", w.Site.Name);
        Assert.Equal(820, w.Site.ElevationM);
        Assert.Equal(24, w.Count);
        Assert.Equal(new DateTime(2025, 4, 3, 0, 0, 0), w.Times[0]); // 01:00 hour-ending is the hour from 00:00
        Assert.Equal(new DateTime(2025, 4, 3, 23, 0, 0), w.Times[^1]); // 24:00 hour-ending is the hour from 23:00
        Assert.Equal(15.0, w.DryBulbC[0], 9); // 59 F = 15 C
        Assert.Equal(10.0, w.DryBulbC[^1], 9); // 50 F = 10 C
        Assert.Equal(0.008, w.HumidityRatio[0], 9); // 56 gr/lb = 0.008 lb/lb (7,000 grains per pound)
        Assert.Equal(1, w.Quality.Counts[QualityKeys.GapFilledPrefix + "humidity_ratio"]);
        Assert.Equal(27.2 * 3386.389, w.PressurePa[3], 6); // 1 inHg = 3,386.389 Pa (common practice, at 0 C)
    }
}
