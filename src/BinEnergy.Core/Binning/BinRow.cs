using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>One dry-bulb bin: its edges and its statistics per occupancy class.</summary>
/// <param name="Index">The bin index k: the bin covers [k w, (k+1) w) in the display unit.</param>
/// <param name="Low">Lower edge (inclusive).</param>
/// <param name="High">Upper edge (exclusive).</param>
/// <param name="Mid">Midpoint.</param>
/// <param name="All">Every hour of the bin.</param>
/// <param name="Occupied">The occupied hours.</param>
/// <param name="Unoccupied">The unoccupied hours.</param>
public sealed record BinRow(
    int Index,
    Temperature Low,
    Temperature High,
    Temperature Mid,
    BinStatistics All,
    BinStatistics Occupied,
    BinStatistics Unoccupied)
{
    /// <summary>The statistics of one occupancy class.</summary>
    public BinStatistics For(OccupancyClass occupancy) => BinStatistics.Pick(occupancy, All, Occupied, Unoccupied);
}
