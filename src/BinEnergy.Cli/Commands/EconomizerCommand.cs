using System.ComponentModel;
using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy economizer WEATHER</c>: every chosen economizer control side by side with the
/// baseline (no economizer), by the bin method and the hourly sum (DESIGN 8).
/// </summary>
public sealed class EconomizerCommand : Command<EconomizerCommand.Settings>
{
    public sealed class Settings : WeatherFileSettings
    {
        [CommandOption("--supply-airflow <N>")]
        [Description("Supply airflow (cfm in ip, L/s in si): the constant flow, or the maximum with --supply-airflow-min. Required.")]
        public double? SupplyAirflow { get; init; }

        [CommandOption("--supply-airflow-min <N>")]
        [Description("Minimum supply airflow of a variable-volume system (cfm or L/s). Without it the flow is constant.")]
        public double? SupplyAirflowMin { get; init; }

        [CommandOption("--min-outdoor-airflow <N>")]
        [Description("Minimum outdoor airflow (cfm or L/s); must meet the ventilation code. Required.")]
        public double? MinOutdoorAirflow { get; init; }

        [CommandOption("--flow-basis <BASIS>")]
        [Description("How airflows become mass flows: site (dry air at 70 F at the site pressure, default), standard (0.075 lb/ft3) or actual (the coil-entering state).")]
        [DefaultValue("site")]
        public string FlowBasis { get; init; } = "site";

        [CommandOption("--supply-temp <T>")]
        [Description("Supply (coil-leaving) air temperature (F or C). Required.")]
        public double? SupplyTemp { get; init; }

        [CommandOption("--return-temp <T>")]
        [Description("Return air temperature (F or C). Required.")]
        public double? ReturnTemp { get; init; }

        [CommandOption("--return-rh <PCT>")]
        [Description("Return air relative humidity, percent. Required.")]
        public double? ReturnRh { get; init; }

        [CommandOption("--design-load <Q>")]
        [Description("Building sensible cooling load at the design outdoor temperature (Btu/h in ip, kW in si). Required.")]
        public double? DesignLoad { get; init; }

        [CommandOption("--design-outdoor <T>")]
        [Description("Design outdoor dry-bulb of that load (F or C). Required.")]
        public double? DesignOutdoor { get; init; }

        [CommandOption("--balance-point <T>")]
        [Description("Outdoor dry-bulb below which the building needs no cooling (F or C). Required.")]
        public double? BalancePoint { get; init; }

        [CommandOption("--coil-leaving-rh <PCT>")]
        [Description("Relative humidity of the air leaving the cooling coil at its wettest, percent. Default 90.")]
        [DefaultValue(90.0)]
        public double CoilLeavingRh { get; init; } = 90.0;

        [CommandOption("--occupied <SCHEDULE>")]
        [Description("When the system runs, e.g. \"Mon-Fri 07:00-19:00; Sat 08:00-13:00\". Default always.")]
        [DefaultValue("always")]
        public string Occupied { get; init; } = "always";

        [CommandOption("--controls <NAMES>")]
        [Description("Comma-separated controls to compare: none, fixed-drybulb, differential-drybulb, fixed-enthalpy, differential-enthalpy, fixed-dewpoint. Default: the five economizer controls.")]
        public string? Controls { get; init; }

        [CommandOption("--non-integrated")]
        [Description("Non-integrated economizers: lock out to minimum outdoor air whenever the coil must run (default: integrated).")]
        public bool NonIntegrated { get; init; }

        [CommandOption("--high-limit-drybulb <T>")]
        [Description("Dry-bulb high limit (F or C). Default 75 F (23.9 C), a suggestion recalled from memory: the local energy code governs.")]
        public double? HighLimitDryBulb { get; init; }

        [CommandOption("--high-limit-enthalpy <H>")]
        [Description("Enthalpy high limit (Btu/lb on the 0 F datum in ip, kJ/kg on the 0 C datum in si). Default 28 Btu/lb (47.2 kJ/kg), recalled from memory.")]
        public double? HighLimitEnthalpy { get; init; }

        [CommandOption("--high-limit-dewpoint <T>")]
        [Description("Dew-point high limit (F or C). Default 55 F (12.8 C), recalled from memory.")]
        public double? HighLimitDewPoint { get; init; }

