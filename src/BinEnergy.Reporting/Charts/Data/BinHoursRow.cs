namespace BinEnergy.Reporting.Charts.Data;

/// <summary>One dry-bulb bin: edges in the display temperature unit, hours by occupancy, and the
/// mean coincident wet-bulb of all its hours (null for a bin with no hours).</summary>
public sealed record BinHoursRow(double LowEdge, double HighEdge, double OccupiedHours, double UnoccupiedHours, double? MeanCoincidentWetBulb);
