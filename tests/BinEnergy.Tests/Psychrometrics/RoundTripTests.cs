using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Tests.Psychrometrics;

/// <summary>Inverse functions undo the forward ones over the whole range, below freezing included.</summary>
public class RoundTripTests
{
    public static TheoryData<double> Elevations => new() { 0.0, 1600.0, 3000.0 };

    [Theory]
    [MemberData(nameof(Elevations))]
    public void DewPoint_HumidityRatio_DewPoint(double elevationM)
    {
        double p = Atmosphere.PressureAtElevationPa(elevationM);
        for (double td = -60; td <= 60; td += 0.5)
        {
            double w = MoistAir.HumidityRatioFromDewPoint(td, p);
            Assert.Equal(td, MoistAir.DewPoint(w, p), tolerance: 1e-5);
        }
    }

    [Theory]
    [MemberData(nameof(Elevations))]
    public void WetBulb_HumidityRatio_WetBulb(double elevationM)
    {
        double p = Atmosphere.PressureAtElevationPa(elevationM);
        for (double t = -40; t <= 50; t += 2.5)
        {
            // From saturation down to a depression the state can still have (W stays positive).
            for (double depression = 0; depression <= 20; depression += 1.0)
            {
                double twb = t - depression;
                double w;
                try
                {
                    w = MoistAir.HumidityRatioFromWetBulb(t, twb, p);
                }
                catch (PsychrometricException)
                {
                    continue; // below the wet-bulb of perfectly dry air: no state
                }

                double back = MoistAir.WetBulb(t, w, p);
                if (Math.Abs(twb) < 1.0)
                {
                    // Eqs. 33 and 35 do not meet at 0 C: within about 1 K of freezing a state can have
                    // a wet-bulb on each side (up to 0.7 K apart at altitude). Either is a true wet-bulb of the same humidity ratio.
                    Assert.Equal(w, MoistAir.HumidityRatioFromWetBulb(t, back, p), tolerance: 1e-8);
                    Assert.InRange(back, twb - 1.0, twb + 1.0);
                }
                else
                {
                    Assert.Equal(twb, back, tolerance: 1e-5);
                }
            }
        }
    }

    [Fact]
    public void Enthalpy_DryBulb_RoundTrip()
    {
        for (double t = -40; t <= 60; t += 5)
        {
            foreach (double w in new[] { 0.0, 0.002, 0.01, 0.03 })
            {
                Assert.Equal(t, MoistAir.DryBulbFromEnthalpy(MoistAir.Enthalpy(t, w), w), 9);
            }
        }
    }

    [Fact]
    public void ImpossibleStates_RaiseTypedErrors()
    {
        double p = Atmosphere.SeaLevelPressurePa;
        Assert.Throws<PsychrometricException>(() => MoistAir.HumidityRatioFromWetBulb(20, 25, p));
        Assert.Throws<PsychrometricException>(() => MoistAir.HumidityRatioFromRelativeHumidity(20, 1.2, p));
        Assert.Throws<PsychrometricException>(() => Saturation.VapourPressurePa(250));
        Assert.Throws<PsychrometricException>(() => Atmosphere.PressureAtElevationPa(20000));
        Assert.Throws<PsychrometricException>(() => MoistAir.WetBulb(20, 0.05, p)); // above saturation at 20 C
        Assert.Throws<PsychrometricException>(() => MoistAir.HumidityRatioFromWetBulb(40, -10, p)); // drier than dry air
    }
}
