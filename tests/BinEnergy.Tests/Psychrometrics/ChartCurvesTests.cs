using System.Text.Json.Serialization;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Psychrometrics;

/// <summary>
/// The psychrometric chart curves against the npm package psychrolib 1.1.1 (an open
/// implementation of ASHRAE Handbook—Fundamentals 2017 ch. 1, SI mode), and the economizer
/// region against its own definition (every vertex inside every limit).
/// </summary>
public class ChartCurvesTests
{
    private sealed record Point([property: JsonPropertyName("t_c")] double TC, [property: JsonPropertyName("rh")] double Rh, [property: JsonPropertyName("h")] double H);

    private sealed record Query([property: JsonPropertyName("p_pa")] double PPa, [property: JsonPropertyName("points")] List<Point> Points);

    private sealed record Answer([property: JsonPropertyName("w_sat")] double WSat, [property: JsonPropertyName("w_rh")] double WRh, [property: JsonPropertyName("w_h")] double WH);

    [Theory]
    [InlineData(0.0)]      // sea level
    [InlineData(1600.0)]   // a high site (about 5,250 ft)
    public void SaturationRhAndEnthalpyLines_MatchPsychrolib(double elevationM)
    {
        double p = Atmosphere.PressureAtElevationPa(elevationM);
        var saturation = ChartCurves.SaturationCurve(-30, 45, p, 2.5);
        var points = new List<Point>();
        foreach (var s in saturation)
        {
            foreach (double rh in ChartCurves.RelativeHumiditySteps)
            {
                points.Add(new Point(s.DryBulbC, rh, 50_000));
            }
        }

        var answers = NodeReference.Run<List<Answer>>("psychrolib-chart-curves.js", new Query(p, points));
        Assert.Equal(points.Count, answers.Count);
        int k = 0;
        foreach (var s in saturation)
        {
            Assert.Equal(answers[k].WSat, s.HumidityRatio, Tolerance(answers[k].WSat));
            foreach (double rh in ChartCurves.RelativeHumiditySteps)
            {
                var line = ChartCurves.RelativeHumidityCurve(rh, s.DryBulbC, s.DryBulbC, p);
                Assert.Single(line);
                Assert.Equal(answers[k].WRh, line[0].HumidityRatio, Tolerance(answers[k].WRh));
                // Enthalpy line at 50 kJ/kg (about the fixed-enthalpy high limits in use, common practice).
                Assert.Equal(answers[k].WH, ChartCurves.HumidityRatioAtEnthalpy(s.DryBulbC, 50_000), Tolerance(answers[k].WH));
                k++;
            }
        }
    }

    /// <summary>0.05 % of the value (the psychrolib agreement the moist-air tests demand) or 1e-8 kg/kg near zero.</summary>
    private static double Tolerance(double w) => Math.Max(0.0005 * Math.Abs(w), 1e-8);

    [Fact]
    public void Sampling_CoversTheRangeWithBothEnds()
    {
        var curve = ChartCurves.SaturationCurve(-10, 3.2, 101_325, 0.5);
        Assert.Equal(-10, curve[0].DryBulbC);
        Assert.Equal(3.2, curve[^1].DryBulbC);
        Assert.Equal(28, curve.Count); // -10 .. 3.0 in 0.5 K steps (27 points) plus the end
        Assert.Throws<ArgumentException>(() => ChartCurves.SaturationCurve(10, 5, 101_325));
        Assert.Throws<PsychrometricException>(() => ChartCurves.SaturationCurve(-150, 0, 101_325));
    }

    [Fact]
    public void EconomizerRegion_FixedDryBulb_IsEverythingBelowSaturationLeftOfTheLimit()
    {
        double p = 101_325;
        double limit = Temperature.FromFahrenheit(65).Celsius;
        var region = ChartCurves.EconomizerRegion(-20, p, limit);
        Assert.Equal(limit, region.Max(v => v.DryBulbC), 9);
        Assert.Equal(-20, region.Min(v => v.DryBulbC), 9);
        foreach (var v in region.Where(v => v.HumidityRatio > 0))
        {
            Assert.Equal(Saturation.HumidityRatio(v.DryBulbC, p), v.HumidityRatio, 12);
        }

        Assert.Equal(new ChartPoint(limit, 0), region[^2]);
        Assert.Equal(new ChartPoint(-20, 0), region[^1]);
    }

    [Fact]
    public void EconomizerRegion_EnthalpyAndDewPointLimits_KeepEveryVertexInside()
    {
        double p = Atmosphere.PressureAtElevationPa(300);
        double limit = Temperature.FromFahrenheit(75).Celsius;
        double enthalpy = SpecificEnthalpy.FromBtuPerPound(28).JoulesPerKilogram; // 28 Btu/lb, a usual fixed-enthalpy limit (common practice)
        double dewPoint = Temperature.FromFahrenheit(55).Celsius;                   // 55 F, a usual dew-point limit (common practice)
        var region = ChartCurves.EconomizerRegion(-10, p, limit, enthalpy, dewPoint);
        double wDew = MoistAir.HumidityRatioFromDewPoint(dewPoint, p);
        bool enthalpyBinds = false;
        foreach (var v in region)
        {
            Assert.True(v.HumidityRatio <= Saturation.HumidityRatio(v.DryBulbC, p) + 1e-12);
            Assert.True(v.HumidityRatio <= wDew + 1e-12);
            Assert.True(MoistAir.Enthalpy(v.DryBulbC, v.HumidityRatio) <= enthalpy + 1e-6);
            enthalpyBinds |= v.HumidityRatio > 0 && Math.Abs(MoistAir.Enthalpy(v.DryBulbC, v.HumidityRatio) - enthalpy) < 1e-6;
        }

        Assert.True(enthalpyBinds, "the enthalpy limit should form part of the top edge between 55 F dew point and 75 F");
        Assert.Empty(ChartCurves.EconomizerRegion(20, p, 20));
    }
}
