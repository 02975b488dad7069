namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// The climate statistics of one calendar month, in SI: what the synthesizer reproduces
/// (DESIGN 5.5). These are the figures published as monthly climate normals.
/// </summary>
/// <param name="Month">Month number, 1 (January) to 12.</param>
/// <param name="DryBulbMaxC">Mean daily maximum dry-bulb, C.</param>
/// <param name="DryBulbMinC">Mean daily minimum dry-bulb, C.</param>
/// <param name="DewPointC">Mean dew point over all hours of the month, C.</param>
/// <param name="DailyMeanSpreadK">Day-to-day spread: the standard deviation of the daily mean
/// dry-bulb about its seasonal course, K.</param>
public sealed record MonthStatistics(int Month, double DryBulbMaxC, double DryBulbMinC, double DewPointC, double DailyMeanSpreadK)
{
    /// <summary>Mean daily range (max minus min), K.</summary>
    public double DailyRangeK => DryBulbMaxC - DryBulbMinC;

    /// <summary>The midpoint of the mean daily maximum and minimum, C (the usual "monthly mean" of normals).</summary>
    public double DailyMidpointC => 0.5 * (DryBulbMaxC + DryBulbMinC);
}
