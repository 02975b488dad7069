using MathNet.Numerics.Interpolation;
using MathNet.Numerics.LinearAlgebra;

namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// Smooth daily courses through twelve monthly values over a non-leap year of 365 days.
/// <see cref="MeanPreserving"/> passes a periodic natural cubic spline (MathNet
/// <see cref="CubicSpline.InterpolateNaturalSorted"/>) through twelve node values at the
/// middle of each month, with the nodes chosen so that the mean of the 365 daily values
/// over each month equals the given monthly mean exactly (a 12 x 12 linear system, solved
/// once by LU decomposition; the curve is linear in its nodes). Interpolating the monthly
/// means themselves would flatten the annual cycle (the mean of a curve over a month lies
/// inside its value at mid-month at the summer peak and the winter trough).
/// Periodicity: the nodes are repeated one year before and after, and only the middle year
/// is used, so the natural end conditions have no visible effect on it.
/// </summary>
public static class MonthlyMeanCurve
{
    /// <summary>Days in the non-leap year.</summary>
    public const int DaysInYear = 365;

    private static readonly int[] MonthLengths = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

    /// <summary>Month index (0..11) of each day of the year (0..364).</summary>
    public static IReadOnlyList<int> MonthOfDay { get; } = BuildMonthOfDay();

    /// <summary>Number of days in each month (0..11) of a non-leap year.</summary>
    public static IReadOnlyList<int> DaysInMonth => MonthLengths;

    private static readonly Matrix<double> SplineBasis = BuildBasis(cubic: true);
    private static readonly Matrix<double> LinearBasis = BuildBasis(cubic: false);
    private static readonly MathNet.Numerics.LinearAlgebra.Factorization.LU<double> MeanOperator =
        (Averaging() * SplineBasis).LU();

    /// <summary>
    /// 365 daily values (each at the middle of its day) of the smooth periodic curve whose
    /// mean over each month equals <paramref name="monthlyMeans"/>[month].
    /// </summary>
    public static double[] MeanPreserving(IReadOnlyList<double> monthlyMeans)
    {
        var nodes = MeanOperator.Solve(Vector<double>.Build.DenseOfEnumerable(Check(monthlyMeans)));
        return (SplineBasis * nodes).ToArray();
    }

    /// <summary>
    /// 365 daily values of the periodic straight-line interpolation between the monthly values
    /// placed at the middle of each month; stays within the range of the values (no overshoot).
    /// </summary>
    public static double[] Linear(IReadOnlyList<double> monthlyValues) =>
        (LinearBasis * Vector<double>.Build.DenseOfEnumerable(Check(monthlyValues))).ToArray();

    /// <summary>The mean of daily values over each month (12 values).</summary>
    public static double[] MonthlyMeans(IReadOnlyList<double> daily)
    {
        if (daily.Count != DaysInYear)
        {
            throw new ArgumentException($"expected {DaysInYear} daily values, got {daily.Count}");
        }

        var sums = new double[12];
        for (int d = 0; d < DaysInYear; d++)
        {
            sums[MonthOfDay[d]] += daily[d];
        }

        return sums.Select((s, m) => s / MonthLengths[m]).ToArray();
    }

    private static IReadOnlyList<double> Check(IReadOnlyList<double> values) =>
        values.Count == 12 ? values : throw new ArgumentException($"expected 12 monthly values, got {values.Count}");

    private static int[] BuildMonthOfDay()
    {
        var months = new int[DaysInYear];
        int d = 0;
        for (int m = 0; m < 12; m++)
        {
            for (int i = 0; i < MonthLengths[m]; i++)
            {
                months[d++] = m;
            }
        }

        return months;
    }

    /// <summary>Column j holds the daily values of the curve through node j = 1 and the other nodes 0.</summary>
    private static Matrix<double> BuildBasis(bool cubic)
    {
        var middles = new double[12];
        double start = 0;
        for (int m = 0; m < 12; m++)
        {
            middles[m] = start + MonthLengths[m] / 2.0;
            start += MonthLengths[m];
        }

        var x = new double[36];
        for (int k = 0; k < 36; k++)
        {
            x[k] = middles[k % 12] + DaysInYear * (k / 12 - 1);
        }

        var basis = Matrix<double>.Build.Dense(DaysInYear, 12);
        for (int j = 0; j < 12; j++)
        {
            var y = new double[36];
            y[j] = y[j + 12] = y[j + 24] = 1.0;
            IInterpolation curve = cubic
                ? CubicSpline.InterpolateNaturalSorted(x, y)
                : LinearSpline.InterpolateSorted(x, y);
            for (int d = 0; d < DaysInYear; d++)
            {
                basis[d, j] = curve.Interpolate(d + 0.5);
            }
        }

        return basis;
    }

    private static Matrix<double> Averaging()
    {
        var a = Matrix<double>.Build.Dense(12, DaysInYear);
        for (int d = 0; d < DaysInYear; d++)
        {
            int m = MonthOfDay[d];
            a[m, d] = 1.0 / MonthLengths[m];
        }

        return a;
    }
}
