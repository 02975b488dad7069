using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy economizer</c>: economizer controls side by side with the same system without one,
/// by the three methods, run as a one-case study (the minimum outdoor air is the ventilation air).
/// </summary>
public sealed class EconomizerCommand : Command<EconomizerCommand.Settings>
{
    public sealed class Settings : EstimateOptions
    {
        [CommandOption("--system <TYPE>"), StudyKey("economizer", "system")]
        public string? System { get; init; }

        [CommandOption("--supply-airflow <N>"), StudyKey("economizer", "supply_airflow", nameof(DisplayUnits.Airflow), Required = true)]
        public double? SupplyAirflow { get; init; }

        [CommandOption("--supply-airflow-min <N>"), StudyKey("economizer", "supply_airflow_min", nameof(DisplayUnits.Airflow))]
        public double? SupplyAirflowMin { get; init; }

        [CommandOption("--min-outdoor-airflow <N>"), StudyKey("economizer", "min_outdoor_airflow", nameof(DisplayUnits.Airflow), Also = ["ventilation.airflow"], Required = true)]
        public double? MinOutdoorAirflow { get; init; }

        [CommandOption("--flow-basis <BASIS>"), StudyKey("economizer", "flow_basis", Also = ["ventilation.flow_basis"])]
        public string? FlowBasis { get; init; }

        [CommandOption("--supply-temp <T>"), StudyKey("economizer", "supply_temp", nameof(DisplayUnits.Temperature), Required = true)]
        public double? SupplyTemp { get; init; }

