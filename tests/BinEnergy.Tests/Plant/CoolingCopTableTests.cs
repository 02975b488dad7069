using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Economizer;

namespace BinEnergy.Tests.Plant;

/// <summary>
/// The cooling COP against outdoor dry-bulb and coil-entering wet-bulb (bilinear in a small
/// table, clamped at its edges with the clamped hours counted), alone and in the economizer's
/// compressor energy on the Chicago TMY3 file.
/// </summary>
public class CoolingCopTableTests(EconomizerRealFiles files) : IClassFixture<EconomizerRealFiles>
{
    // Invented table: rows at 24 and 35 C outdoors, columns at 17 and 22 C entering wet-bulb.
    private static CoolingCopTable Table() => CoolingCopTable.Create([24, 35], [17, 22], [4.0, 3.6, 3.2, 2.9]);

    [Fact]
    public void Bilinear_BetweenTheFourPoints_HandWorked()
    {
        var t = Table();

        // Centre: u = v = 0.5, COP = (4.0 + 3.2 + 3.6 + 2.9) / 4 = 3.425.
        Assert.Equal(3.425, t.Evaluate(29.5, 19.5), 12);

        // (30, 18): u = 6/11, v = 1/5: (5/11)(4/5) 4.0 + (6/11)(4/5) 3.2 + (5/11)(1/5) 3.6 + (6/11)(1/5) 2.9
        //   = 1.454545 + 1.396364 + 0.327273 + 0.316364 = 3.494545.
        Assert.Equal(3.494545, t.Evaluate(30, 18), 6);

        // The corners are the table's own values.
        Assert.Equal(3.6, t.Evaluate(24, 22), 12);
        Assert.Equal(3.2, t.Evaluate(35, 17), 12);
    }

    [Fact]
    public void OutsideTheTable_ClampsEachAxis_AndCountsTheHours()
    {
        var plant = new PlantModel(PlantTestSettings() with { CoolingCopByWetBulb = Table() });
        var clamps = new CurveClampCounter();

        // 40 C outdoors and 25 C wet-bulb are beyond both edges: the corner 2.9; 2 hours counted.
        Assert.Equal(2.9, plant.CoolingCop(40, 25, 2, clamps), 12);
        Assert.Equal(2.0, clamps.CoolingHours);

        // 30 C outdoors, 10 C wet-bulb: the wet-bulb clamps to 17: 4.0 + (3.2 - 4.0)(6/11) = 3.563636.
        Assert.Equal(4.0 + (3.2 - 4.0) * 6 / 11, plant.CoolingCop(30, 10, 1, clamps), 12);
        Assert.Equal(3.0, clamps.CoolingHours);

        // Inside: not counted.
        _ = plant.CoolingCop(30, 20, 1, clamps);
        Assert.Equal(3.0, clamps.CoolingHours);

        // An axis of one value is constant along it: never outside.
        Assert.False(CoolingCopTable.Create([24, 35], [17], [4.0, 3.2]).IsOutside(30, 5));
        Assert.True(CoolingCopTable.Create([24, 35], [17], [4.0, 3.2]).IsOutside(40, 17));
    }

    [Fact]
    public void BadTables_SayWhatIsWrong()
    {
        Assert.Contains("2 x 2 = 4 COPs", Assert.Throws<ArgumentException>(() => CoolingCopTable.Create([24, 35], [17, 22], [4.0, 3.6, 3.2])).Message, StringComparison.Ordinal);
        Assert.Contains("outdoor temperatures must rise", Assert.Throws<ArgumentException>(() => CoolingCopTable.Create([35, 24], [17, 22], [4.0, 3.6, 3.2, 2.9])).Message, StringComparison.Ordinal);
        Assert.Contains("positive", Assert.Throws<ArgumentException>(() => CoolingCopTable.Create([24], [17], [0.0])).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Chicago_EconomizerCompressor_UsesTheMixedAirWetBulb()
    {
        const string chicago = "725300TYA.CSV";
        var w = files.Weather[chicago];
        var occ = files.Occupied[chicago];
        var bins = BinTable.Build(w, DryBulbBinScale.Default(UnitSystem.IP), occ);
        var settings = EconomizerRealFiles.Reference(true);

        // A flat table of 3.0 is the constant COP 3.0: the same compressor energy (no wet-bulb effect).
        var flat = new PlantModel(PlantTestSettings() with { CoolingCop = PerformanceCurve.Constant(3.0), CoolingCopByWetBulb = CoolingCopTable.Create([24], [17], [3.0]) });
        var constant = new PlantModel(PlantTestSettings() with { CoolingCop = PerformanceCurve.Constant(3.0) });
        double flatJ = EconomizerEvaluation.Evaluate(w, occ, bins, settings, flat).Baseline.Totals.Hourly.Compressor.ElectricityJ;
        double constJ = EconomizerEvaluation.Evaluate(w, occ, bins, settings, constant).Baseline.Totals.Hourly.Compressor.ElectricityJ;
        Assert.Equal(constJ, flatJ, 1e-9 * constJ);

        // The invented table: each baseline hour's coil energy over the COP at its outdoor dry-bulb and the wet-bulb of its
        // mix (Handbook—Fundamentals 2017 ch. 1 wet-bulb, solved here through HourlyStateSolver.WetBulb, a fogged mix at its dry-bulb); clamped hours counted.
        var table = new PlantModel(PlantTestSettings() with { CoolingCopByWetBulb = Table() });
        var e = EconomizerEvaluation.Evaluate(w, occ, bins, settings, table);
        var model = new EconomizerModel(settings, w.Site.SitePressurePa);
        double expected = 0, outside = 0;
        for (int i = 0; i < w.Count; i++)
        {
            if (!occ[i])
            {
                continue;
            }

            var h = model.Evaluate(EconomizerControl.None, w.DryBulbC[i], w.HumidityRatio[i], w.EnthalpyJPerKg[i], w.DewPointC[i]);
            if (!h.CoilRuns)
            {
                continue;
            }

            double wb = HourlyStateSolver.WetBulb(h.MixedDryBulbC, h.MixedHumidityRatio, w.Site.SitePressurePa);
            expected += h.CoilTotalW * 3600 / Table().Evaluate(w.DryBulbC[i], wb);
            outside += Table().IsOutside(w.DryBulbC[i], wb) ? 1 : 0;
        }

        Assert.Equal(expected, e.Baseline.Totals.Hourly.Compressor.ElectricityJ, 1e-9 * expected);
        Assert.Equal(outside, e.CoolingClampHours);
        Assert.True(outside > 0, "Chicago's coil hours reach outside 24 to 35 C outdoors");

        // The table's COPs (2.9 to 4.0) bracket the compressor energy: coil / 4.0 <= compressor <= coil / 2.9.
        double coil = e.Baseline.Totals.Hourly.CoilTotal.Joules;
        Assert.InRange(e.Baseline.Totals.Hourly.Compressor.ElectricityJ, coil / 4.0, coil / 2.9);
    }

    private static PlantSettings PlantTestSettings() => new(
        HeatingSource.Gas,
        HeatingEfficiency: 0.85,
        HeatPumpCop: null,
        CoolingCop: PerformanceCurve.Constant(3.2),
        FanEfficiency: 0.6,
        HumidifierEfficiency: 1.0,
        Tariffs: new Dictionary<Fuel, FuelTariff>());
}
