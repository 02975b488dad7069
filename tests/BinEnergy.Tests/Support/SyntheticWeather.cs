using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Support;

/// <summary>
/// Invented hourly records for tests (no real place): a smooth annual and daily cycle of
/// dry-bulb with a dew point a set spread below it, or columns given directly.
/// </summary>
internal static class SyntheticWeather
{
    /// <summary>2018 starts on a Monday, the default calendar year of typical-year files.</summary>
    public static readonly DateTime Start = new(2018, 1, 1, 0, 0, 0, DateTimeKind.Unspecified);

    public static HourlyWeather FromColumns(double[] dryBulbC, double[] humidityRatio, double pressurePa = Atmosphere.SeaLevelPressurePa,
        string name = "Testville", DateTime? start = null)
    {
        var s = start ?? Start;
        var times = Enumerable.Range(0, dryBulbC.Length).Select(i => s.AddHours(i)).ToArray();
        var site = new SiteInfo(name, 0, null, null, null, pressurePa, SitePressureSource.RecordMean);
        var columns = new HourlyColumns { Times = times, DryBulbC = dryBulbC, HumidityRatio = humidityRatio, PressurePa = Enumerable.Repeat(pressurePa, dryBulbC.Length).ToArray() };
        return new HourlyWeather(site, columns, new QualityReport(), new CalendarInfo(s.Year, false, "invented test record"));
    }

    /// <summary>
    /// A year of 8,760 invented hours: dry-bulb = mean - annualSwing cos(2 pi day/365) - dailySwing cos(2 pi (hour - 3)/24),
    /// dew point = dry-bulb - spread - humidSwing cos(2 pi (hour - 3)/24) (capped at the dry-bulb), or dry air when dry is set.
    /// </summary>
    public static HourlyWeather Year(double meanC = 12, double annualSwingK = 12, double dailySwingK = 5, double spreadK = 4,
        bool dry = false, double pressurePa = Atmosphere.SeaLevelPressurePa, int hours = 8760, string name = "Testville")
    {
        var t = new double[hours];
        var w = new double[hours];
        for (int i = 0; i < hours; i++)
        {
            double day = i / 24.0;
            double hour = i % 24;
            double daily = Math.Cos(2 * Math.PI * (hour - 3) / 24);
            t[i] = meanC - annualSwingK * Math.Cos(2 * Math.PI * day / 365) - dailySwingK * daily;
            double dewPoint = Math.Min(t[i], t[i] - spreadK - 0.5 * dailySwingK * daily);
            w[i] = dry ? 0.0 : MoistAir.HumidityRatioFromDewPoint(dewPoint, pressurePa);
        }

        return FromColumns(t, w, pressurePa, name);
    }
}
