namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// One month of a synthesized year against its input: each figure as asked for and as
/// measured on the hourly output (daily maxima and minima are the largest and smallest of
/// the day's 24 hourly values). SI: C for temperatures, K for ranges and spreads.
/// </summary>
/// <param name="Month">1..12.</param>
/// <param name="TargetMaxC">Mean daily maximum asked for.</param>
/// <param name="MaxC">Mean daily maximum of the output.</param>
/// <param name="TargetMinC">Mean daily minimum asked for.</param>
/// <param name="MinC">Mean daily minimum of the output.</param>
/// <param name="TargetDewPointC">Mean dew point asked for.</param>
/// <param name="DewPointC">Mean hourly dew point of the output.</param>
/// <param name="TargetSpreadK">Day-to-day spread asked for.</param>
/// <param name="SpreadK">Standard deviation of the output's daily mean (the midpoint of its maximum
/// and minimum) about the smooth seasonal course, within the month.</param>
public sealed record MonthCheck(
    int Month,
    double TargetMaxC,
    double MaxC,
    double TargetMinC,
    double MinC,
    double TargetDewPointC,
    double DewPointC,
    double TargetSpreadK,
    double SpreadK)
{
    /// <summary>Mean daily range asked for, K.</summary>
    public double TargetRangeK => TargetMaxC - TargetMinC;

    /// <summary>Mean daily range of the output, K.</summary>
    public double RangeK => MaxC - MinC;

    /// <summary>Midpoint of the mean daily maximum and minimum asked for, C.</summary>
    public double TargetMidpointC => 0.5 * (TargetMaxC + TargetMinC);

    /// <summary>Midpoint of the output's mean daily maximum and minimum, C.</summary>
    public double MidpointC => 0.5 * (MaxC + MinC);
}
