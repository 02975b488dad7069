using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>The weather quantities' facts are the one source the parser, the maps, the quality keys and the docs read.</summary>
public sealed class QuantityFactsTests
{
    [Fact]
    public void DocsShowTheFactsTable_AsGenerated()
    {
        string docs = File.ReadAllText(Path.Combine(TestData.Root, "docs", "weather.md")).Replace("\r\n", "\n", StringComparison.Ordinal);
        string table = WeatherQuantityFacts.MarkdownTable();
        Assert.True(docs.Contains("<!-- quantity facts: generated, do not edit by hand -->\n" + table + "\n<!-- end of quantity facts -->", StringComparison.Ordinal),
            "docs/weather.md should show the table WeatherQuantityFacts.MarkdownTable() makes:\n" + table);
    }

    [Fact]
    public void EveryQuantityHasOneRow_InEnumOrder_WithItsOwnKeyAndColumns()
    {
        Assert.Equal(Enum.GetValues<WeatherQuantity>(), WeatherQuantityFacts.All.Select(f => f.Quantity));
        Assert.Equal(WeatherQuantityFacts.All.Count, WeatherQuantityFacts.All.Select(f => f.Key).Distinct().Count());
        var columns = WeatherQuantityFacts.All.SelectMany(f => f.OpenColumns.Select(c => c.Column)).ToList();
        Assert.Equal(columns.Count, columns.Distinct(StringComparer.OrdinalIgnoreCase).Count());
        Assert.All(WeatherQuantityFacts.All, f => Assert.All(f.OpenColumns, c => Assert.True(f.Units.ContainsKey(c.Unit), $"{c.Column}: unit {c.Unit}")));
        // The order of preference of DESIGN 5.1: dew point, humidity ratio, wet-bulb, RH.
        Assert.Equal([WeatherQuantity.DewPoint, WeatherQuantity.HumidityRatio, WeatherQuantity.WetBulb, WeatherQuantity.RelativeHumidity],
            WeatherQuantityFacts.All.Where(f => f.IsHumidity).OrderBy(f => f.HumidityPreference).Select(f => f.Quantity));
    }

    [Theory]
    [InlineData("f", 212.0, 100.0)] // water boils at 212 F = 100 C at sea level (common knowledge)
    [InlineData("k", 273.15, 0.0)] // 0 C = 273.15 K (SI definition)
    public void TemperatureUnits_ConvertToCelsius(string unit, double raw, double celsius)
    {
        var (factor, offset) = WeatherQuantityFacts.Of(WeatherQuantity.DryBulb).Units[unit];
        Assert.Equal(celsius, raw * factor + offset, 10);
    }

    [Fact]
    public void PressureInInchesOfMercury_ConvertsToPascals()
    {
        // 29.92 inHg = 101.325 kPa, standard sea-level pressure (ASHRAE Handbook—Fundamentals ch. 1, table 1; recalled from memory).
        var (factor, _) = WeatherQuantityFacts.Of(WeatherQuantity.Pressure).Units["inhg"];
        Assert.InRange(29.92 * factor, 101_300, 101_350);
    }
}
