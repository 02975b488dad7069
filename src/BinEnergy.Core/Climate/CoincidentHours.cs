namespace BinEnergy.Core.Climate;

/// <summary>
/// The hours a mean coincident value is taken over: the hours at the data level nearest the
/// design value (every hour at the nearest distinct value of the key; both neighbouring levels
/// when the design value lies midway between them); if that is fewer than
/// <see cref="MinimumHours"/> hours, the set is widened symmetrically, one level each side at a
/// time, until it is not. Weather data are stored at a fixed resolution (whole F, tenths of a C),
/// so a design percentile usually falls on or between such levels; a fixed window around it
/// would take one neighbouring level and not the other. The handbook defines the mean
/// coincident wet-bulb as the mean wet-bulb of the hours at the design dry-bulb (ASHRAE
/// Handbook—Fundamentals 2017, ch. 14, "Climatic design information"); this is that definition
/// on a record's own data levels.
/// </summary>
/// <param name="LowKey">The lowest key level taken.</param>
/// <param name="HighKey">The highest key level taken.</param>
/// <param name="Count">How many hours are taken.</param>
public sealed record CoincidentHours(double LowKey, double HighKey, int Count)
{
    /// <summary>The fewest hours a coincident mean is taken over (widened until reached).</summary>
    public const int MinimumHours = 5;

    /// <summary>Two key values closer than this are one data level (float noise of unit conversions).</summary>
    public const double LevelTolerance = 1e-9;

    /// <summary>The definition in words, named in every output that shows a coincident mean.</summary>
    public const string Definition =
        "coincident means over the hours at the data level nearest the design value (both levels when it lies midway; widened one level each side until at least 5 hours)";

    /// <summary>The coincident hours of <paramref name="design"/> in a key column (any order, non-empty).</summary>
    public static CoincidentHours Around(double[] key, double design)
    {
        ArgumentNullException.ThrowIfNull(key);
        var sorted = (double[])key.Clone();
        Array.Sort(sorted);
        return AroundSorted(sorted, design);
    }

    /// <summary>The coincident hours of <paramref name="design"/> in a key column already sorted ascending (non-empty), as the percentiles use it.</summary>
    public static CoincidentHours AroundSorted(double[] sorted, double design)
    {
        ArgumentNullException.ThrowIfNull(sorted);
        if (sorted.Length == 0)
        {
            throw new ArgumentException("the key column is empty", nameof(sorted));
        }

        var levels = new List<double> { sorted[0] };
        foreach (double v in sorted)
        {
            if (v - levels[^1] > LevelTolerance)
            {
                levels.Add(v);
            }
        }

        int above = levels.FindIndex(l => l >= design - LevelTolerance);
        int lo, hi;
        if (above < 0)
        {
            lo = hi = levels.Count - 1;
        }
        else if (above == 0 || Math.Abs(levels[above] - design) <= LevelTolerance)
        {
            lo = hi = above;
        }
        else
        {
            double below = design - levels[above - 1], over = levels[above] - design;
            (lo, hi) = Math.Abs(below - over) <= LevelTolerance ? (above - 1, above) : below < over ? (above - 1, above - 1) : (above, above);
        }

        int Count() => CountBelow(sorted, levels[hi] + LevelTolerance) - CountBelow(sorted, levels[lo] - LevelTolerance);
        while (Count() < MinimumHours && (lo > 0 || hi < levels.Count - 1))
        {
            lo = Math.Max(0, lo - 1);
            hi = Math.Min(levels.Count - 1, hi + 1);
        }

        return new CoincidentHours(levels[lo], levels[hi], Count());
    }

    /// <summary>Whether a key value is one of these hours.</summary>
    public bool Contains(double key) => key >= LowKey - LevelTolerance && key <= HighKey + LevelTolerance;

    /// <summary>The mean of <paramref name="values"/> over these hours of <paramref name="key"/>.</summary>
    public double MeanOf(double[] key, double[] values)
    {
        double sum = 0;
        int n = 0;
        for (int i = 0; i < key.Length; i++)
        {
            if (Contains(key[i]))
            {
                sum += values[i];
                n++;
            }
        }

        return sum / n;
    }

    /// <summary>Number of sorted values strictly below <paramref name="value"/>.</summary>
    private static int CountBelow(double[] sorted, double value)
    {
        int k = Array.BinarySearch(sorted, value);
        if (k < 0)
        {
            return ~k;
        }

        while (k > 0 && sorted[k - 1] >= value)
        {
            k--;
        }

        return k;
    }
}
