using BinEnergy.Cli.Commands;
using Spectre.Console.Cli;

namespace BinEnergy.Cli;

/// <summary>The list of commands. Each command lives in its own file under Commands/.</summary>
internal static class CommandRegistry
{
    public static void Register(IConfigurator config, CommandOutput output)
    {
        config.AddCommand<AirCommand>("air")
            .WithData(output)
            .WithDescription("Properties of one moist-air state and its airflow factors at the site.")
            .WithExample("air", "--drybulb", "95", "--wetbulb", "75", "--elevation", "5000")
            .WithExample("air", "--drybulb", "30", "--rh", "40", "--units", "si", "--json");

        config.AddCommand<InspectCommand>("inspect")
            .WithData(output)
            .WithDescription("Reads a weather file: hours, site, pressure, dry-bulb, degree-days, design conditions and data repairs.")
            .WithExample("inspect", "weather.csv")
            .WithExample("inspect", "725300TYA.CSV", "--map", "tmy3", "--units", "si", "--json");

        config.AddCommand<ConvertCommand>("convert")
            .WithData(output)
            .WithDescription("Reads a weather file through a column map and writes it in the open CSV layout.")
            .WithExample("convert", "725300TYA.CSV", "--map", "tmy3", "--out", "chicago.csv");

        config.AddCommand<SynthCommand>("synth")
            .WithData(output)
            .WithDescription("Synthesize an hourly weather year (open layout) from monthly statistics and a seed.")
            .WithExample("synth", "--monthly", "weather-samples/port-verrin-monthly.csv", "--seed", "1", "--out", "port-verrin.csv");
    }
}
