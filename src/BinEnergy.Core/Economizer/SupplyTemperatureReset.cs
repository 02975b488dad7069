using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// A supply-temperature reset of a variable-volume system by outdoor dry-bulb: at or below
/// <see cref="OutdoorLow"/> the supply is at <see cref="MaxSupply"/>; at or above
/// <see cref="OutdoorHigh"/> it is at the set (design) supply temperature; linear between.
/// A linear outdoor-air reset schedule (common practice; the energy code adopted locally sets
/// when a reset is required and its limits).
/// </summary>
/// <param name="MaxSupply">The warmest supply temperature the reset reaches.</param>
/// <param name="OutdoorLow">Outdoor dry-bulb at and below which the supply is at its warmest.</param>
/// <param name="OutdoorHigh">Outdoor dry-bulb at and above which the supply is at the set temperature.</param>
public sealed record SupplyTemperatureReset(Temperature MaxSupply, Temperature OutdoorLow, Temperature OutdoorHigh)
{
    /// <summary>The supply temperature at an outdoor dry-bulb, C, given the set (design) supply temperature, C.</summary>
    public double SupplyC(double outdoorC, double designSupplyC)
    {
        double lo = OutdoorLow.Celsius;
        double hi = OutdoorHigh.Celsius;
        if (outdoorC <= lo)
        {
            return MaxSupply.Celsius;
        }

        if (outdoorC >= hi)
        {
            return designSupplyC;
        }

        return MaxSupply.Celsius + (designSupplyC - MaxSupply.Celsius) * (outdoorC - lo) / (hi - lo);
    }

    /// <summary>Problems with the reset against the set supply and return temperatures, each naming its key.</summary>
    public IEnumerable<EconomizerSettingsProblem> Problems(Temperature supply, Temperature ret)
    {
        if (!(MaxSupply.Celsius > supply.Celsius && MaxSupply.Celsius < ret.Celsius))
        {
            yield return new("supply_temp_reset_max", "the reset's warmest supply temperature must be above the supply temperature and below the return temperature");
        }

        if (!(OutdoorHigh.Celsius > OutdoorLow.Celsius))
        {
            yield return new("supply_temp_reset_outdoor_high", "the outdoor temperature that ends the reset must be above the one that starts it (supply_temp_reset_outdoor_low)");
        }
    }
}
