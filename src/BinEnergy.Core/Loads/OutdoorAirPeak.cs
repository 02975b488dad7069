using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>The outdoor-air load rates at one design condition.</summary>
/// <param name="Condition">Which condition, e.g. "heating 99.6 % dry-bulb".</param>
/// <param name="DryBulb">Design dry-bulb (or mean coincident dry-bulb for dehumidification).</param>
/// <param name="HumidityRatio">Humidity ratio of the design state at the site pressure.</param>
/// <param name="WetBulb">Wet-bulb of the design state.</param>
/// <param name="DewPoint">Dew point of the design state.</param>
/// <param name="Loads">Load rates with the recovery device, if any.</param>
/// <param name="WithoutRecovery">Load rates without the device (the same as <paramref name="Loads"/> when there is none).</param>
public sealed record OutdoorAirPeak(
    string Condition,
    Temperature DryBulb,
    HumidityRatio HumidityRatio,
    Temperature WetBulb,
    Temperature DewPoint,
    OutdoorAirLoadRates Loads,
    OutdoorAirLoadRates WithoutRecovery);
