namespace BinEnergy.Reporting.Charts.Data;

/// <summary>One energy component by calendar month (12 values, January first). A palette colour
/// may be given to match the other charts (e.g. <see cref="ChartPalette.Heating"/>).</summary>
public sealed record MonthlyEnergySeries(string Name, IReadOnlyList<double> Values, ChartColor? Color = null);
