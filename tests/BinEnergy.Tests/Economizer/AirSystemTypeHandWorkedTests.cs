using BinEnergy.Core.Economizer;
using BinEnergy.Core.Units;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// Hand-worked hours of the three air-system types (DESIGN 8 and 15) on the small system of
/// <see cref="EconomizerTestSystems.HandWorked"/>: 1,000 L/s of standard air, m = 1.201384753 kg/s
/// (0.075 lb/ft3, common practice), 200 L/s outdoor air, T_s 13 C, T_r 24 C at 50 % RH, load line
/// 50 kW at 35 C from a 10 C balance point (2,000 W/K). Room-air humid heat
/// c_p,r = 1006 + 1860 W_r J/(kg K) (Handbook—Fundamentals 2017, ch. 1, eq. 32 differentiated) with
/// W_r = 0.0092985052 (psychrolib 1.1.1, GetHumRatioFromRelHum(24, 0.5, 101325)):
/// c_p,r = 1006 + 17.2952 = 1023.2952 J/(kg K).
/// </summary>
public class AirSystemTypeHandWorkedTests
{
    private const double MassFlow = 1.201384753; // 1 m3/s x 0.075 lb/ft3 (common practice)
    private const double Wr = 0.0092985052; // psychrolib 1.1.1, GetHumRatioFromRelHum(24, 0.5, 101325)
    private const double CpR = 1006 + 1860 * Wr; // eq. 32 differentiated: 1023.2952 J/(kg K)

    private static EconomizerModel Model(AirSystemType type, Func<EconomizerSettings, EconomizerSettings>? change = null)
    {
        var s = EconomizerTestSystems.HandWorked() with { System = type };
        return new EconomizerModel(change is null ? s : change(s), EconomizerTestSystems.SeaLevel);
    }

    private static EconomizerHour Hour(EconomizerModel m, EconomizerControl c, double tO, double wO) =>
        m.Evaluate(c, tO, wO, 1006 * tO + wO * (2_501_000 + 1860 * tO), Core.Psychrometrics.MoistAir.DewPoint(wO, EconomizerTestSystems.SeaLevel));

    private static double Cp(double w) => 1006 + 1860 * w; // eq. 32 differentiated

    private static void Close(double expected, double actual, double relative = 1e-6) =>
        Assert.InRange(actual, expected - Math.Max(1e-6, Math.Abs(expected) * relative), expected + Math.Max(1e-6, Math.Abs(expected) * relative));

    private static readonly EconomizerControl Differential = new(HighLimitKind.DifferentialDryBulb);

    [Fact]
    public void SingleZone_SupplyFollowsTheLoad_AndTheEconomizerMixesToIt()
    {
        // T_o = 15 C, W_o = 0.008. Q_b = 2,000 (15 - 10) = 10,000 W.
        // T_sup = 24 - 10,000 / (1.201385 x 1023.2952) = 24 - 8.1341 = 15.8659 C (above T_s = 13: not clamped).
        // Baseline x = 0.2: T_mix = 0.2 x 15 + 0.8 x 24 = 22.2 C; W_mix = 0.2 x 0.008 + 0.8 x W_r = 0.00903880.
        // Coil sensible = 1.201385 x (1006 + 1860 x 0.0090388)(22.2 - 15.8659) = 1.201385 x 1022.8122 x 6.3341 = 7,783 W.
        // W_lim at 15.87 C, 90 % RH is about 0.0101 > W_mix: no latent. Delivered = Q_b exactly: no reheat.
        var m = Model(AirSystemType.SingleZone);
        double tSup = 24 - 10_000 / (MassFlow * CpR);
        double wMix = 0.2 * 0.008 + 0.8 * Wr;
        var b = Hour(m, EconomizerControl.None, 15, 0.008);
        Close(tSup, b.SupplyDryBulbC);
        Close(MassFlow, b.SupplyMassFlowKgPerS);
        Close(22.2, b.MixedDryBulbC);
        Close(MassFlow * Cp(wMix) * (22.2 - tSup), b.CoilSensibleW);
        Assert.InRange(b.CoilSensibleW, 7_780, 7_786);
        Assert.Equal(0.0, b.CoilLatentW);
        Assert.Equal(0.0, b.ReheatW);
        Assert.Equal(0.0, b.PreheatW);

        // Economizer: x = (24 - 15.8659)/(24 - 15) = 0.90379 mixes exactly to T_sup: free cooling, coil 0.
        var e = Hour(m, Differential, 15, 0.008);
        Assert.Equal(EconomizerMode.FreeCooling, e.Mode);
        Close((24 - tSup) / (24 - 15), e.OutdoorFraction);
        Assert.Equal(0.0, e.CoilTotalW);
    }

