using BinEnergy.Core.Weather.Synthesis;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy synth</c>: an hourly weather year in the open layout, synthesized from a
/// monthly-statistics file with a seed (<see cref="WeatherSynthesizer"/>). Refuses to replace
/// an existing file unless <c>--force</c>; writes to a temporary name and moves it into place,
/// so a failure never leaves a half-written file.
/// </summary>
public sealed class SynthCommand : Command<SynthCommand.Settings>
{
    public sealed class Settings : CommonSettings
    {
        [CommandOption("--monthly <FILE>"), Description("Monthly statistics (CSV: month, drybulb_max_c|f, drybulb_min_c|f, dewpoint_c|f, daily_mean_sd_k|f; see docs/synthesis.md). Required.")]
        public string? Monthly { get; init; }

        [CommandOption("--seed <N>"), Description("Seed of the random sequence (a whole number, 0 or more); the same seed gives the same file. Required.")]
        public ulong? Seed { get; init; }

        [CommandOption("--out <FILE>"), Description("The hourly file to write (open layout; .csv, or .csv.gz for gzip). Required.")]
        public string? Out { get; init; }

        [CommandOption("--year <Y>"), Description("Calendar year of the dates and weekdays: a non-leap year from 1900 to 2100. Default 2018 (it starts on a Monday)."), DefaultValue(Core.Weather.CalendarInfo.DefaultTypicalYear)]
        public int Year { get; init; } = Core.Weather.CalendarInfo.DefaultTypicalYear;

        [CommandOption("--force"), Description("Replace --out if it exists.")]
        public bool Force { get; init; }

        public override Spectre.Console.ValidationResult Validate() => FirstBroken(
            base.Validate,
            (Monthly is null, "--monthly FILE is required (the monthly statistics to synthesize from)"),
            (Seed is null, "--seed N is required (any whole number; the same seed gives the same weather)"),
            (Year < 1900 || Year > 2100 || DateTime.IsLeapYear(Year), $"--year {Year} must be a non-leap year from 1900 to 2100 (the synthesized year has 365 days)"));
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        string monthly = settings.Monthly!;
        string fullOut = CommandOutput.TargetFile(settings.Out, monthly, settings.Force, "where to write the hourly year", "--monthly input");
        var climate = MonthlyClimateReader.Read(monthly);
        var result = WeatherSynthesizer.Synthesize(climate, settings.Seed!.Value, settings.Year);
        if (!TextFile.WriteAtomically(fullOut, settings.Force, w => SynthesizedYearWriter.Write(result, monthly, w)))
        {
            throw CommandOutput.InTheWay(settings.Out!);
        }

        output.Write(SynthDocument.Build(result, climate, settings.Out!, settings.DisplayUnits), settings);
        return ExitCodes.Ok;
    }
}
