using System.Globalization;
using System.Text;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>The calendar (DESIGN 5.3) and quality policy (5.4) on invented open-layout files.</summary>
public sealed class CalendarAndQualityTests
{
    private static HourlyWeather Read(string text, WeatherReadOptions? options = null) =>
        WeatherReader.Read(Encoding.UTF8.GetBytes(text), "invented.csv", options);

    [Fact]
    public void ShortGapInOneColumn_FilledLinearlyAndCounted()
    {
        var w = Read(OpenLayoutText.File(48, (i, r) => i is >= 10 and <= 12 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",,") : r));
        Assert.Equal(48, w.Count);
        Assert.Equal(3, w.Quality.Counts[QualityKeys.GapFilledPrefix + "drybulb"]);
        double a = OpenLayoutText.DryBulb(9), b = OpenLayoutText.DryBulb(13);
        for (int k = 1; k <= 3; k++)
        {
            Assert.Equal(a + (b - a) * k / 4, w.DryBulbC[9 + k], 9);
        }

        Assert.Equal(3, w.Quality.TotalRepairs);
    }

    [Fact]
    public void MissingRows_FillEveryColumnAndAreCounted()
    {
        var w = Read(OpenLayoutText.File(48, (i, r) => i is 20 or 21 ? null : r));
        Assert.Equal(48, w.Count);
        Assert.Equal(new DateTime(2026, 1, 1, 20, 0, 0), w.Times[20]);
        Assert.Equal(2, w.Quality.Counts[QualityKeys.GapFilledPrefix + "drybulb"]);
        Assert.Equal(2, w.Quality.Counts[QualityKeys.GapFilledPrefix + "dewpoint"]);
        Assert.Equal(2, w.Quality.Counts[QualityKeys.GapFilledPrefix + "pressure"]);
    }

    [Fact]
    public void GapLimit_IsConfigurable()
    {
        string text = OpenLayoutText.File(48, (i, r) => i is >= 10 and <= 12 ? null : r);
        var e = Assert.Throws<WeatherDataException>(() => Read(text, new WeatherReadOptions { MaxGapHours = 2 }));
        Assert.Equal(WeatherErrorKind.LongGap, e.Kind);
    }

    [Fact]
    public void LongGap_DroppedWhenAllowed_CountedAndStated()
    {
        var w = Read(OpenLayoutText.File(48, (i, r) => i is >= 20 and < 30 ? null : r), new WeatherReadOptions { AllowDroppingLongGaps = true });
        Assert.Equal(38, w.Count);
        Assert.Equal(10, w.Quality.Counts[QualityKeys.LongGapHoursDropped]);
        Assert.Contains(w.Quality.Warnings, x => x.Contains("38 hours present", StringComparison.Ordinal));
        Assert.Equal(new DateTime(2026, 1, 1, 19, 0, 0), w.Times[19]);
        Assert.Equal(new DateTime(2026, 1, 2, 6, 0, 0), w.Times[20]);
    }

    [Fact]
    public void RhUpTo103_ClampedTo100AndCounted()
    {
        var w = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + (i == 5 ? ",9.5,102.5" : ",9.5,80"), header: "time,drybulb_c,rh_pct"));
        Assert.Equal(1, w.Quality.Counts[QualityKeys.RhClamped]);
        Assert.Equal(9.5, w.DewPointC[5], 4); // saturated: dew point = dry-bulb
        Assert.Contains("line 12", w.Quality.Examples[QualityKeys.RhClamped][0], StringComparison.Ordinal);
    }

    [Fact]
    public void DewPointAboveDryBulb_ClampedWithinOneKelvin_SuspectBeyond()
    {
        var w = Read(OpenLayoutText.File(24, (i, r) => i switch
        {
            3 => "2026-01-01T03:00,10.0,10.6,100.1",
            4 => "2026-01-01T04:00,10.0,12.5,100.1",
            _ => r,
        }));
        Assert.Equal(1, w.Quality.Counts[QualityKeys.DewPointAboveDryBulbClamped]);
        Assert.Equal(1, w.Quality.Counts[QualityKeys.DewPointAboveDryBulbSuspect]);
        Assert.Equal(10.0, w.DewPointC[4]);
        Assert.Equal(10.0, w.WetBulbC[4], 6);
    }

    [Fact]
    public void HumidityMeasures_FollowThePriorityOrder_AndAgree()
    {
        // Outside check: each file's W must equal the handbook relation for its own measure (via MoistAir).
        double p = Atmosphere.PressureAtElevationPa(100);
        var dp = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,12", header: "time,drybulb_c,dewpoint_c"));
        Assert.Equal(MoistAir.HumidityRatioFromDewPoint(12, p), dp.HumidityRatio[0], 12);
        var rh = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,60", header: "time,drybulb_c,rh_pct"));
        Assert.Equal(MoistAir.HumidityRatioFromRelativeHumidity(20, 0.6, p), rh.HumidityRatio[0], 12);
        var wb = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,15", header: "time,drybulb_c,wetbulb_c"));
        Assert.Equal(MoistAir.HumidityRatioFromWetBulb(20, 15, p), wb.HumidityRatio[0], 12);
        Assert.Equal(15, wb.WetBulbC[0], 5);
        var hr = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,0.008", header: "time,drybulb_c,humidity_ratio"));
        Assert.Equal(0.008, hr.HumidityRatio[0], 12);

        // Dew point wins over RH; an RH that disagrees is counted, not used.
        var both = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,12,90", header: "time,drybulb_c,dewpoint_c,rh_pct"));
        Assert.Equal(MoistAir.HumidityRatioFromDewPoint(12, p), both.HumidityRatio[0], 12);
        Assert.Equal(24, both.Quality.Counts[QualityKeys.DisagreesPrefix + "rh"]);
    }

    [Theory]
    [InlineData("wetbulb_c", "{0}", 1.5, 0.9)] // within 1 K of the wet-bulb from the dew point: agrees
    [InlineData("humidity_ratio", "{1}", 1.06, 1.04)] // within 5 % of W: agrees
    public void SecondMeasures_DisagreeingBeyondTheirTolerance_AreCountedHourByHour(string column, string format, double off, double near)
    {
        // Dew point 12 C at 20 C: the second column is written from the hour's own state, then put off on hours 3, 17
        // and 30 by more than its tolerance and on hour 40 by less. Exactly the three are counted, with their lines.
        double p = Atmosphere.PressureAtElevationPa(100);
        double w = MoistAir.HumidityRatioFromDewPoint(12, p);
        double wetBulb = MoistAir.WetBulb(20, w, p);
        string Value(double scale) => string.Format(CultureInfo.InvariantCulture, format, column == "wetbulb_c" ? wetBulb + scale : 0, w * scale);
        var record = Read(OpenLayoutText.File(48, (i, r) => r.Split(',')[0] + ",20,12," + (i is 3 or 17 or 30 ? Value(off) : i == 40 ? Value(near) : Value(column == "wetbulb_c" ? 0 : 1)),
            header: "time,drybulb_c,dewpoint_c," + column));
        string key = QualityKeys.DisagreesPrefix + (column == "wetbulb_c" ? "wetbulb" : "humidity_ratio");
        Assert.Equal(3, record.Quality.Counts[key]);
        Assert.StartsWith("line 24 (", record.Quality.Examples[key][1], StringComparison.Ordinal);
        Assert.Equal(0, record.Quality.TotalRepairs);
    }

    [Theory]
    [InlineData("100.1", "100.1", true)] // one value throughout: looks filled
    [InlineData("100.1", "100.1000000005", true)] // 5e-7 Pa apart: under the rule's 1e-6 Pa
    [InlineData("100.1", "100.1000000015", false)] // 1.5e-6 Pa apart: over it (the exact measure decides)
    [InlineData("100.1", "100.2", false)] // 100 Pa apart
    public void APressureColumnThatNeverChanges_IsNoticed(string even, string odd, bool noticed)
    {
        var record = Read(OpenLayoutText.File(48, (i, r) => r.Replace(",100.1", "," + (i % 2 == 0 ? even : odd), StringComparison.Ordinal)));
        Assert.Equal(noticed, record.Quality.Warnings.Any(x => x.Contains("looks filled", StringComparison.Ordinal)));
    }

    [Fact]
    public void SpacesAroundFieldsAndNames_AreIgnored()
    {
        var w = Read(OpenLayoutText.File(24, (i, r) => " " + r.Replace(",", " , "), header: "time , drybulb_c , dewpoint_c , pressure_kpa"));
        Assert.Equal(24, w.Count);
        Assert.Equal(OpenLayoutText.DryBulb(5), w.DryBulbC[5]);
        Assert.Equal(100_100, w.PressurePa[5], 6);
        var blank = Read(OpenLayoutText.File(24, (i, r) => i == 3 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",   ,") : r));
        Assert.Equal(1, blank.Quality.Counts[QualityKeys.GapFilledPrefix + "drybulb"]); // a field of spaces is missing, not text
    }

    [Fact]
    public void FahrenheitColumns_AreConvertedToSi()
    {
        var w = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",50,41", header: "time,drybulb_f,dewpoint_f"));
        Assert.Equal(10.0, w.DryBulbC[0], 9); // 50 F = 10 C (definition of the scales)
        Assert.Equal(5.0, w.DewPointC[0], 9); // 41 F = 5 C
    }

    [Fact]
    public void SitePressure_FollowsElevationThenRecordMeanThenSeaLevel()
    {
        string noMeta = "# name: Dry Hollow\n";
        var withColumn = Read(OpenLayoutText.File(24, metadata: noMeta));
        Assert.Equal(SitePressureSource.RecordMean, withColumn.Site.PressureSource);
        Assert.Equal(100_100, withColumn.Site.SitePressurePa, 6);

        var none = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,12", header: "time,drybulb_c,dewpoint_c", metadata: noMeta));
        Assert.Equal(SitePressureSource.SeaLevelAssumed, none.Site.PressureSource);
        Assert.Equal(101_325, none.PressurePa[3]); // standard sea-level pressure (ASHRAE Fundamentals ch. 1, eq. 3 at Z = 0)
        Assert.False(none.HourlyPressureFromRecord);
        Assert.Contains(none.Quality.Warnings, x => x.Contains("sea-level", StringComparison.Ordinal));

        var overridden = Read(OpenLayoutText.File(24, (i, r) => r.Split(',')[0] + ",20,12", header: "time,drybulb_c,dewpoint_c", metadata: noMeta),
            new WeatherReadOptions { ElevationM = 1500 });
        Assert.Equal(SitePressureSource.StandardAtmosphereAtElevation, overridden.Site.PressureSource);
        Assert.Equal(84_556, overridden.PressurePa[0], 0); // about 84.56 kPa at 1,500 m (ASHRAE Fundamentals ch. 1, table 1; recalled from memory)
    }

    [Fact]
    public void CalendarRecord_KeepsItsOwnDatesAndWeekdays()
    {
        var w = Read(OpenLayoutText.File(48));
        Assert.False(w.Calendar.IsTypicalYear);
        Assert.Equal(2026, w.Calendar.Year);
        Assert.Equal(DayOfWeek.Thursday, w.Times[0].DayOfWeek); // 1 January 2026 is a Thursday (any calendar)
    }

    /// <summary>An invented typical year: January from 1994, February from 1996 (with its 29 February), March from 2003.</summary>
    private static string MixedYears(bool leapDay)
    {
        var sb = new StringBuilder(OpenLayoutText.Metadata).Append(OpenLayoutText.Header).Append('\n');
        void Month(int year, int month)
        {
            int days = month == 2 && !leapDay ? 28 : DateTime.DaysInMonth(year, month);
            for (int h = 0; h < days * 24; h++)
            {
                var t = new DateTime(year, month, 1).AddHours(h);
                sb.Append(string.Create(CultureInfo.InvariantCulture, $"{t:yyyy-MM-ddTHH:mm},5,1,100.1\n"));
            }
        }

        Month(1994, 1);
        Month(1996, 2);
        Month(2003, 3);
        return sb.ToString();
    }

    [Fact]
    public void TypicalYear_KeyedOnMonthDayHour_WeekdaysFrom2018ByDefault()
    {
        var w = Read(MixedYears(leapDay: false));
        Assert.True(w.Calendar.IsTypicalYear);
        Assert.Equal(2018, w.Calendar.Year);
        Assert.Equal((31 + 28 + 31) * 24, w.Count);
        Assert.Equal(new DateTime(2018, 3, 1), w.Times[(31 + 28) * 24]);
        Assert.Equal(DayOfWeek.Monday, w.Times[0].DayOfWeek); // 1 January 2018 was a Monday
        Assert.Contains("starting on a Monday", w.Calendar.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void TypicalYear_CalendarYearIsConfigurable()
    {
        var w = Read(MixedYears(leapDay: false), new WeatherReadOptions { CalendarYear = 2021 });
        Assert.Equal(DayOfWeek.Friday, w.Times[0].DayOfWeek); // 1 January 2021 was a Friday
    }

    [Fact]
    public void TypicalYearWithLeapDay_KeepsItOnALeapYearStartingTheSameWeekday()
    {
        var w = Read(MixedYears(leapDay: true));
        Assert.Equal((31 + 29 + 31) * 24, w.Count);
        Assert.Equal(2024, w.Calendar.Year); // 2024: a leap year that starts on a Monday, like 2018
        Assert.Equal(new DateTime(2024, 2, 29), w.Times[(31 + 28) * 24]);
        Assert.Contains("29 February", w.Calendar.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void OpenLayoutRoundTrip_WriterThenReader_GivesTheSameRecord()
    {
        var original = Read(OpenLayoutText.File(72));
        var text = new StringWriter(CultureInfo.InvariantCulture);
        OpenLayoutWriter.Write(original, text);
        var again = Read(text.ToString());
        Assert.Equal(original.Count, again.Count);
        for (int i = 0; i < original.Count; i++)
        {
            Assert.Equal(original.DryBulbC[i], again.DryBulbC[i], 6);
            Assert.Equal(original.DewPointC[i], again.DewPointC[i], 3);
            Assert.Equal(original.Times[i], again.Times[i]);
        }

        Assert.Equal(0, again.Quality.TotalRepairs);
    }
}
