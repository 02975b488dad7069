namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Occupied hours of one dry-bulb bin in each economizer mode.</summary>
public sealed record EconomizerModesRow(double LowEdge, double HighEdge, double NoCoolingHours, double FreeCoolingHours, double IntegratedHours, double MinimumOutdoorAirHours);
