using BinEnergy.Core.Economizer;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// Invariants of the hour model over a grid of outdoor states from -10 C to 40 C and 5 % to
/// 100 % RH, for constant and variable volume and every flow basis (DESIGN 8).
/// </summary>
public class EconomizerModelInvariantTests
{
    private const double P = EconomizerTestSystems.SeaLevel;

    public static TheoryData<bool, FlowBasis> Systems() => new()
    {
        { false, FlowBasis.Site },
        { true, FlowBasis.Site },
        { false, FlowBasis.Standard },
        { false, FlowBasis.Actual },
        { true, FlowBasis.Actual },
    };

    private static IEnumerable<(double T, double W, double H, double Dp)> Grid()
    {
        for (double t = -10; t <= 40; t += 0.5)
        {
            for (double rh = 0.05; rh <= 1.0001; rh += 0.05)
            {
                double w = MoistAir.HumidityRatioFromRelativeHumidity(t, Math.Min(rh, 1.0), P);
                yield return (t, w, MoistAir.Enthalpy(t, w), MoistAir.DewPoint(w, P));
            }
        }
    }

    [Theory]
    [MemberData(nameof(Systems))]
    public void DifferentialEnthalpy_NeverRaisesTheCoilLoad(bool variable, FlowBasis basis)
    {
        var model = new EconomizerModel(EconomizerTestSystems.Office(variable, basis), P);
        foreach (bool integrated in new[] { true, false })
        {
            var control = new EconomizerControl(HighLimitKind.DifferentialEnthalpy, integrated);
            foreach (var s in Grid())
            {
                var e = model.Evaluate(control, s.T, s.W, s.H, s.Dp);
                var b = model.Evaluate(EconomizerControl.None, s.T, s.W, s.H, s.Dp);
                // Equal loads allowed; a rise of more than 1e-9 W is a defect.
                Assert.True(e.CoilTotalW <= b.CoilTotalW + 1e-9,
                    FormattableString.Invariant($"{basis} variable={variable} integrated={integrated}: T_o {s.T} C, W_o {s.W:0.00000}: control {e.CoilTotalW:0.0} W > baseline {b.CoilTotalW:0.0} W"));
            }
        }
    }

    [Theory]
    [MemberData(nameof(Systems))]
    public void FreeCooling_NeverAboveTheSupplyTemperature_AndMixesToIt(bool variable, FlowBasis basis)
    {
        var settings = EconomizerTestSystems.Office(variable, basis);
        var model = new EconomizerModel(settings, P);
        double ts = settings.SupplyTemperature.Celsius;
        foreach (var control in settings.Controls)
        {
            foreach (var s in Grid())
            {
                var h = model.Evaluate(control, s.T, s.W, s.H, s.Dp);
                if (h.Mode == EconomizerMode.FreeCooling)
                {
                    Assert.True(s.T <= ts, $"free cooling at {s.T} C above the supply temperature {ts:0.00} C ({control.Describe()})");
                    Assert.True(h.MixedDryBulbC <= ts + 1e-9, "free cooling mixes to at most the supply temperature");
                    Assert.Equal(0.0, h.CoilTotalW);
                }

                if (h.Mode == EconomizerMode.Integrated)
                {
                    Assert.True(control.Integrated, "only integrated controls run the coil with the economizer on");
                    Assert.True(h.CoilTotalW > 0);
                }

                Assert.InRange(h.OutdoorFraction, 0.0, 1.0);
                Assert.True(h.CoilSensibleW >= 0 && h.CoilLatentW >= 0, "coil loads are never negative");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Systems))]
    public void CoilLoad_EqualsMassFlowTimesEnthalpyDrop(bool variable, FlowBasis basis)
    {
        // Sensible + latent must equal the coil load of Handbook—Fundamentals 2017 ch. 1 ("cooling and
        // dehumidifying of moist air"): m_s (h_mix - h_leave) - m_s (W_mix - W_leave) h_w, with h from eq. 32
        // and the condensate at T_s, h_w = 4.186 T_s kJ/kg, whenever the mix is at or above T_s.
        var settings = EconomizerTestSystems.Office(variable, basis);
        var model = new EconomizerModel(settings, P);
        double ts = settings.SupplyTemperature.Celsius;
        foreach (var control in settings.Controls.Append(EconomizerControl.None))
        {
            foreach (var s in Grid())
            {
                var h = model.Evaluate(control, s.T, s.W, s.H, s.Dp);
                if (h.Mode == EconomizerMode.NoCooling || h.MixedDryBulbC < ts)
                {
                    continue;
                }

                double condensate = (h.MixedHumidityRatio - h.LeavingHumidityRatio) * 4186.0 * ts; // h_w = 4.186 t kJ/kg (ch. 1)
                double expected = h.SupplyMassFlowKgPerS * (h.MixedEnthalpyJPerKg - MoistAir.Enthalpy(ts, h.LeavingHumidityRatio) - condensate);
                Assert.Equal(expected, h.CoilTotalW, 1e-6 * Math.Max(1.0, expected));
            }
        }
    }