    [Fact]
    public void SingleZone_NeverBelowTheSetSupplyTemperature_AndTheRestIsUnmet()
    {
        // T_o = 40 C: Q_b = 2,000 x 30 = 60,000 W. T_r - Q_b/(m c_p) = 24 - 48.80 < 13, so T_sup = 13 C.
        // Delivered = 1.201385 x 1023.2952 x 11 = 13,523.2 W; unmet = 60,000 - 13,523.2 = 46,476.8 W.
        var h = Hour(Model(AirSystemType.SingleZone), EconomizerControl.None, 40, 0.010);
        Close(13, h.SupplyDryBulbC);
        Close(60_000 - MassFlow * CpR * 11, h.UnmetW);
        Assert.Equal(0.0, h.ReheatW);
    }

    [Fact]
    public void SingleZone_SmallLoadOnACoolDay_PreheatsTheMixedAir()
    {
        // T_o = 10.5 C: Q_b = 2,000 x 0.5 = 1,000 W. T_sup = 24 - 1,000/(1.201385 x 1023.2952) = 23.18658 C.
        // x = 0.2 (the economizer cannot go below minimum): T_mix = 0.2 x 10.5 + 0.8 x 24 = 21.3 C < T_sup.
        // W_mix = 0.2 x 0.006 + 0.8 x W_r = 0.00863880; preheat = 1.201385 x (1006 + 1860 x 0.0086388)(23.18658 - 21.3)
        //   = 1.201385 x 1022.0682 x 1.88658 = 2,316.5 W; coil sensible 0.
        var m = Model(AirSystemType.SingleZone);
        double tSup = 24 - 1_000 / (MassFlow * CpR);
        double wMix = 0.2 * 0.006 + 0.8 * Wr;
        foreach (var c in new[] { EconomizerControl.None, Differential })
        {
            var h = Hour(m, c, 10.5, 0.006);
            Close(MassFlow * Cp(wMix) * (tSup - 21.3), h.PreheatW);
            Assert.InRange(h.PreheatW, 2_314, 2_319);
            Assert.Equal(0.0, h.CoilSensibleW);
        }
    }

    [Fact]
    public void VariableVolume_AirflowFollowsTheLoad_ThenReheatsAtTheMinimum()
    {
        // Default minimum airflow: max(0.30 x 1,000, 200) = 300 L/s, 0.3604154 kg/s.
        // T_o = 15 C: Q_b = 10,000 W; m = 10,000 / (1023.2952 x 11) = 0.888385 kg/s (inside [0.36042, 1.20138]).
        // x_min = 1.201385 x 0.2 / 0.888385 = 0.270461; T_mix = 0.270461 x 15 + 0.729539 x 24 = 21.56585 C;
        // coil sensible = 0.888385 x c_p(W_mix)(21.56585 - 13); no reheat.
        var m = Model(AirSystemType.VariableVolume);
        double ms = 10_000 / (CpR * 11);
        double x = MassFlow * 0.2 / ms;
        double tMix = x * 15 + (1 - x) * 24;
        double wMix = x * 0.008 + (1 - x) * Wr;
        var b = Hour(m, EconomizerControl.None, 15, 0.008);
        Close(ms, b.SupplyMassFlowKgPerS);
        Close(x, b.OutdoorFraction);
        Close(ms * Cp(wMix) * (tMix - 13), b.CoilSensibleW);
        Assert.Equal(0.0, b.ReheatW);

        // T_o = 11 C: Q_b = 2,000 W; m wanted 2,000 / (1023.2952 x 11) = 0.17768 < minimum 0.3604154 kg/s.
        // Delivered at the minimum: 0.3604154 x 1023.2952 x 11 = 4,056.9 W; reheat = 4,056.9 - 2,000 = 2,056.9 W.
        var r = Hour(m, EconomizerControl.None, 11, 0.007);
        Close(MassFlow * 0.3, r.SupplyMassFlowKgPerS);
        Close(MassFlow * 0.3 * CpR * 11 - 2_000, r.ReheatW);
        Assert.InRange(r.ReheatW, 2_055, 2_059);
    }

