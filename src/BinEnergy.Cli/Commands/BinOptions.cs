using System.ComponentModel;
using System.Globalization;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;
using BinEnergy.Reporting.Units;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>Options shared by the commands that bin a weather file: bin width, occupancy schedule, holidays.</summary>
public class BinOptions : WeatherFileSettings
{
    [CommandOption("--width <W>")]
    [Description("Dry-bulb bin width (F in ip, K in si). Bins sit on multiples of the width, lower edge inclusive. Default 5 F or 2 C.")]
    [StudyKey("study", "bin_width", nameof(DisplayUnits.TemperatureDifference))]
    public double? Width { get; init; }

    [CommandOption("--occupied <SCHEDULE>")]
    [Description("Occupied hours, e.g. \"Mon-Fri 07:00-19:00; Sat 08:00-13:00\", \"always\" or \"never\" (whole hours; 'Hol' for holidays). Default always.")]
    [StudyKey("schedule", "occupied")]
    public string? Occupied { get; init; }

    [CommandOption("--holidays <DATES>")]
    [Description("Holiday dates, unoccupied unless the schedule has a 'Hol' clause: comma-separated YYYY-MM-DD (the record's calendar year).")]
    [StudyKey("schedule", "holidays", List = true)]
    public string? Holidays { get; init; }

    [CommandOption("--daylight-saving <RULE>")]
    [Description("The building's clocks: none (default, the schedule is in standard time), north-america or europe (the schedule is in clock time; the weather stays in standard time).")]
    [TypeConverter(typeof(ChoiceConverter<DaylightSaving>))]
    [StudyKey("schedule", "daylight_saving")]
    public DaylightSaving? DaylightSaving { get; init; }

    [CommandOption("--csv")]
    [Description("Write the main table as CSV to standard output (the same column names and units as the study tables).")]
    public bool Csv { get; init; }

    /// <summary>The help text of <c>--bin-point</c>, for the commands that evaluate loads on bins.</summary>
    internal const string BinPointHelp =
        "Where the bin method evaluates each bin: mean (the mean dry-bulb of the bin's hours that count, default) or mid (the bin midpoint, the classic method for bin tables that give hours only).";

    /// <summary>The help text of <c>--headline</c>.</summary>
    internal const string HeadlineHelp =
        "The method of the headline figures: hourly (the sum over the hours, default), joint-bin (dry-bulb x humidity bins) or bin (the classic dry-bulb bin method). Every method is shown.";

    public override Spectre.Console.ValidationResult Validate()
    {
        if (Width is double w && !(w >= 0.1 && w <= 50))
        {
            return Spectre.Console.ValidationResult.Error(FormattableString.Invariant($"--width {w} must be between 0.1 and 50 degrees of the display unit"));
        }

        return base.Validate();
    }

    /// <summary>The bin scale the options give.</summary>
    internal DryBulbBinScale Scale() => Width is double w ? new DryBulbBinScale(w, Units) : DryBulbBinScale.Default(Units);

    /// <summary>The occupancy schedule the options give; a syntax error becomes a usage error naming the option.</summary>
    internal OccupancySchedule Schedule()
    {
        var holidays = new List<DateOnly>();
        foreach (var part in (Holidays ?? "").Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            if (!DateOnly.TryParseExact(part, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var d))
            {
                throw new UsageException($"--holidays: '{part}' is not a date; write YYYY-MM-DD, e.g. 2018-12-25, separated by commas");
            }

            holidays.Add(d);
        }

        try
        {
            return OccupancySchedule.Parse(Occupied ?? "always", holidays).WithDaylightSaving(DaylightSaving ?? Core.Schedules.DaylightSaving.None);
        }
        catch (ScheduleSyntaxException e)
        {
            throw new UsageException("--occupied: " + e.Message);
        }
    }
}
