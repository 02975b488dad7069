namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="LoadByBinChart"/>: annual outdoor-air energy by bin, in display units.</summary>
public sealed record LoadByBinData
{
    /// <summary>What the chart is about (climate, variant), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of bin edges, e.g. "F".</summary>
    public required string TemperatureUnit { get; init; }

    /// <summary>Display unit of the energies, e.g. "kBtu" or "kWh".</summary>
    public required string EnergyUnit { get; init; }

    public required IReadOnlyList<LoadByBinRow> Bins { get; init; }
}
