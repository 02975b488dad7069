namespace BinEnergy.Core.Plant;

/// <summary>
/// Cooling COP against two axes, outdoor dry-bulb and coil-entering wet-bulb, from a small user
/// table (rows by outdoor temperature, columns by entering wet-bulb), interpolated bilinearly
/// between the four surrounding points (bilinear interpolation on a rectangular grid, common
/// practice; equipment catalogues tabulate capacity and power this way). Outside the table each
/// axis is held at its end value (clamped), and callers count those hours, as for
/// <see cref="PerformanceCurve"/>. An axis of one value makes the COP constant along it.
/// </summary>
public sealed class CoolingCopTable : IEquatable<CoolingCopTable>
{
    private readonly double[] outdoorC;
    private readonly double[] wetBulbC;
    private readonly double[] cop;

    private CoolingCopTable(double[] outdoorC, double[] wetBulbC, double[] cop)
    {
        this.outdoorC = outdoorC;
        this.wetBulbC = wetBulbC;
        this.cop = cop;
    }

    /// <summary>Outdoor dry-bulbs of the rows, C, ascending.</summary>
    public IReadOnlyList<double> OutdoorC => outdoorC;

    /// <summary>Coil-entering wet-bulbs of the columns, C, ascending.</summary>
    public IReadOnlyList<double> WetBulbC => wetBulbC;

    /// <summary>
    /// Builds a table from its axes and its COPs row by row (one row per outdoor temperature, one
    /// value per wet-bulb in each row).
    /// </summary>
    /// <exception cref="ArgumentException">An axis empty or not strictly ascending, the wrong number of COPs, or a COP that is not positive.</exception>
    public static CoolingCopTable Create(IReadOnlyList<double> outdoorC, IReadOnlyList<double> wetBulbC, IReadOnlyList<double> copRowByRow)
    {
        Ascending(outdoorC, "outdoor temperatures");
        Ascending(wetBulbC, "wet-bulb temperatures");
        if (copRowByRow.Count != outdoorC.Count * wetBulbC.Count)
        {
            throw new ArgumentException($"the table needs {outdoorC.Count} x {wetBulbC.Count} = {outdoorC.Count * wetBulbC.Count} COPs (one row per outdoor temperature, one value per wet-bulb), not {copRowByRow.Count}");
        }

        foreach (double c in copRowByRow)
        {
            if (!(c > 0) || double.IsInfinity(c))
            {
                throw new ArgumentException($"COP must be a positive number, not {c}");
            }
        }

        return new CoolingCopTable([.. outdoorC], [.. wetBulbC], [.. copRowByRow]);
    }

    /// <summary>
    /// True when the point lies outside the table on an axis of two or more values (the COP is
    /// clamped there); an axis of one value is constant, never outside.
    /// </summary>
    public bool IsOutside(double outdoorDryBulbC, double enteringWetBulbC) => Outside(outdoorC, outdoorDryBulbC) || Outside(wetBulbC, enteringWetBulbC);

    private static bool Outside(double[] axis, double x) => axis.Length > 1 && (x < axis[0] || x > axis[^1]);

    /// <summary>
    /// The COP at an outdoor dry-bulb and a coil-entering wet-bulb, C: with i, j the cell and
    /// u, v the fractions across it, COP = (1-u)(1-v) c[i,j] + u (1-v) c[i+1,j] + (1-u) v c[i,j+1] + u v c[i+1,j+1];
    /// each axis clamped to its end values. Allocation-free.
    /// </summary>
    public double Evaluate(double outdoorDryBulbC, double enteringWetBulbC)
    {
        var (i, u) = Cell(outdoorC, outdoorDryBulbC);
        var (j, v) = Cell(wetBulbC, enteringWetBulbC);
        int n = wetBulbC.Length;
        int i1 = Math.Min(i + 1, outdoorC.Length - 1), j1 = Math.Min(j + 1, n - 1);
        return (1 - u) * (1 - v) * cop[i * n + j] + u * (1 - v) * cop[i1 * n + j] + (1 - u) * v * cop[i * n + j1] + u * v * cop[i1 * n + j1];
    }

    /// <summary>The lower index of the interval holding <paramref name="x"/> (clamped) and the fraction across it.</summary>
    private static (int Index, double Fraction) Cell(double[] axis, double x)
    {
        if (axis.Length == 1 || x <= axis[0])
        {
            return (0, 0.0);
        }

        if (x >= axis[^1])
        {
            return (axis.Length - 2, 1.0);
        }

        int k = Array.BinarySearch(axis, x);
        int lo = k >= 0 ? Math.Min(k, axis.Length - 2) : ~k - 1;
        return (lo, (x - axis[lo]) / (axis[lo + 1] - axis[lo]));
    }

    private static void Ascending(IReadOnlyList<double> axis, string what)
    {
        if (axis.Count == 0)
        {
            throw new ArgumentException($"the table needs at least one of its {what}");
        }

        for (int k = 1; k < axis.Count; k++)
        {
            if (!(axis[k] > axis[k - 1]))
            {
                throw new ArgumentException($"the {what} must rise strictly from left to right");
            }
        }
    }

    /// <summary>True when <paramref name="other"/> has the same axes and COPs (tables are immutable).</summary>
    public bool Equals(CoolingCopTable? other) =>
        other is not null && outdoorC.AsSpan().SequenceEqual(other.outdoorC) && wetBulbC.AsSpan().SequenceEqual(other.wetBulbC) && cop.AsSpan().SequenceEqual(other.cop);

    public override bool Equals(object? obj) => Equals(obj as CoolingCopTable);

    public override int GetHashCode() => HashCode.Combine(outdoorC.Length, wetBulbC.Length, cop[0]);
}
