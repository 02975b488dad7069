namespace BinEnergy.Core.Loads;

/// <summary>Loads per unit mass of dry air, J/kg (multiply by kg/s for watts), for one outdoor state.</summary>
internal struct SpecificLoads
{
    public double Heating;
    public double CoolingSensible;
    public double CoolingLatent;
    public double Humidification;
    public double RecoveredHeating;
    public double RecoveredCooling;

    /// <summary>Whether the recovery device changed the air's state.</summary>
    public bool Recovering;
}
