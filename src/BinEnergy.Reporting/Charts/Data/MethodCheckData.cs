namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="MethodCheckChart"/>: annual results of the bin method beside the hourly check.</summary>
public sealed record MethodCheckData
{
    /// <summary>What the chart is about (climate, variant), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of the energies, e.g. "kBtu".</summary>
    public required string EnergyUnit { get; init; }

    public required IReadOnlyList<MethodCheckRow> Rows { get; init; }
}
