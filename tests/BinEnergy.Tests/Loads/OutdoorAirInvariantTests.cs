using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Loads;

public class OutdoorAirInvariantTests
{
    private static readonly DryBulbBinScale Bins = DryBulbBinScale.Default(UnitSystem.IP);

    [Fact]
    public void OneHour_MatchesAHandWorkedExample()
    {
        // 0 C, W = 0.002, sea level, 1,000 L/s on the site basis, heat to 20 C.
        var weather = SyntheticWeather.FromColumns([0.0], [0.002]);
        var settings = new OutdoorAirSettings
        {
            Airflow = VolumeFlow.FromLitresPerSecond(1000),
            Operation = VentilationOperation.Always,
            HeatTo = Temperature.FromCelsius(20),
            CoolTo = Temperature.FromCelsius(24),
            MaxRelativeHumidity = 0.6,
        };
        var result = OutdoorAirCalculator.Compute(weather, settings, DryBulbBinScale.Default(UnitSystem.SI));

        // Worked by hand: rho = 101,325 / (287.042 x 294.261) = 1.19961 kg/m3 (dry air at 70 F, Handbook ch. 1 eq. 26);
        // q = 1.19961 x 1 m3/s x (1.006 + 1.86 x 0.002) x 20 K = 24.225 kW; one hour = 24.225 kWh.
        Assert.Equal(1.19961, result.Assumptions.DryAirDensity, 4);
        Assert.Equal(24.225, result.Annual.Hourly.Loads.Heating.KilowattHours, 0.002);
        Assert.Equal(0.0, result.Annual.Hourly.Loads.CoolingSensible.Joules);
        Assert.Equal(0.0, result.Annual.Hourly.Loads.CoolingLatent.Joules);
    }

    [Fact]
    public void Recovery_MatchesAHandWorkedExample_AndTheFrostLimit()
    {
        var weather = SyntheticWeather.FromColumns([-10.0, 35.0], [0.001, 0.020]);
        var settings = new OutdoorAirSettings
        {
            Airflow = VolumeFlow.FromLitresPerSecond(1000),
            FlowBasis = FlowBasis.Standard,
            Operation = VentilationOperation.Always,
            HeatTo = Temperature.FromCelsius(20),
            CoolTo = Temperature.FromCelsius(24),
            MaxRelativeHumidity = 0.5,
            Recovery = new EnergyRecoverySettings { SensibleEffectiveness = 0.7, LatentEffectiveness = 0.6 },
        };
        double rho = FlowBasisDensity.StandardAirDensity;
        var plain = OutdoorAirCalculator.Compute(weather, settings with { Recovery = null }, DryBulbBinScale.Default(UnitSystem.SI));
        var wheel = OutdoorAirCalculator.Compute(weather, settings, DryBulbBinScale.Default(UnitSystem.SI));

        // Heating hour by hand: T' = -10 + 0.7 x (20 - (-10)) = 11 C, load (20 - 11) / 30 = 30 % of the plain load.
        Assert.Equal(0.3 * plain.Annual.Hourly.Loads.Heating.Joules, wheel.Annual.Hourly.Loads.Heating.Joules, 1e-3);
        Assert.Equal(0.7 * plain.Annual.Hourly.Loads.Heating.Joules, wheel.Annual.Hourly.Loads.RecoveredHeating.Joules, 1e-3);

        // Cooling hour by hand: T' = 35 - 0.7 x 11 = 27.3 C; W' = 0.020 - 0.6 x (0.020 - W_max).
        double wMax = wheel.Assumptions.MaxHumidityRatio.KilogramsPerKilogram;
        double cp = 1006 + 1860 * 0.020;
        Assert.Equal(rho * cp * (27.3 - 24) * 3600, wheel.Annual.Hourly.Loads.CoolingSensible.Joules, 1.0);
        Assert.Equal(0.4 * plain.Annual.Hourly.Loads.CoolingLatent.Joules, wheel.Annual.Hourly.Loads.CoolingLatent.Joules, 1.0);
        Assert.Equal(rho * 2_501_000 * (0.020 - wMax) * 3600, plain.Annual.Hourly.Loads.CoolingLatent.Joules, 1.0);

        // Below a -5 C frost limit the effectiveness drops to 0.35: T' = -10 + 0.35 x 30 = 0.5 C, load 19.5 / 30 of plain.
        var frost = OutdoorAirCalculator.Compute(weather, settings with
        {
            Recovery = settings.Recovery! with { FrostLimit = Temperature.FromCelsius(-5), FrostEffectiveness = 0.35 },
        }, DryBulbBinScale.Default(UnitSystem.SI));
        Assert.Equal(19.5 / 30 * plain.Annual.Hourly.Loads.Heating.Joules, frost.Annual.Hourly.Loads.Heating.Joules, 1e-3);
    }

