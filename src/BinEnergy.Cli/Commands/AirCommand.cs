using System.ComponentModel;
using System.Globalization;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Documents;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy air</c>: one moist-air state, all its properties and the airflow factors at it.</summary>
public sealed class AirCommand : Command<AirCommand.Settings>
{
    public sealed class Settings : CommonSettings
    {
        [CommandOption("--drybulb <T>")]
        [Description("Dry-bulb temperature (F in ip, C in si). Required.")]
        public double? DryBulb { get; init; }

        [CommandOption("--wetbulb <T>")]
        [Description("Thermodynamic wet-bulb (F or C).")]
        public double? WetBulb { get; init; }

        [CommandOption("--dewpoint <T>")]
        [Description("Dew point (F or C).")]
        public double? DewPoint { get; init; }

        [CommandOption("--rh <PCT>")]
        [Description("Relative humidity, percent (0 to 100).")]
        public double? RelativeHumidity { get; init; }

        [CommandOption("--humidity-ratio <W>")]
        [Description("Humidity ratio, lb/lb or kg/kg (the same number).")]
        public double? HumidityRatio { get; init; }

        [CommandOption("--elevation <Z>")]
        [Description("Site elevation (ft in ip, m in si); sets the standard-atmosphere pressure. Default sea level.")]
        public double? Elevation { get; init; }

        [CommandOption("--pressure <P>")]
        [Description("Total (station) pressure (psia in ip, kPa in si), instead of --elevation.")]
        public double? Pressure { get; init; }
    }

    /// <summary>Lowest elevation the command accepts, ft.</summary>
    public const double MinElevationFt = -1_000;

    /// <summary>Highest elevation the command accepts, ft (the standard atmosphere's troposphere ends near 36,089 ft).</summary>
    public const double MaxElevationFt = 36_000;

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var state = BuildState(settings, out string pressureSource);
        output.Write(AirDocument.Build(state, settings.DisplayUnits, pressureSource), settings);
        return ExitCodes.Ok;
    }

    /// <summary>Turns the options into a state, or throws a <see cref="UsageException"/> naming the problem.</summary>
    internal static AirState BuildState(Settings s, out string pressureSource)
    {
        var u = s.DisplayUnits;
        double db = s.DryBulb ?? throw new UsageException("--drybulb is required (F with --units ip, C with --units si)");
        int measures = new[] { s.WetBulb, s.DewPoint, s.RelativeHumidity, s.HumidityRatio }.Count(v => v.HasValue);
        string? problem = measures switch
        {
            0 => "give one humidity measure: --wetbulb, --dewpoint, --rh or --humidity-ratio",
            > 1 => $"give only one humidity measure: --wetbulb, --dewpoint, --rh or --humidity-ratio (got {measures})",
            _ when s.Elevation.HasValue && s.Pressure.HasValue => "give --elevation or --pressure, not both",
            _ when s.RelativeHumidity is double rh && !(rh >= 0 && rh <= 100) => Inv($"--rh {rh} is outside 0 to 100 percent"),
            _ when s.DewPoint > db => Inv($"--dewpoint {s.DewPoint} is above --drybulb {db}: air cannot hold more water than at saturation"),
            _ when s.WetBulb > db => Inv($"--wetbulb {s.WetBulb} is above --drybulb {db}: the wet-bulb can never exceed the dry-bulb"),
            _ when s.HumidityRatio is double w && !(w >= 0 && w < 1) => Inv($"--humidity-ratio {w} must be between 0 and 1 (lb/lb or kg/kg; 0.010 is typical)"),
            _ => null,
        };
        if (problem is not null)
        {
            throw new UsageException(problem);
        }

        Pressure pressure;
        if (s.Pressure is double p)
        {
            pressure = Core.Units.Pressure.From(p, s.Units);
            pressureSource = "given";
            if (!(pressure.Kilopascals >= 30 && pressure.Kilopascals <= 120))
            {
                throw new UsageException(Inv($"--pressure {p} {u.Pressure.Symbol} is outside 30 to 120 kPa (4.4 to 17.4 psia)"));
            }
        }
        else
        {
            var elevation = Length.From(s.Elevation ?? 0.0, s.Units);
            if (!(elevation.Feet >= MinElevationFt - 1e-9 && elevation.Feet <= MaxElevationFt + 1e-9))
            {
                throw new UsageException(Inv($"--elevation {s.Elevation} {u.Length.Symbol} is outside -1,000 to 36,000 ft (-305 to 10,973 m)"));
            }

            pressure = Atmosphere.PressureAt(elevation);
            pressureSource = s.Elevation.HasValue ? Inv($"standard atmosphere at {s.Elevation:0.#} {u.Length.Symbol}") : "standard atmosphere at sea level";
        }

        var dryBulb = Temperature.From(db, s.Units);
        return (s.RelativeHumidity, s.DewPoint, s.WetBulb) switch
        {
            (double rh, _, _) => AirState.FromRelativeHumidity(dryBulb, rh / 100.0, pressure),
            (_, double dp, _) => AirState.FromDewPoint(dryBulb, Temperature.From(dp, s.Units), pressure),
            (_, _, double wb) => AirState.FromWetBulb(dryBulb, Temperature.From(wb, s.Units), pressure),
            _ => AirState.FromHumidityRatio(dryBulb, Core.Units.HumidityRatio.FromKilogramsPerKilogram(s.HumidityRatio!.Value), pressure),
        };
    }

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
