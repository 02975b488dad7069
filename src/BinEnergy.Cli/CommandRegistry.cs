using BinEnergy.Cli.Commands;

namespace BinEnergy.Cli;

/// <summary>The list of commands. Each command lives in its own file under Commands/.</summary>
internal static class CommandRegistry
{
    /// <summary>Each command's settings type, by name (for messages about its options).</summary>
    /// <remarks>Filled as the commands are registered; concurrent runs (tests) write the same entries.</remarks>
    public static System.Collections.Concurrent.ConcurrentDictionary<string, Type> SettingsTypes { get; } = new(StringComparer.Ordinal);

    public static void Register(IConfigurator config, CommandOutput output)
    {
        ICommandConfigurator Add<T>(string name, string description)
            where T : class, ICommand
        {
            SettingsTypes[name] = typeof(T).GetInterfaces().Single(i => i.IsGenericType && i.GetGenericTypeDefinition() == typeof(ICommand<>)).GetGenericArguments()[0];
            return config.AddCommand<T>(name).WithData(output).WithDescription(description);
        }

        Add<AirCommand>("air", "Properties of one moist-air state and its airflow factors at the site.")
            .WithExample("air", "--drybulb", "95", "--wetbulb", "75", "--elevation", "5000")
            .WithExample("air", "--drybulb", "30", "--rh", "40", "--units", "si", "--json");

        Add<InspectCommand>("inspect", "Reads a weather file: hours, site, pressure, dry-bulb, degree-days, design conditions and data repairs.")
            .WithExample("inspect", "weather.csv")
            .WithExample("inspect", "725300TYA.CSV", "--map", "tmy3", "--units", "si", "--json");

        Add<ConvertCommand>("convert", "Reads a weather file through a column map and writes it in the open CSV layout.")
            .WithExample("convert", "725300TYA.CSV", "--map", "tmy3", "--out", "chicago.csv");

        Add<BinsCommand>("bins", "The dry-bulb bin table of a weather file: hours (occupied and not), mean coincident humidity ratio, wet-bulb and enthalpy.")
            .WithExample("bins", "weather.csv", "--occupied", "\"Mon-Fri 07:00-19:00; Sat 08:00-13:00\"")
            .WithExample("bins", "725300TYA.CSV", "--map", "tmy3", "--by", "month", "--csv")
            .WithExample("bins", "weather.csv", "--joint", "--units", "si", "--json");

        Add<OutdoorAirCommand>("outdoor-air", "Annual outdoor-air heating, cooling and dehumidification of one airflow: bin method, hourly check, peaks, assumptions.")
            .WithExample("outdoor-air", "weather.csv", "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60")
            .WithExample("outdoor-air", "723650TYA.CSV", "--map", "tmy3", "--airflow", "2000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--occupied", "\"Mon-Fri 07:00-19:00\"", "--recovery-sensible", "0.75", "--recovery-pressure", "0.8")
            .WithExample("outdoor-air", "weather.csv", "--airflow", "500", "--heat-to", "21", "--cool-to", "24", "--max-rh", "60", "--units", "si", "--json");

        Add<EconomizerCommand>("economizer", "Economizer controls side by side with the baseline (no economizer): hours per mode, coil energy and savings, by bin and hourly.")
            .WithExample("economizer", "weather.csv", "--supply-airflow", "10000", "--min-outdoor-airflow", "2000", "--supply-temp", "55",
                "--return-temp", "75", "--return-rh", "50", "--design-load", "216000", "--design-outdoor", "95", "--balance-point", "45")
            .WithExample("economizer", "722040TYA.CSV", "--map", "tmy3", "--units", "si", "--supply-airflow", "4700", "--supply-airflow-min", "1900",
                "--min-outdoor-airflow", "950", "--supply-temp", "13", "--return-temp", "24", "--return-rh", "50", "--design-load", "63",
                "--design-outdoor", "35", "--balance-point", "7", "--occupied", "\"Mon-Fri 07:00-19:00\"", "--json");

        Add<SynthCommand>("synth", "Synthesize an hourly weather year (open layout) from monthly statistics and a seed.")
            .WithExample("synth", "--monthly", "weather-samples/port-verrin-monthly.csv", "--seed", "1", "--out", "port-verrin.csv");

        Add<RunCommand>("run", "Run a study file: every climate x variant, into tables (Parquet, CSV), charts, report.html, summary.xlsx and summary.json.")
            .WithExample("run", "harbor-study.toml")
            .WithExample("run", "harbor-study.toml", "--out", "reports/harbor", "--hourly", "--force");

        Add<BatchCommand>("batch", "Run a study on many weather files, one per core, into partitioned Parquet tables.")
            .WithExample("batch", "national.toml", "--weather", "stations.csv", "--out", "reports/national")
            .WithExample("batch", "national.toml", "--weather", "'weather/**/*.csv'", "--out", "reports/national", "--shard", "0/4");

        Add<BatchReportCommand>("batch-report", "The cross-climate report of a batch output folder: every shard's tables into report.html and summary.json.")
            .WithExample("batch-report", "reports/national");

        Add<DemoCommand>("demo", "Runs the bundled demo study (invented climates, four ventilation options, economizer) and replaces reports/demo/ with it.")
            .WithExample("demo")
            .WithExample("demo", "--out", "my-demo");
    }
}
