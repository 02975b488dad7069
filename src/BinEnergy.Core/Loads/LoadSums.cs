using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>Running energy sums in joules; a mutable struct so the per-hour loop allocates nothing.</summary>
internal struct LoadSums
{
    public double Heating;
    public double CoolingSensible;
    public double CoolingLatent;
    public double Humidification;
    public double RecoveredHeating;
    public double RecoveredCooling;
    public double FanEnergy;
    public int Hours;

    /// <summary>Adds specific loads (J/kg dry air per second of flow) at a dry-air mass flow for a number of hours.</summary>
    public void Add(in SpecificLoads loads, double massFlowKgPerS, double fanPowerW, int hours)
    {
        double seconds = 3600.0 * hours;
        double ms = massFlowKgPerS * seconds;
        Heating += loads.Heating * ms;
        CoolingSensible += loads.CoolingSensible * ms;
        CoolingLatent += loads.CoolingLatent * ms;
        Humidification += loads.Humidification * ms;
        RecoveredHeating += loads.RecoveredHeating * ms;
        RecoveredCooling += loads.RecoveredCooling * ms;
        FanEnergy += fanPowerW * seconds;
        Hours += hours;
    }

    /// <summary>Adds another set of sums.</summary>
    public void Add(in LoadSums other)
    {
        Heating += other.Heating;
        CoolingSensible += other.CoolingSensible;
        CoolingLatent += other.CoolingLatent;
        Humidification += other.Humidification;
        RecoveredHeating += other.RecoveredHeating;
        RecoveredCooling += other.RecoveredCooling;
        FanEnergy += other.FanEnergy;
        Hours += other.Hours;
    }

    public readonly OutdoorAirTotals ToTotals() => new(
        Energy.FromJoules(Heating), Energy.FromJoules(CoolingSensible), Energy.FromJoules(CoolingLatent),
        Energy.FromJoules(Humidification), Energy.FromJoules(RecoveredHeating), Energy.FromJoules(RecoveredCooling),
        Energy.FromJoules(FanEnergy), Hours);
}
