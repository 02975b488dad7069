namespace BinEnergy.Core.Binning;

/// <summary>
/// Blocks of the day for splitting a bin table (DESIGN 6: default three 8-hour blocks
/// 00-08, 08-16, 16-24). Boundaries are whole hours from 0 to 24, ascending.
/// </summary>
public sealed record TimeOfDayBlocks
{
    private readonly int[] blockOfHour = new int[24];

    /// <summary>Creates blocks from their boundaries, e.g. 0, 8, 16, 24.</summary>
    /// <exception cref="ArgumentException">The boundaries do not start at 0, end at 24 and ascend.</exception>
    public TimeOfDayBlocks(params int[] boundaries)
    {
        if (boundaries.Length < 2 || boundaries[0] != 0 || boundaries[^1] != 24
            || boundaries.Zip(boundaries.Skip(1)).Any(p => p.Second <= p.First))
        {
            throw new ArgumentException("time-of-day block boundaries must start at 0, end at 24 and ascend (e.g. 0, 8, 16, 24)", nameof(boundaries));
        }

        Boundaries = [.. boundaries];
        for (int b = 0; b + 1 < boundaries.Length; b++)
        {
            for (int h = boundaries[b]; h < boundaries[b + 1]; h++)
            {
                blockOfHour[h] = b;
            }
        }
    }

    /// <summary>The default: 00-08, 08-16, 16-24.</summary>
    public static TimeOfDayBlocks Default { get; } = new(0, 8, 16, 24);

    /// <summary>Boundaries in hours, 0 first and 24 last.</summary>
    public IReadOnlyList<int> Boundaries { get; }

    /// <summary>Number of blocks.</summary>
    public int Count => Boundaries.Count - 1;

    /// <summary>The block an hour of the day (0-23) falls in.</summary>
    public int BlockOf(int hourOfDay) => blockOfHour[hourOfDay];

    /// <summary>A block's label, e.g. "08-16".</summary>
    public string Label(int block) => FormattableString.Invariant($"{Boundaries[block]:00}-{Boundaries[block + 1]:00}");
}
