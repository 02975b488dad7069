namespace BinEnergy.Reporting.Charts;

/// <summary>How a plotted series is drawn.</summary>
public enum PlottedSeriesKind
{
    /// <summary>Bars (or bar segments of a stack): X is the bar position, Y the bar's own height.</summary>
    Bars,

    /// <summary>A line through points (X, Y).</summary>
    Line,

    /// <summary>A filled polygon with vertices (X, Y).</summary>
    Area,

    /// <summary>Density cells: X and Y are cell centres, <see cref="PlottedSeries.Weights"/> the count in each cell.</summary>
    Density,
}
