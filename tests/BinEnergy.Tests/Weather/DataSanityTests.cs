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
}