        [CommandOption("--width <W>")]
        [Description("Dry-bulb bin width (F degrees or K). Default 5 F / 2 C.")]
        public double? Width { get; init; }

        [CommandOption("--bin-point <POINT>")]
        [Description(BinOptions.BinPointHelp)]
        public string BinPoint { get; init; } = "mean";

        [CommandOption("--joint")]
        [Description("Also evaluate joint dry-bulb x humidity-ratio bins (10 gr/lb or 1 g/kg), which fix most of the bin error of enthalpy and dew-point controls.")]
        public bool Joint { get; init; }
    }

    /// <summary>CLI option for each settings key of <see cref="EconomizerSettings.Problems"/>.</summary>
    private static readonly Dictionary<string, string> OptionOfKey = new()
    {
        ["supply_airflow"] = "--supply-airflow",
        ["supply_airflow_min"] = "--supply-airflow-min",
        ["min_outdoor_airflow"] = "--min-outdoor-airflow",
        ["supply_temp"] = "--supply-temp",
        ["return_temp"] = "--return-temp",
        ["return_rh"] = "--return-rh",
        ["coil_leaving_rh"] = "--coil-leaving-rh",
        ["design_load"] = "--design-load",
        ["design_outdoor"] = "--design-outdoor",
        ["controls"] = "--controls",
    };

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var units = settings.UnitSystem;
        var economizer = BuildSettings(settings, units);
        var scale = settings.Width is double width ? NewScale(width, units) : DryBulbBinScale.Default(units);
        var schedule = ParseSchedule(settings.Occupied);

        var weather = WeatherReader.Read(settings.Weather, settings.ReadOptions(units));
        var occupied = schedule.Flags(weather);
        var bins = BinTable.Build(weather, scale, occupied);
        var joint = settings.Joint ? bins.Joint(HumidityBinScale.Default(units).Width) : null;
        EconomizerEvaluation result;
        try
        {
            result = EconomizerEvaluation.Evaluate(weather, occupied, bins, economizer, joint);
        }
        catch (EconomizerSettingsException e)
        {
            throw Usage(e);
        }

        var report = new EconomizerReport(result, units, schedule.Text);
        if (settings.Json)
        {
            output.WriteJson(report.ToJson());
        }
        else
        {
            report.Render(output.Console);
        }

