using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>One dry-bulb bin of the economizer evaluation: the state the bin method uses.</summary>
/// <param name="Index">The bin index k (the bin covers [k w, (k+1) w) in the display unit).</param>
/// <param name="Low">Lower edge (inclusive).</param>
/// <param name="High">Upper edge (exclusive).</param>
/// <param name="Mid">Midpoint.</param>
/// <param name="OccupiedHours">Occupied hours in the bin.</param>
/// <param name="MeanHumidityRatio">Mean coincident humidity ratio of the occupied hours (NaN when there are none).</param>
/// <param name="Enthalpy">Enthalpy of the bin state (<see cref="EvaluatedAt"/>, mean humidity ratio), eq. 32.</param>
/// <param name="DewPoint">Dew point of the bin state's humidity ratio at the site pressure.</param>
public sealed record EconomizerBinRow(
    int Index,
    Temperature Low,
    Temperature High,
    Temperature Mid,
    int OccupiedHours,
    HumidityRatio MeanHumidityRatio,
    SpecificEnthalpy Enthalpy,
    Temperature DewPoint)
{
    /// <summary>
    /// The dry-bulb of the bin method's state: the mean of the occupied hours, or the midpoint
    /// (<see cref="EconomizerSettings.BinPoint"/>; the midpoint for a bin without occupied hours).
    /// </summary>
    public Temperature EvaluatedAt { get; init; } = Mid;
}