    [Fact]
    public void VariableVolume_AllOutdoorAirAtTheMinimum_PreheatsAndReheats()
    {
        // Outdoor air 300 L/s = the minimum airflow: x_min = 1. T_o = 11 C, W_o = 0.007: Q_b = 2,000 W.
        // T_mix = 11 C < 13 C: preheat = 0.3604154 x (1006 + 1860 x 0.007) x 2 = 0.3604154 x 1019.02 x 2 = 734.54 W;
        // reheat as above, 2,056.9 W.
        var m = Model(AirSystemType.VariableVolume, s => s with { MinOutdoorAirflow = VolumeFlow.FromLitresPerSecond(300) });
        var h = Hour(m, EconomizerControl.None, 11, 0.007);
        Close(1.0, h.OutdoorFraction);
        Close(MassFlow * 0.3 * Cp(0.007) * 2, h.PreheatW);
        Assert.InRange(h.PreheatW, 734, 735.1);
        Close(MassFlow * 0.3 * CpR * 11 - 2_000, h.ReheatW);
    }

    [Fact]
    public void VariableVolume_SupplyTemperatureReset_IsLinearInOutdoorTemperature()
    {
        // Reset 18 C at and below 12 C outdoors, 13 C at and above 20 C. At T_o = 16 C:
        // T_set = 18 + (13 - 18)(16 - 12)/(20 - 12) = 15.5 C. Q_b = 12,000 W; m = 12,000 / (1023.2952 x 8.5) = 1.379609 kg/s,
        // above the maximum 1.201385: m = 1.201385 at 15.5 C, delivered 1.201385 x 1023.2952 x 8.5 = 10,449.7 W, unmet 1,550.3 W.
        var reset = new SupplyTemperatureReset(Temperature.FromCelsius(18), Temperature.FromCelsius(12), Temperature.FromCelsius(20));
        var m = Model(AirSystemType.VariableVolume, s => s with { Reset = reset });
        Close(18, m.SupplySetpointC(5));
        Close(15.5, m.SupplySetpointC(16));
        Close(13, m.SupplySetpointC(30));
        var h = Hour(m, EconomizerControl.None, 16, 0.008);
        Close(15.5, h.SupplyDryBulbC);
        Close(MassFlow, h.SupplyMassFlowKgPerS);
        Close(12_000 - MassFlow * CpR * 8.5, h.UnmetW);

        // At T_o = 12.5 C: T_set = 18 - 5 x 0.5/8 = 17.6875 C; Q_b = 5,000 W; m = 5,000/(1023.2952 x 6.3125) = 0.774057 kg/s.
        var low = Hour(m, EconomizerControl.None, 12.5, 0.006);
        Close(17.6875, low.SupplyDryBulbC);
        Close(5_000 / (CpR * 6.3125), low.SupplyMassFlowKgPerS);
        Assert.Equal(0.0, low.ReheatW);
    }

