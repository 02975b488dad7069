using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>One layer of a stacked or grouped bar chart: a label, one value per position, a
/// colour, optionally a hatch, a y axis other than the left one and a legend text other than the
/// label (e.g. naming the axis).</summary>
internal sealed record BarLayer(string Label, IReadOnlyList<double> Values, ChartColor Color, IHatch? Hatch = null, IYAxis? YAxis = null, string? LegendText = null);
