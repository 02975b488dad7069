namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="DegreeDayScatterChart"/>: one figure against a climate's degree-days, a point per climate and variant.</summary>
public sealed record DegreeDayScatterData
{
    /// <summary>What the chart is about (study name), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>The figure, e.g. "Heating".</summary>
    public required string Figure { get; init; }

    /// <summary>Its display unit, e.g. "kBtu".</summary>
    public required string Unit { get; init; }

    /// <summary>The degree-days on the X axis, e.g. "Heating degree-days, base 65 F (F-day)".</summary>
    public required string DegreeDays { get; init; }

    /// <summary>Per variant (in order) its points: degree-days, figure.</summary>
    public required IReadOnlyList<(string Variant, IReadOnlyList<(double DegreeDays, double Value)> Points)> Variants { get; init; }
}
