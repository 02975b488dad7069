using BinEnergy.Core.Climate;

namespace BinEnergy.Tests.Climate;

/// <summary>Degree-days, the variable-base curve and design conditions on invented hours with known answers.</summary>
public sealed class DegreeDayAndDesignTests
{
    [Fact]
    public void ConstantTemperature_GivesDegreeDaysByDefinition()
    {
        // A year at 8.3 C, base 18.3 C: 10 K x 365 days = 3,650 K-day (definition: sum(max(0, base - T)) / 24).
        var hours = Enumerable.Repeat(8.3, 8760).ToArray();
        Assert.Equal(3650.0, DegreeDays.Heating(hours, 18.3), 6);
        Assert.Equal(0.0, DegreeDays.Cooling(hours, 18.3));
    }

    [Fact]
    public void Curve_MatchesTheDirectSumAtEveryBase_AndInterpolatesBetween()
    {
        var rng = new Random(7);
        var hours = Enumerable.Range(0, 8760).Select(_ => -10 + 40 * rng.NextDouble()).ToArray();
        var curve = DegreeDayCurve.FromHours(hours);
        Assert.Equal(41, curve.BasesC.Length); // 40 F to 80 F in steps of 1 F
        Assert.Equal(4.4444, curve.BasesC[0], 4); // 40 F = 4.444 C
        for (int i = 0; i < curve.BasesC.Length; i++)
        {
            Assert.Equal(DegreeDays.Heating(hours, curve.BasesC[i]), curve.HeatingKDays[i], 6);
            Assert.Equal(DegreeDays.Cooling(hours, curve.BasesC[i]), curve.CoolingKDays[i], 6);
        }

        double mid = (curve.BasesC[10] + curve.BasesC[11]) / 2;
        Assert.Equal((curve.HeatingKDays[10] + curve.HeatingKDays[11]) / 2, curve.HeatingAt(mid), 9);
        Assert.InRange(curve.HeatingAt(mid) - DegreeDays.Heating(hours, mid), -0.5, 0.5); // linear between bases: close to the exact sum
        Assert.Throws<ArgumentOutOfRangeException>(() => curve.CoolingAt(40));

        // HDD - CDD = (base - mean T) x days, for any base (from the definitions).
        Assert.Equal((curve.BasesC[20] - hours.Average()) * 365, curve.HeatingKDays[20] - curve.CoolingKDays[20], 6);
    }

    [Fact]
    public void CurveSlope_IsTheShareOfHoursBelowTheBase_CheckedByMathNetQuadrature()
    {
        // d HDD / d base = (hours below the base) / 24, so HDD(b2) - HDD(b1) is the integral of that count over [b1, b2]
        // (the variable-base method; a property of the definition). The curve itself is exact, from sorted
        // running sums; here MathNet's double-exponential quadrature integrates the count independently.
        var rng = new Random(11);
        var hours = Enumerable.Range(0, 8760).Select(i => 10 - 12 * Math.Cos(2 * Math.PI * i / 8760) + 4 * (rng.NextDouble() - 0.5)).ToArray();
        var sorted = hours.Order().ToArray();
        double Below(double x) => Array.BinarySearch(sorted, x) is int k && k >= 0 ? k : ~k;
        var curve = DegreeDayCurve.FromHours(hours);
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
        var w = dp.Select(t => 0.001 * t).ToArray();
        var d = DesignConditions.FromHours(db, wb, dp, w);
        Assert.Equal(0.2, d.Heating996DryBulbC, 9);
        Assert.Equal(0.5, d.Heating990DryBulbC, 9);
        Assert.Equal(49.8, d.Cooling[0].DryBulbC, 9);
        Assert.Equal(49.5, d.Cooling[1].DryBulbC, 9);
        Assert.Equal(49.0, d.Cooling[2].DryBulbC, 9);
        Assert.Equal(44.0, d.Cooling[2].MeanCoincidentWetBulbC, 6); // window 48.5..49.5 C, symmetric: mean wet-bulb 49 - 5
        Assert.Equal(201, d.Cooling[2].CoincidentHours); // 200 steps of 0.005 K across the 1 K window, plus one
        Assert.Equal(39.8, d.Dehumidification[0].DewPointC, 9);
        Assert.Equal(49.65, d.Dehumidification[0].MeanCoincidentDryBulbC, 6); // window 39.3..40.0 C (the data end at 40): mean dew point 39.65, dry-bulb 10 K above
        Assert.Contains("Hyndman and Fan", DesignConditions.QuantileMethod, StringComparison.Ordinal);
    }
}
