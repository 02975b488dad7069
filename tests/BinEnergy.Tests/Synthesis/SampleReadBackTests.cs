using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Synthesis;

/// <summary>
/// Each demo climate read back through the project's weather reader: no repairs needed, the
/// monthly inputs still met, and degree-days (base 65 F) and design conditions inside the rough
/// range of the real climate it imitates. The ranges are broad on purpose (an invented year
/// need only be plausible) and are recalled from memory of published normals and the
/// Handbook's climatic design tables for cities of each kind; weather-samples/README.md lists
/// them beside the values <c>binenergy inspect</c> prints.
/// </summary>
public class SampleReadBackTests
{
    /// <summary>Plausible ranges, F-day and F: (HDD65, CDD65, heating 99.6 %, cooling 0.4 %, its MCWB).</summary>
    private static readonly Dictionary<string, (double Lo, double Hi)[]> Plausible = new()
    {
        // Gulf-coast humid subtropical city (Houston or New Orleans kind); recalled from memory.
        ["port-verrin"] = [(1_200, 1_900), (2_600, 3_600), (24, 36), (93, 99), (75, 80)],
        // Upper-Midwest cold continental city (Minneapolis, Fargo or Duluth kind); recalled from memory.
        ["frostmere"] = [(7_500, 10_000), (300, 1_000), (-25, -8), (85, 93), (66, 74)],
        // Southwestern high desert near 1,600 m (Albuquerque kind); recalled from memory.
        ["alcor-mesa"] = [(3_800, 5_200), (1_000, 1_800), (10, 22), (92, 99), (58, 66)],
        // Pacific-coast marine town (Arcata, Eureka or Astoria kind); recalled from memory.
        ["kelpwick"] = [(4_000, 5_500), (0, 150), (25, 36), (66, 80), (58, 66)],
    };

    [Theory]
    [MemberData(nameof(SampleClimates.Data), MemberType = typeof(SampleClimates))]
    public void Sample_ReadsBackWithoutRepairs_AndMeetsItsMonthlyInputs(string name, ulong seed)
    {
        _ = seed;
        var weather = WeatherReader.Read(SampleClimates.HourlyPath(name));
        var climate = SampleClimates.Climate(name);
        Assert.Equal(8760, weather.Count);
        Assert.Equal(0, weather.Quality.TotalRepairs);
        Assert.Equal(climate.Name, weather.Site.Name);
        Assert.Equal(climate.ElevationM, weather.Site.ElevationM);
        Assert.Equal(Atmosphere.PressureAtElevationPa(climate.ElevationM), weather.Site.SitePressurePa, 1.0);

        for (int m = 1; m <= 12; m++)
        {
            var days = Enumerable.Range(0, weather.Count).Where(i => weather.Times[i].Month == m)
                .GroupBy(i => weather.Times[i].Day)
                .Select(g => (Max: g.Max(i => weather.DryBulbC[i]), Min: g.Min(i => weather.DryBulbC[i])))
                .ToArray();
            var input = climate.Months[m - 1];
            Assert.InRange(days.Average(d => d.Max) - input.DryBulbMaxC, -0.5, 0.5);
            Assert.InRange(days.Average(d => d.Min) - input.DryBulbMinC, -0.5, 0.5);
            Assert.InRange(days.Average(d => d.Max - d.Min) - input.DailyRangeK, -1.0, 1.0);
            double dew = Enumerable.Range(0, weather.Count).Where(i => weather.Times[i].Month == m).Average(i => weather.DewPointC[i]);
            Assert.InRange(dew - input.DewPointC, -0.5, 0.5);
        }
    }

    [Theory]
    [MemberData(nameof(SampleClimates.Data), MemberType = typeof(SampleClimates))]
    public void Sample_HasPlausibleDegreeDaysAndDesignConditions(string name, ulong seed)
    {
        _ = seed;
        var weather = WeatherReader.Read(SampleClimates.HourlyPath(name));
        double baseC = Temperature.FromFahrenheit(65).Celsius;
        double hdd = DegreeDaySeries.Of(weather, DegreeDayMethod.Hourly).Heating(baseC) * 1.8;
        double cdd = DegreeDaySeries.Of(weather, DegreeDayMethod.Hourly).Cooling(baseC) * 1.8;
        var design = DesignConditions.FromRecord(weather);
        double F(double c) => Temperature.FromCelsius(c).Fahrenheit;
        var values = new[] { hdd, cdd, F(design.Heating996DryBulbC), F(design.Cooling[0].DryBulbC), F(design.Cooling[0].MeanCoincidentWetBulbC) };
        string[] what = ["HDD65", "CDD65", "heating 99.6 %", "cooling 0.4 %", "cooling 0.4 % MCWB"];
        for (int k = 0; k < values.Length; k++)
        {
            var (lo, hi) = Plausible[name][k];
            Assert.True(values[k] >= lo && values[k] <= hi, $"{name}: {what[k]} {values[k]:0.0} outside the plausible {lo}..{hi}");
        }

        // The same figures written independently: degree-days straight from the text's dry-bulb column.
        var text = HourlyText.Parse(File.ReadAllText(SampleClimates.HourlyPath(name)));
        double hddText = text.DryBulbC.Sum(t => Math.Max(0, 65 - (t * 1.8 + 32))) / 24;
        Assert.Equal(hddText, hdd, 0.5);
    }
}
