using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather.Synthesis;

namespace BinEnergy.Tests.Synthesis;

/// <summary>
/// The synthesizer against its contract (issue 7): deterministic for a seed, monthly mean daily
/// maximum and minimum within 0.5 K and mean daily range within 1 K of the inputs, dew point
/// never above dry-bulb. Every statistic is measured on the written CSV text by
/// <see cref="HourlyText"/>, independently of the synthesizer's own measuring.
/// </summary>
public class WeatherSynthesizerTests
{
    /// <summary>The contract's tolerances (issue 7, "Checks").</summary>
    private const double MeanToleranceK = 0.5, RangeToleranceK = 1.0;

    [Fact]
    public void SameSeed_GivesByteIdenticalFiles()
    {
        string a = SampleClimates.Text("frostmere", 42);
        string b = SampleClimates.Text("frostmere", 42);
        Assert.Equal(a, b);
        Assert.Equal(8 + 8760, a.Count(c => c == '\n')); // 7 metadata lines, the header, 8,760 hours
    }

    [Fact]
    public void DifferentSeeds_GiveDifferentYears_WithTheSameMonthlyMeans()
    {
        var a = HourlyText.Parse(SampleClimates.Text("kelpwick", 1));
        var b = HourlyText.Parse(SampleClimates.Text("kelpwick", 2));
        int differing = a.DryBulbC.Zip(b.DryBulbC).Count(p => Math.Abs(p.First - p.Second) > 0.5);
        Assert.True(differing > 4000, $"only {differing} hours differ by more than 0.5 K");
        var sa = a.MonthlyStatistics();
        var sb = b.MonthlyStatistics();
        for (int m = 0; m < 12; m++)
        {
            Assert.InRange(sa[m].Max - sb[m].Max, -2 * MeanToleranceK, 2 * MeanToleranceK);
        }
    }

