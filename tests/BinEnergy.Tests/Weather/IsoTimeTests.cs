using System.Globalization;
using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>The open layout's time parser against the runtime's own ISO 8601 parse, over years with and without leap days.</summary>
public sealed class IsoTimeTests
{
    [Theory]
    [InlineData(1900)] // not a leap year: a century not divisible by 400 (Gregorian rule, common knowledge)
    [InlineData(2000)] // a leap year: divisible by 400
    [InlineData(2023)]
    [InlineData(2024)]
    [InlineData(1)]
    [InlineData(9999)]
    public void EveryHourOfAYear_ReadsAsTheRuntimeReadsIt(int year)
    {
        var end = year == 9999 ? new DateTime(9999, 12, 31, 23, 0, 0) : new DateTime(year + 1, 1, 1);
        for (var t = new DateTime(year, 1, 1); t < end; t = t.AddHours(1))
        {
            string text = t.ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture);
            Assert.True(IsoTime.TryParse(Encoding.ASCII.GetBytes(text), out var parsed, out int written), text);
            Assert.Equal(DateTime.ParseExact(text, "yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture), parsed);
            Assert.Equal(year, written);
        }
    }

    [Theory]
    [InlineData("2024-02-29 13:45:30", 2024, 2, 29, 13, 45, 30)]
    [InlineData("2023-12-31T24:00", 2024, 1, 1, 0, 0, 0)]
    [InlineData("2026-06-30T23:00", 2026, 6, 30, 23, 0, 0)]
    public void Times_WithSecondsSpaceOr24_Read(string text, int y, int mo, int d, int h, int mi, int s)
    {
        Assert.True(IsoTime.TryParse(Encoding.ASCII.GetBytes(text), out var parsed, out int written));
        Assert.Equal(new DateTime(y, mo, d, h, mi, s), parsed);
        Assert.Equal(int.Parse(text[..4], CultureInfo.InvariantCulture), written); // "24:00" keeps the year of the day it ends
    }

    [Theory]
    [InlineData("2023-02-29T00:00")] // 2023 has no 29 February
    [InlineData("1900-02-29T00:00")]
    [InlineData("2023-13-01T00:00")]
    [InlineData("2023-01-01T25:00")]
    [InlineData("2023-01-01T24:30")]
    [InlineData("2023-01-01T10:60")]
    [InlineData("2023-1-01T10:00")]
    [InlineData("2023-01-01")]
    public void ImpossibleOrMalformedTimes_AreRefused(string text) =>
        Assert.False(IsoTime.TryParse(Encoding.ASCII.GetBytes(text), out _, out _));

    [Fact]
    public void TheLastMidnightTheCalendarHas_IsRefused_NotACrash()
    {
        // 9999-12-31 24:00 is 10000-01-01 00:00, past DateTime's range (the runtime's documented maximum is 9999-12-31).
        Assert.False(IsoTime.TryParse("9999-12-31T24:00"u8, out _, out _));
        Assert.True(IsoTime.TryParse("9999-12-30T24:00"u8, out var last, out _));
        Assert.Equal(new DateTime(9999, 12, 31), last);
    }
}
