namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Annual energy and cost of one climate x variant case (one row of the annual table).</summary>
public sealed record ComparisonCell(string Climate, string Variant, double AnnualEnergy, double AnnualCost);
