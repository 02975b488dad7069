namespace BinEnergy.Core.Binning;

/// <summary>Which hours of a bin a statistic covers (DESIGN 6).</summary>
public enum OccupancyClass
{
    /// <summary>Every hour of the bin.</summary>
    All,

    /// <summary>The hours the occupancy schedule marks occupied.</summary>
    Occupied,

    /// <summary>The other hours.</summary>
    Unoccupied,
}
