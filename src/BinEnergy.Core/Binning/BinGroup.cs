namespace BinEnergy.Core.Binning;

/// <summary>One group of a split bin table: a month or a time-of-day block, and its bins.</summary>
/// <param name="Key">Month number (1-12) or block number (0-based).</param>
/// <param name="Label">Month abbreviation ("Jan") or block label ("08-16").</param>
/// <param name="Table">The group's bins, on the same bin range as the whole table.</param>
public sealed record BinGroup(int Key, string Label, BinTable Table);
