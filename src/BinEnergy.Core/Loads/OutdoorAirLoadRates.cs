using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>The outdoor-air load rates at one state (see <see cref="OutdoorAirLoad"/>).</summary>
public sealed record OutdoorAirLoadRates(
    Power Heating,
    Power CoolingSensible,
    Power CoolingLatent,
    Power Humidification,
    Power RecoveredHeating,
    Power RecoveredCooling)
{
    /// <summary>Sensible plus latent cooling.</summary>
    public Power Cooling => CoolingSensible + CoolingLatent;
}
