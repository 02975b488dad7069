using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;

namespace BinEnergy.Reporting.Batch;

/// <summary>Where and how a batch writes.</summary>
public sealed record BatchOutputSettings
{
    /// <summary>The output folder.</summary>
    public required string Folder { get; init; }

    /// <summary>The study.</summary>
    public required StudyDefinition Study { get; init; }

    /// <summary>The inputs (their attribute columns and hash).</summary>
    public required BatchInputs Inputs { get; init; }

    /// <summary>The part of the batch this process runs.</summary>
    public BatchShard Shard { get; init; } = BatchShard.Whole;

    /// <summary>A station-list column whose values name the partition folders instead of <c>shard=I</c>, or null.</summary>
    public string? PartitionBy { get; init; }

    /// <summary>Also write each part as CSV beside its Parquet file.</summary>
    public bool Csv { get; init; }

    /// <summary>Keep the finished parts of an earlier run of the same study and inputs; run the rest.</summary>
    public bool Resume { get; init; }

    /// <summary>Start over: remove this shard's earlier parts.</summary>
    public bool Force { get; init; }

    /// <summary>A part is written once one of its tables has this many rows (each part holds whole climates).</summary>
    public int RowsPerPart { get; init; } = 100_000;
}
