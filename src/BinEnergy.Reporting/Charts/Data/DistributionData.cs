namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="DistributionChart"/>: one figure's value in every climate, for each variant.</summary>
public sealed record DistributionData
{
    /// <summary>What the chart is about (study name), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>The figure, e.g. "Heating".</summary>
    public required string Figure { get; init; }

    /// <summary>Its display unit, e.g. "kBtu".</summary>
    public required string Unit { get; init; }

    /// <summary>Per variant (in order) the figure's value in each climate.</summary>
    public required IReadOnlyList<(string Variant, IReadOnlyList<double> Values)> Variants { get; init; }
}
