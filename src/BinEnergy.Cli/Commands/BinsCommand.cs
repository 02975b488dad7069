using System.ComponentModel;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Weather;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy bins</c>: the dry-bulb bin table of a weather file, optionally split or joint with humidity ratio.</summary>
public sealed class BinsCommand : Command<BinsCommand.Settings>
{
    public sealed class Settings : BinOptions
    {
        [CommandOption("--by <SPLIT>")]
        [Description("Split the table: month, or block (time of day, 00-08, 08-16, 16-24 unless --blocks says otherwise).")]
        public string? By { get; init; }

        [CommandOption("--blocks <HOURS>")]
        [Description("Time-of-day block boundaries for --by block, comma-separated whole hours from 0 to 24, e.g. 0,6,12,18,24.")]
        public string? Blocks { get; init; }

        [CommandOption("--joint")]
        [Description("Joint bins of dry-bulb x humidity ratio instead of dry-bulb alone.")]
        public bool Joint { get; init; }

        [CommandOption("--humidity-width <W>")]
        [Description("Humidity-ratio bin width for --joint (gr/lb in ip, g/kg in si). Default 10 gr/lb or 1 g/kg.")]
        public double? HumidityWidth { get; init; }

        [CommandOption("--csv")]
        [Description("Write the table as CSV to standard output (one row per bin, ascending).")]
        public bool Csv { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var units = settings.UnitSystem;
        if (settings.Csv && settings.Json)
        {
            throw new UsageException("give --csv or --json, not both");
        }

        BinSplit? split = settings.By?.ToLowerInvariant() switch
        {
            null => null,
            "month" => BinSplit.Month,
            "block" => BinSplit.TimeOfDayBlock,
            _ => throw new UsageException($"--by must be month or block, not '{settings.By}'"),
        };
        if (split is not null && settings.Joint)
        {
            throw new UsageException("--by and --joint cannot be combined: choose a split or joint bins");
        }

        if (settings.Blocks is not null && split != BinSplit.TimeOfDayBlock)
        {
            throw new UsageException("--blocks applies to --by block only");
        }

        var blocks = ParseBlocks(settings.Blocks);
        var scale = settings.Scale(units);
        var humidityScale = HumidityScale(settings, units);
        var schedule = settings.Schedule();
        var options = settings.ReadOptions(units);

        // Everything is computed before anything is written: a failure leaves no half-written table.
        var weather = WeatherReader.Read(settings.Weather, options);
        var flags = schedule.Flags(weather);
        var table = BinTable.Build(weather, scale, flags);
        var report = new BinsReport(weather, table, schedule, units, settings.Weather + " (" + (options.Map?.Source ?? "open layout") + ")")
        {
            Groups = split is BinSplit s ? table.Split(s, blocks) : null,
            SplitName = split == BinSplit.Month ? "month" : "block",
            Joint = settings.Joint ? table.Joint(humidityScale.Width) : null,
        };

        if (settings.Csv)
        {
            output.Out.Write(report.ToCsv());
        }
        else if (settings.Json)
        {
            output.WriteJson(report.ToJson());
        }
        else
        {
            report.Render(output.Console);
        }

        return ExitCodes.Ok;
    }

    private static HumidityBinScale HumidityScale(Settings settings, Core.Units.UnitSystem units)
    {
        if (settings.HumidityWidth is not double w)
        {
            return HumidityBinScale.Default(units);
        }

        if (!settings.Joint)
        {
            throw new UsageException("--humidity-width applies to --joint only");
        }

        if (!(w >= 0.01 && w <= 100))
        {
            throw new UsageException(FormattableString.Invariant($"--humidity-width {w} must be between 0.01 and 100 ({(units == Core.Units.UnitSystem.IP ? "gr/lb" : "g/kg")})"));
        }

        return new HumidityBinScale(w, units);
    }

    private static TimeOfDayBlocks ParseBlocks(string? text)
    {
        if (text is null)
        {
            return TimeOfDayBlocks.Default;
        }

        var hours = new List<int>();
        foreach (var part in text.Split(',', StringSplitOptions.TrimEntries))
        {
            if (!int.TryParse(part, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int h))
            {
                throw new UsageException($"--blocks: '{part}' is not a whole hour; write boundaries like 0,8,16,24");
            }

            hours.Add(h);
        }

        try
        {
            return new TimeOfDayBlocks([.. hours]);
        }
        catch (ArgumentException)
        {
            throw new UsageException($"--blocks {text}: boundaries must start at 0, end at 24 and ascend, e.g. 0,8,16,24");
        }
    }
}
