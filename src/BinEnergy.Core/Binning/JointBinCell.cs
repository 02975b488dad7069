using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>One cell of a joint dry-bulb x humidity-ratio bin table, with its statistics per occupancy class.</summary>
/// <param name="DryBulbIndex">Dry-bulb bin index k.</param>
/// <param name="HumidityIndex">Humidity-ratio bin index j.</param>
/// <param name="DryBulbLow">Lower dry-bulb edge (inclusive).</param>
/// <param name="DryBulbHigh">Upper dry-bulb edge (exclusive).</param>
/// <param name="DryBulbMid">Dry-bulb midpoint.</param>
/// <param name="HumidityLow">Lower humidity-ratio edge (inclusive).</param>
/// <param name="HumidityHigh">Upper humidity-ratio edge (exclusive).</param>
/// <param name="All">Every hour of the cell.</param>
/// <param name="Occupied">The occupied hours.</param>
/// <param name="Unoccupied">The unoccupied hours.</param>
public sealed record JointBinCell(
    int DryBulbIndex,
    int HumidityIndex,
    Temperature DryBulbLow,
    Temperature DryBulbHigh,
    Temperature DryBulbMid,
    HumidityRatio HumidityLow,
    HumidityRatio HumidityHigh,
    BinStatistics All,
    BinStatistics Occupied,
    BinStatistics Unoccupied)
{
    /// <summary>The statistics of one occupancy class.</summary>
    public BinStatistics For(OccupancyClass occupancy) => BinStatistics.Pick(occupancy, All, Occupied, Unoccupied);
}
