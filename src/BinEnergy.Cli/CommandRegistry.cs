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

        config.AddCommand<RunCommand>("run")
            .WithData(output)
            .WithDescription("Run a study file: every climate x variant, into tables (Parquet, CSV) and summary.json.")
            .WithExample("run", "harbor-study.toml")
            .WithExample("run", "harbor-study.toml", "--out", "reports/harbor", "--hourly", "--force");
    }
}
