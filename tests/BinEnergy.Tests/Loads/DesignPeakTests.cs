using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Tests.Loads;

public class DesignPeakTests
{
    [Fact]
    public void Chicago_PeaksFollowTheTradeRelationsAtTheDesignStates()
    {
        var weather = RealSiteLoadTests.Read("725300TYA.CSV.gz", "tmy3");
        var settings = OutdoorAirTestSettings.Typical(FlowBasis.Standard, cfm: 1000) with { MinRelativeHumidity = 0.3 };
        var result = OutdoorAirCalculator.Compute(weather, settings, DryBulbBinScale.Default(UnitSystem.IP));
        var design = DesignConditions.FromRecord(weather);
        var peaks = result.Peaks!;

        // Heating: q = 1.08 x cfm x (70 - T_99.6) Btu/h (common practice); ours carries 1.006 + 1.86 W over 0.24's 1.005, within 0.5 %.
        double heatingF = 70 - Temperature.FromCelsius(design.Heating996DryBulbC).Fahrenheit;
        Assert.Equal(1.08 * 1000 * heatingF, peaks.Heating.Rate(LoadFigure.Heating).BtuPerHour, 0.005 * 1.08 * 1000 * heatingF);
        Assert.True(peaks.Heating.Rate(LoadFigure.Humidification).Watts > 0, "30 % RH indoors needs water at the heating design");

        // Cooling: sensible 1.08 x cfm x (T_0.4 - 75), latent 0.68 x cfm x (gr - gr_max) within the shorthand's 1.6 % (see TradeShorthandTests).
        var cool = peaks.Cooling;
        Assert.Equal(design.Cooling[0].DryBulbC, cool.DryBulb.Celsius, 9);
        Assert.Equal(design.Cooling[0].MeanCoincidentWetBulbC, cool.WetBulb.Celsius, 4);
        double sensible = 1.08 * 1000 * (cool.DryBulb.Fahrenheit - 75) * (1 + 1.86 / 1.006 * cool.HumidityRatio.KilogramsPerKilogram);
        Assert.Equal(sensible, cool.Rate(LoadFigure.CoolingSensible).BtuPerHour, 0.005 * sensible);
        double grains = cool.HumidityRatio.GrainsPerPound - result.Assumptions.MaxHumidityRatio.GrainsPerPound;
        Assert.True(grains > 0);
        Assert.Equal(1.016, cool.Rate(LoadFigure.CoolingLatent).BtuPerHour / (0.68 * 1000 * grains), 0.005);

        // Dehumidification: the state holds the 0.4 % dew point.
        Assert.Equal(design.Dehumidification[0].DewPointC, peaks.Dehumidification.DewPoint.Celsius, 3);
        Assert.True(peaks.Dehumidification.Rate(LoadFigure.CoolingLatent).Watts > cool.Rate(LoadFigure.CoolingLatent).Watts);
        Assert.Equal(peaks.Heating.Loads, peaks.Heating.WithoutRecovery);
    }

    [Fact]
    public void Recovery_LowersThePeaks_AndTheUnrecoveredPeakIsKept()
    {
        var weather = RealSiteLoadTests.Read("725300TYA.CSV.gz", "tmy3");
        var settings = OutdoorAirTestSettings.Typical() with
        {
            Recovery = new EnergyRecoverySettings { SensibleEffectiveness = 0.7, LatentEffectiveness = 0.5 },
        };
        var peaks = OutdoorAirCalculator.Compute(weather, settings, DryBulbBinScale.Default(UnitSystem.IP)).Peaks!;

        // The design hour is colder than 70 F by dT; recovery leaves (1 - 0.7) dT (worked by hand).
        Assert.Equal(0.3, peaks.Heating.Rate(LoadFigure.Heating).Watts / peaks.Heating.RateWithoutRecovery(LoadFigure.Heating).Watts, 1e-9);
        Assert.True(peaks.Cooling.Total.Watts < peaks.Cooling.TotalWithoutRecovery.Watts);
    }
}
