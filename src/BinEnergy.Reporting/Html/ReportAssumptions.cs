namespace BinEnergy.Reporting.Html;

/// <summary>
/// The assumptions every report states, as formatted text in display units. Required fields
/// make it impossible to leave one out; <see cref="Other"/> holds anything further.
/// </summary>
public sealed record ReportAssumptions
{
    /// <summary>How volume flow becomes mass flow, e.g. "site: dry air at 70 F and the site pressure".</summary>
    public required string FlowBasis { get; init; }

    /// <summary>The air density that basis gives, e.g. "0.0712 lb/ft3".</summary>
    public required string AirDensity { get; init; }

    /// <summary>The sensible factor at the site, e.g. "1.03 Btu/(h cfm F)".</summary>
    public required string SiteSensibleFactor { get; init; }

    /// <summary>The standard-air sensible factor it is compared with.</summary>
    public string StandardSensibleFactor { get; init; } = "1.08 Btu/(h cfm F) (standard air, 0.075 lb/ft3)";

    /// <summary>Dry-bulb bin width, e.g. "5 F, lower edge inclusive".</summary>
    public required string BinWidth { get; init; }

    /// <summary>Calendar of the weather record, e.g. "8,760 hours, 2023, local standard time".</summary>
    public required string Calendar { get; init; }

    /// <summary>Occupancy schedule, e.g. "weekdays 07:00-19:00; ventilation in occupied hours".</summary>
    public required string Schedule { get; init; }

    /// <summary>Each repair made to the weather data, with its count; empty when none.</summary>
    public IReadOnlyList<string> DataRepairs { get; init; } = [];

    /// <summary>Further assumptions (setpoints, recovery, plant, prices ...).</summary>
    public IReadOnlyList<ReportKeyValue> Other { get; init; } = [];
}
