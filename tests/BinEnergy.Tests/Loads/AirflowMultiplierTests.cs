using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Loads;

/// <summary>Hourly airflow multipliers in the outdoor-air engine (invented weather).</summary>
public class AirflowMultiplierTests
{
    [Fact]
    public void HalfAirflowEveryHour_HalvesEveryLoad_ByBothMethods()
    {
        var weather = SyntheticWeather.FromColumns([-10.0, 35.0, 5.0], [0.001, 0.020, 0.004]);
        var settings = OutdoorAirTestSettings.Typical();
        var full = OutdoorAirCalculator.Compute(weather, settings, DryBulbBinScale.Default(UnitSystem.SI));
        var half = OutdoorAirCalculator.Compute(weather, settings with { AirflowMultipliers = Enumerable.Repeat(0.5, 24).ToArray() },
            DryBulbBinScale.Default(UnitSystem.SI));

        // Invariant: loads are linear in the airflow (m = rho V), so half the air is half the load.
        Assert.True(full.Annual.Hourly.Loads.Heating.Joules > 0);
        Assert.Equal(full.Annual.Hourly.Loads.Heating.Joules * 0.5, half.Annual.Hourly.Loads.Heating.Joules, 6);
        Assert.Equal(full.Annual.Hourly.Loads.CoolingLatent.Joules * 0.5, half.Annual.Hourly.Loads.CoolingLatent.Joules, 6);
        Assert.Equal(full.Annual.Bin.Loads.Heating.Joules * 0.5, half.Annual.Bin.Loads.Heating.Joules, 6);
        Assert.True(half.Annual.Hourly.Loads.CoolingSensible.Joules <= full.Annual.Hourly.Loads.CoolingSensible.Joules); // invariant: never above the no-DCV case
    }

    [Fact]
    public void KeptHours_AddUpToTheHourlyTotals_AndFollowTheProfile()
    {
        // Invariant: the per-hour loads the study runner buys energy for are the engine's own hourly sum, hour by hour.
        var weather = SyntheticWeather.Year(meanC: 11, annualSwingK: 13, dailySwingK: 5, spreadK: 3);
        var profile = Enumerable.Range(0, 24).Select(h => h is >= 8 and < 18 ? 1.0 : 0.25).ToArray();
        var settings = OutdoorAirTestSettings.Typical() with { AirflowMultipliers = profile };
        var flags = settings.Schedule.Flags(weather);
        var scale = DryBulbBinScale.Default(UnitSystem.SI);
        var result = OutdoorAirCalculator.Compute(weather, settings, BinTable.Build(weather, scale, flags), flags, keepHours: true);
        var hours = result.Hours!;
        Assert.Equal(weather.Count, hours.Count);
        Assert.Equal(result.Annual.Hourly.Loads.Heating.Joules, hours.Sum(h => h.Loads.Heating.Joules), 1e-6 * result.Annual.Hourly.Loads.Heating.Joules);
        Assert.Equal(result.Annual.Hourly.Loads.CoolingLatent.Joules, hours.Sum(h => h.Loads.CoolingLatent.Joules), 1e-6 * result.Annual.Hourly.Loads.CoolingLatent.Joules + 1);
        Assert.Equal(result.Annual.Hourly.Loads.HoursVentilated, hours.Count(h => h.Loads.HoursVentilated > 0));

        // A night hour carries a quarter of the airflow: at the same state it would carry a quarter of the day's load.
        var full = OutdoorAirCalculator.Compute(weather, settings with { AirflowMultipliers = null }, BinTable.Build(weather, scale, flags), flags, keepHours: true);
        int night = Enumerable.Range(0, weather.Count).First(i => weather.Times[i].Hour == 3 && full.Hours![i].Loads.Heating.Joules > 0);
        Assert.Equal(0.25 * full.Hours![night].Loads.Heating.Joules, hours[night].Loads.Heating.Joules, 1e-9 * full.Hours[night].Loads.Heating.Joules);
        Assert.Null(OutdoorAirCalculator.Compute(weather, settings, scale).Hours); // only when asked for
    }
}
