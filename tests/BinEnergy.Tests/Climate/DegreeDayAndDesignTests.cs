using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Tests.Climate;

/// <summary>Degree-days by each method, the variable-base curve and design conditions on invented hours with known answers.</summary>
public sealed class DegreeDayAndDesignTests
{
    private static readonly DateTime Start = new(2018, 1, 1);

    private static DateTime[] Hours(int n) => Enumerable.Range(0, n).Select(i => Start.AddHours(i)).ToArray();

    private static double C(double f) => (f - 32) / 1.8;

    [Fact]
    public void ConstantTemperature_GivesDegreeDaysByDefinition_ByEveryMethod()
    {
        // A year at 8.3 C, base 18.3 C: 10 K x 365 days = 3,650 K-day (definition: sum over days of max(0, base - T)).
        var t = Enumerable.Repeat(8.3, 8760).ToArray();
        foreach (var method in DegreeDayMethods.All)
        {
            var series = DegreeDaySeries.Of(Hours(8760), t, method);
            Assert.Equal(3650.0, series.Heating(18.3), 6);
            Assert.Equal(0.0, series.Cooling(18.3));
        }
    }

    [Fact]
    public void HandWorkedDay_ByTheThreeMethods()
    {
        // One day: 12 hours at 50 F and 12 hours at 76 F, base 65 F. Hand-worked from the definitions
        // (ASHRAE Handbook—Fundamentals 2017, ch. 14: degree-days from the daily mean temperature):
        // daily mean 63 F -> HDD 2, CDD 0; degree-hours / 24: HDD 12 x 15 / 24 = 7.5, CDD 12 x 11 / 24 = 5.5;
        // (max + min) / 2 = 63 F -> HDD 2 (the weather services' daily mean; recalled from memory).
        var t = Enumerable.Range(0, 24).Select(h => C(h < 12 ? 50 : 76)).ToArray();
        double baseC = C(65);
        var daily = DegreeDaySeries.Of(Hours(24), t, DegreeDayMethod.DailyMean);
        var hourly = DegreeDaySeries.Of(Hours(24), t, DegreeDayMethod.Hourly);
        var maxMin = DegreeDaySeries.Of(Hours(24), t, DegreeDayMethod.MaxMin);
        Assert.Equal(2.0, daily.Heating(baseC) * 1.8, 9);
        Assert.Equal(0.0, daily.Cooling(baseC) * 1.8, 9);
        Assert.Equal(7.5, hourly.Heating(baseC) * 1.8, 9);
        Assert.Equal(5.5, hourly.Cooling(baseC) * 1.8, 9);
        Assert.Equal(2.0, maxMin.Heating(baseC) * 1.8, 9);

        // A day at 60 F with one hour at 50 F and one at 80 F: mean (22 x 60 + 130) / 24 = 60.4167 F -> HDD 4.5833;
        // (max + min) / 2 = 65 F -> HDD 0 (hand-worked).
        var spiky = Enumerable.Range(0, 24).Select(h => C(h == 3 ? 50 : h == 15 ? 80 : 60)).ToArray();
        Assert.Equal(4.583333, DegreeDaySeries.Of(Hours(24), spiky, DegreeDayMethod.DailyMean).Heating(baseC) * 1.8, 5);
        Assert.Equal(0.0, DegreeDaySeries.Of(Hours(24), spiky, DegreeDayMethod.MaxMin).Heating(baseC) * 1.8, 9);
    }

    [Fact]
    public void PartialDay_CountsItsShareOfTheDay()
    {
        // 36 hours at 55 F from midnight: one whole day and half a day, base 65 F -> 10 + 10 x 12 / 24 = 15 F-day.
        var t = Enumerable.Repeat(C(55), 36).ToArray();
        var series = DegreeDaySeries.Of(Hours(36), t, DegreeDayMethod.DailyMean);
        Assert.Equal([1.0, 0.5], series.Days);
        Assert.Equal(15.0, series.Heating(C(65)) * 1.8, 9);
    }

