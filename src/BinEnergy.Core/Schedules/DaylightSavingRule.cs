namespace BinEnergy.Core.Schedules;

/// <summary>Turns local standard time into the clock time of a <see cref="DaylightSaving"/> rule.</summary>
public static class DaylightSavingRule
{
    /// <summary>
    /// The clock time of the hour starting at <paramref name="standardTime"/> (local standard time):
    /// one hour later while daylight saving is in force, the same otherwise. Europe's changes are at
    /// 01:00 UTC, placed in local standard time with <paramref name="utcOffsetHours"/> (UTC+1 when unknown).
    /// </summary>
    public static DateTime ClockTime(DateTime standardTime, DaylightSaving rule, double? utcOffsetHours = null)
    {
        if (rule == DaylightSaving.None)
        {
            return standardTime;
        }

        var (start, end) = Period(standardTime.Year, rule, utcOffsetHours ?? 1.0);
        return standardTime >= start && standardTime < end ? standardTime.AddHours(1) : standardTime;
    }

    /// <summary>The start and end of daylight saving in <paramref name="year"/>, in local standard time.</summary>
    public static (DateTime Start, DateTime End) Period(int year, DaylightSaving rule, double utcOffsetHours = 1.0) => rule switch
    {
        DaylightSaving.NorthAmerica => (NthSunday(year, 3, 2).AddHours(2), NthSunday(year, 11, 1).AddHours(1)),
        DaylightSaving.Europe => (LastSunday(year, 3).AddHours(1 + utcOffsetHours), LastSunday(year, 10).AddHours(1 + utcOffsetHours)),
        _ => (DateTime.MaxValue, DateTime.MaxValue),
    };

    private static DateTime NthSunday(int year, int month, int n)
    {
        var first = new DateTime(year, month, 1);
        return first.AddDays(((7 - (int)first.DayOfWeek) % 7) + (7 * (n - 1)));
    }

    private static DateTime LastSunday(int year, int month)
    {
        var last = new DateTime(year, month, DateTime.DaysInMonth(year, month));
        return last.AddDays(-(int)last.DayOfWeek);
    }
}
