using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>One layer of a stacked or grouped bar chart: a label, one value per position, a
/// colour, optionally a hatch and a y axis other than the left one.</summary>
internal sealed record BarLayer(string Label, IReadOnlyList<double> Values, ChartColor Color, IHatch? Hatch = null, IYAxis? YAxis = null);
