namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Annual outdoor-air energy of one dry-bulb bin, in the display energy unit (all 0 or more).</summary>
public sealed record LoadByBinRow(double LowEdge, double HighEdge, double Heating, double SensibleCooling, double LatentCooling, double Humidification = 0);
