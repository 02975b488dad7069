namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="EconomizerModesChart"/>: hours in each economizer mode by bin, for one control.</summary>
public sealed record EconomizerModesData
{
    /// <summary>What the chart is about (climate, variant), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>The high-limit control the modes belong to, e.g. "fixed dry-bulb 65 F".</summary>
    public required string ControlName { get; init; }

    /// <summary>Display unit of bin edges.</summary>
    public required string TemperatureUnit { get; init; }

    public required IReadOnlyList<EconomizerModesRow> Bins { get; init; }
}
