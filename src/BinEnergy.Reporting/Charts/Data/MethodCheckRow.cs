namespace BinEnergy.Reporting.Charts.Data;

/// <summary>One annual quantity by the hourly sum, joint bins and the bin method, in the display unit.</summary>
public sealed record MethodCheckRow(string Quantity, double Hourly, double JointBin, double BinMethod);
