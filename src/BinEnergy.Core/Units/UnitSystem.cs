namespace BinEnergy.Core.Units;

/// <summary>The two display systems. Everything inside the engine is SI; this only
/// chooses how values are read at the edges and shown in outputs.</summary>
public enum UnitSystem
{
    /// <summary>Inch-pound: F, psia, lb/lb, Btu/lb (0 F datum), cfm, Btu/h, kBtu.</summary>
    IP,

    /// <summary>SI: C, kPa, kg/kg, kJ/kg (0 C datum), L/s, W, kWh.</summary>
    SI,
}
