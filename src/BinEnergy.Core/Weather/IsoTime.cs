namespace BinEnergy.Core.Weather;

/// <summary>
/// Reads the open layout's times, ISO 8601 local time without offset: <c>yyyy-MM-ddTHH:mm</c>, optionally <c>:ss</c>,
/// a space allowed instead of <c>T</c>, hour 24 allowed for the midnight that ends a day. Reads the field's UTF-8
/// bytes (the runtime's exact-format parse costs about as much as the rest of a row).
/// </summary>
internal static class IsoTime
{
    /// <summary>Parses a time; <paramref name="writtenYear"/> is the year as written (for "24:00", that of the day it ends).</summary>
    public static bool TryParse(ReadOnlySpan<byte> s, out DateTime value, out int writtenYear)
    {
        value = default;
        writtenYear = 0;
        int second = 0;
        if (s.Length is not (16 or 19) || s[4] != '-' || s[7] != '-' || (s[10] != 'T' && s[10] != ' ') || s[13] != ':'
            || !Digits(s, 0, 4, out int year) || !Digits(s, 5, 2, out int month) || !Digits(s, 8, 2, out int day)
            || !Digits(s, 11, 2, out int hour) || !Digits(s, 14, 2, out int minute)
            || (s.Length == 19 && (s[16] != ':' || !Digits(s, 17, 2, out second))))
        {
            return false;
        }

        if (year < 1 || month is < 1 or > 12 || day < 1 || day > DateTime.DaysInMonth(year, month) || minute > 59 || second > 59
            || hour > 24 || (hour == 24 && (minute != 0 || second != 0 || (year == 9999 && month == 12 && day == 31))))
        {
            return false; // hour 24 only as 24:00 that ends a day, and not the last day the calendar has
        }

        writtenYear = year;
        value = hour == 24 ? new DateTime(year, month, day).AddDays(1) : new DateTime(year, month, day, hour, minute, second);
        return true;
    }

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
