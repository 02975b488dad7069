using System.Runtime.InteropServices;

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
        if (s.Length is not (16 or 19) || s[4] != '-' || s[7] != '-')
        {
            return false;
        }

        if (!Digits(s, 0, 4, out int year) || !Digits(s, 5, 2, out int month) || !Digits(s, 8, 2, out int day) || !TimeOfDay(s, out int hour, out long clock))
        {
            return false;
        }

        if (year < 1 || month is < 1 or > 12 || day < 1 || day > DateTime.DaysInMonth(year, month))
        {
            return false;
        }

        writtenYear = year;
        if (hour == 24)
        {
            value = new DateTime(year, month, day).AddDays(1);
            return true;
        }

        value = new DateTime(DaysBefore(year, month) * TimeSpan.TicksPerDay + (day - 1) * TimeSpan.TicksPerDay + clock);
        return true;
    }

    /// <summary>
    /// The time of day of a time of the right length (<c>THH:mm</c> or <c>THH:mm:ss</c> from position 10): the hour,
    /// and the ticks since midnight; false when it is malformed or out of range. Hour 24 is accepted only as 24:00(:00),
    /// with ticks of zero (the caller moves it to the next day).
    /// </summary>
    private static bool TimeOfDay(ReadOnlySpan<byte> s, out int hour, out long ticks)
    {
        ticks = 0;
        int minute = 0, second = 0;
        hour = 0;
        if ((s[10] != 'T' && s[10] != ' ') || s[13] != ':' || !Digits(s, 11, 2, out hour) || !Digits(s, 14, 2, out minute)
            || (s.Length == 19 && (s[16] != ':' || !Digits(s, 17, 2, out second))))
        {
            return false;
        }

        if (hour == 24)
        {
            return minute == 0 && second == 0;
        }

        if (hour > 23 || minute > 59 || second > 59)
        {
            return false;
        }

        ticks = hour * TimeSpan.TicksPerHour + minute * TimeSpan.TicksPerMinute + second * TimeSpan.TicksPerSecond;
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

    /// <summary>
    /// Reads the times of a file in turn, remembering the last day read and the time expected next: an hour's file has
    /// 24 rows a day, each an hour after the one before. A text equal to the expected next one (same date, the hour one
    /// more, the same minutes) is that time without being read; a text with the date bytes of the last day needs only
    /// its time of day read. The results are those of <see cref="IsoTime.TryParse"/> for every text, in any order.
    /// </summary>
    internal struct Reader
    {
        private ulong dayHead; // the date's first eight bytes, "yyyy-MM-"
        private ushort dayTail; // its last two, "dd"
        private long dayTicks; // midnight starting that day; 0 (0001-01-01) before a day is remembered
        private int dayYear;
        private ulong nextTail; // bytes 8 to 15 of the text expected next, "ddTHH:mm", when hasNext
        private long nextTicks;
        private bool hasNext;

        /// <summary>As <see cref="IsoTime.TryParse"/>.</summary>
        public bool TryParse(ReadOnlySpan<byte> s, out DateTime value, out int writtenYear)
        {
            if (hasNext && s.Length == 16 && MemoryMarshal.Read<ulong>(s[8..]) == nextTail && MemoryMarshal.Read<ulong>(s) == dayHead)
            {
                // The expected text, byte for byte: the same day (the date's last two bytes are in the tail), one hour on.
                value = new DateTime(nextTicks);
                writtenYear = dayYear;
                Expect(s, value);
                return true;
            }

            if (dayYear > 0 && s.Length is 16 or 19 && MemoryMarshal.Read<ulong>(s) == dayHead && MemoryMarshal.Read<ushort>(s[8..]) == dayTail
                && TimeOfDay(s, out int hour, out long clock) && hour < 24)
            {
                value = new DateTime(dayTicks + clock);
                writtenYear = dayYear;
                Expect(s, value);
                return true;
            }

            hasNext = false;
            if (!IsoTime.TryParse(s, out value, out writtenYear))
            {
                return false;
            }

            if (!s.Slice(11, 2).SequenceEqual("24"u8))
            {
                // Not the "24:00" that ends a day (that midnight is on the next day): remember this day.
                dayHead = MemoryMarshal.Read<ulong>(s);
                dayTail = MemoryMarshal.Read<ushort>(s[8..]);
                dayTicks = value.Date.Ticks;
                dayYear = writtenYear;
                Expect(s, value);
            }

            return true;
        }

        /// <summary>After <paramref name="s"/> read as <paramref name="value"/> on the remembered day: the text an hour later on the same day, if any.</summary>
        private void Expect(ReadOnlySpan<byte> s, DateTime value)
        {
            int hour = ((s[11] - '0') * 10) + (s[12] - '0');
            hasNext = s.Length == 16 && hour < 23;
            if (hasNext)
            {
                // Little-endian: byte 8 of the text is the lowest byte of the tail, so bytes 11 and 12 (the hour) are bits 24 to 39.
                int next = hour + 1;
                ulong digits = ((ulong)('0' + (next / 10)) << 24) | ((ulong)('0' + (next % 10)) << 32);
                nextTail = (MemoryMarshal.Read<ulong>(s[8..]) & ~(0xFFFFUL << 24)) | digits;
                nextTicks = value.Ticks + TimeSpan.TicksPerHour;
            }
        }
    }
}