    [Theory]
    [InlineData(FlowBasis.Site)]
    [InlineData(FlowBasis.Standard)]
    [InlineData(FlowBasis.Actual)]
    public void Loads_ScaleLinearlyWithAirflow(FlowBasis basis)
    {
        var weather = SyntheticWeather.Year(meanC: 16, spreadK: 2);
        var one = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical(basis, 1000), Bins, HumidityBinScale.Default(UnitSystem.IP));
        var three = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical(basis, 3000), Bins, HumidityBinScale.Default(UnitSystem.IP));
        foreach (var figure in Enum.GetValues<LoadFigure>())
        {
            Assert.Equal(3 * one.Annual.Hourly.Loads[figure].Joules, three.Annual.Hourly.Loads[figure].Joules, 1e-6 * (1 + three.Annual.Hourly.Loads[figure].Joules));
            Assert.Equal(3 * one.Annual.Bin.Loads[figure].Joules, three.Annual.Bin.Loads[figure].Joules, 1e-6 * (1 + three.Annual.Bin.Loads[figure].Joules));
            Assert.Equal(3 * one.Annual.JointBin.Loads[figure].Joules, three.Annual.JointBin.Loads[figure].Joules, 1e-6 * (1 + three.Annual.JointBin.Loads[figure].Joules));
        }

        Assert.True(one.Annual.Hourly.Loads.Heating.Joules > 0 && one.Annual.Hourly.Loads.CoolingSensible.Joules > 0 && one.Annual.Hourly.Loads.CoolingLatent.Joules > 0);
    }

    [Fact]
    public void TargetsThatEncloseEveryHour_GiveZeroLoads()
    {
        var weather = SyntheticWeather.Year(meanC: 20, annualSwingK: 3, dailySwingK: 2, spreadK: 8);
        var table = BinTable.Build(weather, Bins);
        var settings = OutdoorAirTestSettings.Typical() with
        {
            HeatTo = table.Rows[0].Low,              // at or below the coldest bin's lower edge
            CoolTo = table.Rows[^1].High,            // at or above the warmest bin's upper edge
            MaxRelativeHumidity = 1.0,
            MinRelativeHumidity = 0.01,
        };
        var result = OutdoorAirCalculator.Compute(weather, settings, Bins, HumidityBinScale.Default(UnitSystem.IP));
        Assert.True(settings.MinRelativeHumidity * Saturation.VapourPressurePa(settings.HeatTo.Celsius) * 1.01
            < MoistAir.VapourPressureFromHumidityRatio(weather.HumidityRatio.Min(), Atmosphere.SeaLevelPressurePa));
        foreach (var figure in Enum.GetValues<LoadFigure>())
        {
            Assert.Equal(0.0, result.Annual.Hourly.Loads[figure].Joules);
            Assert.Equal(0.0, result.Annual.Bin.Loads[figure].Joules);
            Assert.Equal(0.0, result.Annual.JointBin.Loads[figure].Joules);
            Assert.Equal(0.0, result.DifferencePercent(IntegrationMethod.Bin, figure));
        }

        Assert.Equal(8760, result.Annual.Hourly.Loads.HoursVentilated);
    }

    [Fact]
    public void Recovery_NeverIncreasesALoad()
    {
        var records = new[]
        {
            SyntheticWeather.Year(meanC: 5, annualSwingK: 15),
            SyntheticWeather.Year(meanC: 24, annualSwingK: 5, spreadK: 1),
            SyntheticWeather.Year(meanC: 15, annualSwingK: 10, spreadK: 12),
        };
        var devices = new[]
        {
            new EnergyRecoverySettings { SensibleEffectiveness = 0.75, LatentEffectiveness = 0.65 },
            new EnergyRecoverySettings { SensibleEffectiveness = 0.6 },
            new EnergyRecoverySettings { SensibleEffectiveness = 0.8, LatentEffectiveness = 0.7, FrostLimit = Temperature.FromCelsius(-5), FrostEffectiveness = 0.3 },
        };
        var figures = new[] { LoadFigure.Heating, LoadFigure.CoolingSensible, LoadFigure.CoolingLatent, LoadFigure.Humidification };
        foreach (var weather in records)
        {
            var baseSettings = OutdoorAirTestSettings.Typical() with { MinRelativeHumidity = 0.3 };
            var plain = OutdoorAirCalculator.Compute(weather, baseSettings, Bins, HumidityBinScale.Default(UnitSystem.IP));
            foreach (var device in devices)
            {
                var with = OutdoorAirCalculator.Compute(weather, baseSettings with { Recovery = device }, Bins, HumidityBinScale.Default(UnitSystem.IP));
                foreach (var f in figures)
                {
                    Assert.True(with.Annual.Hourly.Loads[f].Joules <= plain.Annual.Hourly.Loads[f].Joules, $"hourly {f}");
                    Assert.True(with.Annual.Bin.Loads[f].Joules <= plain.Annual.Bin.Loads[f].Joules, $"bin {f}");
                    Assert.True(with.Annual.JointBin.Loads[f].Joules <= plain.Annual.JointBin.Loads[f].Joules, $"joint {f}");
                    for (int b = 0; b < with.Bins.Count; b++)
                    {
                        Assert.True(with.Bins[b].Figures.Hourly.Loads[f].Joules <= plain.Bins[b].Figures.Hourly.Loads[f].Joules, $"bin row {b} {f}");
                    }
                }

                // What the device saves is exactly the difference of the loads.
                double saved = plain.Annual.Hourly.Loads.Heating.Joules + plain.Annual.Hourly.Loads.Humidification.Joules - with.Annual.Hourly.Loads.Heating.Joules - with.Annual.Hourly.Loads.Humidification.Joules;
                Assert.Equal(saved, with.Annual.Hourly.Loads.RecoveredHeating.Joules, 1e-6 * (1 + saved));
                Assert.True(with.Annual.Hourly.Loads.RecoveredHeating.Joules >= 0 && with.Annual.Hourly.Loads.RecoveredCooling.Joules >= 0);
            }
        }
    }

    [Fact]
    public void OccupiedOperation_VentilatesTheOccupiedHoursOnly()
    {
        var weather = SyntheticWeather.Year();
        var schedule = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00");
        var settings = OutdoorAirTestSettings.Typical() with { Operation = VentilationOperation.Occupied, Schedule = schedule };
        var result = OutdoorAirCalculator.Compute(weather, settings, Bins);
        int occupied = schedule.Flags(weather).Count(f => f);

        Assert.Equal(occupied, result.Annual.Hourly.Loads.HoursVentilated);
        Assert.Equal(occupied, result.Annual.Bin.Loads.HoursVentilated);
        Assert.Equal(occupied, result.Bins.Sum(b => b.HoursVentilated));
        Assert.Equal(result.Annual.Hourly.Loads.Heating.Joules, result.Bins.Sum(b => b.Figures.Hourly.Loads.Heating.Joules), 1e-3);
        Assert.Equal(result.Annual.Hourly.Loads.CoolingLatent.Joules, result.Months.Sum(m => m.Figures.Hourly.Loads.CoolingLatent.Joules), 1e-3);
        Assert.Equal(12, result.Months.Count);
        Assert.Equal(result.Annual.Bin.Loads.Heating.Joules, result.Bins.Sum(b => b.Figures.Bin.Loads.Heating.Joules), 1e-3);
    }

    [Fact]
    public void VentilationRate_GivesTheAirflow_AndWarnsWhenTheGivenFlowIsBelowIt()
    {
        // 62.1 ventilation rate procedure arithmetic: 50 people x 5 cfm + 5,000 ft2 x 0.06 cfm/ft2 = 550 cfm; / 0.8 = 687.5 cfm.
        var rate = VentilationRate.FromIp(50, 5, 5000, 0.06, 0.8);
        Assert.Equal(550, rate.BreathingZoneAirflow.Cfm, 6);
        Assert.Equal(687.5, rate.OutdoorAirflow.Cfm, 6);

        var weather = SyntheticWeather.Year(hours: 48);
        var byRate = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical() with { Airflow = null, Ventilation = rate }, Bins);
        Assert.Equal(687.5, byRate.Assumptions.Airflow.Cfm, 6);
        Assert.Empty(byRate.Warnings);

        var low = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical(cfm: 500) with { Ventilation = rate }, Bins);
        Assert.Contains(low.Warnings, w => w.Contains("below the people-and-area minimum") && w.Contains("licensed engineer"));
    }

    [Fact]
    public void BadSettings_AreNamed()
    {
        var s = OutdoorAirTestSettings.Typical() with { HeatTo = Temperature.FromFahrenheit(80), MaxRelativeHumidity = 1.5 };
        var problems = s.Problems();
        Assert.Contains(problems, p => p.Contains("heating setpoint") && p.Contains("above the cooling setpoint"));
        Assert.Contains(problems, p => p.Contains("maximum indoor RH 150"));
        Assert.Throws<ArgumentException>(() => OutdoorAirCalculator.Compute(SyntheticWeather.Year(hours: 24), s, Bins));

        var humid = OutdoorAirTestSettings.Typical() with { MinRelativeHumidity = 0.7, MaxRelativeHumidity = 0.5 };
        Assert.Contains(humid.Problems(), p => p.Contains("minimum RH 70 %"));
    }

    [Fact]
    public void SiteBasisAtAltitude_CutsTheSensibleLoadByTheDensityRatio()
    {
        // 1,619 m (5,312 ft): standard atmosphere 83.33 kPa (Handbook ch. 1, eq. 3).
        double p = Atmosphere.PressureAtElevationPa(1619);
        var weather = SyntheticWeather.Year(meanC: 14, pressurePa: p);
        var site = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical(FlowBasis.Site), Bins);
        var standard = OutdoorAirCalculator.Compute(weather, OutdoorAirTestSettings.Typical(FlowBasis.Standard), Bins);

        // Dry air at 70 F and 83.33 kPa: 83,328 / (287.042 x 294.261) = 0.9865 kg/m3 vs 1.2014 standard: 17.9 % less (worked by hand).
        double ratio = site.Annual.Hourly.Loads.Heating.Joules / standard.Annual.Hourly.Loads.Heating.Joules;
        Assert.Equal(0.821, ratio, 0.001);
        Assert.Equal(ratio, site.Annual.Hourly.Loads.CoolingSensible.Joules / standard.Annual.Hourly.Loads.CoolingSensible.Joules, 9);
    }
}