    [Fact]
    public void ConstantVolumeReheat_CoolsEverythingToTheSupplyTemperature_AndReheats()
    {
        // T_o = 15 C: x = 0.2, T_mix = 22.2 C, coil sensible = 1.201385 x c_p(0.0090388) x 9.2 = 11,305 W.
        // Delivered = 1.201385 x 1023.2952 x 11 = 13,523.2 W against Q_b = 10,000 W: reheat 3,523.2 W.
        var m = Model(AirSystemType.ConstantVolumeReheat);
        double wMix = 0.2 * 0.008 + 0.8 * Wr;
        var b = Hour(m, EconomizerControl.None, 15, 0.008);
        Close(MassFlow * Cp(wMix) * 9.2, b.CoilSensibleW);
        Close(MassFlow * CpR * 11 - 10_000, b.ReheatW);
        Assert.InRange(b.ReheatW, 3_521, 3_525);

        // The economizer (x = (24 - 13)/(24 - 15) = 1.2 -> 1) gives a mix of 15 C: the coil trims 2 K and the reheat is the same.
        var e = Hour(m, Differential, 15, 0.008);
        Assert.Equal(EconomizerMode.Integrated, e.Mode);
        Close(MassFlow * Cp(0.008) * 2, e.CoilSensibleW);
        Close(b.ReheatW, e.ReheatW);
    }

    [Fact]
    public void SettingsErrors_NameTheKey()
    {
        var cvr = EconomizerTestSystems.HandWorked() with { SupplyAirflowMin = VolumeFlow.FromLitresPerSecond(400) };
        Assert.Contains(cvr.Problems(), p => p.Key == "supply_airflow_min" && p.Message.Contains("variable-volume", StringComparison.Ordinal));
        var reset = new SupplyTemperatureReset(Temperature.FromCelsius(12), Temperature.FromCelsius(12), Temperature.FromCelsius(20));
        var vav = EconomizerTestSystems.HandWorked() with { System = AirSystemType.VariableVolume, Reset = reset };
        Assert.Contains(vav.Problems(), p => p.Key == "supply_temp_reset_max");
        var sz = EconomizerTestSystems.HandWorked() with { System = AirSystemType.SingleZone, Reset = reset with { MaxSupply = Temperature.FromCelsius(16) } };
        Assert.Contains(sz.Problems(), p => p.Key == "supply_temp_reset_max" && p.Message.Contains("single-zone", StringComparison.Ordinal));
    }

    [Fact]
    public void SupplyFan_HeatAfterTheCoil_LowersTheCoilLeavingTemperature()
    {
        // Constant volume with reheat, supply fan 500 Pa at efficiency 0.5: P = 1.0 m3/s x 500 / 0.5 = 1,000 W (FanPower).
        // Fan rise 1,000 / (1.201385 x 1023.2952) = 0.81342 K: the coil cools to 13 - 0.81342 = 12.18658 C.
        // T_o = 15 C, x = 0.2, T_mix = 22.2 C: sensible = 1.201385 x c_p(W_mix) x (22.2 - 12.18658).
        var m = Model(AirSystemType.ConstantVolumeReheat, s => s with { SupplyFan = new AirSystemFan(500, 0.5) });
        double tCoil = 13 - 1_000 / (MassFlow * CpR);
        var b = Hour(m, EconomizerControl.None, 15, 0.004);
        Close(1_000, b.FanW);
        Close(MassFlow * Cp(b.MixedHumidityRatio) * (22.2 - tCoil), b.CoilSensibleW);
        Close(13, b.SupplyDryBulbC);
        Close(MassFlow * CpR * 11 - 10_000, b.ReheatW); // the zones still get 13 C air

        // T_o = 11 C: the economizer mixes to the coil-leaving 12.18658 C, x = (24 - 12.18658)/(24 - 11) = 0.908725: free cooling.
        var e = Hour(m, Differential, 11, 0.004);
        Assert.Equal(EconomizerMode.FreeCooling, e.Mode);
        Close((24 - tCoil) / 13, e.OutdoorFraction);
        Close(tCoil, e.MixedDryBulbC);
        Close(1_000, e.FanW);
    }

