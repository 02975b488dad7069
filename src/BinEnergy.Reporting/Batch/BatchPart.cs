using System.Text.Json.Serialization;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// One finished part of a batch, as its manifest lists it: the partition folder and number, the files written (one per
/// table, paths relative to the output folder), the inputs and climates whose rows they hold, and their counts.
/// </summary>
public sealed record BatchPart
{
    /// <summary>The partition folder, e.g. <c>shard=0</c> or <c>state=CO</c>.</summary>
    [JsonPropertyName("partition")]
    public required string Partition { get; init; }

    /// <summary>The part's number within its partition and shard.</summary>
    [JsonPropertyName("number")]
    public required int Number { get; init; }

    /// <summary>The files, relative to the output folder, with forward slashes.</summary>
    [JsonPropertyName("files")]
    public required IReadOnlyList<string> Files { get; init; }

    /// <summary>Rows per table.</summary>
    [JsonPropertyName("rows")]
    public required IReadOnlyDictionary<string, int> Rows { get; init; }

    /// <summary>The inputs' keys (listed name or file path relative to the inputs' folder, or the station list's line).</summary>
    [JsonPropertyName("inputs")]
    public required IReadOnlyList<string> Inputs { get; init; }

    /// <summary>The climates' names, as in the tables' <c>climate</c> column (those that ran).</summary>
    [JsonPropertyName("climates")]
    public required IReadOnlyList<string> Climates { get; init; }

    /// <summary>Inputs stopped by a problem.</summary>
    [JsonPropertyName("failed")]
    public required int Failed { get; init; }

    /// <summary>Problems and cautions by kind.</summary>
    [JsonPropertyName("warnings")]
    public required IReadOnlyDictionary<string, int> Warnings { get; init; }
}
