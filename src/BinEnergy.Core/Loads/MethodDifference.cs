namespace BinEnergy.Core.Loads;

/// <summary>How far an estimate is from its reference (a bin method from the hourly sum), in percent.</summary>
public static class MethodDifference
{
    /// <summary>Below this many joules a year a figure is zero for every practical purpose.</summary>
    public const double NegligibleJoules = 1.0;

    /// <summary>
    /// 100 (estimate - reference) / |reference|; 0 when both are negligible; null when only the
    /// reference is (no percentage exists).
    /// </summary>
    public static double? Percent(double estimate, double reference, double negligible = NegligibleJoules)
    {
        if (Math.Abs(reference) < negligible)
        {
            return Math.Abs(estimate) < negligible ? 0.0 : null;
        }

        return 100.0 * (estimate - reference) / Math.Abs(reference);
    }
}
