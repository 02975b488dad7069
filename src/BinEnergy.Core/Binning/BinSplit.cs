namespace BinEnergy.Core.Binning;

/// <summary>How a bin table is split into groups (DESIGN 6).</summary>
public enum BinSplit
{
    /// <summary>One table per calendar month (1-12).</summary>
    Month,

    /// <summary>One table per time-of-day block (<see cref="TimeOfDayBlocks"/>).</summary>
    TimeOfDayBlock,
}
