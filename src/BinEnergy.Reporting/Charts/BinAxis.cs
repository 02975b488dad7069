namespace BinEnergy.Reporting.Charts;

/// <summary>Bar positions for dry-bulb bins: the midpoint of each bin and a bar width a little
/// narrower than the narrowest bin, so neighbouring bars keep a gap.</summary>
internal static class BinAxis
{
    public static (double[] Midpoints, double BarWidth) Layout(IReadOnlyList<(double Low, double High)> bins)
    {
        for (int i = 0; i < bins.Count; i++)
        {
            var (low, high) = bins[i];
            if (!double.IsFinite(low) || !double.IsFinite(high) || !(high > low))
            {
                throw new ArgumentException(FormattableString.Invariant($"bin {i + 1} has edges {low} to {high}; a bin needs finite edges with high above low"));
            }
        }

        double[] mid = bins.Select(b => (b.Low + b.High) / 2).ToArray();
        double width = bins.Count == 0 ? 1 : bins.Min(b => b.High - b.Low) * 0.86;
        return (mid, width);
    }

    /// <summary>Sets x limits to the outer bin edges plus half a bin, and at least six bins
    /// wide so that one or two bars do not fill the chart.</summary>
    public static void FitX(ScottPlot.Plot plot, IReadOnlyList<(double Low, double High)> bins)
    {
        double low = bins.Min(b => b.Low);
        double high = bins.Max(b => b.High);
        double width = bins.Min(b => b.High - b.Low);
        double pad = Math.Max(width * 0.5, (6 * width - (high - low)) / 2);
        plot.Axes.SetLimitsX(low - pad, high + pad);
    }
}
