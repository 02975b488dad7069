namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Annual savings of one economizer control against the no-economizer baseline:
/// energy in the display unit and, when known, cost.</summary>
public sealed record ControlSavingsRow(string ControlName, double EnergySavings, double? CostSavings = null);
