namespace BinEnergy.Core.Loads;

/// <summary>Peak outdoor-air load rates at the record's design conditions (DESIGN 7.4).</summary>
/// <param name="Heating">At the 99.6 % heating dry-bulb.</param>
/// <param name="Cooling">At the 0.4 % cooling dry-bulb with its mean coincident wet-bulb.</param>
/// <param name="Dehumidification">At the 0.4 % dew point with its mean coincident dry-bulb.</param>
/// <param name="Method">How the design conditions were taken from the record (the percentile method).</param>
public sealed record OutdoorAirPeaks(
    OutdoorAirPeak Heating,
    OutdoorAirPeak Cooling,
    OutdoorAirPeak Dehumidification,
    string Method)
{
    /// <summary>The conditions in the order outputs list them.</summary>
    public IReadOnlyList<OutdoorAirPeak> All => [Heating, Cooling, Dehumidification];
}
