namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Annual energy and cost of one climate x variant case (one row of the annual table).</summary>
public sealed record ComparisonCell(string Climate, string Variant, double AnnualEnergy, double AnnualCost)
{
    /// <summary>The lowest and highest complete year of a multi-year record's energy, drawn as a range; null for one year.</summary>
    public (double Min, double Max)? EnergyRange { get; init; }

    /// <summary>The same for the cost.</summary>
    public (double Min, double Max)? CostRange { get; init; }
}