    [Fact]
    public void VariableVolume_FollowsTheLoadBetweenItsBounds()
    {
        // Office system, site basis at sea level: rho = 1 / v(21.11 C, W = 0) = 1.1996 kg/m3 (eq. 26).
        // Q_b(75 F) = 216,000 (75 - 55)/(95 - 55) = 108,000 Btu/h = 31,651 W.
        // c_p (T_r - T_s) = (1006 + 1860 W_r) x 11.111 K with W_r = 0.009298 (75 F, 50 %): 1023.3 x 11.111 = 11,370 J/kg.
        // m_s = 31,651 / 11,370 = 2.784 kg/s, between rho V_min = 1.1996 x 1.8878 = 2.265 and rho V_max = 5.663 kg/s.
        var settings = EconomizerTestSystems.Office(variable: true);
        var model = new EconomizerModel(settings, P);
        double t = (75.0 - 32) / 1.8;
        var h = model.Evaluate(EconomizerControl.None, t, 0.008, MoistAir.Enthalpy(t, 0.008), MoistAir.DewPoint(0.008, P));
        double cp = MoistAir.HumidSpecificHeat(model.ReturnHumidityRatio);
        Assert.Equal(model.BuildingLoadW(t) / (cp * (20 / 1.8)), h.SupplyMassFlowKgPerS, 9);
        Assert.Equal(2.784, h.SupplyMassFlowKgPerS, 3); // worked above
        // At minimum supply flow the minimum outdoor fraction rises to 2,000 / 4,000 = 0.5.
        double t60 = (60.0 - 32) / 1.8;
        var low = model.Evaluate(EconomizerControl.None, t60, 0.008, MoistAir.Enthalpy(t60, 0.008), MoistAir.DewPoint(0.008, P));
        Assert.Equal(0.5, low.OutdoorFraction, 9);
        Assert.Equal(model.FlowBasisDensityKgPerM3 * settings.SupplyAirflowMin!.Value.CubicMetresPerSecond, low.SupplyMassFlowKgPerS, 9);
    }

    [Fact]
    public void ActualBasis_UsesTheDensityOfTheMixedState()
    {
        // Constant volume, actual basis: m_s = V_s / v(T_mix, W_mix, p) (eq. 26) at the coil-entering state.
        var settings = EconomizerTestSystems.Office(variable: false, basis: FlowBasis.Actual);
        var model = new EconomizerModel(settings, P);
        var h = model.Evaluate(new EconomizerControl(HighLimitKind.DifferentialDryBulb), 30.0, 0.015, MoistAir.Enthalpy(30, 0.015), MoistAir.DewPoint(0.015, P));
        double rho = MoistAir.DryAirDensity(h.MixedDryBulbC, h.MixedHumidityRatio, P);
        Assert.Equal(rho * settings.SupplyAirflow.CubicMetresPerSecond, h.SupplyMassFlowKgPerS, 9);
        Assert.Equal(0.2, h.OutdoorFraction, 12); // 2,000 / 10,000 cfm: both at the same state
    }

    [Fact]
    public void EnthalpyLimit_ConvertsThroughTheDatum()
    {
        // 28 Btu/lb on the 0 F datum is (28 - 7.69) x 2.326 = 47.24 kJ/kg on the 0 C datum, not 28 x 2.326 = 65.13
        // (the offset is dry air from 0 F to 32 F: 1.006 x 17.78 / 2.326 = 7.689 Btu/lb; eq. 32, common practice).
        var limits = HighLimits.Suggested;
        Assert.Equal(47.24, limits.Enthalpy.KilojoulesPerKilogram, 2);
        Assert.Equal(28.0, limits.Enthalpy.BtuPerPound, 9);
        Assert.Equal(75.0, limits.DryBulb.Fahrenheit, 9); // recalled from memory
        Assert.Equal(55.0, limits.DewPoint.Fahrenheit, 9); // recalled from memory
    }

    [Fact]
    public void Settings_NameEveryProblemByKey()
    {
        var bad = EconomizerTestSystems.Office() with
        {
            MinOutdoorAirflow = Core.Units.VolumeFlow.FromCfm(20_000),
            SupplyTemperature = Core.Units.Temperature.FromFahrenheit(80),
            ReturnRelativeHumidity = 1.2,
            CoilLeavingRelativeHumidity = 0,
            LoadLine = new BuildingLoadLine(Core.Units.Power.FromBtuPerHour(-5), Core.Units.Temperature.FromFahrenheit(50), Core.Units.Temperature.FromFahrenheit(55)),
        };
        var e = Assert.Throws<EconomizerSettingsException>(() => new EconomizerModel(bad, P));
        var keys = e.Problems.Select(p => p.Key).ToHashSet();
        Assert.Superset(new HashSet<string> { "min_outdoor_airflow", "supply_temp", "return_rh", "coil_leaving_rh", "design_load", "design_outdoor" }, keys);
        Assert.Contains("min_outdoor_airflow", e.Message);
        Assert.Empty(EconomizerTestSystems.Office().Problems());
        var twice = EconomizerTestSystems.Office() with { Controls = [new(HighLimitKind.FixedDryBulb), new(HighLimitKind.FixedDryBulb)] };
        Assert.Contains(twice.Problems(), p => p.Key == "controls");
    }

    [Fact]
    public void ControlNames_RoundTrip()
    {
        foreach (var name in EconomizerControl.Names)
        {
            Assert.True(EconomizerControl.TryParse(name.ToUpperInvariant(), false, out var c));
            Assert.Equal(name, c.Name);
            Assert.False(c.Integrated);
        }

        Assert.False(EconomizerControl.TryParse("enthalpy", true, out _));
    }
}
