using BinEnergy.Core.Economizer;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// Hand-worked hours of the economizer model (DESIGN 8) with every intermediate value written
/// out. The system is <see cref="EconomizerTestSystems.HandWorked"/>: m_s = 1.2014 kg/s
/// (1,000 L/s of standard air, 0.075 lb/ft3 = 1.201385 kg/m3, common practice), x_min = 0.2,
/// T_s = 13 C, T_r = 24 C.
/// Indoor states at 101.325 kPa from the npm package psychrolib 1.1.1 (SI mode):
///   W_r   = GetHumRatioFromRelHum(24, 0.50) = 0.0092985052 kg/kg
///   W_lim = GetHumRatioFromRelHum(13, 0.90) = 0.0083859349 kg/kg
///   (p_ws(24 C) = 2985.13 Pa, p_ws(13 C) = 1497.81 Pa; handbook ch. 1 table 3 lists 2.9852 and
///   1.4980 kPa, recalled from memory.)
/// Enthalpy by Handbook—Fundamentals 2017 ch. 1 eq. 32: h = 1006 t + W (2,501,000 + 1860 t) J/kg,
///   h_r = 1006(24) + 0.0092985052 (2,501,000 + 44,640) = 24,144 + 23,670.65 = 47,814.65 J/kg.
/// Coil: sensible = m_s (1006 + 1860 W_mix)(T_mix - 13); latent = m_s (W_mix - W_leave)(h_g - h_w) at 13 C with
///   h_g = 2,501,000 + 1860 x 13 (eq. 32) and the condensate's h_w = 4186 x 13 (ch. 1, the coil equation
///   m (h1 - h2) - m (W1 - W2) h_w): 2,501,000 - 2326 x 13 = 2,501,000 - 30,238 = 2,470,762 J/kg.
/// </summary>
public class EconomizerHandWorkedTests
{
    private const double MassFlow = 1.201384753; // 1 m3/s x 0.075 lb/ft3 (common practice)
    private const double Wr = 0.0092985052; // psychrolib 1.1.1, GetHumRatioFromRelHum(24, 0.5, 101325)
    private const double Wlim = 0.0083859349; // psychrolib 1.1.1, GetHumRatioFromRelHum(13, 0.9, 101325)
    private const double LatentAtTs = 2_470_762.0; // 2,501,000 + 1860 x 13 - 4186 x 13 J/kg (eq. 32 less the condensate)

    private static readonly EconomizerModel Model = new(EconomizerTestSystems.HandWorked(), EconomizerTestSystems.SeaLevel);

    private static EconomizerControl Integrated(HighLimitKind kind) => new(kind, Integrated: true);

    private static EconomizerControl NonIntegrated(HighLimitKind kind) => new(kind, Integrated: false);

    private static EconomizerHour Hour(EconomizerControl c, double tO, double wO) =>
        Model.Evaluate(c, tO, wO, 1006 * tO + wO * (2_501_000 + 1860 * tO), Core.Psychrometrics.MoistAir.DewPoint(wO, EconomizerTestSystems.SeaLevel));

    private static void Close(double expected, double actual, double relative = 2e-6, double absolute = 1e-6) =>
        Assert.InRange(actual, expected - Math.Max(absolute, Math.Abs(expected) * relative), expected + Math.Max(absolute, Math.Abs(expected) * relative));

    [Fact]
    public void IndoorStates_MatchPsychrolib()
    {
        Close(Wr, Model.ReturnHumidityRatio, 1e-6);
        Close(Wlim, Model.CoilLeavingHumidityLimit, 1e-6);
        Close(47_814.65, Model.ReturnEnthalpyJPerKg, 1e-6); // worked above from eq. 32
        Close(MassFlow, Model.FlowBasisDensityKgPerM3, 1e-9);
    }

