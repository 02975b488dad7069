using System.Globalization;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// The six real files of tests/data/weather-open (NREL TMY3 and EU JRC PVGIS, see SOURCES.md
/// there), read in their own layout through the shipped maps, checked against what the files
/// themselves say and against independent computations from their raw columns.
/// </summary>
public sealed class RealWeatherFileTests
{
    private static readonly Dictionary<string, HourlyWeather> Cache = [];

    internal static HourlyWeather Read(string name)
    {
        lock (Cache)
        {
            if (!Cache.TryGetValue(name, out var w))
            {
                w = WeatherReader.Read(TestData.Open(name), new WeatherReadOptions { Map = ColumnMap.Load(name == TestData.PvgisFile ? "pvgis" : "tmy3") });
                Cache[name] = w;
            }

            return w;
        }
    }

    public static TheoryData<string> Tmy3 => new(TestData.Tmy3Files);

    public static TheoryData<string> All => new([.. TestData.Tmy3Files, TestData.PvgisFile]);

    /// <summary>The raw columns of a TMY3 file, parsed here by splitting lines (independent of the reader).</summary>
    private static (double[] DryBulb, double[] DewPoint, double[] Rh, double[] PressureHpa, string[] Dates) RawTmy3(string name)
    {
        var lines = TestData.Lines(name).Where(l => l.Length > 0).ToArray();
        var header = lines[1].Split(',');
        int db = Array.IndexOf(header, "Dry-bulb (C)"), dp = Array.IndexOf(header, "Dew-point (C)");
        int rh = Array.IndexOf(header, "RHum (%)"), p = Array.IndexOf(header, "Pressure (mbar)");
        var rows = lines.Skip(2).Select(l => l.Split(',')).ToArray();
        double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);
        return (rows.Select(r => D(r[db])).ToArray(), rows.Select(r => D(r[dp])).ToArray(), rows.Select(r => D(r[rh])).ToArray(),
            rows.Select(r => D(r[p])).ToArray(), rows.Select(r => r[0]).ToArray());
    }

    [Theory]
    [MemberData(nameof(All))]
    public void EachFile_ReadsAsATypicalYearOf8760Hours(string name)
    {
        var w = Read(name);
        Assert.Equal(8760, w.Count); // SOURCES.md: 8760 data rows per file
        Assert.True(w.Calendar.IsTypicalYear);
        Assert.Equal(new DateTime(2018, 1, 1, 0, 0, 0), w.Times[0]);
        Assert.Equal(new DateTime(2018, 12, 31, 23, 0, 0), w.Times[^1]);
        Assert.Equal(DayOfWeek.Monday, w.Times[0].DayOfWeek); // 1 January 2018 was a Monday (common knowledge, any calendar)
        for (int i = 1; i < w.Count; i++)
        {
            Assert.Equal(TimeSpan.FromHours(1), w.Times[i] - w.Times[i - 1]);
        }
    }

    [Fact]
    public void Tmy3Header_GivesTheStationMetadata()
    {
        var abq = Read("723650TYA.CSV").Site;
        Assert.Equal("ALBUQUERQUE INTL ARPT [ISIS]", abq.Name); // line 1 of the file
        Assert.Equal(1619, abq.ElevationM); // SOURCES.md: Albuquerque at 1619 m
        Assert.Equal(-7.0, abq.UtcOffsetHours);
        Assert.Equal(35.040, abq.Latitude);
        Assert.Equal(SitePressureSource.StandardAtmosphereAtElevation, abq.PressureSource);
    }

    [Fact]
    public void Tmy3HourEnding_FirstRowBecomesMidnightHour()
    {
        // SOURCES.md: TMY3 times run 01:00 to 24:00, each value for the hour ending then. The first row
        // (01/01, 01:00) is the hour starting at 00:00; the last (12/31, 24:00) the hour starting at 23:00.
        var raw = RawTmy3("725300TYA.CSV");
        var w = Read("725300TYA.CSV");
        Assert.Equal(raw.DryBulb[0], w.DryBulbC[0], 9);
        Assert.Equal(raw.DryBulb[^1], w.DryBulbC[^1], 9);
        Assert.Equal(raw.PressureHpa[100] * 100, w.PressurePa[100], 6);
    }

    [Fact]
    public void Pvgis_UtcTimesShiftedToLocalStandardTime()
    {
        // SOURCES.md: PVGIS time(UTC) is hour-beginning UTC, local standard time UTC+1. The first row
        // (2018-01-01 00:00 UTC) is 01:00 local; the last row (2016-12-31 23:00 UTC) is 00:00 on 1 January.
        var lines = TestData.Lines(TestData.PvgisFile);
        int header = Array.FindIndex(lines, l => l.StartsWith("time(UTC)", StringComparison.Ordinal));
        double firstT2m = double.Parse(lines[header + 1].Split(',')[1], CultureInfo.InvariantCulture);
        double lastT2m = double.Parse(lines[header + 8760].Split(',')[1], CultureInfo.InvariantCulture);
        var w = Read(TestData.PvgisFile);
        Assert.Equal(1.0, w.Site.UtcOffsetHours);
        Assert.Equal(250.0, w.Site.ElevationM); // the file's header: Elevation (m): 250.0
        Assert.Equal(firstT2m, w.DryBulbC[1], 9);
        Assert.Equal(lastT2m, w.DryBulbC[0], 9);
        Assert.Equal(lastT2m - firstT2m, w.DryBulbC[0] - w.DryBulbC[1], 9);
        Assert.Contains("1 hour(s) crossed the year boundary", string.Join('\n', w.Quality.Warnings), StringComparison.Ordinal);
        Assert.Equal(firstT2m, w.DryBulbC[1], 9); // the rows in between keep their order
        Assert.Equal(double.Parse(lines[header + 8759].Split(',')[1], CultureInfo.InvariantCulture), w.DryBulbC[^1], 9);
    }

    [Fact]
    public void Arcata_DewPointAboveDryBulbIn29Hours_AllClampedAndCounted()
    {
        var w = Read("725945TYA.CSV");
        int clamped = w.Quality.Counts.GetValueOrDefault(QualityKeys.DewPointAboveDryBulbClamped);
        int suspect = w.Quality.Counts.GetValueOrDefault(QualityKeys.DewPointAboveDryBulbSuspect);
        Assert.Equal(29, clamped + suspect); // SOURCES.md: the dew point exceeds the dry-bulb in 29 hours
        var raw = RawTmy3("725945TYA.CSV");
        Assert.Equal(29, raw.DryBulb.Zip(raw.DewPoint).Count(p => p.Second > p.First)); // independent count from the raw columns
        Assert.Equal(raw.DryBulb.Zip(raw.DewPoint).Count(p => p.Second - p.First > 1.0), suspect);
        Assert.All(w.Quality.Examples[QualityKeys.DewPointAboveDryBulbSuspect], e => Assert.Contains("09-", e, StringComparison.Ordinal)); // the September stretch
        Assert.All(Enumerable.Range(0, w.Count), i => Assert.True(w.DewPointC[i] <= w.DryBulbC[i]));
    }

    [Theory]
    [MemberData(nameof(Tmy3))]
    public void RhFromDryBulbAndDewPoint_AgreesWithTheFilesRh(string name)
    {
        // Outside reference: the file's own RHum column. Measured agreement: median absolute difference
        // 0.2 to 0.5 points on all five files; the larger differences are below freezing (the dataset's RH is
        // over liquid water, the handbook's over ice) and at month joins (the dataset smooths the joins).
        var raw = RawTmy3(name);
        var diff = new double[raw.DryBulb.Length];
        for (int i = 0; i < diff.Length; i++)
        {
            double t = raw.DryBulb[i];
            double td = Math.Min(raw.DewPoint[i], t);
            diff[i] = Math.Abs(Saturation.VapourPressurePa(td) / Saturation.VapourPressurePa(t) * 100 - raw.Rh[i]);
        }

        Array.Sort(diff);
        Assert.True(diff[diff.Length / 2] < 1.0, $"median |RH difference| {diff[diff.Length / 2]:0.00} points");
        Assert.True(diff.Count(d => d <= 5.0) >= 0.97 * diff.Length);

        // The reader's own check counts the same hours beyond 5 points.
        var w = Read(name);
        int beyond = diff.Count(d => d > 5.0);
        Assert.InRange(w.Quality.Counts.GetValueOrDefault(QualityKeys.DisagreesPrefix + "rh"), beyond - 3, beyond + 3);
    }

    [Theory]
    [InlineData("722040TYA.CSV")]
    [InlineData("703165TY.csv")]
    public void LargeRhDisagreements_SitAtMonthJoins(string name)
    {
        // SOURCES.md: RH and dew point disagree at some month joins (the dataset smooths the joins).
        var raw = RawTmy3(name);
        var w = Read(name);
        int disagreements = w.Quality.Counts[QualityKeys.DisagreesPrefix + "rh"];
        Assert.InRange(disagreements, 1, 60);

        // A disagreement is a check, not a repair: the dew point is used and the RH column changes nothing.
        Assert.Equal(disagreements, w.Quality.Disagreements.Single().Value);
        Assert.DoesNotContain(w.Quality.Repairs, kv => kv.Key.StartsWith(QualityKeys.DisagreesPrefix, StringComparison.Ordinal));
        Assert.Equal(w.Quality.Repairs.Sum(kv => kv.Value), w.Quality.TotalRepairs);
        int atJoins = 0, beyond = 0;
        for (int i = 0; i < raw.DryBulb.Length; i++)
        {
            double calc = Saturation.VapourPressurePa(Math.Min(raw.DewPoint[i], raw.DryBulb[i])) / Saturation.VapourPressurePa(raw.DryBulb[i]) * 100;
            var date = DateTime.ParseExact(raw.Dates[i], "MM/dd/yyyy", CultureInfo.InvariantCulture);
            bool join = date.Day == 1 || date.Day == DateTime.DaysInMonth(2001, date.Month); // typical years have no 29 February
            if (Math.Abs(calc - raw.Rh[i]) > 5.0)
            {
                beyond++;
                atJoins += join ? 1 : 0;
            }
        }

        Assert.Equal(beyond, atJoins);
        Assert.InRange(disagreements, beyond - 2, beyond + 2); // the reader's count, from its own humidity ratio and the hour's pressure
    }

    [Theory]
    [MemberData(nameof(All))]
    public void MeanStationPressure_AgreesWithStandardAtmosphereAtHeaderElevation(string name)
    {
        var w = Read(name);
        double expected = Atmosphere.PressureAtElevationPa(w.Site.ElevationM!.Value); // ASHRAE Fundamentals ch. 1, eq. 3
        double mean = w.PressurePa.Average();
        Assert.InRange(mean / expected, 0.98, 1.02);
        if (name == "723650TYA.CSV")
        {
            Assert.InRange(mean, 82_000, 86_000); // about 83.4 kPa at 1,619 m (ASHRAE Fundamentals ch. 1, table 1, interpolated; recalled from memory)
        }
    }

    [Theory]
    [MemberData(nameof(Tmy3))]
    public void DegreeDaysAndDesignDryBulbs_MatchAnIndependentComputationFromRawColumns(string name)
    {
        var raw = RawTmy3(name);

        // Independent: in F with decimal arithmetic, straight from the raw C column.
        decimal hdd = 0, cdd = 0;
        foreach (var c in raw.DryBulb)
        {
            decimal f = (decimal)c * 1.8m + 32m;
            hdd += Math.Max(0m, 65m - f);
            cdd += Math.Max(0m, f - 65m);
        }

        var w = Read(name);
        double baseC = (65 - 32) / 1.8;
        Assert.Equal((double)(hdd / 24m), DegreeDaySeries.Of(w, DegreeDayMethod.Hourly).Heating(baseC) * 1.8, 6);
        Assert.Equal((double)(cdd / 24m), DegreeDaySeries.Of(w, DegreeDayMethod.Hourly).Cooling(baseC) * 1.8, 6);

        // Independent percentile: Hyndman and Fan definition 7 written out, h = (n - 1) p.
        var sorted = raw.DryBulb.Order().ToArray();
        double R7(double p)
        {
            double h = (sorted.Length - 1) * p;
            int lo = (int)Math.Floor(h);
            return sorted[lo] + (h - lo) * (sorted[Math.Min(lo + 1, sorted.Length - 1)] - sorted[lo]);
        }

        var d = DesignConditions.FromRecord(w);
        Assert.Equal(R7(0.004), d.Heating996DryBulbC, 9);
        Assert.Equal(R7(0.01), d.Heating990DryBulbC, 9);
        Assert.Equal(R7(0.996), d.Cooling[0].DryBulbC, 9);
        Assert.Equal(R7(0.99), d.Cooling[1].DryBulbC, 9);
        Assert.Equal(R7(0.98), d.Cooling[2].DryBulbC, 9);
    }

    [Fact]
    public void Chicago_AgreesWithPublishedClimateFigures()
    {
        var w = Read("725300TYA.CSV");
        double hddF = DegreeDaySeries.Of(w, DegreeDayMethod.DailyMean).Heating((65 - 32) / 1.8) * 1.8;
        Assert.InRange(hddF, 6_500 * 0.9, 6_500 * 1.1); // Chicago O'Hare normal HDD65 about 6,500 F-day (NOAA 1981-2010 normals; recalled from memory)
        var d = DesignConditions.FromRecord(w);
        double F(double c) => c * 1.8 + 32;
        Assert.InRange(F(d.Heating996DryBulbC), -4 - 5, -4 + 5); // O'Hare 99.6 % heating dry-bulb about -4 F (ASHRAE Fundamentals climatic design conditions; recalled from memory)
        Assert.InRange(F(d.Cooling[0].DryBulbC), 91 - 3, 91 + 3); // O'Hare 0.4 % cooling dry-bulb about 91 F (same source; recalled from memory)
        Assert.InRange(F(d.Cooling[0].MeanCoincidentWetBulbC), 74 - 3, 74 + 3); // with MCWB about 74 F (same source; recalled from memory)
    }

    [Fact]
    public void SandPoint_ConstantFilledPressure_IsNoticed()
    {
        var w = Read("703165TY.csv");
        Assert.Contains(w.Quality.Warnings, x => x.Contains("constant at 101.2 kPa", StringComparison.Ordinal)); // SOURCES.md: a constant 1012 mbar
    }
}
