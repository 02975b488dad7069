using System.ComponentModel;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy outdoor-air</c>: annual outdoor-air loads of one airflow by the bin method, checked hour by hour.</summary>
public sealed class OutdoorAirCommand : Command<OutdoorAirCommand.Settings>
{
    public sealed class Settings : BinOptions
    {
        [CommandOption("--airflow <FLOW>")]
        [Description("Outdoor airflow (cfm in ip, L/s in si). Or give --people and --area rates instead.")]
        public double? Airflow { get; init; }

        [CommandOption("--flow-basis <BASIS>")]
        [Description("How the volume becomes mass of dry air: site (dry air at 70 F and the site pressure, default), standard (0.075 lb/ft3) or actual (each hour's outdoor air).")]
        public string FlowBasis { get; init; } = "site";

        [CommandOption("--heat-to <T>")]
        [Description("Heating setpoint (F or C). Required.")]
        public double? HeatTo { get; init; }

        [CommandOption("--cool-to <T>")]
        [Description("Cooling setpoint (F or C). Required.")]
        public double? CoolTo { get; init; }

        [CommandOption("--max-rh <PCT>")]
        [Description("Maximum indoor RH at the cooling setpoint, percent. Required.")]
        public double? MaxRh { get; init; }

        [CommandOption("--min-rh <PCT>")]
        [Description("Minimum indoor RH at the heating setpoint, percent; adds humidification. Default none.")]
        public double? MinRh { get; init; }

        [CommandOption("--ventilate <WHEN>")]
        [Description("When outdoor air runs: occupied (the --occupied hours, default) or always.")]
        public string Ventilate { get; init; } = "occupied";

        [CommandOption("--people <N>")]
        [Description("Zone population, for the people-and-area minimum (ASHRAE 62.1 ventilation rate procedure; you supply the rates).")]
        public double? People { get; init; }

        [CommandOption("--per-person <FLOW>")]
        [Description("Outdoor air per person (cfm or L/s) from the standard your code adopts.")]
        public double? PerPerson { get; init; }

        [CommandOption("--area <A>")]
        [Description("Zone floor area (ft2 in ip, m2 in si).")]
        public double? Area { get; init; }

        [CommandOption("--per-area <RATE>")]
        [Description("Outdoor air per unit floor area (cfm/ft2 or L/(s m2)) from the standard your code adopts.")]
        public double? PerArea { get; init; }

        [CommandOption("--zone-effectiveness <EZ>")]
        [Description("Zone air-distribution effectiveness E_z. Default 1.0.")]
        public double ZoneEffectiveness { get; init; } = 1.0;

        [CommandOption("--recovery-sensible <E>")]
        [Description("Energy recovery sensible effectiveness, 0 to 1 (e.g. 0.75). Default no recovery.")]
        public double? RecoverySensible { get; init; }

        [CommandOption("--recovery-latent <E>")]
        [Description("Energy recovery latent effectiveness, 0 to 1. Default 0 (sensible only).")]
        public double? RecoveryLatent { get; init; }

        [CommandOption("--frost-limit <T>")]
        [Description("Outdoor dry-bulb (F or C) below which the recovery device defrosts and runs at --frost-effectiveness.")]
        public double? FrostLimit { get; init; }

        [CommandOption("--frost-effectiveness <E>")]
        [Description("Sensible effectiveness below the frost limit. Default 0 (no recovery while defrosting).")]
        public double? FrostEffectiveness { get; init; }

        [CommandOption("--recovery-pressure <DP>")]
        [Description("Pressure drop the device adds on each air stream (in. w.c. in ip, Pa in si). Default 0.")]
        public double? RecoveryPressure { get; init; }

        [CommandOption("--fan-efficiency <E>")]
        [Description("Fan and motor efficiency for the recovery pressure drop. Default 0.6.")]
        public double? FanEfficiency { get; init; }

        [CommandOption("--bypass-when-idle")]
        [Description("The air bypasses the recovery device when it does not recover (no fan penalty in those hours).")]
        public bool BypassWhenIdle { get; init; }

        [CommandOption("--bin-point <POINT>")]
        [Description(BinPointHelp)]
        public string BinPoint { get; init; } = "mean";

        [CommandOption("--joint")]
        [Description("Also integrate over joint dry-bulb x humidity-ratio bins (10 gr/lb or 1 g/kg), which closes most of the latent error of dry-bulb bins.")]
        public bool Joint { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var units = settings.UnitSystem;
        var scale = settings.Scale(units);
        var loadSettings = BuildSettings(settings, units);
        var options = settings.ReadOptions(units);

        // Everything is computed before anything is written.
        var weather = WeatherReader.Read(settings.Weather, options);
        var flags = loadSettings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, scale, flags);
        var result = OutdoorAirCalculator.Compute(weather, loadSettings, table, flags,
            settings.Joint ? HumidityBinScale.Default(units) : null, DesignConditions.FromRecord(weather));
        var report = new OutdoorAirReport(weather, result, units, settings.Weather + " (" + (options.Map?.Source ?? "open layout") + ")",
            settings.Occupied is null && loadSettings.Operation == VentilationOperation.Occupied);
        if (settings.Json)
        {
            // The JSON holds the warnings too; standard error makes sure a person sees them.
            foreach (var w in result.Warnings)
            {
                output.Error.WriteLine("binenergy: warning: " + w);
            }

            output.WriteJson(report.ToJson());
        }
        else
        {
            report.Render(output.Console);
        }

