namespace BinEnergy.Reporting.Charts.Data;

/// <summary>One annual quantity by the bin method and by the hourly check, in the display unit.</summary>
public sealed record BinVsHourlyRow(string Quantity, double BinMethod, double Hourly);
