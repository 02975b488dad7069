using BinEnergy.Core.Binning;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// One dry-bulb bin of an outdoor-air estimate: the bin and its weather statistics, its ventilated
/// hours and their mean coincident humidity ratio, the dry-bulb the bin method evaluated it at,
/// and its figures by the three methods (the hourly ones are the exact sum of its own hours).
/// </summary>
/// <param name="Bin">The bin and its weather statistics.</param>
/// <param name="HoursVentilated">Hours of the bin in which outdoor air runs.</param>
/// <param name="MeanHumidityRatio">Mean coincident humidity ratio of those hours (NaN when none).</param>
/// <param name="EvaluatedAt">The dry-bulb at which the bin method evaluated the loads: the mean dry-bulb of the
/// ventilated hours, or the midpoint (<see cref="OutdoorAirSettings.BinPoint"/>; the midpoint for a bin without them).</param>
/// <param name="Figures">The bin's figures by each method.</param>
public sealed record OutdoorAirBinRow(
    BinRow Bin,
    int HoursVentilated,
    HumidityRatio MeanHumidityRatio,
    Temperature EvaluatedAt,
    ByMethod<EnergyFigures> Figures)
{
    /// <summary>How many years the bin's weather statistics span (its figures are per year): 1 but for the mean year of a multi-year record.</summary>
    public int YearsAveraged { get; init; } = 1;
}
