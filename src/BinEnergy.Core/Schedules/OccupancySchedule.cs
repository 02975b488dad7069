using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Schedules;

/// <summary>
/// When a building is occupied, hour by hour over a week, with optional holiday dates, read
/// from a short text of the project's own (DESIGN 7.1: ventilation air runs in occupied
/// hours by default).
/// </summary>
/// <remarks>
/// <para>Syntax: <c>always</c>, <c>never</c>, or clauses separated by <c>;</c>. A clause is a
/// list of days (<c>Mon</c>, <c>Mon-Fri</c>, <c>Mon,Wed,Fri</c>, <c>daily</c>, <c>Hol</c> for the
/// holiday dates) followed by time ranges <c>HH:MM-HH:MM</c> separated by commas, e.g.
/// <c>Mon-Fri 07:00-19:00; Sat 08:00-13:00</c>. Days without times mean the whole day.
/// Day names are the English three-letter abbreviations or the full names, in any case.</para>
/// <para>The weather is hourly, so times are whole hours (<c>07:00</c>, not <c>07:30</c>); an
/// hour is occupied when it starts inside a range (from inclusive, to exclusive); <c>24:00</c>
/// ends a day. A range whose end is before its start runs past midnight into the next
/// weekday (<c>Fri 22:00-06:00</c> occupies Friday 22-24 and Saturday 0-6). Clauses add up.</para>
/// <para>Holiday dates are unoccupied all day unless a <c>Hol</c> clause gives their hours;
/// an overnight range does not spill into a holiday.</para>
/// </remarks>
public sealed class OccupancySchedule
{
    /// <summary>One line describing the syntax, appended to every syntax error.</summary>
    public const string SyntaxHelp =
        "Write 'always', 'never', or clauses like 'Mon-Fri 07:00-19:00; Sat 08:00-13:00' (days Mon..Sun, 'daily' or 'Hol'; whole hours, 24:00 ends the day)";

    private const int HolidayRow = 7;

    private static readonly string[] DayNames = ["monday", "tuesday", "wednesday", "thursday", "friday", "saturday", "sunday"];

    /// <summary>Rows 0..6 are Monday..Sunday, row 7 the holidays; 24 hours each.</summary>
    private readonly bool[] table;

    private readonly HashSet<DateOnly> holidays;

    private OccupancySchedule(string text, bool[] table, HashSet<DateOnly> holidays)
    {
        Text = text;
        this.table = table;
        this.holidays = holidays;
    }

    /// <summary>The schedule's text as given.</summary>
    public string Text { get; }

    /// <summary>The daylight-saving rule of the building's clocks (the schedule is in clock time).</summary>
    public DaylightSaving DaylightSaving { get; private init; } = DaylightSaving.None;

    /// <summary>The same schedule read in the clock time of <paramref name="rule"/>.</summary>
    public OccupancySchedule WithDaylightSaving(DaylightSaving rule) => new(Text, table, holidays) { DaylightSaving = rule };

    /// <summary>The clock time of every hour of a record (local standard time shifted by the daylight-saving rule).</summary>
    public DateTime[] ClockTimes(HourlyWeather weather)
    {
        ArgumentNullException.ThrowIfNull(weather);
        if (DaylightSaving == DaylightSaving.None)
        {
            return weather.Times;
        }

        return [.. weather.Times.Select(t => DaylightSavingRule.ClockTime(t, DaylightSaving, weather.Site.UtcOffsetHours))];
    }

    /// <summary>True when <paramref name="other"/> occupies the same hours: the same week, holidays and daylight-saving rule (the texts may differ).</summary>
    public bool SameHoursAs(OccupancySchedule other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return ReferenceEquals(this, other)
            || (DaylightSaving == other.DaylightSaving && table.AsSpan().SequenceEqual(other.table) && holidays.SetEquals(other.holidays));
    }

    /// <summary>The holiday dates (unoccupied unless a <c>Hol</c> clause says otherwise).</summary>
    public IReadOnlyCollection<DateOnly> Holidays => holidays;

    /// <summary>Occupied hours in an ordinary (non-holiday) week.</summary>
    public int OccupiedHoursPerWeek => table.Take(7 * 24).Count(b => b);

    /// <summary>Every hour occupied.</summary>
    public static OccupancySchedule Always { get; } = Parse("always");