    [Fact]
    public void ReturnFan_HeatRaisesTheReturnAirBeforeTheMixingBox()
    {
        // Return fan 250 Pa at 0.5: 1.0 x 250 / 0.5 = 500 W; rise 500 / (1.201385 x 1023.2952) = 0.40671 K.
        // T_o = 15 C, x = 0.2: T_mix = 0.2 x 15 + 0.8 x 24.40671 = 22.52537 C.
        var m = Model(AirSystemType.ConstantVolumeReheat, s => s with { ReturnFan = new AirSystemFan(250, 0.5) });
        var h = Hour(m, EconomizerControl.None, 15, 0.004);
        Close(0.2 * 15 + 0.8 * (24 + 500 / (MassFlow * CpR)), h.MixedDryBulbC);
        Close(500, h.FanW);
    }

    [Fact]
    public void VariableVolumeFan_FollowsThePartLoadCurve()
    {
        // Default curve 0.0013 + 0.1470 f + 0.9506 f^2 - 0.0998 f^3 (ASHRAE 90.1 Appendix G, recalled from memory):
        // f = 1: 0.0013 + 0.147 + 0.9506 - 0.0998 = 0.9991; f = 0.5: 0.0013 + 0.0735 + 0.23765 - 0.012475 = 0.299975.
        Close(0.9991, FanPartLoadCurve.Default.Fraction(1.0));
        Close(0.299975, FanPartLoadCurve.Default.Fraction(0.5));

        // T_o = 15 C: m = 10,000 / (1023.2952 x 11) = 0.888385 kg/s (as above), f = 0.888385 / 1.201385 = 0.73946.
        // Design 1,000 W (500 Pa at 0.5): P = 1,000 x g(0.73946) = 1,000 (0.0013 + 0.10870 + 0.51979 - 0.04035) = 589.4 W.
        var m = Model(AirSystemType.VariableVolume, s => s with { SupplyFan = new AirSystemFan(500, 0.5) });
        double f = 10_000 / (CpR * 11) / MassFlow;
        double g = 0.0013 + 0.1470 * f + 0.9506 * f * f - 0.0998 * f * f * f;
        var h = Hour(m, EconomizerControl.None, 15, 0.004);
        Close(1_000 * g, h.FanW); // the airflow follows the zone load; the coil, not the zone, absorbs the fan heat
        Assert.InRange(h.FanW, 589, 590);

        // Below the balance point the fans still run, at the minimum airflow (f = 0.3): 1,000 x g(0.3).
        var idle = Hour(m, EconomizerControl.None, 5, 0.003);
        Assert.Equal(EconomizerMode.NoCooling, idle.Mode);
        Close(1_000 * FanPartLoadCurve.Default.Fraction(0.3), idle.FanW);
        Assert.Equal(0.0, idle.CoilTotalW);
    }

    [Fact]
    public void BelowTheBalancePoint_VariableVolume_PreheatsTheMixAndReheatsTheMinimumAirflow()
    {
        // T_o = 5 C < T_bal = 10 C: Q_b = 0, mode "no cooling", but the system still supplies 13 C air at its minimum.
        // m = 0.3 x 1.201385 = 0.3604154 kg/s; x_min = 1.201385 x 0.2 / 0.3604154 = 0.666667.
        // T_mix = 0.666667 x 5 + 0.333333 x 24 = 11.33333 C < 13 C; W_mix = 0.666667 x 0.003 + 0.333333 x W_r = 0.00509950.
        // Preheat = 0.3604154 x (1006 + 1860 x 0.0050995)(13 - 11.33333) = 0.3604154 x 1015.4851 x 1.66667 = 610.0 W.
        // Reheat to room temperature (the zones need no cooling): 0.3604154 x 1023.2952 x (24 - 13) = 4,056.9 W. Coil 0.
        var m = Model(AirSystemType.VariableVolume);
        double ms = 0.3 * MassFlow;
        double x = MassFlow * 0.2 / ms;
        double wMix = x * 0.003 + (1 - x) * Wr;
        double tMix = x * 5 + (1 - x) * 24;
        foreach (var c in new[] { EconomizerControl.None, Differential })
        {
            // The economizer would mix to (24 - 13)/(24 - 5) = 0.579 < x_min: it stays at the minimum, the same hour.
            var h = Hour(m, c, 5, 0.003);
            Assert.Equal(EconomizerMode.NoCooling, h.Mode);
            Close(x, h.OutdoorFraction);
            Close(ms * Cp(wMix) * (13 - tMix), h.PreheatW);
            Assert.InRange(h.PreheatW, 609, 611);
            Close(ms * CpR * 11, h.ReheatW);
            Assert.InRange(h.ReheatW, 4_055, 4_059);
            Assert.Equal(0.0, h.CoilTotalW);
        }
    }

