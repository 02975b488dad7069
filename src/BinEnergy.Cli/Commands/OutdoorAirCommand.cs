using BinEnergy.Core.Loads;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Units;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy outdoor-air</c>: annual outdoor-air loads of one airflow by the three methods, run as a one-case study.</summary>
public sealed class OutdoorAirCommand : Command<OutdoorAirCommand.Settings>
{
    public sealed class Settings : EstimateOptions
    {
        [CommandOption("--airflow <FLOW>"), StudyKey("ventilation", "airflow", nameof(DisplayUnits.Airflow), Note = "Or give --people with --per-person and --area with --per-area.")]
        public double? Airflow { get; init; }

        [CommandOption("--flow-basis <BASIS>"), StudyKey("ventilation", "flow_basis")]
        public string? FlowBasis { get; init; }

        [CommandOption("--heat-to <T>"), StudyKey("ventilation", "heat_to", nameof(DisplayUnits.Temperature), Required = true)]
        public double? HeatTo { get; init; }

        [CommandOption("--cool-to <T>"), StudyKey("ventilation", "cool_to", nameof(DisplayUnits.Temperature), Required = true)]
        public double? CoolTo { get; init; }

        [CommandOption("--max-rh <PCT>"), StudyKey("ventilation", "max_rh_pct", Required = true)]
        public double? MaxRh { get; init; }

        [CommandOption("--min-rh <PCT>"), StudyKey("ventilation", "min_rh_pct")]
        public double? MinRh { get; init; }

        [CommandOption("--ventilate <WHEN>"), StudyKey("ventilation", "operation")]
        public string? Ventilate { get; init; }

        [CommandOption("--people <N>"), StudyKey("ventilation", "people")]
        public double? People { get; init; }

        [CommandOption("--per-person <FLOW>"), StudyKey("ventilation", "per_person", nameof(DisplayUnits.Airflow))]
        public double? PerPerson { get; init; }

        [CommandOption("--area <A>"), StudyKey("ventilation", "area", nameof(DisplayUnits.Area))]
        public double? Area { get; init; }

        [CommandOption("--per-area <RATE>"), StudyKey("ventilation", "per_area", nameof(DisplayUnits.Airflow))]
        public double? PerArea { get; init; }

        [CommandOption("--zone-effectiveness <EZ>"), StudyKey("ventilation", "zone_effectiveness")]
        public double? ZoneEffectiveness { get; init; }

        [CommandOption("--recovery-sensible <E>"), StudyKey("recovery", "sensible_effectiveness", Note = "Without it, no recovery.")]
        public double? RecoverySensible { get; init; }

        [CommandOption("--recovery-latent <E>"), StudyKey("recovery", "latent_effectiveness")]
        public double? RecoveryLatent { get; init; }

        [CommandOption("--frost-limit <T>"), StudyKey("recovery", "frost_limit", nameof(DisplayUnits.Temperature))]
        public double? FrostLimit { get; init; }

        [CommandOption("--frost-effectiveness <E>"), StudyKey("recovery", "frost_effectiveness")]
        public double? FrostEffectiveness { get; init; }

        [CommandOption("--fan-power <P>"), StudyKey("ventilation", "fan_power", nameof(DisplayUnits.FanPowerPerFlow))]
        public double? FanPower { get; init; }

        [CommandOption("--fan-pressure <DP>"), StudyKey("ventilation", "fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? FanPressure { get; init; }

        [CommandOption("--recovery-pressure <DP>"), StudyKey("recovery", "pressure_drop", nameof(DisplayUnits.PressureDrop))]
        public double? RecoveryPressure { get; init; }

        [CommandOption("--fan-efficiency <E>"), StudyKey("recovery", "fan_efficiency")]
        public double? FanEfficiency { get; init; }

        [CommandOption("--bypass-when-idle"), StudyKey("recovery", "bypass_when_idle")]
        public bool BypassWhenIdle { get; init; }

        public override ValidationResult Validate() => FirstBroken(
            base.Validate,
            (Airflow is null && People is null && Area is null, "give --airflow (cfm in ip, L/s in si), or --people with --per-person and --area with --per-area"),
            ((People is null) != (PerPerson is null) || (Area is null) != (PerArea is null), "give --people with --per-person, and --area with --per-area (either pair or both)"),
            (RecoverySensible is null && StudyOptions.Given(this, "recovery"), "the recovery options need --recovery-sensible (the device's sensible effectiveness, e.g. 0.75)"),
            (FrostEffectiveness is not null && FrostLimit is null, "--frost-effectiveness needs --frost-limit (the outdoor dry-bulb below which the device defrosts)"));
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var (run, headline) = OneCaseStudy.Run(settings, "outdoor-air");
        var doc = OutdoorAirDocument.Build(run, settings.DisplayUnits, settings.Source(), headline,
            settings.Occupied is null && run.Case.OutdoorAir.Operation == VentilationOperation.Occupied);
        output.Write(doc, settings, settings.Csv);
        return ExitCodes.Ok;
    }
}
