namespace BinEnergy.Core.Plant;

/// <summary>The energy carriers a building buys, each with its own price and carbon factor.</summary>
public enum Fuel
{
    /// <summary>Electricity, billed per kWh.</summary>
    Electricity,

    /// <summary>Natural gas, billed per therm (or per kWh of its heat content).</summary>
    Gas,

    /// <summary>Heating oil, billed per US gallon (or per litre).</summary>
    Oil,
}
