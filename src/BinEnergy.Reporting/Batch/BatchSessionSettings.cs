namespace BinEnergy.Reporting.Batch;

/// <summary>How a batch runs: where and how it writes, whether the first bad input is fatal, and how many files run at once.</summary>
public sealed record BatchSessionSettings
{
    /// <summary>Where and how the batch writes (folder, study, inputs, shard, partitioning, resume).</summary>
    public required BatchOutputSettings Output { get; init; }

    /// <summary>Stop at the first bad input (a station-list row, a missing or bad file, a duplicate name).</summary>
    public bool Strict { get; init; }

    /// <summary>Weather files run at once; null for one per core.</summary>
    public int? Workers { get; init; }

    /// <summary>The climates whose per-climate charts are drawn (<c>--charts-for</c>); none by default.</summary>
    public Core.Batch.BatchClimateSelection ChartsFor { get; init; } = Core.Batch.BatchClimateSelection.None;
}
