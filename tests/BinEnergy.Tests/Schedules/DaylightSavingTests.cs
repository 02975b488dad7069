using BinEnergy.Core.Schedules;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Schedules;

/// <summary>Schedules in clock time: the daylight-saving rules and what they do to the occupied hours.</summary>
public class DaylightSavingTests
{
    [Fact]
    public void Periods_MatchTheCalendar()
    {
        // 2018 (calendar facts): North America changed on Sunday 11 March and Sunday 4 November; the EU on
        // Sunday 25 March and Sunday 28 October, at 01:00 UTC = 02:00 local standard time at UTC+1.
        var (naStart, naEnd) = DaylightSavingRule.Period(2018, DaylightSaving.NorthAmerica);
        Assert.Equal(new DateTime(2018, 3, 11, 2, 0, 0), naStart);
        Assert.Equal(new DateTime(2018, 11, 4, 1, 0, 0), naEnd); // 02:00 daylight time is 01:00 standard
        var (euStart, euEnd) = DaylightSavingRule.Period(2018, DaylightSaving.Europe, 1.0);
        Assert.Equal(new DateTime(2018, 3, 25, 2, 0, 0), euStart);
        Assert.Equal(new DateTime(2018, 10, 28, 2, 0, 0), euEnd);
        Assert.Equal(new DateTime(2018, 7, 1, 8, 0, 0), DaylightSavingRule.ClockTime(new DateTime(2018, 7, 1, 7, 0, 0), DaylightSaving.NorthAmerica));
        Assert.Equal(new DateTime(2018, 1, 1, 7, 0, 0), DaylightSavingRule.ClockTime(new DateTime(2018, 1, 1, 7, 0, 0), DaylightSaving.NorthAmerica));
    }

    [Fact]
    public void ClockTimeSchedule_StartsAnHourEarlierInStandardTimeInSummer_AndNotInWinter()
    {
        var weather = SyntheticWeather.Year();
        var schedule = OccupancySchedule.Parse("Mon-Fri 07:00-19:00").WithDaylightSaving(DaylightSaving.NorthAmerica);
        var flags = schedule.Flags(weather);
        int Hour(int month, int day, int hour) => Array.FindIndex(weather.Times, t => t == new DateTime(2018, month, day, hour, 0, 0));

        // Monday 2 July 2018: the clocks say 07:00 at 06:00 standard time, 19:00 at 18:00.
        Assert.True(flags[Hour(7, 2, 6)]);
        Assert.False(flags[Hour(7, 2, 18)]);

        // Monday 8 January 2018: standard time is clock time.
        Assert.False(flags[Hour(1, 8, 6)]);
        Assert.True(flags[Hour(1, 8, 18)]);

        // Weekday hours move, they are not added or lost except on the two Sundays the clocks change (no one is there then).
        Assert.Equal(OccupancySchedule.Parse("Mon-Fri 07:00-19:00").Flags(weather).Count(f => f), flags.Count(f => f));
    }
}
