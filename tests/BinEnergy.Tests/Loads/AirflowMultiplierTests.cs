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
        Assert.True(full.Hourly.Heating.Joules > 0);
        Assert.Equal(full.Hourly.Heating.Joules * 0.5, half.Hourly.Heating.Joules, 6);
        Assert.Equal(full.Hourly.CoolingLatent.Joules * 0.5, half.Hourly.CoolingLatent.Joules, 6);
        Assert.Equal(full.Bin.Heating.Joules * 0.5, half.Bin.Heating.Joules, 6);
        Assert.True(half.Hourly.CoolingSensible.Joules <= full.Hourly.CoolingSensible.Joules); // invariant: never above the no-DCV case
    }
}
