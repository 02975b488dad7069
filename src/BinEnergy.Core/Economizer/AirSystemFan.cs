using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// A fan of the air system (supply or return) by its total pressure rise and total (fan, motor
/// and drive) efficiency at the design airflow: P_design = V_design dp / eta
/// (<see cref="FanPower"/>). All its power ends up as heat in the air it moves (motor in the air
/// stream; common practice for packaged and built-up air handlers).
/// </summary>
/// <param name="TotalPressurePa">Total pressure rise at the design airflow, Pa.</param>
/// <param name="Efficiency">Total efficiency, in (0, 1].</param>
public sealed record AirSystemFan(double TotalPressurePa, double Efficiency)
{
    /// <summary>Electric power at the design airflow, W.</summary>
    public double DesignPowerW(VolumeFlow designAirflow) => FanPower.Electric(designAirflow, TotalPressurePa, Efficiency).Watts;

    /// <summary>Problems with the fan, each naming the key (<paramref name="prefix"/> is <c>supply_fan</c> or <c>return_fan</c>).</summary>
    public IEnumerable<EconomizerSettingsProblem> Problems(string prefix)
    {
        if (!(TotalPressurePa >= 0 && TotalPressurePa <= 5000))
        {
            yield return new(prefix + "_pressure", "the fan's total pressure must be from 0 to 5,000 Pa (20 in. w.g.)");
        }

        if (!(Efficiency > 0 && Efficiency <= 1))
        {
            yield return new(prefix + "_efficiency", "the fan efficiency must be above 0 and at most 1");
        }
    }
}
