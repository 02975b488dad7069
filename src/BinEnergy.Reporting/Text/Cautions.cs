namespace BinEnergy.Reporting.Text;

/// <summary>
/// The cautions the outputs carry (DESIGN 13), written once: every command, the report and the
/// summary take them from here.
/// </summary>
public static class Cautions
{
    /// <summary>Results are estimates for comparing options.</summary>
    public const string Estimates =
        "Results are estimates for comparing options, not predictions of metered energy use or cost. They depend on the weather record, the inputs and the simplifications stated under Assumptions.";

    /// <summary>Ventilation rates are the code's and the engineer's to set.</summary>
    public const string VentilationCode =
        "Ventilation rates must meet the code adopted locally and the judgement of the responsible licensed engineer; BinEnergy neither sets nor approves a ventilation rate.";

    /// <summary>Too little outdoor air harms people.</summary>
    public const string TooLittleAir =
        "Reducing outdoor air below the required minimum harms occupants' health and comfort. Do not use these results to justify less outdoor air than the code and the responsible engineer require.";

    /// <summary>Economizer and recovery settings follow the energy code.</summary>
    public const string EnergyCode =
        "Economizer high limits and energy-recovery settings must follow the locally adopted energy code; suggested values in BinEnergy are defaults, not requirements.";

    /// <summary>Design conditions from one record.</summary>
    public const string DesignConditions =
        "Design conditions here come from this one weather record; size equipment from the design data your local code adopts, with the judgement of the responsible licensed engineer.";

    /// <summary>Invented weather.</summary>
    public const string InventedWeather =
        "This is invented weather that imitates monthly statistics, not a measured or typical year. Use it to explore and compare options; size equipment and show compliance with measured design data for the site, under the codes in force there and the judgement of a licensed engineer.";

    /// <summary>The banner at the top of the report.</summary>
    public const string Banner =
        "These results are estimates for comparing options. Ventilation rates must meet the locally adopted code and the judgement of the responsible licensed engineer; see Cautions.";

    /// <summary>The cautions of every outdoor-air estimate (commands, summary).</summary>
    public static IReadOnlyList<string> OutdoorAir { get; } = [Estimates, VentilationCode, TooLittleAir];

    /// <summary>The cautions of an economizer evaluation.</summary>
    public static IReadOnlyList<string> Economizer { get; } = [Estimates, EnergyCode, VentilationCode];

    /// <summary>The full list the report ends with.</summary>
    public static IReadOnlyList<string> Report { get; } = [Estimates, VentilationCode, TooLittleAir, EnergyCode, DesignConditions];
}
