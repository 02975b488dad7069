using System.Globalization;
using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>Values physical one by one but not together: a unit slip stops the read; spikes and outliers are warned about.</summary>
public sealed class DataSanityTests
{
    private static HourlyWeather Read(string text) => WeatherReader.Read(Encoding.UTF8.GetBytes(text), "sanity.csv");

    [Fact]
    public void ADryBulbColumnNamedFThatHoldsCelsius_StopsTheRead()
    {
        // The invented file's dry-bulbs (6 to 14 C) written under drybulb_f: read as F they are -14 to -10 C, below every dew point.
        string text = OpenLayoutText.File(240).Replace("time,drybulb_c,", "time,drybulb_f,", StringComparison.Ordinal);
        var e = Assert.Throws<WeatherDataException>(() => Read(text));
        Assert.Equal(WeatherErrorKind.ValueOutOfRange, e.Kind);
        Assert.Contains("more than 1 K above the dry-bulb in 240 of 240 hours", e.Message, StringComparison.Ordinal);
        Assert.Contains("drybulb_f", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ASpikeAndAHotJanuaryHour_AreWarnedAbout_AndUsedAsTheyAre()
    {
        // A mild invented January (6 to 14 C): hour 100 reads 55 C.
        string text = OpenLayoutText.File(24 * 31, (i, row) => i == 100 ? string.Create(CultureInfo.InvariantCulture, $"{row.Split(',')[0]},55,5,100.1") : row);
        var w = Read(text);
        Assert.Equal(55, w.DryBulbC[100]);
        Assert.Contains(w.Quality.Warnings, x => x.StartsWith("1 single-hour dry-bulb spike(s)", StringComparison.Ordinal) && x.Contains("line 107 (2026-01-05 04:00) 55 C", StringComparison.Ordinal));
        Assert.Contains(w.Quality.Warnings, x => x.StartsWith("1 hour(s) with a dry-bulb more than 6 standard deviations", StringComparison.Ordinal));
    }

    [Theory]
    [MemberData(nameof(RealWeatherFileTests.Tmy3), MemberType = typeof(RealWeatherFileTests))]
    public void TheRealFiles_HaveNoSpikeOrOutlier(string name)
    {
        // Quality-checked datasets (SOURCES.md): their extremes are weather, and the checks must not call them errors.
        var w = RealWeatherFileTests.Read(name);
        Assert.DoesNotContain(w.Quality.Warnings, x => x.Contains("spike", StringComparison.Ordinal) || x.Contains("standard deviations", StringComparison.Ordinal));
    }

    [Fact]
    public void AYearOfFahrenheitValuesLabelledCelsius_IsWarnedAbout_WithTheReadingThatFits()
    {
        // The invented Test Fen (52.1 N, 100 m) with its 6 to 14 C year written as F (43 to 57) under drybulb_c and dewpoint_c:
        // every value is physical, but an annual mean of 50 C is found nowhere, let alone at 52 N.
        string text = OpenLayoutText.File(8760, (i, row) =>
        {
            var p = row.Split(',');
            double f(string c) => Math.Round(double.Parse(c, CultureInfo.InvariantCulture) * 1.8 + 32, 2);
            return string.Create(CultureInfo.InvariantCulture, $"{p[0]},{f(p[1])},{f(p[2])},{p[3]}");
        });
        var w = Read(text);
        Assert.Contains(w.Quality.Warnings, x => x.StartsWith("the mean dry-bulb of the record is 50 C, outside", StringComparison.Ordinal)
            && x.Contains("at latitude 52.1 and 100 m; read as F it would be 10 C, which fits", StringComparison.Ordinal));
    }

    [Fact]
    public void TheAnnualMeanBand_HoldsKnownClimates_AndRefusesUnitSlips()
    {
        // Annual means recalled from memory: Singapore (1 N, sea level) about 27.5 C; Chicago (42 N, 190 m) about 10 C;
        // La Paz (16 S, 3,640 m) about 8 C; Yakutsk (62 N, 100 m) about -9 C; the South Pole (90 S, 2,835 m) about -49 C.
        foreach (var (lat, z, mean) in new[] { (1.3, 15.0, 27.5), (41.98, 190.0, 10.0), (-16.5, 3640.0, 8.0), (62.0, 100.0, -9.0), (-90.0, 2835.0, -49.0) })
        {
            var (low, high) = WeatherChecks.PlausibleAnnualMeanC(lat, z);
            Assert.InRange(mean, low, high);
        }

        // Chicago's 10 C written as F (50) and read as C is above the band; Singapore's 27.5 C read as F (-2.5 C) below it.
        Assert.True(WeatherChecks.PlausibleAnnualMeanC(41.98, 190).High < 50);
        Assert.True(WeatherChecks.PlausibleAnnualMeanC(1.3, 15).Low > (27.5 - 32) / 1.8);
    }

    [Theory]
    [MemberData(nameof(RealWeatherFileTests.All), MemberType = typeof(RealWeatherFileTests))]
    public void TheRealFiles_HaveAPlausibleAnnualMean(string name)
    {
        var w = RealWeatherFileTests.Read(name);
        Assert.NotNull(w.Site.Latitude);
        Assert.DoesNotContain(w.Quality.Warnings, x => x.StartsWith("the mean dry-bulb of the record", StringComparison.Ordinal));
    }
}