    [Fact]
    public void Curve_MatchesTheDirectSumAtEveryBase_ForEveryMethod_AndInterpolatesBetween()
    {
        var rng = new Random(7);
        var hours = Enumerable.Range(0, 8760).Select(i => 10 - 12 * Math.Cos(2 * Math.PI * i / 8760) + 8 * (rng.NextDouble() - 0.5)).ToArray();
        foreach (var method in DegreeDayMethods.All)
        {
            var series = DegreeDaySeries.Of(Hours(8760), hours, method);
            var curve = DegreeDayCurve.From(series);
            Assert.Equal(method, curve.Method);
            Assert.Equal(41, curve.BasesC.Length); // 40 F to 80 F in steps of 1 F
            Assert.Equal(4.4444, curve.BasesC[0], 4); // 40 F = 4.444 C
            for (int i = 0; i < curve.BasesC.Length; i++)
            {
                Assert.Equal(series.Heating(curve.BasesC[i]), curve.HeatingKDays[i], 6);
                Assert.Equal(series.Cooling(curve.BasesC[i]), curve.CoolingKDays[i], 6);
            }

            double mid = (curve.BasesC[10] + curve.BasesC[11]) / 2;
            Assert.Equal((curve.HeatingKDays[10] + curve.HeatingKDays[11]) / 2, curve.HeatingAt(mid), 9);
            Assert.InRange(curve.HeatingAt(mid) - series.Heating(mid), -0.5, 0.5); // linear between bases: close to the exact sum
            Assert.Throws<ArgumentOutOfRangeException>(() => curve.CoolingAt(40));
        }

        // HDD - CDD = (base - mean T) x days for the daily and hourly means, at any base (from the definitions).
        var dailyCurve = DegreeDayCurve.From(DegreeDaySeries.Of(Hours(8760), hours, DegreeDayMethod.DailyMean));
        Assert.Equal((dailyCurve.BasesC[20] - hours.Average()) * 365, dailyCurve.HeatingKDays[20] - dailyCurve.CoolingKDays[20], 6);
    }

    [Fact]
    public void CurveSlope_IsTheShareOfHoursBelowTheBase_CheckedByMathNetQuadrature()
    {
        // d HDD / d base = (hours below the base) / 24 for degree-hours, so HDD(b2) - HDD(b1) is the integral of that
        // count over [b1, b2] (the variable-base method; a property of the definition). The curve itself is exact,
        // from sorted running sums; here MathNet's double-exponential quadrature integrates the count independently.
        var rng = new Random(11);
        var hours = Enumerable.Range(0, 8760).Select(i => 10 - 12 * Math.Cos(2 * Math.PI * i / 8760) + 4 * (rng.NextDouble() - 0.5)).ToArray();
        var sorted = hours.Order().ToArray();
        double Below(double x) => Array.BinarySearch(sorted, x) is int k && k >= 0 ? k : ~k;
        var curve = DegreeDayCurve.From(DegreeDaySeries.Of(Hours(8760), hours, DegreeDayMethod.Hourly));
        var b = curve.BasesC; // 40 F to 80 F in 1 F steps, where the curve is exact
        foreach (var (b1, b2) in new[] { (b[0], b[10]), (b[10], b[25]), (b[25], b[40]) })
        {
            double integral = MathNet.Numerics.Integrate.OnClosedInterval(x => Below(x) / 24.0, b1, b2, 1e-8);
            double difference = curve.HeatingAt(b2) - curve.HeatingAt(b1);
            Assert.Equal(1.0, integral / difference, 0.002);
        }
    }

    [Fact]
    public void DesignConditions_OnEvenlySpreadHours_AreTheirPercentiles()
    {
        // 10,001 hours at 0.000, 0.005, ..., 50.000 C: the type-7 quantile at p is exactly 50 p.
        int n = 10_001;
        var db = Enumerable.Range(0, n).Select(i => i * 0.005).ToArray();
        var wb = db.Select(t => t - 5).ToArray();
        var dp = db.Select(t => t - 10).ToArray();
        var h = db.Select(t => 1000 * t).ToArray();
        var d = DesignConditions.FromHours(db, wb, dp, h, 101_325);
        Assert.Equal(0.2, d.Heating996DryBulbC, 9);
        Assert.Equal(0.5, d.Heating990DryBulbC, 9);
        Assert.Equal(49.8, d.Cooling[0].DryBulbC, 9);
        Assert.Equal(49.5, d.Cooling[1].DryBulbC, 9);
        Assert.Equal(49.0, d.Cooling[2].DryBulbC, 9);

        // Every hour is its own level: the design level holds one hour, so the set widens to the 5 hours 48.99..49.01 C.
        Assert.Equal(44.0, d.Cooling[2].MeanCoincidentWetBulbC, 6);
        Assert.Equal(5, d.Cooling[2].CoincidentHours);
        Assert.Equal(39.8, d.Dehumidification[0].DewPointC, 9);
        Assert.Equal(49.8, d.Dehumidification[0].MeanCoincidentDryBulbC, 6);
        Assert.Equal(5, d.Dehumidification[0].CoincidentHours);
        Assert.Equal(49_800, d.Enthalpy[0].EnthalpyJPerKg, 6);
        Assert.Equal(49.8, d.Enthalpy[0].MeanCoincidentDryBulbC, 6);
        Assert.Equal(49_500, d.Enthalpy[1].EnthalpyJPerKg, 6);
        Assert.Contains("Hyndman and Fan", DesignConditions.QuantileMethod, StringComparison.Ordinal);
        Assert.Contains("nearest the design value", DesignConditions.Basis, StringComparison.Ordinal);
    }

