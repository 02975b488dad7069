using BinEnergy.Core.Climate;
using BinEnergy.Tests.Support;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Climate;

/// <summary>Design conditions and degree-days of the real check files, against the definitions applied by hand to their raw columns.</summary>
public sealed class RecordDesignConditionsTests
{
    public static TheoryData<string> Tmy3 => new(TestData.Tmy3Files);

    private static double F(double c) => c * 1.8 + 32;

    [Theory]
    [MemberData(nameof(Tmy3))]
    public void CoincidentHours_AreTheHoursAtTheNearestRawLevel(string name)
    {
        // The handbook defines the mean coincident wet-bulb over the hours at the design dry-bulb (ASHRAE
        // Handbook—Fundamentals 2017, ch. 14). Written out here on the raw dry-bulb column (tenths of a C as stored):
        // the distinct stored values, the one nearest the 0.4 % value (both when midway), widened to at least 5 hours.
        var raw = RawSiteColumns.Read(name + ".gz", "tmy3");
        var w = RealWeatherFileTests.Read(name);
        var d = DesignConditions.FromRecord(w);
        var levels = raw.DryBulbC.Distinct().Order().ToArray();
        double design = d.Cooling[0].DryBulbC;
        double nearest = levels.Min(l => Math.Abs(l - design));
        var at = levels.Select((l, i) => (l, i)).Where(x => Math.Abs(Math.Abs(x.l - design) - nearest) < 1e-9).Select(x => x.i).ToArray();
        int lo = at.Min(), hi = at.Max();
        int Count() => raw.DryBulbC.Count(t => t >= levels[lo] - 1e-9 && t <= levels[hi] + 1e-9);
        while (Count() < 5)
        {
            lo = Math.Max(0, lo - 1);
            hi = Math.Min(levels.Length - 1, hi + 1);
        }

        Assert.Equal(Count(), d.Cooling[0].CoincidentHours);
        var hours = Enumerable.Range(0, w.Count).Where(i => raw.DryBulbC[i] >= levels[lo] - 1e-9 && raw.DryBulbC[i] <= levels[hi] + 1e-9).ToArray();
        Assert.Equal(hours.Average(i => w.WetBulbC[i]), d.Cooling[0].MeanCoincidentWetBulbC, 9);
    }

    [Fact]
    public void Chicago_CoolingMcwb_IsTakenAtTheDesignLevel_AndTheDehumidificationPointsAreSeparate()
    {
        var d = DesignConditions.FromRecord(RealWeatherFileTests.Read("725300TYA.CSV"));

        // 0.4 % dry-bulb 90 F; its 14 hours at 90 F (32.2 C stored) have a mean wet-bulb of 76.6 F. The handbook's
        // published O'Hare figure is about 91 F / 74 F MCWB (ASHRAE Fundamentals climatic design conditions; recalled
        // from memory): a typical year with its own hours, within a few F.
        Assert.Equal(90.0, F(d.Cooling[0].DryBulbC), 1);
        Assert.Equal(14, d.Cooling[0].CoincidentHours);
        Assert.Equal(76.6, F(d.Cooling[0].MeanCoincidentWetBulbC), 1);

        // 0.4 % and 1 % dew points differ, so do their hour sets (computed separately).
        Assert.NotEqual(d.Dehumidification[0].DewPointC, d.Dehumidification[1].DewPointC);
        Assert.NotEqual(d.Dehumidification[0].CoincidentHours, d.Dehumidification[1].CoincidentHours);

        // The enthalpy points lie above the cooling 0.4 % state's enthalpy would suggest for a dry day and below saturation at it:
        // O'Hare 0.4 % enthalpy about 40 Btu/lb with MCDB about 85 F (ASHRAE Fundamentals climatic design conditions; recalled from memory).
        double btuLb = Core.Units.SpecificEnthalpy.FromJoulesPerKilogram(d.Enthalpy[0].EnthalpyJPerKg).BtuPerPound;
        Assert.InRange(btuLb, 40 - 3, 40 + 3);
        Assert.InRange(F(d.Enthalpy[0].MeanCoincidentDryBulbC), 85 - 6, 85 + 6);
        Assert.True(d.Enthalpy[0].EnthalpyJPerKg > d.Enthalpy[1].EnthalpyJPerKg);
    }

