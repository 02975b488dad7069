using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>The outdoor-air loads of one hour at one design condition (their energies over the hour are the peak rates).</summary>
/// <param name="Condition">Which condition, e.g. "heating 99.6 % dry-bulb".</param>
/// <param name="Key">The condition's name in tables: <c>heating_99_6</c>, <c>cooling_0_4</c>, <c>dehumidification_0_4</c>.</param>
/// <param name="DryBulb">Design dry-bulb (or mean coincident dry-bulb for dehumidification).</param>
/// <param name="HumidityRatio">Humidity ratio of the design state at the site pressure.</param>
/// <param name="WetBulb">Wet-bulb of the design state.</param>
/// <param name="DewPoint">Dew point of the design state.</param>
/// <param name="Loads">One hour's loads with the recovery device, if any.</param>
/// <param name="WithoutRecovery">One hour's loads without the device (the same as <paramref name="Loads"/> when there is none).</param>
public sealed record OutdoorAirPeak(
    string Condition,
    string Key,
    Temperature DryBulb,
    HumidityRatio HumidityRatio,
    Temperature WetBulb,
    Temperature DewPoint,
    LoadVector Loads,
    LoadVector WithoutRecovery)
{
    /// <summary>The load rate of one figure with the device: its energy over the hour.</summary>
    public Power Rate(LoadFigure figure) => Power.FromWatts(Loads[figure].Joules / 3600.0);

    /// <summary>The load rate of one figure without the device.</summary>
    public Power RateWithoutRecovery(LoadFigure figure) => Power.FromWatts(WithoutRecovery[figure].Joules / 3600.0);

    /// <summary>True for the heating condition, whose sensible part is heating and latent part humidification.</summary>
    public bool IsHeating => Key.StartsWith("heating", StringComparison.Ordinal);

    /// <summary>The sensible rate: heating at the heating condition, sensible cooling otherwise.</summary>
    public Power Sensible => Rate(IsHeating ? LoadFigure.Heating : LoadFigure.CoolingSensible);

    /// <summary>The latent rate: humidification at the heating condition, latent cooling otherwise.</summary>
    public Power Latent => Rate(IsHeating ? LoadFigure.Humidification : LoadFigure.CoolingLatent);

    /// <summary>Sensible plus latent, with the device.</summary>
    public Power Total => Sensible + Latent;

    /// <summary>Sensible plus latent without the device.</summary>
    public Power TotalWithoutRecovery => IsHeating
        ? RateWithoutRecovery(LoadFigure.Heating) + RateWithoutRecovery(LoadFigure.Humidification)
        : RateWithoutRecovery(LoadFigure.CoolingSensible) + RateWithoutRecovery(LoadFigure.CoolingLatent);
}
