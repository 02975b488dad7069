using MathNet.Numerics.Interpolation;

namespace BinEnergy.Core.Climate;

/// <summary>
/// Heating and cooling degree-days of an hourly record as functions of the base temperature
/// (the variable-base or balance-point curve): exact values at a set of bases, each computed
/// from the hours as in <see cref="DegreeDays"/>, and MathNet linear-spline interpolation
/// between them for any balance point inside the range.
/// </summary>
public sealed class DegreeDayCurve
{
    private readonly LinearSpline heating;
    private readonly LinearSpline cooling;

    private DegreeDayCurve(double[] basesC, double[] heatingKDays, double[] coolingKDays)
    {
        BasesC = basesC;
        HeatingKDays = heatingKDays;
        CoolingKDays = coolingKDays;
        heating = LinearSpline.InterpolateSorted(basesC, heatingKDays);
        cooling = LinearSpline.InterpolateSorted(basesC, coolingKDays);
    }

    /// <summary>The bases, C, ascending.</summary>
    public double[] BasesC { get; }

    /// <summary>Heating degree-days at each base, K-day.</summary>
    public double[] HeatingKDays { get; }

    /// <summary>Cooling degree-days at each base, K-day.</summary>
    public double[] CoolingKDays { get; }

    /// <summary>The bases of the usual curve: 40 F to 80 F in steps of 1 F, in C.</summary>
    public static double[] StandardBasesC() =>
        Enumerable.Range(40, 41).Select(f => Units.Conversions.FahrenheitToCelsius(f)).ToArray();

    /// <summary>
    /// Builds the curve from hourly dry-bulbs. Sorting the hours once and keeping running sums
    /// gives every base in O(log n): HDD(b) = (k b - sum of the k temperatures below b) / 24.
    /// </summary>
    public static DegreeDayCurve FromHours(IReadOnlyList<double> dryBulbC, IReadOnlyList<double>? basesC = null)
    {
        var bases = (basesC ?? StandardBasesC()).ToArray();
        if (bases.Length < 2 || bases.Zip(bases.Skip(1)).Any(p => !(p.Second > p.First)))
        {
            throw new ArgumentException("the bases must be at least two values in ascending order", nameof(basesC));
        }

        var sorted = dryBulbC.ToArray();
        Array.Sort(sorted);
        var prefix = new double[sorted.Length + 1];
        for (int i = 0; i < sorted.Length; i++)
        {
            prefix[i + 1] = prefix[i] + sorted[i];
        }

        double total = prefix[^1];
        var hdd = new double[bases.Length];
        var cdd = new double[bases.Length];
        for (int j = 0; j < bases.Length; j++)
        {
            double b = bases[j];
            int k = LowerBound(sorted, b);
            hdd[j] = (k * b - prefix[k]) / 24.0;
            cdd[j] = ((total - prefix[k]) - (sorted.Length - k) * b) / 24.0;
        }

        return new DegreeDayCurve(bases, hdd, cdd);
    }

    /// <summary>Heating degree-days at a base inside the curve's range, K-day (linear interpolation).</summary>
    public double HeatingAt(double baseC) => heating.Interpolate(CheckRange(baseC));

    /// <summary>Cooling degree-days at a base inside the curve's range, K-day (linear interpolation).</summary>
    public double CoolingAt(double baseC) => cooling.Interpolate(CheckRange(baseC));

    private double CheckRange(double baseC) =>
        baseC >= BasesC[0] - 1e-9 && baseC <= BasesC[^1] + 1e-9
            ? baseC
            : throw new ArgumentOutOfRangeException(nameof(baseC), baseC, FormattableString.Invariant($"the base must lie within {BasesC[0]:0.##} to {BasesC[^1]:0.##} C"));

    /// <summary>Number of sorted values strictly below <paramref name="value"/>.</summary>
    private static int LowerBound(double[] sorted, double value)
    {
        int lo = 0, hi = sorted.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < value)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }

        return lo;
    }
}
