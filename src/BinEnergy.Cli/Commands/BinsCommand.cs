using BinEnergy.Core.Binning;
using BinEnergy.Reporting.Documents;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy bins</c>: the dry-bulb bin table of a weather file, optionally split by month or time of day, or joint with humidity.</summary>
public sealed class BinsCommand : Command<BinsCommand.Settings>
{
    public sealed class Settings : BinOptions
    {
        [CommandOption("--by <SPLIT>"), Description("Split the table: month, or block (time of day, 00-08, 08-16, 16-24 unless --blocks says otherwise)."), TypeConverter(typeof(BinSplitChoice))]
        public BinSplit? By { get; init; }

        [CommandOption("--blocks <HOURS>"), Description("Time-of-day block boundaries for --by block, comma-separated whole hours from 0 to 24, e.g. 0,6,12,18,24.")]
        public string? Blocks { get; init; }

        [CommandOption("--joint"), Description("Joint bins of dry-bulb x humidity ratio instead of dry-bulb alone.")]
        public bool Joint { get; init; }

        [CommandOption("--humidity-width <W>"), Description("Humidity-ratio bin width for --joint (gr/lb in ip, g/kg in si). Default 10 gr/lb or 1 g/kg.")]
        public double? HumidityWidth { get; init; }

        public override ValidationResult Validate() => FirstBroken(
            base.Validate,
            (By is not null && Joint, "--by and --joint cannot be combined: choose a split or joint bins"),
            (Blocks is not null && By != BinSplit.TimeOfDayBlock, "--blocks applies to --by block only"),
            (HumidityWidth is not null && !Joint, "--humidity-width applies to --joint only"),
            (HumidityWidth is double w && !(w >= 0.01 && w <= 100), FormattableString.Invariant($"--humidity-width {HumidityWidth} must be between 0.01 and 100 (gr/lb in ip, g/kg in si)")));
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var blocks = ParseBlocks(settings.Blocks);

        // Everything is computed before anything is written: a failure leaves no half-written table.
        var (_, weather, schedule, scale) = OneCaseStudy.ReadWeather(settings, "bins");
        var table = BinTable.Build(weather, scale, schedule.Flags(weather));
        var split = settings.By is BinSplit by ? (by == BinSplit.Month ? "month" : "block", table.Split(by, blocks)) : ((string, IReadOnlyList<BinGroup>)?)null;
        var joint = settings.Joint ? table.Joint(settings.HumidityWidth ?? HumidityBinScale.Default(settings.Units).Width) : null;
        output.Write(BinsDocument.Build(weather, table, schedule.Text, settings.DisplayUnits, settings.Source(), split, joint), settings, settings.Csv);
        return ExitCodes.Ok;
    }

    private static TimeOfDayBlocks ParseBlocks(string? text)
    {
        if (text is null)
        {
            return TimeOfDayBlocks.Default;
        }

        var hours = text.Split(',', StringSplitOptions.TrimEntries)
            .Select(part => int.TryParse(part, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int h)
                ? h
                : throw new UsageException($"--blocks: '{part}' is not a whole hour; write boundaries like 0,8,16,24"))
            .ToArray();
        try
        {
            return new TimeOfDayBlocks(hours);
        }
        catch (ArgumentException)
        {
            throw new UsageException($"--blocks {text}: boundaries must start at 0, end at 24 and ascend, e.g. 0,8,16,24");
        }
    }
}