    public static TheoryData<string, ulong> SamplesAndSeeds()
    {
        var data = new TheoryData<string, ulong>();
        foreach (var (name, _) in SampleClimates.All)
        {
            foreach (ulong seed in new ulong[] { 0, 7, 123456789 })
            {
                data.Add(name, seed);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(SamplesAndSeeds))]
    public void MonthlyMeansAndRanges_MeetTheInputs(string name, ulong seed)
    {
        var climate = SampleClimates.Climate(name);
        var text = HourlyText.Parse(SampleClimates.Text(name, seed));
        var stats = text.MonthlyStatistics();
        for (int m = 0; m < 12; m++)
        {
            var input = climate.Months[m];
            Assert.InRange(stats[m].Max - input.DryBulbMaxC, -MeanToleranceK, MeanToleranceK);
            Assert.InRange(stats[m].Min - input.DryBulbMinC, -MeanToleranceK, MeanToleranceK);
            Assert.InRange(stats[m].Range - input.DailyRangeK, -RangeToleranceK, RangeToleranceK);
            Assert.InRange(stats[m].DewPoint - input.DewPointC, -MeanToleranceK, MeanToleranceK);
        }
    }

    [Theory]
    [MemberData(nameof(SamplesAndSeeds))]
    public void DewPoint_IsNeverAboveDryBulb(string name, ulong seed)
    {
        var result = SampleClimates.Synthesize(name, seed);
        var w = result.Weather;
        for (int i = 0; i < w.Count; i++)
        {
            Assert.True(w.DewPointC[i] <= w.DryBulbC[i], $"hour {i}: dew point {w.DewPointC[i]} above dry-bulb {w.DryBulbC[i]}");
            // Saturation in the record's convention: over liquid water, also below 0 C (dew points are over water).
            Assert.True(w.HumidityRatio[i] <= MoistAir.HumidityRatioFromDewPoint(w.DryBulbC[i], w.PressurePa[i], w.HumidityOver) * (1 + 1e-9), $"hour {i} is supersaturated");
        }

        var text = HourlyText.Parse(SynthesizedYearWriter.ToText(result, name + "-monthly.csv"));
        Assert.All(text.DewPointC.Zip(text.DryBulbC), p => Assert.True(p.First <= p.Second));
        Assert.All(text.RelativeHumidityPct, rh => Assert.InRange(rh, 0.5, 100.0));
    }

    [Fact]
    public void ResultReport_AgreesWithTheIndependentMeasurement()
    {
        var result = SampleClimates.Synthesize("port-verrin", 5);
        var stats = HourlyText.Parse(SynthesizedYearWriter.ToText(result, "x.csv")).MonthlyStatistics();
        for (int m = 0; m < 12; m++)
        {
            Assert.Equal(stats[m].Max, result.Months[m].MaxC, 0.002);
            Assert.Equal(stats[m].Min, result.Months[m].MinC, 0.002);
            Assert.Equal(stats[m].DewPoint, result.Months[m].DewPointC, 0.002);
        }

        Assert.True(result.WorstExtremeErrorK < WeatherSynthesizer.ToleranceK);
        Assert.True(result.WorstDewPointErrorK < WeatherSynthesizer.ToleranceK);
        Assert.Equal(0, result.RangeFlooredDays);
    }

    [Fact]
    public void DiurnalShape_FollowsTheHandbookProfile()
    {
        // On a calm day (the next day's minimum close to today's) the hours follow T = Tmax - f (Tmax - Tmin).
        var text = HourlyText.Parse(SampleClimates.Text("alcor-mesa", 11));
        var days = Enumerable.Range(0, 365).Select(d => text.DryBulbC.Skip(d * 24).Take(24).ToArray()).ToArray();
        int minAtFive = days.Count(h => Array.IndexOf(h, h.Min()) == 5);
        int maxAtTwoOrThree = days.Count(h => h[14] == h.Max() || h[15] == h.Max());
        Assert.True(minAtFive > 0.8 * 365, $"minimum at 05:00 on {minAtFive} days");
        Assert.True(maxAtTwoOrThree > 0.95 * 365, $"maximum at 14:00-15:00 on {maxAtTwoOrThree} days");

        // Morning rise 05:00 -> 14:00 is the fraction-of-range profile: at 09:00 the Handbook
        // fraction is 0.55 (ASHRAE Handbook—Fundamentals ch. 14, fraction of daily range; recalled from memory).
        foreach (var h in days.Take(60))
        {
            double range = h[14] - h[5];
            Assert.Equal(h[14] - 0.55 * range, h[9], 0.002);
        }
    }

    [Fact]
    public void HoursJoinSmoothly_AcrossMidnight()
    {
        var text = HourlyText.Parse(SampleClimates.Text("frostmere", 9));
        var steps = text.DryBulbC.Zip(text.DryBulbC.Skip(1), (a, b) => Math.Abs(b - a)).ToArray();
        var midnightSteps = Enumerable.Range(1, 364).Select(d => Math.Abs(text.DryBulbC[d * 24] - text.DryBulbC[d * 24 - 1])).ToArray();
        // The profile's steepest step is 0.19 of a range (08:00 -> 09:00), a midnight step 0.07 of one
        // (0.75 -> 0.82), and a day's steps average 2/24 = 0.083 of a range: with the evening fall
        // aimed at the next day's minimum, midnight is no jump but an ordinary, gentler step.
        Assert.True(midnightSteps.Max() < 4.0, $"largest midnight step {midnightSteps.Max():0.00} K");
        Assert.True(midnightSteps.Average() < steps.Average(), "midnight steps should be no larger than the average step");
        Assert.True(midnightSteps.Max() < 0.6 * steps.Max(), "the largest step should not be at midnight");
    }

    [Fact]
    public void DailyMeans_HaveThePersistenceAndSpreadAskedFor()
    {
        // Pooled over the four samples and several seeds: lag-one autocorrelation of the daily
        // midpoint's departure from its monthly mean, and its within-month standard deviation.
        var correlations = new List<double>();
        var ratios = new List<double>();
        foreach (var (name, _) in SampleClimates.All)
        {
            foreach (ulong seed in new ulong[] { 21, 22, 23 })
            {
                var result = SampleClimates.Synthesize(name, seed);
                ratios.AddRange(result.Months.Select(m => m.SpreadK / m.TargetSpreadK));
                var text = HourlyText.Parse(SynthesizedYearWriter.ToText(result, "x.csv"));
                var days = text.Days().ToArray();
                var monthMean = Enumerable.Range(1, 12).Select(m => days.Where(d => d.Month == m).Average(d => 0.5 * (d.Max + d.Min))).ToArray();
                var departure = days.Select(d => 0.5 * (d.Max + d.Min) - monthMean[d.Month - 1]).ToArray();
                correlations.Add(LagOneCorrelation(departure));
            }
        }

        // Departures from a monthly mean lose a little persistence against the process's own 0.7.
        Assert.InRange(correlations.Average(), 0.55, 0.8);
        Assert.InRange(ratios.Average(), 0.85, 1.15);
    }

    [Fact]
    public void Pressure_IsTheStandardAtmosphereAtTheElevation()
    {
        var text = HourlyText.Parse(SampleClimates.Text("alcor-mesa", 2));
        // 1,600 m: 83.53 kPa by Handbook ch. 1 eq. 3; Table 1 gives 84.556 kPa at 1,500 m and
        // 79.495 kPa at 2,000 m (recalled from memory), and 1,600 m lies between them.
        Assert.All(text.PressureKPa, p => Assert.Equal(83.53, p, 0.01));
        Assert.Equal("1600", text.Metadata["elevation_m"]);
    }

    [Fact]
    public void LeapYear_IsRefused()
    {
        var climate = SampleClimates.Climate("kelpwick");
        Assert.Throws<ArgumentException>(() => WeatherSynthesizer.Synthesize(climate, 1, 2024));
        var result = WeatherSynthesizer.Synthesize(climate, 1, 2019);
        Assert.Equal(new DateTime(2019, 12, 31, 23, 0, 0), result.Weather.Times[^1]);
        Assert.Equal(DayOfWeek.Tuesday, result.Weather.Times[0].DayOfWeek); // 1 January 2019 was a Tuesday (common knowledge)
    }

    [Fact]
    public void SoftLimit_StaysBelowDryBulb_AndVanishesFarFromSaturation()
    {
        // T - s ln(1 + exp((T - Td0)/s)): never above T; equal to Td0 when Td0 is far below T.
        foreach (double depression in new[] { -50.0, -5.0, -1.0, 0.0, 0.3, 1.0, 3.0, 10.0, 800.0 })
        {
            double bounded = 20.0 - WeatherSynthesizer.SoftPlus(depression, 0.5);
            Assert.True(bounded <= 20.0);
            Assert.True(double.IsFinite(bounded));
        }

        Assert.Equal(20.0 - 5.0, 20.0 - WeatherSynthesizer.SoftPlus(5.0, 0.5), 1e-4);
        Assert.Equal(20.0 - 0.5 * Math.Log(2), 20.0 - WeatherSynthesizer.SoftPlus(0.0, 0.5), 1e-12); // s ln 2 at Td0 = T (exact)
    }

    private static double LagOneCorrelation(double[] x)
    {
        double mean = x.Average();
        double num = 0, den = 0;
        for (int i = 0; i < x.Length; i++)
        {
            den += (x[i] - mean) * (x[i] - mean);
            if (i > 0)
            {
                num += (x[i] - mean) * (x[i - 1] - mean);
            }
        }

        return num / den;
    }
}
