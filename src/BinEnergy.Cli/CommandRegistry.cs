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

        config.AddCommand<SynthCommand>("synth")
            .WithData(output)
            .WithDescription("Synthesize an hourly weather year (open layout) from monthly statistics and a seed.")
            .WithExample("synth", "--monthly", "weather-samples/port-verrin-monthly.csv", "--seed", "1", "--out", "port-verrin.csv");
    }
}
