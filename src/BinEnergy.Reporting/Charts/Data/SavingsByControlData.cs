namespace BinEnergy.Reporting.Charts.Data;

/// <summary>Input of <see cref="EconomizerSavingsChart"/>: annual savings by economizer control.</summary>
public sealed record SavingsByControlData
{
    /// <summary>What the chart is about (climate, variant), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>What is saved, e.g. "Cooling coil energy saved" (the y axis label, before the unit).</summary>
    public string Quantity { get; init; } = "Annual energy saved";

    /// <summary>Display unit of the energy savings, e.g. "kBtu".</summary>
    public required string EnergyUnit { get; init; }

    /// <summary>What the cost saved covers, for the caption (e.g. "cost saved on compressor, reheat and fan energy").</summary>
    public string CostQuantity { get; init; } = "cost saved";

    /// <summary>Currency of the cost savings, e.g. "USD"; null when costs are not given.</summary>
    public string? CostUnit { get; init; }

    public required IReadOnlyList<ControlSavingsRow> Controls { get; init; }
}
