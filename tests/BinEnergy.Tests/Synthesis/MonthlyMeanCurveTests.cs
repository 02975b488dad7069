using BinEnergy.Core.Weather.Synthesis;

namespace BinEnergy.Tests.Synthesis;

/// <summary>The seasonal curves: they keep each month's mean and recover a smooth annual cycle.</summary>
public class MonthlyMeanCurveTests
{
    private static readonly int[] MonthLengths = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31]; // a non-leap year

    [Fact]
    public void MonthlyMeans_AreReproducedExactly()
    {
        double[] means = [-12.1, -9.3, -2.2, 6.8, 13.9, 19.3, 22.1, 20.8, 15.4, 7.9, -1.6, -9.0];
        var daily = MonthlyMeanCurve.MeanPreserving(means);
        Assert.Equal(365, daily.Length);
        int start = 0;
        for (int m = 0; m < 12; m++)
        {
            Assert.Equal(means[m], daily.Skip(start).Take(MonthLengths[m]).Average(), 1e-9);
            start += MonthLengths[m];
        }
    }

    [Fact]
    public void AnnualSinusoid_IsRecoveredFromItsMonthlyMeans()
    {
        // T(t) = 10 + 12 sin(2 pi (t - 105) / 365): the monthly means of its daily values,
        // passed through the curve, give the sinusoid back (an analytic check: a mean-preserving
        // smooth interpolation of a smooth periodic function returns it closely; plain
        // interpolation of the means would lose about 1 % of the amplitude, sinc(pi/12) = 0.989).
        double T(double t) => 10 + 12 * Math.Sin(2 * Math.PI * (t - 105) / 365);
        var exact = Enumerable.Range(0, 365).Select(d => T(d + 0.5)).ToArray();
        var means = MonthlyMeanCurve.MonthlyMeans(exact);
        var daily = MonthlyMeanCurve.MeanPreserving(means);
        double worst = exact.Zip(daily, (a, b) => Math.Abs(a - b)).Max();
        Assert.True(worst < 0.03, $"worst daily error {worst:0.000} K on an amplitude of 12 K");
    }

    [Fact]
    public void Constant_StaysConstant_AndTheYearWraps()
    {
        var daily = MonthlyMeanCurve.MeanPreserving(Enumerable.Repeat(7.5, 12).ToArray());
        Assert.All(daily, v => Assert.Equal(7.5, v, 1e-9));

        var linear = MonthlyMeanCurve.Linear([1, 2, 3, 4, 5, 6, 7, 6, 5, 4, 3, 2]);
        Assert.All(linear, v => Assert.InRange(v, 1.0, 7.0)); // straight lines never overshoot
        Assert.Equal(1.0, linear[15], 0.05); // mid-January sits on the January value
        Assert.True(Math.Abs(linear[364] - linear[0]) < 0.05, "31 December and 1 January meet");
    }
}
