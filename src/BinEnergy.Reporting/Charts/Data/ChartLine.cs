namespace BinEnergy.Reporting.Charts.Data;

/// <summary>A labelled line or polygon outline in display units (x and y of equal length).</summary>
public sealed record ChartLine(string Label, IReadOnlyList<double> X, IReadOnlyList<double> Y);
