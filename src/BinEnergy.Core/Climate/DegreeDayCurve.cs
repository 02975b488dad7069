using MathNet.Numerics.Interpolation;

namespace BinEnergy.Core.Climate;

/// <summary>
/// Heating and cooling degree-days of an hourly record as functions of the base temperature
/// (the variable-base or balance-point curve): exact values at a set of bases, each counted
/// as in <see cref="DegreeDaySeries"/> by its method, and MathNet linear-spline interpolation
/// between them for any balance point inside the range.
/// </summary>
public sealed class DegreeDayCurve
{
    private readonly LinearSpline heating;
    private readonly LinearSpline cooling;

    private DegreeDayCurve(DegreeDayMethod method, double[] basesC, double[] heatingKDays, double[] coolingKDays)
    {
        Method = method;
        BasesC = basesC;
        HeatingKDays = heatingKDays;
        CoolingKDays = coolingKDays;
        heating = LinearSpline.InterpolateSorted(basesC, heatingKDays);
        cooling = LinearSpline.InterpolateSorted(basesC, coolingKDays);
    }

    /// <summary>How the day temperatures were taken.</summary>
    public DegreeDayMethod Method { get; }

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
    /// Builds the curve from a degree-day series. Sorting its temperatures once and keeping
    /// running sums of days d and of d T gives every base in O(log n):
    /// HDD(b) = b x (days below b) - (sum of d T below b), CDD(b) likewise above.
    /// </summary>
    public static DegreeDayCurve From(DegreeDaySeries series, IReadOnlyList<double>? basesC = null)
    {
        ArgumentNullException.ThrowIfNull(series);
        var bases = (basesC ?? StandardBasesC()).ToArray();
        if (bases.Length < 2 || bases.Zip(bases.Skip(1)).Any(p => !(p.Second > p.First)))
        {
            throw new ArgumentException("the bases must be at least two values in ascending order", nameof(basesC));
        }

        var sorted = (double[])series.TemperaturesC.Clone();
        var days = (double[])series.Days.Clone();
        Array.Sort(sorted, days);
        var dayPrefix = new double[sorted.Length + 1];
        var degreePrefix = new double[sorted.Length + 1];
        for (int i = 0; i < sorted.Length; i++)
        {
            dayPrefix[i + 1] = dayPrefix[i] + days[i];
            degreePrefix[i + 1] = degreePrefix[i] + days[i] * sorted[i];
        }

        var hdd = new double[bases.Length];
        var cdd = new double[bases.Length];
        for (int j = 0; j < bases.Length; j++)
        {
            double b = bases[j];
            int k = LowerBound(sorted, b);
            hdd[j] = b * dayPrefix[k] - degreePrefix[k];
            cdd[j] = (degreePrefix[^1] - degreePrefix[k]) - b * (dayPrefix[^1] - dayPrefix[k]);
        }

        return new DegreeDayCurve(series.Method, bases, hdd, cdd);
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
