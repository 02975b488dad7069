namespace BinEnergy.Reporting.Charts;

/// <summary>
/// One series as a chart actually drew it, read back from the plot so that tests and callers
/// can check what is on the page (sums, counts) without looking at pixels.
/// </summary>
/// <param name="Label">The legend text.</param>
/// <param name="Kind">How it is drawn.</param>
/// <param name="X">Bar positions, point or vertex x values, or density cell centres.</param>
/// <param name="Y">Bar heights (each segment's own height in a stack), point or vertex y values, or cell centres.</param>
/// <param name="Weights">For <see cref="PlottedSeriesKind.Density"/>: the count in each non-empty cell; otherwise null.</param>
public sealed record PlottedSeries(
    string Label,
    PlottedSeriesKind Kind,
    IReadOnlyList<double> X,
    IReadOnlyList<double> Y,
    IReadOnlyList<double>? Weights = null)
{
    /// <summary>Sum of the bar heights (bars), of the weights (density), or of Y (lines, areas).</summary>
    public double Total => Kind == PlottedSeriesKind.Density ? (Weights ?? []).Sum() : Y.Sum();

    /// <summary>Number of bars, points, vertices or non-empty cells.</summary>
    public int Count => X.Count;
}