    [Fact]
    public void DehumidificationHumidityRatio_IsTheValueAtTheDesignDewPoint()
    {
        // Dew points 10..20 C in steps of 0.01 K (1,001 hours): the 0.4 % point is 19.96 C. W at a 20 C dew point at
        // 101.325 kPa is the saturation humidity ratio at 20 C, 0.014758 kg/kg in the handbook's table (ASHRAE
        // Handbook—Fundamentals 2017, ch. 1, table 2; recalled from memory), which includes the enhancement factor
        // (about 1.004) that the ideal-gas equations 20 and 6 leave out: within 0.5 %.
        var dp = Enumerable.Range(0, 1001).Select(i => 10 + 0.01 * i).ToArray();
        var db = dp.Select(t => t + 8).ToArray();
        var d = DesignConditions.FromHours(db, dp, dp, db, 101_325);
        Assert.Equal(19.96, d.Dehumidification[0].DewPointC, 9);
        Assert.Equal(MoistAir.HumidityRatioFromDewPoint(19.96, 101_325), d.Dehumidification[0].HumidityRatio, 12);
        Assert.Equal(1.0, MoistAir.HumidityRatioFromDewPoint(20, 101_325) / 0.014758, 0.005);
        Assert.Equal(19.9, d.Dehumidification[1].DewPointC, 9); // 0.4 % and 1 % are computed separately
        Assert.NotEqual(d.Dehumidification[0].MeanCoincidentDryBulbC, d.Dehumidification[1].MeanCoincidentDryBulbC);
    }

    [Fact]
    public void CoincidentHours_TakeTheNearestDataLevel_BothWhenMidway_WidenedToFiveHours()
    {
        // The handbook's mean coincident wet-bulb is the mean over the hours at the design dry-bulb (ASHRAE
        // Handbook—Fundamentals 2017, ch. 14); on data stored in whole F every level is a whole F value.
        // Levels 88 F x 10 hours, 89 F x 3, 90 F x 7.
        var key = Enumerable.Repeat(88.0, 10).Concat(Enumerable.Repeat(89.0, 3)).Concat(Enumerable.Repeat(90.0, 7)).ToArray();
        var values = key.Select((k, i) => k * 100 + i).ToArray();

        var at90 = CoincidentHours.Around(key, 89.8); // nearest level 90 F: its 7 hours, not the 89 F hours
        Assert.Equal((90.0, 90.0, 7), (at90.LowKey, at90.HighKey, at90.Count));
        Assert.Equal(Enumerable.Range(13, 7).Average(i => 9000.0 + i), at90.MeanOf(key, values), 9);

        var midway = CoincidentHours.Around(key, 88.5); // midway between 88 and 89 F: both levels
        Assert.Equal((88.0, 89.0, 13), (midway.LowKey, midway.HighKey, midway.Count));

        var few = CoincidentHours.Around(key, 89.1); // 89 F holds 3 hours: widened one level each side, 88..90 F
        Assert.Equal((88.0, 90.0, 20), (few.LowKey, few.HighKey, few.Count));

        var beyond = CoincidentHours.Around(key, 95); // above the data: the top level
        Assert.Equal((90.0, 90.0, 7), (beyond.LowKey, beyond.HighKey, beyond.Count));
    }
}
