using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;
using Spectre.Console;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy economizer</c>: economizer controls side by side with the same system without one,
/// by the three methods, run as a one-case study (the minimum outdoor air is the ventilation air).
/// </summary>
public sealed class EconomizerCommand : Command<EconomizerCommand.Settings>
{
    public sealed class Settings : EstimateOptions
    {
        [CommandOption("--system <TYPE>")]
        [Description("The air system: single-zone (constant airflow, supply temperature follows the load), variable-volume (default; airflow follows the load, reheat at minimum airflow counted) or constant-volume-reheat (fixed supply temperature, reheat counted).")]
        [TypeConverter(typeof(ChoiceConverter<AirSystemType>))]
        [StudyKey("economizer", "system")]
        public AirSystemType? System { get; init; }

        [CommandOption("--supply-airflow <N>")]
        [Description("Supply airflow (cfm in ip, L/s in si): the constant flow, or the maximum with --supply-airflow-min. Required.")]
        [StudyKey("economizer", "supply_airflow", nameof(DisplayUnits.Airflow))]
        public double? SupplyAirflow { get; init; }

        [CommandOption("--supply-airflow-min <N>")]
        [Description("Minimum supply airflow of a variable-volume system (cfm or L/s). Default 30 % of the supply airflow, not below the minimum outdoor airflow (recalled from memory).")]
        [StudyKey("economizer", "supply_airflow_min", nameof(DisplayUnits.Airflow))]
        public double? SupplyAirflowMin { get; init; }

        [CommandOption("--min-outdoor-airflow <N>")]
        [Description("Minimum outdoor airflow (cfm or L/s); must meet the ventilation code. Required.")]
        [StudyKey("economizer", "min_outdoor_airflow", nameof(DisplayUnits.Airflow))]
        [StudyKey("ventilation", "airflow", nameof(DisplayUnits.Airflow))]
        public double? MinOutdoorAirflow { get; init; }

        [CommandOption("--flow-basis <BASIS>")]
        [Description("How airflows become mass flows: site (dry air at 70 F at the site pressure, default), standard (0.075 lb/ft3) or actual (the coil-entering state).")]
        [TypeConverter(typeof(ChoiceConverter<FlowBasis>))]
        [StudyKey("economizer", "flow_basis")]
        [StudyKey("ventilation", "flow_basis")]
        public FlowBasis? FlowBasis { get; init; }

        [CommandOption("--supply-temp <T>")]
        [Description("Supply (coil-leaving) air temperature (F or C). Required.")]
        [StudyKey("economizer", "supply_temp", nameof(DisplayUnits.Temperature))]
        public double? SupplyTemp { get; init; }

