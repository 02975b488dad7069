namespace BinEnergy.Core.Weather;

/// <summary>
/// Reads the open layout's times, ISO 8601 local time without offset: <c>yyyy-MM-ddTHH:mm</c>,
/// optionally <c>:ss</c>, a space allowed instead of <c>T</c>, hour 24 allowed for the midnight
/// that ends a day. Parses the UTF-8 bytes directly (the reader's hot path).
/// </summary>
internal static class IsoTime
{
    /// <summary>Parses a time; <paramref name="writtenYear"/> is the year as written (for "24:00", that of the day it ends).</summary>
    public static bool TryParse(ReadOnlySpan<byte> s, out DateTime value, out int writtenYear)
    {
        value = default;
        writtenYear = 0;
        if (s.Length is not (16 or 19) || s[4] != '-' || s[7] != '-' || (s[10] != 'T' && s[10] != ' ') || s[13] != ':' || (s.Length == 19 && s[16] != ':'))
        {
            return false;
        }

        if (!Digits(s, 0, 4, out int year) || !Digits(s, 5, 2, out int month) || !Digits(s, 8, 2, out int day) ||
            !Digits(s, 11, 2, out int hour) || !Digits(s, 14, 2, out int minute))
        {
            return false;
        }

        int second = 0;
        if (s.Length == 19 && !Digits(s, 17, 2, out second))
        {
            return false;
        }

        if (year < 1 || month is < 1 or > 12 || day < 1 || day > DateTime.DaysInMonth(year, month) || minute > 59 || second > 59)
        {
            return false;
        }

        writtenYear = year;
        if (hour == 24 && minute == 0 && second == 0)
        {
            value = new DateTime(year, month, day).AddDays(1);
            return true;
        }

        if (hour > 23)
        {
            return false;
        }

        value = new DateTime(DaysBefore(year, month) * TimeSpan.TicksPerDay + (day - 1) * TimeSpan.TicksPerDay
            + hour * TimeSpan.TicksPerHour + minute * TimeSpan.TicksPerMinute + second * TimeSpan.TicksPerSecond);
        return true;
    }

    /// <summary>Days from 0001-01-01 to the first of the month, in the proleptic Gregorian calendar (leap years: every fourth, except centuries not divisible by 400).</summary>
    private static long DaysBefore(int year, int month)
    {
        int y = year - 1;
        return (y * 365L) + (y / 4) - (y / 100) + (y / 400) + (DateTime.IsLeapYear(year) ? LeapMonthStarts : MonthStarts)[month - 1];
    }

    private static readonly int[] MonthStarts = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];
    private static readonly int[] LeapMonthStarts = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335];

    private static bool Digits(ReadOnlySpan<byte> s, int start, int count, out int value)
    {
        value = 0;
        for (int i = start; i < start + count; i++)
        {
            int d = s[i] - '0';
            if ((uint)d > 9)
            {
                return false;
            }

            value = value * 10 + d;
        }

        return true;
    }
}