        return ExitCodes.Ok;
    }

    /// <summary>Turns the options into economizer settings, or throws a <see cref="UsageException"/> naming the option.</summary>
    internal static EconomizerSettings BuildSettings(Settings s, UnitSystem units)
    {
        double Need(double? value, string option, string what) =>
            value ?? throw new UsageException($"{option} is required: {what}");

        string flowUnit = units == UnitSystem.IP ? "cfm" : "L/s";
        string tUnit = units == UnitSystem.IP ? "F" : "C";
        double supply = Need(s.SupplyAirflow, "--supply-airflow", $"the supply airflow in {flowUnit}");
        double outdoor = Need(s.MinOutdoorAirflow, "--min-outdoor-airflow", $"the minimum outdoor airflow in {flowUnit}");
        double ts = Need(s.SupplyTemp, "--supply-temp", $"the supply air temperature in {tUnit}");
        double tr = Need(s.ReturnTemp, "--return-temp", $"the return air temperature in {tUnit}");
        double rh = Need(s.ReturnRh, "--return-rh", "the return air relative humidity in percent");
        double load = Need(s.DesignLoad, "--design-load", units == UnitSystem.IP ? "the design sensible cooling load in Btu/h" : "the design sensible cooling load in kW");
        double design = Need(s.DesignOutdoor, "--design-outdoor", $"the design outdoor dry-bulb in {tUnit}");
        double balance = Need(s.BalancePoint, "--balance-point", $"the balance-point outdoor dry-bulb in {tUnit}");
        if (!(rh >= 0 && rh < 100))
        {
            throw new UsageException(Inv($"--return-rh {rh} must be from 0 up to (not including) 100 percent"));
        }

        if (!(s.CoilLeavingRh > 0 && s.CoilLeavingRh <= 100))
        {
            throw new UsageException(Inv($"--coil-leaving-rh {s.CoilLeavingRh} must be above 0 and at most 100 percent"));
        }

        var basis = s.FlowBasis.ToLowerInvariant() switch
        {
            "site" => Core.Psychrometrics.FlowBasis.Site,
            "standard" => Core.Psychrometrics.FlowBasis.Standard,
            "actual" => Core.Psychrometrics.FlowBasis.Actual,
            _ => throw new UsageException($"--flow-basis must be site, standard or actual, not '{s.FlowBasis}'"),
        };

        var suggested = HighLimits.Suggested;
        var limits = new HighLimits(
            s.HighLimitDryBulb is double db ? Temperature.From(db, units) : suggested.DryBulb,
            s.HighLimitEnthalpy is double h ? SpecificEnthalpy.From(h, units) : suggested.Enthalpy,
            s.HighLimitDewPoint is double dp ? Temperature.From(dp, units) : suggested.DewPoint);
        if (!(limits.Enthalpy.KilojoulesPerKilogram > 0 && limits.Enthalpy.KilojoulesPerKilogram < 200))
        {
            throw new UsageException(units == UnitSystem.IP
                ? Inv($"--high-limit-enthalpy {s.HighLimitEnthalpy} Btu/lb is outside 8 to 93 Btu/lb (0 F datum)")
                : Inv($"--high-limit-enthalpy {s.HighLimitEnthalpy} kJ/kg is outside 0 to 200 kJ/kg (0 C datum)"));
        }

        var settings = new EconomizerSettings
        {
            SupplyAirflow = VolumeFlow.From(supply, units),
            SupplyAirflowMin = s.SupplyAirflowMin is double min ? VolumeFlow.From(min, units) : null,
            MinOutdoorAirflow = VolumeFlow.From(outdoor, units),
            FlowBasis = basis,
            SupplyTemperature = Temperature.From(ts, units),
            ReturnTemperature = Temperature.From(tr, units),
            ReturnRelativeHumidity = rh / 100.0,
            CoilLeavingRelativeHumidity = s.CoilLeavingRh / 100.0,
            LoadLine = new BuildingLoadLine(Power.From(load, units), Temperature.From(design, units), Temperature.From(balance, units)),
            Controls = ParseControls(s.Controls, !s.NonIntegrated),
            Limits = limits,
            BinPoint = BinOptions.ParseBinPoint(s.BinPoint),
        };
        var problems = settings.Problems();
        if (problems.Count > 0)
        {
            throw Usage(new EconomizerSettingsException(problems));
        }

        return settings;
    }

    private static EconomizerControl[] ParseControls(string? text, bool integrated)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return [.. EconomizerControl.EconomizerKinds.Select(k => new EconomizerControl(k, integrated))];
        }

        var list = new List<EconomizerControl>();
        foreach (var part in text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            if (!EconomizerControl.TryParse(part, integrated, out var control))
            {
                throw new UsageException($"--controls: '{part}' is not a control; use any of {string.Join(", ", EconomizerControl.Names)}");
            }

            if (list.Contains(control))
            {
                throw new UsageException($"--controls: '{part}' is listed twice");
            }

            list.Add(control);
        }

        if (list.Count == 0)
        {
            throw new UsageException("--controls: name at least one control");
        }

        return [.. list];
    }

    private static OccupancySchedule ParseSchedule(string text)
    {
        try
        {
            return OccupancySchedule.Parse(text);
        }
        catch (ScheduleSyntaxException e)
        {
            throw new UsageException("--occupied: " + e.Message);
        }
    }

    private static DryBulbBinScale NewScale(double width, UnitSystem units)
    {
        try
        {
            return new DryBulbBinScale(width, units);
        }
        catch (ArgumentOutOfRangeException)
        {
            throw new UsageException(Inv($"--width {width} must be between 0.1 and 50 degrees ({(units == UnitSystem.IP ? "F" : "K")})"));
        }
    }

    private static UsageException Usage(EconomizerSettingsException e) =>
        new(string.Join("; ", e.Problems.Select(p => (OptionOfKey.TryGetValue(p.Key, out var o) ? o : p.Key) + ": " + p.Message)));

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
