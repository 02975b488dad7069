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
        plot.Axes.Bottom.TickGenerator = EdgeTicks(bins, low - pad, high + pad);
    }

    /// <summary>
    /// Ticks on the bin edges (every edge, or every second, fifth ... edge when there would be
    /// more than about 20), so that each bar sits between two labelled edges instead of on an
    /// unrelated automatic grid.
    /// </summary>
    internal static ScottPlot.TickGenerators.NumericManual EdgeTicks(IReadOnlyList<(double Low, double High)> bins, double from, double to)
    {
        var ticks = new ScottPlot.TickGenerators.NumericManual();
        foreach (double x in EdgeTickPositions(bins, from, to))
        {
            ticks.AddMajor(x, ChartCanvas.FormatTick(Math.Round(x, 6)));
        }

        return ticks;
    }

    /// <summary>The positions <see cref="EdgeTicks"/> labels, from left to right.</summary>
    internal static IReadOnlyList<double> EdgeTickPositions(IReadOnlyList<(double Low, double High)> bins, double from, double to)
    {
        double width = bins.Min(b => b.High - b.Low);
        double origin = bins.Min(b => b.Low);
        int count = (int)Math.Floor((to - from) / width) + 1;
        int every = new[] { 1, 2, 4, 5, 10, 20, 50 }.FirstOrDefault(k => count / k <= 20, 100);
        long first = (long)Math.Ceiling((from - origin) / width - 1e-9);
        long last = (long)Math.Floor((to - origin) / width + 1e-9);
        var positions = new List<double>();
        for (long k = first; k <= last; k++)
        {
            double x = origin + k * width;
            if ((long)Math.Round(x / width) % every == 0) // bins sit on multiples of the width
            {
                positions.Add(x);
            }
        }

        return positions;
    }

    /// <summary>
    /// The bin width with its unit for captions: "5 F" when every bin has that width, "2 to 5 F"
    /// when they differ, "equal-width" when there are no bins.
    /// </summary>
    public static string WidthText(IReadOnlyList<(double Low, double High)> bins, string unit)
    {
        if (bins.Count == 0)
        {
            return "equal-width";
        }

        var widths = bins.Select(b => Math.Round(b.High - b.Low, 6)).ToArray();
        double low = widths.Min();
        double high = widths.Max();
        string Text(double w) => ChartCanvas.FormatTick(w);
        return low == high ? $"{Text(low)} {unit}" : $"{Text(low)} to {Text(high)} {unit}";
    }
}