        [CommandOption("--supply-temp-reset-max <T>")]
        [Description("Variable volume: the warmest supply temperature of an outdoor reset (F or C); give it with --supply-temp-reset-outdoor-low and -high. Default: no reset.")]
        [StudyKey("economizer", "supply_temp_reset_max", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetMax { get; init; }

        [CommandOption("--supply-temp-reset-outdoor-low <T>")]
        [Description("Outdoor dry-bulb at and below which the reset supply is at its warmest (F or C).")]
        [StudyKey("economizer", "supply_temp_reset_outdoor_low", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetOutdoorLow { get; init; }

        [CommandOption("--supply-temp-reset-outdoor-high <T>")]
        [Description("Outdoor dry-bulb at and above which the supply is at --supply-temp (F or C).")]
        [StudyKey("economizer", "supply_temp_reset_outdoor_high", nameof(DisplayUnits.Temperature))]
        public double? SupplyTempResetOutdoorHigh { get; init; }

        [CommandOption("--return-temp <T>")]
        [Description("Return air temperature (F or C). Required.")]
        [StudyKey("economizer", "return_temp", nameof(DisplayUnits.Temperature))]
        [StudyKey("ventilation", "heat_to", nameof(DisplayUnits.Temperature))]
        [StudyKey("ventilation", "cool_to", nameof(DisplayUnits.Temperature))]
        public double? ReturnTemp { get; init; }

        [CommandOption("--return-rh <PCT>")]
        [Description("Return air relative humidity, percent. Required.")]
        [StudyKey("economizer", "return_rh_pct")]
        [StudyKey("ventilation", "max_rh_pct")]
        public double? ReturnRh { get; init; }

        [CommandOption("--design-load <Q>")]
        [Description("Building sensible cooling load at the design outdoor temperature (Btu/h in ip, kW in si). Required.")]
        [StudyKey("economizer", "design_load", nameof(DisplayUnits.Power))]
        public double? DesignLoad { get; init; }

        [CommandOption("--design-outdoor <T>")]
        [Description("Design outdoor dry-bulb of that load (F or C). Required.")]
        [StudyKey("economizer", "design_outdoor", nameof(DisplayUnits.Temperature))]
        public double? DesignOutdoor { get; init; }

        [CommandOption("--balance-point <T>")]
        [Description("Outdoor dry-bulb below which the building needs no cooling (F or C). Required.")]
        [StudyKey("economizer", "balance_point", nameof(DisplayUnits.Temperature))]
        public double? BalancePoint { get; init; }

        [CommandOption("--coil-leaving-rh <PCT>")]
        [Description("Relative humidity of the air leaving the cooling coil at its wettest, percent. Default 90.")]
        [StudyKey("economizer", "coil_leaving_rh_pct")]
        public double? CoilLeavingRh { get; init; }

        [CommandOption("--supply-fan-pressure <DP>")]
        [Description("Total pressure of the supply fan at the supply airflow (in. w.g. in ip, Pa in si); 0 for none. Default 3 in. w.g. (750 Pa), recalled from memory.")]
        [StudyKey("economizer", "supply_fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? SupplyFanPressure { get; init; }

        [CommandOption("--supply-fan-efficiency <E>")]
        [Description("Total efficiency of the supply fan. Default 0.6.")]
        [StudyKey("economizer", "supply_fan_efficiency")]
        public double? SupplyFanEfficiency { get; init; }

        [CommandOption("--return-fan-pressure <DP>")]
        [Description("Total pressure of a return fan (in. w.g. or Pa). Default: no return fan.")]
        [StudyKey("economizer", "return_fan_pressure", nameof(DisplayUnits.PressureDrop))]
        public double? ReturnFanPressure { get; init; }

        [CommandOption("--return-fan-efficiency <E>")]
        [Description("Total efficiency of the return fan. Default 0.6.")]
        [StudyKey("economizer", "return_fan_efficiency")]
        public double? ReturnFanEfficiency { get; init; }

        [CommandOption("--fan-curve <C0,C1,C2,C3>")]
        [Description("Variable volume: fan power fraction c0 + c1 f + c2 f^2 + c3 f^3 of the flow fraction f. Default 0.0013,0.1470,0.9506,-0.0998 (an energy-code baseline curve, recalled from memory).")]
        [StudyKey("economizer", "fan_curve", Numbers = true)]
        public string? FanCurve { get; init; }

        [CommandOption("--controls <NAMES>")]
        [Description("Comma-separated controls to compare with the baseline: fixed-drybulb, differential-drybulb, fixed-enthalpy, differential-enthalpy, fixed-dewpoint. Default: all five.")]
        [StudyKey("economizer", "controls", List = true)]
        public string? Controls { get; init; }

        [CommandOption("--non-integrated")]
        [Description("Non-integrated economizers: lock out to minimum outdoor air whenever the coil must run (default: integrated).")]
        [StudyKey("economizer", "integrated", Inverted = true)]
        public bool NonIntegrated { get; init; }

        [CommandOption("--high-limit-drybulb <T>")]
        [Description("Dry-bulb high limit (F or C). Default 75 F (23.9 C), a suggestion recalled from memory: the local energy code governs.")]
        [StudyKey("economizer", "high_limit_drybulb", nameof(DisplayUnits.Temperature))]
        public double? HighLimitDryBulb { get; init; }

        [CommandOption("--high-limit-enthalpy <H>")]
        [Description("Enthalpy high limit (Btu/lb on the 0 F datum in ip, kJ/kg on the 0 C datum in si). Default 28 Btu/lb (47.2 kJ/kg), recalled from memory.")]
        [StudyKey("economizer", "high_limit_enthalpy", nameof(DisplayUnits.Enthalpy))]
        public double? HighLimitEnthalpy { get; init; }

        [CommandOption("--high-limit-dewpoint <T>")]
        [Description("Dew-point high limit (F or C). Default 55 F (12.8 C), recalled from memory.")]
        [StudyKey("economizer", "high_limit_dewpoint", nameof(DisplayUnits.Temperature))]
        public double? HighLimitDewPoint { get; init; }

        [CommandOption("--cooling-cop <COP>")]
        [Description("Cooling COP of the plant, for compressor energy (one number; a study file takes outdoor-temperature pairs and a wet-bulb table). Needed with any plant option.")]
        [StudyKey("plant", "cooling_cop")]
        public double? CoolingCop { get; init; }

        [CommandOption("--heating-fuel <FUEL>")]
        [Description("What buys the reheat and preheat: gas, oil, electric or heat-pump. Default gas (with --heating-efficiency).")]
        [StudyKey("plant", "heating_fuel")]
        public string? HeatingFuel { get; init; }

        [CommandOption("--heating-efficiency <E>")]
        [Description("Seasonal efficiency of gas, oil or electric heating. Default 1.0 for electric; required for gas and oil.")]
        [StudyKey("plant", "heating_efficiency")]
        public double? HeatingEfficiency { get; init; }

        [CommandOption("--heating-cop <COP>")]
        [Description("Heat pump: heating COP (one number).")]
        [StudyKey("plant", "heating_cop")]
        public double? HeatingCop { get; init; }

        [CommandOption("--heating-capacity <Q>")]
        [Description("Heat pump: heating capacity (Btu/h in ip, kW in si); the backup carries the rest. Default no limit.")]
        [StudyKey("plant", "heating_capacity", nameof(DisplayUnits.Power))]
        public double? HeatingCapacity { get; init; }

        [CommandOption("--heat-pump-lockout <T>")]
        [Description("Heat pump: outdoor dry-bulb below which the backup heats alone (F or C). Default none.")]
        [StudyKey("plant", "heat_pump_lockout", nameof(DisplayUnits.Temperature))]
        public double? HeatPumpLockout { get; init; }

        [CommandOption("--backup-fuel <FUEL>")]
        [Description("Heat pump: backup heat, electric (default), gas or oil (gas and oil with --backup-efficiency).")]
        [StudyKey("plant", "backup_fuel")]
        public string? BackupFuel { get; init; }

        [CommandOption("--backup-efficiency <E>")]
        [Description("Heat pump: efficiency of the backup heat. Default 1.0 (electric).")]
        [StudyKey("plant", "backup_efficiency")]
        public double? BackupEfficiency { get; init; }

        [CommandOption("--defrost-below <T>")]
        [Description("Heat pump: outdoor dry-bulb below which its COP drops by --defrost-penalty (F or C). Default no defrost penalty.")]
        [StudyKey("plant", "defrost_below", nameof(DisplayUnits.Temperature))]
        public double? DefrostBelow { get; init; }

        [CommandOption("--defrost-penalty <PCT>")]
        [Description("Heat pump: COP lost while defrosting, percent. Default 10 (recalled from memory).")]
        [StudyKey("plant", "defrost_penalty_pct")]
        public double? DefrostPenalty { get; init; }

        [CommandOption("--humidifier <TYPE>")]
        [Description("The plant's humidifier: steam-electric (default), steam-gas or adiabatic.")]
        [StudyKey("plant", "humidifier")]
        public string? Humidifier { get; init; }

        [CommandOption("--humidifier-efficiency <E>")]
        [Description("Steam humidifier efficiency. Default 1.0 steam-electric, 0.8 steam-gas (recalled from memory).")]
        [StudyKey("plant", "humidifier_efficiency")]
        public double? HumidifierEfficiency { get; init; }

        [CommandOption("--price-electricity <PRICE>")]
        [Description("Electricity price per kWh, for the cost columns. Default 0.")]
        [StudyKey("plant", "price_electricity_per_kwh")]
        public double? PriceElectricity { get; init; }

        /// <summary>True when any option of the plant is given (then the command buys energy through a plant).</summary>
        private bool HasPlant => HeatingFuel is not null || HeatingEfficiency is not null || HeatingCop is not null || HeatingCapacity is not null
            || HeatPumpLockout is not null || BackupFuel is not null || BackupEfficiency is not null || DefrostBelow is not null
            || DefrostPenalty is not null || Humidifier is not null || HumidifierEfficiency is not null || PriceElectricity is not null;

        public override ValidationResult Validate()
        {
            if (HasPlant && CoolingCop is null)
            {
                return ValidationResult.Error("--cooling-cop is required with the plant options: the plant buys the coil energy at that COP");
            }

            if ((HasPlant || CoolingCop is not null) && HeatingEfficiency is null && (HeatingFuel is null or "gas" or "oil"))
            {
                return ValidationResult.Error($"--heating-efficiency is required for {HeatingFuel ?? "gas"} heating (the default --heating-fuel is gas): e.g. --heating-efficiency 0.85, or choose --heating-fuel electric or heat-pump");
            }

            var missing = new (string Option, double? Value, string What)[]
            {
                ("--supply-airflow", SupplyAirflow, "the supply airflow"),
                ("--min-outdoor-airflow", MinOutdoorAirflow, "the minimum outdoor airflow"),
                ("--supply-temp", SupplyTemp, "the supply air temperature"),
                ("--return-temp", ReturnTemp, "the return air temperature"),
                ("--return-rh", ReturnRh, "the return air relative humidity in percent"),
                ("--design-load", DesignLoad, "the design sensible cooling load"),
                ("--design-outdoor", DesignOutdoor, "the design outdoor dry-bulb"),
                ("--balance-point", BalancePoint, "the balance-point outdoor dry-bulb"),
            }.Where(o => o.Value is null).ToList();
            if (missing.Count > 0)
            {
                return ValidationResult.Error(string.Join("; ", missing.Select(m => $"{m.Option} is required: {m.What}")));
            }

            return base.Validate();
        }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var run = OneCaseStudy.Run(settings, "economizer");
        var u = settings.DisplayUnits;
        var a = run.OutdoorAir.Assumptions;
        string methods = AssumptionText.Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol);
        var doc = EconomizerDocument.Build(run.Economizer!, u, settings.Headline ?? IntegrationMethod.Hourly, a.Schedule, methods);
        output.Write(doc, settings, settings.Csv);
        return ExitCodes.Ok;
    }
}
