namespace BinEnergy.Reporting.Html;

/// <summary>The cautions every report carries (DESIGN section 13), shown at the top in short and in full at the end.</summary>
public static class ReportCautions
{
    /// <summary>The one-line caution at the top of the page.</summary>
    public const string Banner =
        "These results are estimates for comparing options. Ventilation rates must meet the locally adopted code and the judgement of the responsible licensed engineer; see Cautions.";

    /// <summary>The full cautions.</summary>
    public static IReadOnlyList<string> Standard { get; } =
    [
        "Results are estimates for comparing options, not predictions of metered energy use or cost. They depend on the weather record, the inputs and the simplifications stated under Assumptions.",
        "Ventilation rates must meet the code adopted locally and the judgement of the responsible licensed engineer. This report neither sets nor approves a ventilation rate.",
        "Reducing outdoor air below the required minimum harms occupants' health and comfort. Do not use these results to justify less outdoor air than the code and the responsible engineer require.",
        "Economizer high limits and energy-recovery settings must follow the locally adopted energy code; suggested values in BinEnergy are defaults, not requirements.",
    ];
}
