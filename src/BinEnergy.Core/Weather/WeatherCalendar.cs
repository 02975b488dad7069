using System.Globalization;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The reader's calendar step (DESIGN 5.3): each row's time shifted to hour-beginning local standard time, then
/// placed on the record's calendar: a calendar record keeps its dates; a typical year is keyed on month, day and hour
/// in the calendar year whose weekdays it uses, with hours that crossed the year boundary in the shift moved to the
/// other end of the year.
/// </summary>
/// <param name="Keys">Each row's hour on the calendar, in file order.</param>
/// <param name="Order">The rows in the order of their hours; null when that is file order.</param>
/// <param name="Calendar">The calendar the hours are placed in.</param>
internal sealed record WeatherCalendar(DateTime[] Keys, int[]? Order, CalendarInfo Calendar)
{
    /// <summary>Places the rows of <paramref name="raw"/>, shifted by <paramref name="shiftHours"/>, on their calendar.</summary>
    public static WeatherCalendar Place(RawWeatherTable raw, double shiftHours, WeatherReadOptions options)
    {
        var shifted = raw.Times.Select(t => t.AddHours(shiftHours)).ToArray();
        bool typical = raw.TypicalYear ?? IsTypicalYear(shifted, raw.WrittenYears);
        if (raw.Map.Time.HourEnding)
        {
            raw.Quality.Warn("hour-ending times shifted back one hour to hour-beginning");
        }

        return typical ? TypicalYear(raw, shifted, options.CalendarYear) : new WeatherCalendar(shifted, null, new CalendarInfo(shifted[0].Year, false,
            shifted[0].Year == shifted[^1].Year
                ? Inv($"calendar year {shifted[0].Year} as recorded, with its own dates and weekdays")
                : Inv($"{shifted[0]:yyyy-MM-dd} to {shifted[^1]:yyyy-MM-dd} as recorded, with their own dates and weekdays")));
    }

    /// <summary>Each hour moved to the same month, day and time of day in the calendar year (a leap year when the record has a 29 February).</summary>
    private static WeatherCalendar TypicalYear(RawWeatherTable raw, DateTime[] shifted, int wantedYear)
    {
        int year = shifted.Any(t => t.Month == 2 && t.Day == 29) && !DateTime.IsLeapYear(wantedYear) ? LeapYearStartingLike(wantedYear) : wantedYear;
        var keys = new DateTime[shifted.Length];
        var place = new int[shifted.Length]; // -1: moved to the front of the year, 1: to the back, 0: stays
        for (int i = 0; i < shifted.Length; i++)
        {
            var t = shifted[i];
            keys[i] = new DateTime(year, t.Month, t.Day) + t.TimeOfDay;
            place[i] = t.Year == raw.WrittenYears[i] ? 0 : t.Year > raw.WrittenYears[i] ? -1 : 1;
        }

        int moved = place.Count(p => p != 0);
        if (moved > 0)
        {
            raw.Quality.Warn($"{moved} hour(s) crossed the year boundary when shifted to hour-beginning local standard time and were moved to the other end of the typical year");
        }

        var start = new DateTime(year, 1, 1).DayOfWeek;
        string note = Inv($"typical year (months from different years), keyed on month, day and hour; weekdays from {year}, a {(DateTime.IsLeapYear(year) ? "leap" : "non-leap")} year starting on a {start}")
            + (year != wantedYear ? Inv($" (the record has a 29 February, so {year} is used instead of {wantedYear})") : "");
        return new WeatherCalendar(keys, moved > 0 ? Enumerable.Range(0, keys.Length).OrderBy(i => place[i]).ToArray() : null, new CalendarInfo(year, true, note));
    }

    /// <summary>
    /// A typical year mixes source years month by month: the year changes somewhere other than at a 31 December to
    /// 1 January step. A one-year or multi-year calendar record changes year only there.
    /// </summary>
    private static bool IsTypicalYear(DateTime[] shifted, IReadOnlyList<int> writtenYears)
    {
        for (int i = 1; i < shifted.Length; i++)
        {
            if (writtenYears[i] != writtenYears[i - 1] && !(shifted[i - 1].Month == 12 && shifted[i].Month == 1) && !(shifted[i].Month == 1 && shifted[i].Day == 1))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The leap year nearest <paramref name="year"/> whose 1 January falls on the same weekday.</summary>
    private static int LeapYearStartingLike(int year)
    {
        var weekday = new DateTime(year, 1, 1).DayOfWeek;
        for (int d = 1; d < 40; d++)
        {
            foreach (int y in new[] { year + d, year - d })
            {
                if (y is > 1 and < 9999 && DateTime.IsLeapYear(y) && new DateTime(y, 1, 1).DayOfWeek == weekday)
                {
                    return y;
                }
            }
        }

        return 2024;
    }

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
