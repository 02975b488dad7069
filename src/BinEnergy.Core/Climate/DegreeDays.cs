namespace BinEnergy.Core.Climate;

/// <summary>
/// Degree-days computed from hourly temperatures: heating = sum over hours of
/// max(0, base - T) / 24, cooling = sum of max(0, T - base) / 24, in kelvin-days (multiply by
/// 1.8 for F-days). This is the hourly definition (ASHRAE Handbook—Fundamentals 2017, ch. 14,
/// "Degree-days and climatic normals"), which differs from the daily mean-temperature method
/// by the hours on the other side of the base within a day.
/// </summary>
public static class DegreeDays
{
    /// <summary>Heating degree-days (K-day) of hourly dry-bulbs in C over a base in C.</summary>
    public static double Heating(IReadOnlyList<double> dryBulbC, double baseC)
    {
        double sum = 0;
        for (int i = 0; i < dryBulbC.Count; i++)
        {
            sum += Math.Max(0.0, baseC - dryBulbC[i]);
        }

        return sum / 24.0;
    }

    /// <summary>Cooling degree-days (K-day) of hourly dry-bulbs in C over a base in C.</summary>
    public static double Cooling(IReadOnlyList<double> dryBulbC, double baseC)
    {
        double sum = 0;
        for (int i = 0; i < dryBulbC.Count; i++)
        {
            sum += Math.Max(0.0, dryBulbC[i] - baseC);
        }

        return sum / 24.0;
    }
}
