namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="MonthlyEnergyChart"/>: energy components by month, stacked.</summary>
public sealed record MonthlyEnergyData
{
    /// <summary>What the chart is about (climate, variant), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of the energies, e.g. "kBtu".</summary>
    public required string EnergyUnit { get; init; }

    public required IReadOnlyList<MonthlyEnergySeries> Series { get; init; }
}