        return ExitCodes.Ok;
    }

    /// <summary>Turns the options into load settings, or throws a <see cref="UsageException"/> naming the options at fault.</summary>
    internal static OutdoorAirSettings BuildSettings(Settings s, UnitSystem units)
    {
        var missing = new List<string>();
        if (s.HeatTo is null)
        {
            missing.Add("--heat-to");
        }

        if (s.CoolTo is null)
        {
            missing.Add("--cool-to");
        }

        if (s.MaxRh is null)
        {
            missing.Add("--max-rh");
        }

        if (missing.Count > 0)
        {
            throw new UsageException("give " + string.Join(", ", missing) + " (e.g. --heat-to 70 --cool-to 75 --max-rh 60)");
        }

        var basis = s.FlowBasis.ToLowerInvariant() switch
        {
            "site" => Core.Psychrometrics.FlowBasis.Site,
            "standard" => Core.Psychrometrics.FlowBasis.Standard,
            "actual" => Core.Psychrometrics.FlowBasis.Actual,
            _ => throw new UsageException($"--flow-basis must be site, standard or actual, not '{s.FlowBasis}'"),
        };
        var operation = s.Ventilate.ToLowerInvariant() switch
        {
            "occupied" => VentilationOperation.Occupied,
            "always" => VentilationOperation.Always,
            _ => throw new UsageException($"--ventilate must be occupied or always, not '{s.Ventilate}'"),
        };
        var point = BinOptions.ParseBinPoint(s.BinPoint);

        var rate = Ventilation(s, units);
        if (s.Airflow is null && rate is null)
        {
            throw new UsageException("give --airflow (cfm in ip, L/s in si), or --people with --per-person and --area with --per-area");
        }

        if (s.Airflow is double a && !(a > 0))
        {
            throw new UsageException(FormattableString.Invariant($"--airflow {a} must be above zero"));
        }

        var settings = new OutdoorAirSettings
        {
            Airflow = s.Airflow is double f ? VolumeFlow.From(f, units) : null,
            Ventilation = rate,
            FlowBasis = basis,
            Operation = operation,
            Schedule = s.Schedule(),
            HeatTo = Temperature.From(s.HeatTo!.Value, units),
            CoolTo = Temperature.From(s.CoolTo!.Value, units),
            MaxRelativeHumidity = s.MaxRh!.Value / 100.0,
            MinRelativeHumidity = s.MinRh / 100.0,
            Recovery = Recovery(s, units),
            BinPoint = point,
        };
        var problems = settings.Problems();
        if (problems.Count > 0)
        {
            throw new UsageException(string.Join("; ", problems));
        }

        return settings;
    }

    private static VentilationRate? Ventilation(Settings s, UnitSystem units)
    {
        bool any = s.People is not null || s.PerPerson is not null || s.Area is not null || s.PerArea is not null;
        if (!any)
        {
            return null;
        }

        if ((s.People is null) != (s.PerPerson is null) || (s.Area is null) != (s.PerArea is null))
        {
            throw new UsageException("give --people with --per-person, and --area with --per-area (either pair or both)");
        }

        double people = s.People ?? 0, perPerson = s.PerPerson ?? 0, area = s.Area ?? 0, perArea = s.PerArea ?? 0;
        return units == UnitSystem.IP
            ? VentilationRate.FromIp(people, perPerson, area, perArea, s.ZoneEffectiveness)
            : new VentilationRate(people, VolumeFlow.FromLitresPerSecond(perPerson), area, perArea, s.ZoneEffectiveness);
    }

    private static EnergyRecoverySettings? Recovery(Settings s, UnitSystem units)
    {
        bool any = s.RecoveryLatent is not null || s.FrostLimit is not null || s.FrostEffectiveness is not null
            || s.RecoveryPressure is not null || s.FanEfficiency is not null || s.BypassWhenIdle;
        if (s.RecoverySensible is null)
        {
            if (any)
            {
                throw new UsageException("the recovery options need --recovery-sensible (the device's sensible effectiveness, e.g. 0.75)");
            }

            return null;
        }

        if (s.FrostEffectiveness is not null && s.FrostLimit is null)
        {
            throw new UsageException("--frost-effectiveness needs --frost-limit (the outdoor dry-bulb below which the device defrosts)");
        }

        double dp = s.RecoveryPressure ?? 0;
        return new EnergyRecoverySettings
        {
            SensibleEffectiveness = s.RecoverySensible.Value,
            LatentEffectiveness = s.RecoveryLatent ?? 0,
            FrostLimit = s.FrostLimit is double t ? Temperature.From(t, units) : null,
            FrostEffectiveness = s.FrostEffectiveness ?? 0,
            PressureDropPa = units == UnitSystem.IP ? dp * Conversions.PascalsPerInchOfWater : dp,
            FanEfficiency = s.FanEfficiency ?? 0.6,
            BypassWhenIdle = s.BypassWhenIdle,
        };
    }
}
