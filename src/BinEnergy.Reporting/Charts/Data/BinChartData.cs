namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="BinHoursChart"/>: the bin table of one climate, in display units.</summary>
public sealed record BinChartData
{
    /// <summary>What the chart is about (climate, schedule), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of bin edges and wet-bulb, e.g. "F" or "C".</summary>
    public required string TemperatureUnit { get; init; }

    /// <summary>The bins, in any order.</summary>
    public required IReadOnlyList<BinHoursRow> Bins { get; init; }
}
