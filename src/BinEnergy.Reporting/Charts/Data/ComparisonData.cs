namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="ComparisonChart"/>: annual energy and cost of every climate x
/// variant case, in long format. Climates and variants appear in the order of first mention.</summary>
public sealed record ComparisonData
{
    /// <summary>What the chart is about (study name), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of the annual energy, e.g. "MBtu" or "MWh".</summary>
    public required string EnergyUnit { get; init; }

    /// <summary>Currency of the annual cost, e.g. "USD".</summary>
    public required string CostUnit { get; init; }

    public required IReadOnlyList<ComparisonCell> Cells { get; init; }
}
