using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Units;
using Spectre.Console;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy outdoor-air</c>: annual outdoor-air loads of one airflow by the three methods, run as a one-case study.</summary>
public sealed class OutdoorAirCommand : Command<OutdoorAirCommand.Settings>
{
    public sealed class Settings : EstimateOptions
    {
        [CommandOption("--airflow <FLOW>")]
        [Description("Outdoor airflow (cfm in ip, L/s in si). Or give --people and --area rates instead.")]
        [StudyKey("ventilation", "airflow", nameof(DisplayUnits.Airflow))]
        public double? Airflow { get; init; }

        [CommandOption("--flow-basis <BASIS>")]
        [Description("How the volume becomes mass of dry air: site (dry air at 70 F and the site pressure, default), standard (0.075 lb/ft3) or actual (each hour's outdoor air).")]
        [TypeConverter(typeof(ChoiceConverter<FlowBasis>))]
        [StudyKey("ventilation", "flow_basis")]
        public FlowBasis? FlowBasis { get; init; }

        [CommandOption("--heat-to <T>")]
        [Description("Heating setpoint (F or C). Required.")]
        [StudyKey("ventilation", "heat_to", nameof(DisplayUnits.Temperature))]
        public double? HeatTo { get; init; }

        [CommandOption("--cool-to <T>")]
        [Description("Cooling setpoint (F or C). Required.")]
        [StudyKey("ventilation", "cool_to", nameof(DisplayUnits.Temperature))]
        public double? CoolTo { get; init; }

        [CommandOption("--max-rh <PCT>")]
        [Description("Maximum indoor RH at the cooling setpoint, percent. Required.")]
        [StudyKey("ventilation", "max_rh_pct")]
        public double? MaxRh { get; init; }

        [CommandOption("--min-rh <PCT>")]
        [Description("Minimum indoor RH at the heating setpoint, percent; adds humidification. Default none.")]
        [StudyKey("ventilation", "min_rh_pct")]
        public double? MinRh { get; init; }

        [CommandOption("--ventilate <WHEN>")]
        [Description("When outdoor air runs: occupied (the --occupied hours, default) or always.")]
        [TypeConverter(typeof(ChoiceConverter<VentilationOperation>))]
        [StudyKey("ventilation", "operation")]
        public VentilationOperation? Ventilate { get; init; }

        [CommandOption("--people <N>")]
        [Description("Zone population, for the people-and-area minimum (ASHRAE 62.1 ventilation rate procedure; you supply the rates).")]
        [StudyKey("ventilation", "people")]
        public double? People { get; init; }

        [CommandOption("--per-person <FLOW>")]
        [Description("Outdoor air per person (cfm or L/s) from the standard your code adopts.")]
        [StudyKey("ventilation", "per_person", nameof(DisplayUnits.Airflow))]
        public double? PerPerson { get; init; }

        [CommandOption("--area <A>")]
        [Description("Zone floor area (ft2 in ip, m2 in si).")]
        [StudyKey("ventilation", "area", nameof(DisplayUnits.Area))]
        public double? Area { get; init; }

        [CommandOption("--per-area <RATE>")]
        [Description("Outdoor air per unit floor area (cfm/ft2 or L/(s m2)) from the standard your code adopts.")]
        [StudyKey("ventilation", "per_area", nameof(DisplayUnits.Airflow))]
        public double? PerArea { get; init; }

        [CommandOption("--zone-effectiveness <EZ>")]
        [Description("Zone air-distribution effectiveness E_z. Default 1.0.")]
        [StudyKey("ventilation", "zone_effectiveness")]
        public double? ZoneEffectiveness { get; init; }

        [CommandOption("--recovery-sensible <E>")]
        [Description("Energy recovery sensible effectiveness, 0 to 1 (e.g. 0.75). Default no recovery.")]
        [StudyKey("recovery", "sensible_effectiveness")]
        public double? RecoverySensible { get; init; }

        [CommandOption("--recovery-latent <E>")]
        [Description("Energy recovery latent effectiveness, 0 to 1. Default 0 (sensible only).")]
        [StudyKey("recovery", "latent_effectiveness")]
        public double? RecoveryLatent { get; init; }

