using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Climate;

/// <summary>
/// What a weather record says about its climate: dry-bulb statistics, degree-days at a base and
/// over a range of bases (the balance-point curve), and the design conditions from the record.
/// </summary>
/// <param name="MinDryBulbC">Lowest hourly dry-bulb, C.</param>
/// <param name="MeanDryBulbC">Mean hourly dry-bulb, C.</param>
/// <param name="MaxDryBulbC">Highest hourly dry-bulb, C.</param>
/// <param name="DegreeDayMethod">How the degree-days were counted.</param>
/// <param name="DegreeDayBaseC">The base of <paramref name="HeatingKDays"/> and <paramref name="CoolingKDays"/>, C.</param>
/// <param name="HeatingKDays">Heating degree-days at the base, K-day.</param>
/// <param name="CoolingKDays">Cooling degree-days at the base, K-day.</param>
/// <param name="Curve">Degree-days over a range of bases.</param>
/// <param name="Design">Design conditions from the record.</param>
public sealed record ClimateSummary(
    double MinDryBulbC,
    double MeanDryBulbC,
    double MaxDryBulbC,
    DegreeDayMethod DegreeDayMethod,
    double DegreeDayBaseC,
    double HeatingKDays,
    double CoolingKDays,
    DegreeDayCurve Curve,
    DesignConditions Design)
{
    /// <summary>The summary of <paramref name="weather"/> with degree-days by <paramref name="method"/> at <paramref name="baseC"/> and the curve over <paramref name="curveBasesC"/>.</summary>
    public static ClimateSummary Of(HourlyWeather weather, DegreeDayMethod method, double baseC, double[] curveBasesC)
    {
        ArgumentNullException.ThrowIfNull(weather);
        var t = weather.DryBulbC;
        var series = DegreeDaySeries.Of(weather, method);
        return new ClimateSummary(t.Min(), t.Average(), t.Max(), method, baseC,
            series.Heating(baseC), series.Cooling(baseC),
            DegreeDayCurve.From(series, curveBasesC), DesignConditions.FromRecord(weather));
    }
}