    [Fact]
    public void BelowTheBalancePoint_ConstantVolumeReheat_CoolsAndReheats_AndTheEconomizerSavesTheCoil()
    {
        // T_o = 8 C, W_o = 0.004: Q_b = 0. Baseline x = 0.2: T_mix = 0.2 x 8 + 0.8 x 24 = 20.8 C, above T_s = 13 C:
        // W_mix = 0.2 x 0.004 + 0.8 x W_r = 0.00823880 (below W_lim at 13 C, 90 % RH, about 0.00839: no latent).
        // Coil sensible = 1.201385 x (1006 + 1860 x 0.0082388) x 7.8 = 1.201385 x 1021.3242 x 7.8 = 9,570.6 W.
        // Reheat = 1.201385 x 1023.2952 x 11 = 13,523.2 W (all of the supply's cooling, since the zones need none).
        var m = Model(AirSystemType.ConstantVolumeReheat);
        double wMix = 0.2 * 0.004 + 0.8 * Wr;
        var b = Hour(m, EconomizerControl.None, 8, 0.004);
        Assert.Equal(EconomizerMode.NoCooling, b.Mode);
        Close(MassFlow * Cp(wMix) * 7.8, b.CoilSensibleW);
        Assert.InRange(b.CoilSensibleW, 9_568, 9_573);
        Assert.Equal(0.0, b.CoilLatentW);
        Close(MassFlow * CpR * 11, b.ReheatW);
        Assert.InRange(b.ReheatW, 13_521, 13_525);

        // The economizer mixes to 13 C, x = (24 - 13)/(24 - 8) = 0.6875: no coil; the reheat is the same.
        var e = Hour(m, Differential, 8, 0.004);
        Assert.Equal(EconomizerMode.NoCooling, e.Mode);
        Close(11.0 / 16.0, e.OutdoorFraction);
        Assert.Equal(0.0, e.CoilTotalW);
        Close(b.ReheatW, e.ReheatW);
    }

    [Fact]
    public void BelowTheBalancePoint_SingleZone_SuppliesRoomTemperature_AndPreheatsOnly()
    {
        // T_o = 5 C: Q_b = 0, T_sup = 24 - 0 = 24 C (the supply follows the load line to room temperature).
        // x = 0.2: T_mix = 0.2 x 5 + 0.8 x 24 = 20.2 C; W_mix = 0.2 x 0.003 + 0.8 x W_r = 0.00803880.
        // Preheat = 1.201385 x (1006 + 1860 x 0.0080388)(24 - 20.2) = 1.201385 x 1020.9522 x 3.8 = 4,660.9 W; no reheat, no coil.
        var h = Hour(Model(AirSystemType.SingleZone), EconomizerControl.None, 5, 0.003);
        Assert.Equal(EconomizerMode.NoCooling, h.Mode);
        Close(24, h.SupplyDryBulbC);
        Close(MassFlow * Cp(0.2 * 0.003 + 0.8 * Wr) * 3.8, h.PreheatW);
        Assert.InRange(h.PreheatW, 4_659, 4_663);
        Assert.Equal(0.0, h.ReheatW);
        Assert.Equal(0.0, h.CoilTotalW);
    }
}