    [Fact]
    public void OutdoorAtSupplyTemperature_FreeCoolingMeetsSetpointWithFullOutdoorAir()
    {
        // T_o = 13 C = T_s, W_o = 0.008 (below W_lim 0.0083859: no dehumidification needed).
        // Q_b = 50,000 (13 - 10)/(35 - 10) = 6,000 W > 0: cooling needed.
        // x = (T_r - T_s)/(T_r - T_o) = (24 - 13)/(24 - 13) = 1.000 (within [0.2, 1]).
        // T_mix = 13.000 C = T_s exactly; W_mix = 0.008 < W_lim; coil load 0: free cooling.
        var h = Hour(Integrated(HighLimitKind.DifferentialDryBulb), 13.0, 0.008);
        Assert.Equal(EconomizerMode.FreeCooling, h.Mode);
        Assert.Equal(1.0, h.OutdoorFraction, 12);
        Assert.Equal(13.0, h.MixedDryBulbC, 9);
        Assert.Equal(0.008, h.MixedHumidityRatio, 12);
        Assert.Equal(0.0, h.CoilTotalW);
        Assert.Equal(6_000.0, Model.BuildingLoadW(13.0), 6);

        // Baseline, x = 0.2: T_mix = 0.2(13) + 0.8(24) = 21.8 C;
        // W_mix = 0.2(0.008) + 0.8(0.0092985052) = 0.0016 + 0.0074388042 = 0.0090388042;
        // sensible = 1.2013848 (1006 + 1860 x 0.0090388042)(21.8 - 13) = 1.2013848 x 1022.8122 x 8.8 = 10,813.36 W;
        // W_leave = W_lim; latent = 1.2013848 (0.0090388042 - 0.0083859349) 2,470,762 = 1,937.94 W; total 12,751.30 W.
        var b = Hour(EconomizerControl.None, 13.0, 0.008);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, b.Mode);
        Assert.Equal(0.2, b.OutdoorFraction, 12);
        Close(21.8, b.MixedDryBulbC, 1e-12);
        Close(0.0090388042, b.MixedHumidityRatio, 1e-6);
        Close(10_813.36, b.CoilSensibleW, 2e-6);
        Close(1_937.94, b.CoilLatentW, 2e-5);
        Close(12_751.30, b.CoilTotalW, 2e-6);
        Close(Wlim, b.LeavingHumidityRatio, 1e-6);
    }

    [Fact]
    public void OutdoorBelowSupplyTemperature_FractionMixesExactlyToSetpoint()
    {
        // T_o = 11 C, W_o = 0.004. Q_b = 50,000 (11 - 10)/25 = 2,000 W.
        // x = (24 - 13)/(24 - 11) = 11/13 = 0.846154; T_mix = 0.846154(11) + 0.153846(24) = 9.307692 + 3.692308 = 13.000 C.
        // W_mix = 0.846154(0.004) + 0.153846(0.0092985052) = 0.0033846 + 0.0014305 = 0.0048151 < W_lim: free cooling.
        var h = Hour(Integrated(HighLimitKind.FixedDryBulb), 11.0, 0.004);
        Assert.Equal(EconomizerMode.FreeCooling, h.Mode);
        Close(11.0 / 13.0, h.OutdoorFraction, 1e-12);
        Close(13.0, h.MixedDryBulbC, 1e-12);
        Close(0.0048151, h.MixedHumidityRatio, 2e-5);
        Assert.Equal(0.0, h.CoilTotalW);
    }

    [Fact]
    public void OutdoorBetweenSupplyAndReturn_IntegratedTrimsNonIntegratedLocksOut()
    {
        // T_o = 18 C, W_o = 0.007; Q_b = 50,000 (18 - 10)/25 = 16,000 W.
        // Differential dry-bulb: 18 < 24 enabled. x = (24 - 13)/(24 - 18) = 1.8333 -> clamped to 1.
        // Integrated: T_mix = 18 C, W_mix = 0.007 < W_lim: sensible only,
        //   1.2013848 (1006 + 1860 x 0.007)(18 - 13) = 1.2013848 x 1019.02 x 5 = 6,121.18 W.
        var i = Hour(Integrated(HighLimitKind.DifferentialDryBulb), 18.0, 0.007);
        Assert.Equal(EconomizerMode.Integrated, i.Mode);
        Assert.Equal(1.0, i.OutdoorFraction, 12);
        Assert.Equal(18.0, i.MixedDryBulbC, 12);
        Close(6_121.18, i.CoilSensibleW, 2e-6);
        Assert.Equal(0.0, i.CoilLatentW);

        // Non-integrated: the coil must run, so the economizer locks out to x = 0.2:
        //   T_mix = 0.2(18) + 0.8(24) = 22.8 C; W_mix = 0.0014 + 0.0074388042 = 0.0088388042;
        //   sensible = 1.2013848 (1006 + 16.4402)(9.8) = 12,037.77 W;
        //   latent = 1.2013848 (0.0088388042 - 0.0083859349) 2,470,762 = 1,344.27 W; total 13,382.04 W.
        var n = Hour(NonIntegrated(HighLimitKind.DifferentialDryBulb), 18.0, 0.007);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, n.Mode);
        Assert.Equal(0.2, n.OutdoorFraction, 12);
        Close(22.8, n.MixedDryBulbC, 1e-12);
        Close(12_037.77, n.CoilSensibleW, 2e-6);
        Close(1_344.27, n.CoilLatentW, 3e-5);
        Close(13_382.04, n.CoilTotalW, 2e-6);
        Assert.Equal(Hour(EconomizerControl.None, 18.0, 0.007), n);
    }

    [Fact]
    public void OutdoorAboveReturn_MinimumOutdoorAirForEveryControl()
    {
        // T_o = 30 C > T_r, W_o = 0.012; Q_b = 50,000 (30 - 10)/25 = 40,000 W.
        // Every control: x = x_min = 0.2; T_mix = 0.2(30) + 0.8(24) = 25.2 C;
        // W_mix = 0.0024 + 0.0074388042 = 0.0098388042;
        // sensible = 1.2013848 (1006 + 18.3002)(12.2) = 15,013.06 W;
        // latent = 1.2013848 (0.0098388042 - 0.0083859349) 2,470,762 = 4,312.60 W; total 19,325.66 W.
        foreach (var c in EconomizerTestSystems.AllControls(true).Append(EconomizerControl.None))
        {
            var h = Hour(c, 30.0, 0.012);
            Assert.Equal(EconomizerMode.MinimumOutdoorAir, h.Mode);
            Assert.Equal(0.2, h.OutdoorFraction, 12);
            Close(25.2, h.MixedDryBulbC, 1e-12);
            Close(15_013.06, h.CoilSensibleW, 2e-6);
            Close(4_312.60, h.CoilLatentW, 1e-5);
            Close(19_325.66, h.CoilTotalW, 2e-6);
        }
    }

    [Fact]
    public void FixedDryBulbLimit_BlocksAWarmDryHour()
    {
        // T_o = 21 C > limit 20 C, W_o = 0.005, h_o = 21,126 + 0.005 (2,540,060) = 33,826.3 J/kg.
        // Fixed dry-bulb: disabled (minimum outdoor air). Differential dry-bulb: 21 < 24, enabled, x = 1:
        //   sensible 1.2013848 (1006 + 9.3)(8) = 9,758.13 W, no latent (W_mix 0.005 < W_lim).
        // Baseline x = 0.2: T_mix = 23.4 C, W_mix = 0.0084388042:
        //   sensible 1.2013848 (1006 + 15.6962)(10.4) = 12,765.48 W; latent 1.2013848 (0.0000528693) 2,470,762 = 156.93 W.
        var f = Hour(Integrated(HighLimitKind.FixedDryBulb), 21.0, 0.005);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, f.Mode);
        Close(12_765.48, f.CoilSensibleW, 2e-6);
        Close(156.93, f.CoilLatentW, 3e-4);
        var d = Hour(Integrated(HighLimitKind.DifferentialDryBulb), 21.0, 0.005);
        Assert.Equal(EconomizerMode.Integrated, d.Mode);
        Close(9_758.13, d.CoilSensibleW, 2e-6);
        Assert.Equal(0.0, d.CoilLatentW);
    }

    [Fact]
    public void DifferentialDryBulb_BlocksAboveReturnEvenWhenDry()
    {
        // T_o = 26 C > T_r = 24 C, W_o = 0.002 (very dry): h_o = 26,156 + 0.002 (2,549,360) = 31,254.72 J/kg < h_r.
        // Differential dry-bulb: disabled. Differential enthalpy would pass its enthalpy test
        // but also needs T_o < T_r (and 26 C is above its 20 C dry-bulb limit).
        // Baseline: T_mix = 0.2(26) + 0.8(24) = 24.4 C, W_mix = 0.0004 + 0.0074388042 = 0.0078388042 (< W_lim, no latent);
        //   sensible = 1.2013848 (1006 + 14.5802)(11.4) = 13,977.65 W.
        foreach (var kind in new[] { HighLimitKind.DifferentialDryBulb, HighLimitKind.DifferentialEnthalpy })
        {
            var h = Hour(Integrated(kind), 26.0, 0.002);
            Assert.Equal(EconomizerMode.MinimumOutdoorAir, h.Mode);
            Close(13_977.65, h.CoilSensibleW, 2e-6);
            Assert.Equal(0.0, h.CoilLatentW);
        }

        Assert.False(Model.IsEnabled(Integrated(HighLimitKind.DifferentialDryBulb), 24.0, 30_000, 0)); // T_o = T_r: not cooler
    }

    [Fact]
    public void FixedEnthalpyLimit_BlocksAMildHumidHour()
    {
        // T_o = 18 C, W_o = 0.010: h_o = 18,108 + 0.010 (2,534,480) = 43,452.8 J/kg > limit 40,000.
        // Fixed enthalpy: disabled. Differential enthalpy: 43,452.8 < h_r 47,814.65 and 18 < 20: enabled, x = 1:
        //   sensible 1.2013848 (1006 + 18.6)(5) = 6,154.69 W;
        //   latent 1.2013848 (0.010 - 0.0083859349) 2,470,762 = 4,791.09 W; total 10,945.78 W.
        // Baseline: T_mix = 22.8 C, W_mix = 0.002 + 0.0074388042 = 0.0094388042:
        //   sensible 1.2013848 (1006 + 17.5562)(9.8) = 12,050.91 W; latent 1.2013848 (0.0010528693) 2,470,762 = 3,125.27 W;
        //   total 15,176.18 W.
        var f = Hour(Integrated(HighLimitKind.FixedEnthalpy), 18.0, 0.010);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, f.Mode);
        Close(15_176.18, f.CoilTotalW, 2e-6);
        Close(3_125.27, f.CoilLatentW, 2e-5);
        var d = Hour(Integrated(HighLimitKind.DifferentialEnthalpy), 18.0, 0.010);
        Assert.Equal(EconomizerMode.Integrated, d.Mode);
        Close(6_154.69, d.CoilSensibleW, 2e-6);
        Close(4_791.09, d.CoilLatentW, 2e-5);
        Close(10_945.78, d.CoilTotalW, 2e-6);
    }

    [Fact]
    public void DifferentialEnthalpyLimit_BlocksAHumidHourWhereDryBulbControlAddsLoad()
    {
        // T_o = 19 C, W_o = 0.0125: h_o = 19,114 + 0.0125 (2,536,340) = 50,818.25 J/kg > h_r 47,814.65.
        // Differential enthalpy: disabled -> baseline, x = 0.2: T_mix = 23.0 C, W_mix = 0.0025 + 0.0074388042 = 0.0099388042:
        //   sensible 1.2013848 (1006 + 18.4862)(10) = 12,308.02 W; latent 1.2013848 (0.0015528693) 2,470,762 = 4,609.44 W;
        //   total 16,917.46 W.
        // Differential dry-bulb: 19 < 24, enabled, x = 1: T_mix = 19 C, W_mix = 0.0125:
        //   sensible 1.2013848 (1006 + 23.25)(6) = 7,419.15 W; latent 1.2013848 (0.0041140651) 2,470,762 = 12,211.93 W;
        //   total 19,631.08 W: 2,713.62 W MORE than the baseline (negative savings).
        var e = Hour(Integrated(HighLimitKind.DifferentialEnthalpy), 19.0, 0.0125);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, e.Mode);
        Close(16_917.46, e.CoilTotalW, 2e-6);
        var d = Hour(Integrated(HighLimitKind.DifferentialDryBulb), 19.0, 0.0125);
        Assert.Equal(EconomizerMode.Integrated, d.Mode);
        Close(7_419.15, d.CoilSensibleW, 2e-6);
        Close(12_211.93, d.CoilLatentW, 2e-6);
        Close(19_631.08, d.CoilTotalW, 2e-6);
        Close(-2_713.62, e.CoilTotalW - d.CoilTotalW, 2e-5);
    }

    [Fact]
    public void FixedDewPointLimit_BlocksAHourTheFixedEnthalpyLimitLetsThrough()
    {
        // T_o = 15 C, W_o = 0.0085: dew point 11.60 C (psychrolib 1.1.1 GetTDewPointFromHumRatio) > limit 10 C.
        // h_o = 15,090 + 0.0085 (2,528,900) = 36,585.65 J/kg < 40,000: fixed enthalpy enabled, x = 1:
        //   sensible 1.2013848 (1006 + 15.81)(2) = 2,455.17 W; latent 1.2013848 (0.0001140651) 2,470,762 = 338.58 W.
        // Fixed dew point: disabled -> baseline: T_mix = 22.2 C, W_mix = 0.0017 + 0.0074388042 = 0.0091388042:
        //   sensible 1.2013848 (1006 + 16.9982)(9.2) = 11,306.93 W; latent 1.2013848 (0.0007528693) 2,470,762 = 2,234.77 W.
        var dp = Hour(Integrated(HighLimitKind.FixedDewPoint), 15.0, 0.0085);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, dp.Mode);
        Close(11_306.93, dp.CoilSensibleW, 2e-6);
        Close(2_234.77, dp.CoilLatentW, 2e-5);
        var fh = Hour(Integrated(HighLimitKind.FixedEnthalpy), 15.0, 0.0085);
        Assert.Equal(EconomizerMode.Integrated, fh.Mode);
        Close(2_455.17, fh.CoilSensibleW, 2e-6);
        Close(338.58, fh.CoilLatentW, 2e-4);
    }

    [Fact]
    public void BelowBalancePoint_NoCoolingNeeded_ButTheSupplyIsStillConditioned()
    {
        // T_o = 5 C < T_bal = 10 C: Q_b = 0, mode "no cooling" for every control. This system (constant volume with
        // reheat) still supplies 13 C air: without an economizer x = 0.2, T_mix = 0.2 x 5 + 0.8 x 24 = 20.2 C and
        // W_mix = 0.2 x 0.003 + 0.8 x 0.0092985052 = 0.0080388042 (below W_lim, no latent), so the coil cools
        // 1.2013848 x (1006 + 1860 x 0.0080388042) x 7.2 = 1.2013848 x 1020.9522 x 7.2 = 8,831.1 W.
        // Every economizer control is enabled (5 C is under each limit) and mixes to 13 C: x = 11/19, no coil.
        var b = Hour(EconomizerControl.None, 5.0, 0.003);
        Assert.Equal(EconomizerMode.NoCooling, b.Mode);
        Close(1.2013848 * (1006 + 1860 * 0.0080388042) * 7.2, b.CoilSensibleW, 2e-6);
        Assert.InRange(b.CoilSensibleW, 8_829, 8_833);
        foreach (var c in EconomizerTestSystems.AllControls(true))
        {
            var h = Hour(c, 5.0, 0.003);
            Assert.Equal(EconomizerMode.NoCooling, h.Mode);
            Close(11.0 / 19.0, h.OutdoorFraction);
            Assert.Equal(0.0, h.CoilTotalW);
        }
    }

    [Fact]
    public void HumidMixBelowSupplyTemperature_IsIntegratedNotFree()
    {
        // T_o = 12 C, W_o = 0.0088 (saturated near 12.3 C: fog). x = (24 - 13)/(24 - 12) = 0.916667, T_mix = 13 C;
        // W_mix = 0.916667(0.0088) + 0.083333(0.0092985052) = 0.0080667 + 0.0007749 = 0.0088415 > W_lim:
        // the coil must dehumidify (latent 1.2013848 (0.0088415 - 0.0083859) 2,470,762 = 1,352 W): "integrated".
        var i = Hour(Integrated(HighLimitKind.DifferentialDryBulb), 12.0, 0.0088);
        Assert.Equal(EconomizerMode.Integrated, i.Mode);
        Close(11.0 / 12.0, i.OutdoorFraction, 1e-12);
        Assert.Equal(0.0, i.CoilSensibleW);
        Close(1_352.0, i.CoilLatentW, 2e-3);
        var n = Hour(NonIntegrated(HighLimitKind.DifferentialDryBulb), 12.0, 0.0088);
        Assert.Equal(EconomizerMode.MinimumOutdoorAir, n.Mode);
    }
}
