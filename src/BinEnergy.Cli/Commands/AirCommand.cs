using BinEnergy.Core.Psychrometrics;
using BinEnergy.Reporting.Documents;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy air</c>: one moist-air state, all its properties and the airflow factors at it.</summary>
public sealed class AirCommand : Command<AirCommand.Settings>
{
    public sealed class Settings : CommonSettings
    {
        [CommandOption("--drybulb <T>"), Description("Dry-bulb temperature (F in ip, C in si). Required.")]
        public double? DryBulb { get; init; }

        [CommandOption("--wetbulb <T>"), Description("Thermodynamic wet-bulb (F or C).")]
        public double? WetBulb { get; init; }

        [CommandOption("--dewpoint <T>"), Description("Dew point (F or C).")]
        public double? DewPoint { get; init; }

        [CommandOption("--rh <PCT>"), Description("Relative humidity, percent (0 to 100).")]
        public double? RelativeHumidity { get; init; }

        [CommandOption("--humidity-ratio <W>"), Description("Humidity ratio, lb/lb or kg/kg (the same number).")]
        public double? HumidityRatio { get; init; }

        [CommandOption("--elevation <Z>"), Description("Site elevation (ft in ip, m in si); sets the standard-atmosphere pressure. Default sea level.")]
        public double? Elevation { get; init; }

        [CommandOption("--pressure <P>"), Description("Total (station) pressure (psia in ip, kPa in si), instead of --elevation.")]
        public double? Pressure { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        double dryBulb = settings.DryBulb ?? throw new UsageException("--drybulb is required (F with --units ip, C with --units si)");
        var (state, pressureSource) = new AirStateInput(settings.Units, dryBulb)
        {
            WetBulb = settings.WetBulb,
            DewPoint = settings.DewPoint,
            RelativeHumidityPct = settings.RelativeHumidity,
            HumidityRatio = settings.HumidityRatio,
            Elevation = settings.Elevation,
            Pressure = settings.Pressure,
        }.Resolve();
        output.Write(AirDocument.Build(state, settings.DisplayUnits, pressureSource), settings);
        return ExitCodes.Ok;
    }
}
