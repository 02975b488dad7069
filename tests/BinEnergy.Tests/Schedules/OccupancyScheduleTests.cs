using BinEnergy.Core.Errors;
using BinEnergy.Core.Schedules;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Schedules;

public class OccupancyScheduleTests
{
    private static readonly DateTime Monday = new(2018, 1, 1); // 1 January 2018 was a Monday (calendar fact)

    [Fact]
    public void OfficeWeek_CountsTheHoursTheTextSays()
    {
        var s = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00");

        // 5 days x 12 h + 5 h on Saturday = 65 h (arithmetic on the text).
        Assert.Equal(65, s.OccupiedHoursPerWeek);
        Assert.False(s.IsOccupied(Monday.AddHours(6)));
        Assert.True(s.IsOccupied(Monday.AddHours(7)));
        Assert.True(s.IsOccupied(Monday.AddHours(18)));
        Assert.False(s.IsOccupied(Monday.AddHours(19)));
        Assert.True(s.IsOccupied(Monday.AddDays(5).AddHours(12)));   // Saturday noon
        Assert.False(s.IsOccupied(Monday.AddDays(5).AddHours(13)));
        Assert.False(s.IsOccupied(Monday.AddDays(6).AddHours(12)));  // Sunday
    }

    [Theory]
    [InlineData("always", 168)]
    [InlineData("ALWAYS", 168)]
    [InlineData("never", 0)]
    [InlineData("daily 00:00-24:00", 168)]
    [InlineData("Sat,Sun", 48)]
    [InlineData("mon,wed,fri 08:00-12:00, 13:00-17:00", 24)]
    [InlineData("Monday-Friday 9:00-17:00", 40)]
    [InlineData("Fri-Mon 10:00-11:00", 4)]
    [InlineData("Mon-Fri 07:00-19:00; Mon-Fri 12:00-20:00", 65)]
    [InlineData("Mon-Fri 07:00-19:00;", 60)]
    public void Variants_GiveTheirWeeklyHours(string text, int hoursPerWeek)
    {
        Assert.Equal(hoursPerWeek, OccupancySchedule.Parse(text).OccupiedHoursPerWeek);
    }

    [Fact]
    public void OvernightRange_SpillsIntoTheNextWeekday()
    {
        var s = OccupancySchedule.Parse("Sun 22:00-06:00");
        Assert.Equal(8, s.OccupiedHoursPerWeek);
        Assert.True(s.IsOccupied(Monday.AddHours(5)));       // Monday 05:00, spilled from Sunday
        Assert.False(s.IsOccupied(Monday.AddHours(6)));
        Assert.True(s.IsOccupied(Monday.AddDays(6).AddHours(23)));
    }

    [Fact]
    public void Holidays_AreUnoccupiedUnlessAHolidayClauseSaysSo()
    {
        var newYear = DateOnly.FromDateTime(Monday);
        var plain = OccupancySchedule.Parse("Mon-Fri 07:00-19:00", [newYear]);
        Assert.False(plain.IsOccupied(Monday.AddHours(10)));
        Assert.True(plain.IsOccupied(Monday.AddDays(1).AddHours(10)));

        var withHours = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Hol 09:00-12:00", [newYear]);
        Assert.True(withHours.IsOccupied(Monday.AddHours(10)));
        Assert.False(withHours.IsOccupied(Monday.AddHours(13)));
    }

    [Fact]
    public void Flags_MatchIsOccupiedForEveryHour()
    {
        var weather = SyntheticWeather.Year(hours: 24 * 14);
        var s = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00");
        var flags = s.Flags(weather);
        Assert.Equal(2 * 65, flags.Count(f => f));
        for (int i = 0; i < flags.Length; i++)
        {
            Assert.Equal(s.IsOccupied(weather.Times[i]), flags[i]);
        }
    }

    [Theory]
    [InlineData("", 1, "empty")]
    [InlineData("Mnn-Fri 07:00-19:00", 1, "Mnn")]
    [InlineData("Mon-Fri 07:30-19:00", 9, "07:30")]
    [InlineData("Mon-Fri 07:00-25:00", 15, "25:00")]
    [InlineData("Mon-Fri 0700", 9, "0700")]
    [InlineData("Mon-Fri 07:00-19:00; ; Sat", 22, ";")]
    [InlineData("07:00-19:00", 1, "07:00")]
    [InlineData("Mon 08:00-08:00", 5, "08:00-08:00")]
    [InlineData("Mon 08:00-12:00,", 16, ",")]
    [InlineData("Mon-Hol 08:00-12:00", 5, "Hol")]
    [InlineData("Sat 24:00-02:00", 5, "24:00")]
    public void BadText_PointsAtTheBadPart(string text, int position, string fragment)
    {
        var e = Assert.Throws<ScheduleSyntaxException>(() => OccupancySchedule.Parse(text));
        Assert.IsAssignableFrom<InputDataException>(e);
        Assert.Equal(position, e.Position);
        Assert.Contains(fragment, e.Message);
        Assert.Contains("character " + position, e.Message);
        Assert.Contains("Mon-Fri 07:00-19:00", e.Message); // the help shows the accepted form
    }
}