        [CommandOption("--frost-limit <T>")]
        [Description("Outdoor dry-bulb (F or C) below which the recovery device defrosts and runs at --frost-effectiveness.")]
        [StudyKey("recovery", "frost_limit", nameof(DisplayUnits.Temperature))]
        public double? FrostLimit { get; init; }

        [CommandOption("--frost-effectiveness <E>")]
        [Description("Sensible effectiveness below the frost limit. Default 0 (no recovery while defrosting).")]
        [StudyKey("recovery", "frost_effectiveness")]
        public double? FrostEffectiveness { get; init; }

        [CommandOption("--fan-power <P>")]
        [Description("Power of the fan that moves the outdoor air per unit airflow (W/cfm in ip, W per L/s in si); 0 for none. Default: from --fan-pressure.")]
        [StudyKey("ventilation", "fan_power", nameof(DisplayUnits.FanPowerPerFlow))]
        public double? FanPower { get; init; }

        [CommandOption("--fan-pressure <DP>")]
        [Description("Total pressure of the fan that moves the outdoor air (in. w.g. in ip, Pa in si), at efficiency 0.6. Default 1 in. w.g. (250 Pa), recalled from memory.")]
        [StudyKey("ventilation", "fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? FanPressure { get; init; }

        [CommandOption("--recovery-pressure <DP>")]
        [Description("Pressure drop the device adds on each air stream (in. w.c. in ip, Pa in si). Default 0.")]
        [StudyKey("recovery", "pressure_drop", nameof(DisplayUnits.PressureDrop))]
        public double? RecoveryPressure { get; init; }

        [CommandOption("--fan-efficiency <E>")]
        [Description("Fan and motor efficiency for the recovery pressure drop. Default 0.6.")]
        [StudyKey("recovery", "fan_efficiency")]
        public double? FanEfficiency { get; init; }

        [CommandOption("--bypass-when-idle")]
        [Description("The air bypasses the recovery device when it does not recover (no fan penalty in those hours).")]
        [StudyKey("recovery", "bypass_when_idle")]
        public bool BypassWhenIdle { get; init; }

        public override ValidationResult Validate()
        {
            var missing = new[] { ("--heat-to", HeatTo), ("--cool-to", CoolTo), ("--max-rh", MaxRh) }.Where(o => o.Item2 is null).Select(o => o.Item1).ToList();
            if (missing.Count > 0)
            {
                return ValidationResult.Error("give " + string.Join(", ", missing) + " (e.g. --heat-to 70 --cool-to 75 --max-rh 60)");
            }

            if (Airflow is null && People is null && Area is null)
            {
                return ValidationResult.Error("give --airflow (cfm in ip, L/s in si), or --people with --per-person and --area with --per-area");
            }

            if ((People is null) != (PerPerson is null) || (Area is null) != (PerArea is null))
            {
                return ValidationResult.Error("give --people with --per-person, and --area with --per-area (either pair or both)");
            }

            bool recoveryOptions = RecoveryLatent is not null || FrostLimit is not null || FrostEffectiveness is not null
                || RecoveryPressure is not null || FanEfficiency is not null || BypassWhenIdle;
            if (RecoverySensible is null && recoveryOptions)
            {
                return ValidationResult.Error("the recovery options need --recovery-sensible (the device's sensible effectiveness, e.g. 0.75)");
            }

            if (FrostEffectiveness is not null && FrostLimit is null)
            {
                return ValidationResult.Error("--frost-effectiveness needs --frost-limit (the outdoor dry-bulb below which the device defrosts)");
            }

            return base.Validate();
        }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var run = OneCaseStudy.Run(settings, "outdoor-air");
        var doc = OutdoorAirDocument.Build(run, settings.DisplayUnits, settings.Source(), settings.Headline ?? IntegrationMethod.Hourly,
            settings.Occupied is null && run.Case.OutdoorAir.Operation == VentilationOperation.Occupied);
        output.Write(doc, settings, settings.Csv);
        return ExitCodes.Ok;
    }
}
