using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Units;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// The Chicago energy balance of the three air-system types (the reference system of
/// docs/economizer.md: 10,000 cfm, 2,000 cfm outdoor air, 55 F supply, 75 F return, on the NREL
/// TMY3 file of Chicago O'Hare). A first-law balance on the air handler, hour by hour in every
/// occupied hour (the cooling hours, and those at or below the balance point, where the building
/// load is zero but the system still conditions its supply): the coil's sensible heat minus preheat equals what the supply delivers to the
/// zones (the building load, plus reheat, less the unmet load) plus the outdoor air's sensible
/// load against the return air, m_oa c_p (T_o - T_r) (steady-flow energy balance, Handbook—
/// Fundamentals 2017 ch. 1, "adiabatic mixing" and "sensible heating or cooling").
/// </summary>
public class AirSystemEnergyBalanceTests(EconomizerRealFiles files, ITestOutputHelper output) : IClassFixture<EconomizerRealFiles>
{
    private const string Chicago = "725300TYA.CSV";

    [Theory]
    [InlineData(AirSystemType.SingleZone, false)]
    [InlineData(AirSystemType.VariableVolume, false)]
    [InlineData(AirSystemType.ConstantVolumeReheat, false)]
    [InlineData(AirSystemType.SingleZone, true)]
    [InlineData(AirSystemType.VariableVolume, true)]
    [InlineData(AirSystemType.ConstantVolumeReheat, true)]
    public void Chicago_BaselineCoilEnergy_IsTheBuildingLoadPlusTheOutdoorAirLoad(AirSystemType type, bool fan)
    {
        var w = files.Weather[Chicago];
        var occ = files.Occupied[Chicago];
        var settings = EconomizerRealFiles.Reference(true) with
        {
            System = type,
            SupplyAirflowMin = type == AirSystemType.VariableVolume ? VolumeFlow.FromCfm(3_000) : null,
            SupplyFan = fan ? new AirSystemFan(3 * 248.84, 0.6) : null, // 3 in. w.g. at 0.6 (recalled from memory)
        };
        var model = new EconomizerModel(settings, w.Site.SitePressurePa);
        double mOa = model.FlowBasisDensityKgPerM3 * settings.MinOutdoorAirflow.CubicMetresPerSecond;
        double cpR = 1006 + 1860 * model.ReturnHumidityRatio; // eq. 32 differentiated
        double tR = settings.ReturnTemperature.Celsius;
        double building = 0, outdoorAir = 0, coil = 0, latent = 0, reheat = 0, preheat = 0, unmet = 0, fans = 0, winterReheat = 0;
        for (int i = 0; i < w.Count; i++)
        {
            if (!occ[i])
            {
                continue;
            }

            double qb = model.BuildingLoadW(w.DryBulbC[i]);
            var h = model.Evaluate(EconomizerControl.None, w.DryBulbC[i], w.HumidityRatio[i], w.EnthalpyJPerKg[i], w.DewPointC[i]);
            if (qb <= 0)
            {
                Assert.Equal(EconomizerMode.NoCooling, h.Mode);
                winterReheat += h.ReheatW * 3600;
            }

            building += qb * 3600;
            outdoorAir += mOa * cpR * (w.DryBulbC[i] - tR) * 3600;
            coil += h.CoilSensibleW * 3600;
            latent += h.CoilLatentW * 3600;
            reheat += h.ReheatW * 3600;
            preheat += h.PreheatW * 3600;
            unmet += h.UnmetW * 3600;
            fans += h.FanW * 3600;
        }

        // coil - preheat = (building + reheat - unmet) + outdoor air + supply-fan heat, to the c_p of mixed against room air
        // (1.86 dW / 1.02: under 0.3 % of the terms).
        double lhs = coil - preheat;
        double rhs = building + reheat - unmet + outdoorAir + fans;
        double scale = building + reheat + preheat + Math.Abs(outdoorAir);
        Assert.InRange(lhs, rhs - 0.003 * scale, rhs + 0.003 * scale);

        // At or below the balance point a single-zone supply is at room temperature (no reheat); the other two reheat their
        // cool supply back to it (variable volume at its minimum airflow, constant volume at its fixed supply temperature).
        if (type == AirSystemType.SingleZone)
        {
            Assert.Equal(0.0, winterReheat);
        }
        else
        {
            Assert.True(winterReheat > 0.1 * reheat, "winter reheat is counted");
        }

        if (type != AirSystemType.ConstantVolumeReheat)
        {
            // A system that follows the load: no more coil than the building's load plus the outdoor-air load (and reheat at the minimum).
            Assert.True(coil <= building + reheat + Math.Max(outdoorAir, 0) + preheat + fans + 0.001 * building);
        }
        else
        {
            Assert.True(reheat > 0.2 * building, "constant volume with reheat reheats much of the year");
        }

        var e = EconomizerEvaluation.Evaluate(w, occ, BinTable.Build(w, DryBulbBinScale.Default(UnitSystem.IP), occ), settings);
        Assert.Equal(coil + latent, e.Baseline.Totals.Hourly.CoilTotal.Joules, 1e-6 * (coil + latent));
        var db = EconomizerRealFiles.Control(e, HighLimitKind.DifferentialDryBulb);
        output.WriteLine(FormattableString.Invariant(
            $"{AirSystemTypes.Name(type)}{(fan ? " with a 3 in. w.g. supply fan" : string.Empty)}: building {Energy.FromJoules(building).Kbtu:N0} kBtu, OA sensible {Energy.FromJoules(outdoorAir).Kbtu:N0}, baseline coil {e.Baseline.Totals.Hourly.CoilTotal.Kbtu:N0} kBtu (latent {Energy.FromJoules(latent).Kbtu:N0}), reheat {Energy.FromJoules(reheat).Kbtu:N0} (at or below the balance point {Energy.FromJoules(winterReheat).Kbtu:N0}), preheat {Energy.FromJoules(preheat).Kbtu:N0}, unmet {Energy.FromJoules(unmet).Kbtu:N0}, fans {Energy.FromJoules(fans).KilowattHours:N0} kWh in occupied hours; differential dry-bulb saves {db.Savings(IntegrationMethod.Hourly).Kbtu:N0} kBtu coil, {db.HeatingSavings(IntegrationMethod.Hourly).Kbtu:N0} kBtu heating"));
        Assert.True(db.Savings(IntegrationMethod.Hourly).Joules > 0);
        Assert.True(db.Savings(IntegrationMethod.Hourly).Joules < e.Baseline.Totals.Hourly.CoilTotal.Joules);
    }

    [Fact]
    public void Chicago_TheLoadFollowingTypesNeedLessCoilEnergyThanConstantVolumeWithReheat()
    {
        var w = files.Weather[Chicago];
        var occ = files.Occupied[Chicago];
        var bins = BinTable.Build(w, DryBulbBinScale.Default(UnitSystem.IP), occ);
        double Coil(AirSystemType t) => EconomizerEvaluation.Evaluate(w, occ, bins, EconomizerRealFiles.Reference(true) with
        {
            System = t,
            SupplyAirflowMin = t == AirSystemType.VariableVolume ? VolumeFlow.FromCfm(3_000) : null,
        }).Baseline.Totals.Hourly.CoilTotal.Joules;
        double cvr = Coil(AirSystemType.ConstantVolumeReheat);
        Assert.True(Coil(AirSystemType.VariableVolume) < cvr);
        Assert.True(Coil(AirSystemType.SingleZone) < cvr);
    }
}
