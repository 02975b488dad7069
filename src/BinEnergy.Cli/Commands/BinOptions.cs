using System.ComponentModel;
using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>Options shared by the commands that bin a weather file: bin width, occupancy schedule, holidays.</summary>
public class BinOptions : WeatherFileSettings
{
    [CommandOption("--width <W>")]
    [Description("Dry-bulb bin width (F in ip, K in si). Bins sit on multiples of the width, lower edge inclusive. Default 5 F or 2 C.")]
    public double? Width { get; init; }

    [CommandOption("--occupied <SCHEDULE>")]
    [Description("Occupied hours, e.g. \"Mon-Fri 07:00-19:00; Sat 08:00-13:00\", \"always\" or \"never\" (whole hours; 'Hol' for holidays). Default always.")]
    public string? Occupied { get; init; }

    [CommandOption("--holidays <DATES>")]
    [Description("Holiday dates, unoccupied unless the schedule has a 'Hol' clause: comma-separated YYYY-MM-DD (the record's calendar year).")]
    public string? Holidays { get; init; }

    /// <summary>The help text of <c>--bin-point</c>, for the commands that evaluate loads on bins.</summary>
    internal const string BinPointHelp =
        "Where the bin method evaluates each bin: mean (the mean dry-bulb of the bin's hours that count, default) or mid (the bin midpoint, the classic method for bin tables that give hours only).";

    /// <summary>Reads <c>--bin-point</c>: <c>mean</c> or <c>mid</c> (<c>midpoint</c>).</summary>
    internal static BinEvaluationPoint ParseBinPoint(string text) => text.ToLowerInvariant() switch
    {
        "mid" or "midpoint" => BinEvaluationPoint.Midpoint,
        "mean" => BinEvaluationPoint.MeanDryBulb,
        _ => throw new UsageException($"--bin-point must be mean or mid, not '{text}'"),
    };

    /// <summary>The bin scale the options give.</summary>
    internal DryBulbBinScale Scale(UnitSystem units)
    {
        if (Width is not double w)
        {
            return DryBulbBinScale.Default(units);
        }

        if (!(w >= 0.1 && w <= 50))
        {
            throw new UsageException(FormattableString.Invariant($"--width {w} must be between 0.1 and 50 ({(units == UnitSystem.IP ? "F" : "K")})"));
        }

        return new DryBulbBinScale(w, units);
    }

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
            return OccupancySchedule.Parse(Occupied ?? "always", holidays);
        }
        catch (ScheduleSyntaxException e)
        {
            throw new UsageException("--occupied: " + e.Message);
        }
    }
}