        [CommandOption("--supply-temp-reset-max <T>"), StudyKey("economizer", "supply_temp_reset_max", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetMax { get; init; }

        [CommandOption("--supply-temp-reset-outdoor-low <T>"), StudyKey("economizer", "supply_temp_reset_outdoor_low", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetOutdoorLow { get; init; }

        [CommandOption("--supply-temp-reset-outdoor-high <T>"), StudyKey("economizer", "supply_temp_reset_outdoor_high", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetOutdoorHigh { get; init; }

        [CommandOption("--return-temp <T>"), StudyKey("economizer", "return_temp", nameof(DisplayUnits.Temperature), Also = ["ventilation.heat_to", "ventilation.cool_to"], Required = true)]
        public double? ReturnTemp { get; init; }

        [CommandOption("--return-rh <PCT>"), StudyKey("economizer", "return_rh_pct", Also = ["ventilation.max_rh_pct"], Required = true)]
        public double? ReturnRh { get; init; }

        [CommandOption("--design-load <Q>"), StudyKey("economizer", "design_load", nameof(DisplayUnits.Power), Required = true)]
        public double? DesignLoad { get; init; }

        [CommandOption("--design-outdoor <T>"), StudyKey("economizer", "design_outdoor", nameof(DisplayUnits.Temperature), Required = true)]
        public double? DesignOutdoor { get; init; }

        [CommandOption("--balance-point <T>"), StudyKey("economizer", "balance_point", nameof(DisplayUnits.Temperature), Required = true)]
        public double? BalancePoint { get; init; }

        [CommandOption("--coil-leaving-rh <PCT>"), StudyKey("economizer", "coil_leaving_rh_pct")]
        public double? CoilLeavingRh { get; init; }

        [CommandOption("--supply-fan-pressure <DP>"), StudyKey("economizer", "supply_fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? SupplyFanPressure { get; init; }

        [CommandOption("--supply-fan-efficiency <E>"), StudyKey("economizer", "supply_fan_efficiency")]
        public double? SupplyFanEfficiency { get; init; }

        [CommandOption("--return-fan-pressure <DP>"), StudyKey("economizer", "return_fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? ReturnFanPressure { get; init; }

        [CommandOption("--return-fan-efficiency <E>"), StudyKey("economizer", "return_fan_efficiency")]
        public double? ReturnFanEfficiency { get; init; }

        [CommandOption("--fan-curve <C0,C1,C2,C3>"), StudyKey("economizer", "fan_curve", Numbers = true, Note = "Give them comma-separated.")]
        public string? FanCurve { get; init; }

        [CommandOption("--controls <NAMES>"), StudyKey("economizer", "controls", List = true, Note = "Comma-separated.")]
        public string? Controls { get; init; }

        [CommandOption("--non-integrated"), StudyKey("economizer", "integrated", Inverted = true, Help = "Non-integrated economizers: lock out to minimum outdoor air whenever the coil must run (default: integrated)")]
        public bool NonIntegrated { get; init; }

        [CommandOption("--high-limit-drybulb <T>"), StudyKey("economizer", "high_limit_drybulb", nameof(DisplayUnits.Temperature))]
        public double? HighLimitDryBulb { get; init; }

        [CommandOption("--high-limit-enthalpy <H>"), StudyKey("economizer", "high_limit_enthalpy", nameof(DisplayUnits.Enthalpy))]
        public double? HighLimitEnthalpy { get; init; }

        [CommandOption("--high-limit-dewpoint <T>"), StudyKey("economizer", "high_limit_dewpoint", nameof(DisplayUnits.Temperature))]
        public double? HighLimitDewPoint { get; init; }

        [CommandOption("--cooling-cop <COP>"), StudyKey("plant", "cooling_cop", Note = "One number here; a study file also takes outdoor-temperature pairs and a wet-bulb table. Needed with any plant option.")]
        public double? CoolingCop { get; init; }

        [CommandOption("--heating-fuel <FUEL>"), StudyKey("plant", "heating_fuel")]
        public string? HeatingFuel { get; init; }

        [CommandOption("--heating-efficiency <E>"), StudyKey("plant", "heating_efficiency")]
        public double? HeatingEfficiency { get; init; }

        [CommandOption("--heating-cop <COP>"), StudyKey("plant", "heating_cop")]
        public double? HeatingCop { get; init; }

        [CommandOption("--heating-capacity <Q>"), StudyKey("plant", "heating_capacity", nameof(DisplayUnits.Power))]
        public double? HeatingCapacity { get; init; }

        [CommandOption("--heat-pump-lockout <T>"), StudyKey("plant", "heat_pump_lockout", nameof(DisplayUnits.Temperature))]
        public double? HeatPumpLockout { get; init; }

        [CommandOption("--backup-fuel <FUEL>"), StudyKey("plant", "backup_fuel")]
        public string? BackupFuel { get; init; }

        [CommandOption("--backup-efficiency <E>"), StudyKey("plant", "backup_efficiency")]
        public double? BackupEfficiency { get; init; }

        [CommandOption("--defrost-below <T>"), StudyKey("plant", "defrost_below", nameof(DisplayUnits.Temperature))]
        public double? DefrostBelow { get; init; }

        [CommandOption("--defrost-penalty <PCT>"), StudyKey("plant", "defrost_penalty_pct")]
        public double? DefrostPenalty { get; init; }

        [CommandOption("--heating-capacity-per-airflow <Q>"), StudyKey("plant", "heating_capacity", nameof(DisplayUnits.CapacityPerAirflow))]
        public double? HeatingCapacityPerAirflow { get; init; }

        [CommandOption("--cooling-cop-table-outdoor <T,T,...>"), StudyKey("plant", "cooling_cop_table_outdoor", nameof(DisplayUnits.Temperature), Numbers = true, Note = "Give them comma-separated.")]
        public string? CoolingCopTableOutdoor { get; init; }

        [CommandOption("--cooling-cop-table-wetbulb <T,T,...>"), StudyKey("plant", "cooling_cop_table_wetbulb", nameof(DisplayUnits.Temperature), Numbers = true, Note = "Give them comma-separated.")]
        public string? CoolingCopTableWetBulb { get; init; }

        [CommandOption("--cooling-cop-table <COP,COP,...>"), StudyKey("plant", "cooling_cop_table", Numbers = true, Note = "Give them comma-separated, row by row.")]
        public string? CoolingCopTable { get; init; }

        [CommandOption("--min-rh <PCT>"), StudyKey("ventilation", "min_rh_pct", Note = "The minimum outdoor air is humidified to it at the return temperature; --humidifier says what that buys.")]
        public double? MinRh { get; init; }

        [CommandOption("--humidifier <TYPE>"), StudyKey("plant", "humidifier")]
        public string? Humidifier { get; init; }

        [CommandOption("--humidifier-efficiency <E>"), StudyKey("plant", "humidifier_efficiency")]
        public double? HumidifierEfficiency { get; init; }

        [CommandOption("--price-electricity <PRICE>"), StudyKey("plant", "price_electricity_per_kwh", Note = "Per kWh, for the cost columns.")]
        public double? PriceElectricity { get; init; }

        [CommandOption("--price-gas <PRICE>"), StudyKey("plant", "price_gas", nameof(DisplayUnits.GasPrice), Note = "For the cost columns of gas heating or backup.")]
        public double? PriceGas { get; init; }

        // Any [plant] option (--cooling-cop among them) makes the command buy its energy through a plant.
        public override ValidationResult Validate() => FirstBroken(
            base.Validate,
            (StudyOptions.Given(this, "plant") && CoolingCop is null, "--cooling-cop is required with the plant options: the plant buys the coil energy at that COP"),
            (StudyOptions.Given(this, "plant") && HeatingEfficiency is null && (HeatingFuel is null or "gas" or "oil"),
                $"--heating-efficiency is required for {HeatingFuel ?? "gas"} heating (the default --heating-fuel is gas): e.g. --heating-efficiency 0.85, or choose --heating-fuel electric or heat-pump"));
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var (run, headline) = OneCaseStudy.Run(settings, "economizer");
        var u = settings.DisplayUnits;
        var a = run.OutdoorAir.Assumptions;
        string methods = AssumptionText.Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol);
        var doc = EconomizerDocument.Build(run.Economizer!, u, headline, a.Schedule, methods, run.OutdoorAir.Annual[headline]);
        output.Write(doc, settings, settings.Csv);
        return ExitCodes.Ok;
    }
}