    [Fact]
    public void FromRecord_IsComputedOncePerRecord_AndEqualsTheColumnsOwn()
    {
        // Every variant of a climate asks for its record's design conditions: the same record gives the same object, and
        // its figures are those of the definition on the record's columns (FromHours sorts them itself).
        var w = RealWeatherFileTests.Read("725300TYA.CSV");
        var once = DesignConditions.FromRecord(w);
        Assert.Same(once, DesignConditions.FromRecord(w));
        var direct = DesignConditions.FromHours(w.DryBulbC, w.WetBulbC, w.DewPointC, w.EnthalpyJPerKg, w.Site.SitePressurePa, w.HumidityOver);
        Assert.Equal(direct.Heating996DryBulbC, once.Heating996DryBulbC);
        Assert.Equal(direct.Cooling, once.Cooling);
        Assert.Equal(direct.Dehumidification, once.Dehumidification);
        Assert.Equal(direct.Enthalpy, once.Enthalpy);

        // A slice of the record is another record, with its own design conditions (the winter quarter has no 0.4 % summer day).
        var winter = w.Slice(0, 2160);
        Assert.True(DesignConditions.FromRecord(winter).Cooling[0].DryBulbC < once.Cooling[0].DryBulbC - 5);
    }

    [Theory]
    [MemberData(nameof(Tmy3))]
    public void DailyMeanDegreeDays_MatchTheDefinitionOnTheRawColumn(string name)
    {
        // Published degree-days are counted from daily mean temperatures (ASHRAE Handbook—Fundamentals 2017, ch. 14):
        // written out on the raw column in F with decimal arithmetic, 24 stored hours to a day.
        var raw = RawSiteColumns.Read(name + ".gz", "tmy3");
        decimal hdd = 0, cdd = 0, hddMaxMin = 0;
        foreach (var day in raw.DryBulbC.Chunk(24))
        {
            decimal mean = day.Select(c => (decimal)c * 1.8m + 32m).Average();
            hdd += Math.Max(0m, 65m - mean);
            cdd += Math.Max(0m, mean - 65m);
            decimal mid = ((decimal)day.Max() + (decimal)day.Min()) / 2 * 1.8m + 32m;
            hddMaxMin += Math.Max(0m, 65m - mid);
        }

        var w = RealWeatherFileTests.Read(name);
        double baseC = (65 - 32) / 1.8;
        var daily = DegreeDaySeries.Of(w, DegreeDayMethod.DailyMean);
        Assert.Equal(365, daily.Days.Length);
        Assert.Equal((double)hdd, daily.Heating(baseC) * 1.8, 6);
        Assert.Equal((double)cdd, daily.Cooling(baseC) * 1.8, 6);
        Assert.Equal((double)hddMaxMin, DegreeDaySeries.Of(w, DegreeDayMethod.MaxMin).Heating(baseC) * 1.8, 6);
    }

    [Fact]
    public void Chicago_DegreeDays_ByTheThreeMethods()
    {
        // Daily means give fewer degree-days than degree-hours / 24 (hours on the other side of the base within a
        // day cancel): 6,325 and 842 F-day against 6,497 and 1,014 for O'Hare's typical year. The published O'Hare
        // normals are about 6,500 HDD65 and 830 CDD65 (NOAA 1981-2010 normals; recalled from memory).
        var w = RealWeatherFileTests.Read("725300TYA.CSV");
        double baseC = (65 - 32) / 1.8;
        var daily = DegreeDaySeries.Of(w, DegreeDayMethod.DailyMean);
        var hourly = DegreeDaySeries.Of(w, DegreeDayMethod.Hourly);
        Assert.Equal(6325, daily.Heating(baseC) * 1.8, 0);
        Assert.Equal(842, daily.Cooling(baseC) * 1.8, 0);
        Assert.Equal(6497, hourly.Heating(baseC) * 1.8, 0);
        Assert.Equal(1014, hourly.Cooling(baseC) * 1.8, 0);
        Assert.InRange(daily.Cooling(baseC) * 1.8, 830 * 0.8, 830 * 1.2);
    }
}
