using BinEnergy.Core.Binning;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// One dry-bulb bin of an outdoor-air estimate: the bin, its ventilated hours and their mean
/// coincident humidity ratio, the bin method's loads (evaluated at <see cref="EvaluatedAt"/> and
/// that humidity ratio, times the hours) and, beside them, the hourly loads of the same hours.
/// </summary>
/// <param name="Bin">The bin and its weather statistics.</param>
/// <param name="HoursVentilated">Hours of the bin in which outdoor air runs.</param>
/// <param name="MeanHumidityRatio">Mean coincident humidity ratio of those hours (NaN when none).</param>
/// <param name="BinMethod">Loads by the bin method.</param>
/// <param name="Hourly">Loads of the same hours summed hour by hour.</param>
public sealed record OutdoorAirBinRow(
    BinRow Bin,
    int HoursVentilated,
    HumidityRatio MeanHumidityRatio,
    OutdoorAirTotals BinMethod,
    OutdoorAirTotals Hourly)
{
    /// <summary>
    /// The dry-bulb at which the bin method evaluated the loads: the mean dry-bulb of the
    /// ventilated hours, or the midpoint (<see cref="OutdoorAirSettings.BinPoint"/>; the midpoint
    /// for a bin without ventilated hours).
    /// </summary>
    public Temperature EvaluatedAt { get; init; } = Bin.Mid;
}