    /// <summary>
    /// Reads a schedule (syntax in the class remarks).
    /// </summary>
    /// <exception cref="ScheduleSyntaxException">The text is empty or a part of it is not understood; the error points at it.</exception>
    public static OccupancySchedule Parse(string text, IEnumerable<DateOnly>? holidays = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        var table = new bool[8 * 24];
        var dates = new HashSet<DateOnly>(holidays ?? []);
        string trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            throw new ScheduleSyntaxException(text, 0, text, "the schedule is empty");
        }

        if (trimmed.Equals("always", StringComparison.OrdinalIgnoreCase))
        {
            Array.Fill(table, true);
            return new OccupancySchedule(text, table, dates);
        }

        if (trimmed.Equals("never", StringComparison.OrdinalIgnoreCase))
        {
            return new OccupancySchedule(text, table, dates);
        }

        int start = 0;
        while (start <= text.Length)
        {
            int end = text.IndexOf(';', start);
            if (end < 0)
            {
                end = text.Length;
            }

            ParseClause(text, start, end, table);
            start = end + 1;
        }

        return new OccupancySchedule(text, table, dates);
    }

    /// <summary>Whether the hour starting at <paramref name="hourStart"/> (clock time) is occupied.</summary>
    public bool IsOccupied(DateTime hourStart)
    {
        int row = holidays.Count > 0 && holidays.Contains(DateOnly.FromDateTime(hourStart))
            ? HolidayRow
            : ((int)hourStart.DayOfWeek + 6) % 7;
        return table[row * 24 + hourStart.Hour];
    }

    /// <summary>The occupied flag of every hour of a record, index i for hour i.</summary>
    public bool[] Flags(HourlyWeather weather)
    {
        var flags = new bool[weather.Count];
        var times = ClockTimes(weather);
        for (int i = 0; i < flags.Length; i++)
        {
            flags[i] = IsOccupied(times[i]);
        }

        return flags;
    }

    private static void ParseClause(string text, int start, int end, bool[] table)
    {
        int p = SkipSpaces(text, start, end);
        if (p >= end)
        {
            // An empty clause is allowed only as a trailing ';'.
            if (end == text.Length && start > 0)
            {
                return;
            }

            throw new ScheduleSyntaxException(text, end < text.Length ? end : start, end < text.Length ? ";" : text[start..end],
                "an empty clause before this ';': each part between ';' needs days and, optionally, hours");
        }

        int timesStart = p;
        while (timesStart < end && !char.IsDigit(text[timesStart]))
        {
            timesStart++;
        }

        var days = ParseDays(text, p, timesStart);
        int q = SkipSpaces(text, timesStart, end);
        if (q >= end)
        {
            foreach (int d in days)
            {
                Array.Fill(table, true, d * 24, 24);
            }

            return;
        }

        int r = q;
        while (r < end)
        {
            int comma = text.IndexOf(',', r, end - r);
            int rangeEnd = comma < 0 ? end : comma;
            var (from, to) = ParseRange(text, r, rangeEnd);
            foreach (int d in days)
            {
                Mark(table, d, from, to);
            }

            r = comma < 0 ? end : comma + 1;
            if (comma >= 0 && SkipSpaces(text, r, end) >= end)
            {
                throw new ScheduleSyntaxException(text, comma, ",", "a time range is missing after the comma");
            }
        }
    }

    private static List<int> ParseDays(string text, int start, int end)
    {
        var days = new List<int>();
        int p = start;
        while (p < end)
        {
            p = SkipSpaces(text, p, end);
            if (p >= end)
            {
                break;
            }

            int itemEnd = text.IndexOf(',', p, end - p);
            if (itemEnd < 0)
            {
                itemEnd = end;
            }

            string item = text[p..itemEnd].Trim();
            if (item.Length == 0)
            {
                throw new ScheduleSyntaxException(text, p, ",", "a day name is missing before the comma");
            }

            int dash = item.IndexOf('-');
            if (dash < 0)
            {
                days.AddRange(DayOrGroup(text, p, item));
            }
            else
            {
                int dashAt = text.IndexOf('-', p);
                int first = Day(text, p, item[..dash].Trim());
                int last = Day(text, dashAt + 1, item[(dash + 1)..].Trim());
                for (int d = first; ; d = (d + 1) % 7)
                {
                    days.Add(d);
                    if (d == last)
                    {
                        break;
                    }
                }
            }

            p = itemEnd + 1;
        }

        if (days.Count == 0)
        {
            throw new ScheduleSyntaxException(text, start, Fragment(text, start, Math.Max(end, start + 1)),
                "a clause must start with days (e.g. 'Mon-Fri', 'Sat', 'daily' or 'Hol')");
        }

        return days;
    }

    private static IEnumerable<int> DayOrGroup(string text, int position, string item)
    {
        if (item.Equals("daily", StringComparison.OrdinalIgnoreCase))
        {
            return Enumerable.Range(0, 7);
        }

        if (item.Equals("hol", StringComparison.OrdinalIgnoreCase) || item.Equals("holiday", StringComparison.OrdinalIgnoreCase)
            || item.Equals("holidays", StringComparison.OrdinalIgnoreCase))
        {
            return [HolidayRow];
        }

        return [Day(text, position, item)];
    }

    private static int Day(string text, int position, string name)
    {
        string lower = name.ToLowerInvariant();
        if (lower.Length >= 3)
        {
            for (int d = 0; d < 7; d++)
            {
                if (DayNames[d].StartsWith(lower, StringComparison.Ordinal))
                {
                    return d;
                }
            }
        }

        string problem = name.Length == 0
            ? "a day name is missing"
            : lower is "hol" or "daily" or "holiday" or "holidays"
                ? "'daily' and 'Hol' cannot be part of a day range"
                : "unknown day name (use Mon, Tue, Wed, Thu, Fri, Sat, Sun, 'daily' or 'Hol')";
        int at = Math.Max(0, text.IndexOf(name, position, StringComparison.Ordinal));
        throw new ScheduleSyntaxException(text, name.Length == 0 ? position : at, name.Length == 0 ? "-" : name, problem);
    }

    private static (int From, int To) ParseRange(string text, int start, int end)
    {
        int p = SkipSpaces(text, start, end);
        string range = text[p..end].TrimEnd();
        int dash = range.IndexOf('-');
        if (dash < 0)
        {
            throw new ScheduleSyntaxException(text, p, range, "a time range needs a start and an end, like 07:00-19:00");
        }

        int from = Hour(text, p, range[..dash].Trim(), allow24: false);
        int toAt = p + dash + 1;
        int to = Hour(text, SkipSpaces(text, toAt, end), range[(dash + 1)..].Trim(), allow24: true);
        if (from == to % 24 && to != 24)
        {
            throw new ScheduleSyntaxException(text, p, range, "the range starts and ends at the same time (use 00:00-24:00 for a whole day)");
        }

        return (from, to);
    }

    private static int Hour(string text, int position, string value, bool allow24)
    {
        int colon = value.IndexOf(':');
        string hh = colon < 0 ? value : value[..colon];
        string mm = colon < 0 ? "00" : value[(colon + 1)..];
        if (hh.Length is < 1 or > 2 || mm.Length != 2 || !hh.All(char.IsAsciiDigit) || !mm.All(char.IsAsciiDigit))
        {
            throw new ScheduleSyntaxException(text, position, value.Length == 0 ? "-" : value, "a time must be written HH:MM, like 07:00");
        }

        int h = int.Parse(hh, System.Globalization.CultureInfo.InvariantCulture);
        int m = int.Parse(mm, System.Globalization.CultureInfo.InvariantCulture);
        if (m != 0)
        {
            throw new ScheduleSyntaxException(text, position, value,
                "times must be whole hours because the weather is hourly (use 07:00 or 08:00, not 07:30)");
        }

        if (h > 24 || (h == 24 && !allow24))
        {
            throw new ScheduleSyntaxException(text, position, value,
                allow24 ? "the hour must be 00 to 24" : "a range cannot start at 24:00 (use 00:00)");
        }

        return h;
    }

    private static void Mark(bool[] table, int day, int from, int to)
    {
        if (to > from)
        {
            Array.Fill(table, true, day * 24 + from, to - from);
            return;
        }

        // Past midnight: the rest of this day, then the start of the next weekday (holidays do not spill).
        Array.Fill(table, true, day * 24 + from, 24 - from);
        if (day != HolidayRow && to > 0)
        {
            Array.Fill(table, true, ((day + 1) % 7) * 24, to);
        }
    }

    private static int SkipSpaces(string text, int p, int end)
    {
        while (p < end && char.IsWhiteSpace(text[p]))
        {
            p++;
        }

        return p;
    }

    private static string Fragment(string text, int start, int end) =>
        text.Length == 0 ? "" : text[Math.Min(start, text.Length - 1)..Math.Min(Math.Max(end, start + 1), text.Length)];
}
