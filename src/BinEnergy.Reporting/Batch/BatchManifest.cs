using System.Text.Json;
using System.Text.Json.Serialization;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// The list of a batch shard's finished parts (<c>manifest.json</c>, or <c>manifest-shard-I-of-N.json</c> for a shard of
/// several), rewritten atomically after every part, with the hashes of the study and the input list it was run with, so
/// <c>--resume</c> keeps these parts and refuses a changed study or list.
/// </summary>
public sealed record BatchManifest
{
    [JsonPropertyName("study")]
    public required string Study { get; init; }

    [JsonPropertyName("study_sha256")]
    public required string StudyHash { get; init; }

    [JsonPropertyName("inputs_sha256")]
    public required string InputsHash { get; init; }

    [JsonPropertyName("shard")]
    public required int Shard { get; init; }

    [JsonPropertyName("shards")]
    public required int Shards { get; init; }

    [JsonPropertyName("partition_by")]
    public string? PartitionBy { get; init; }

    [JsonPropertyName("engine_version")]
    public required string EngineVersion { get; init; }

    [JsonPropertyName("parts")]
    public List<BatchPart> Parts { get; init; } = [];

    private static readonly JsonSerializerOptions Options = new() { WriteIndented = true };

    /// <summary>The file name of a shard's manifest.</summary>
    public static string FileName(int shard, int shards) =>
        shards == 1 ? "manifest.json" : FormattableString.Invariant($"manifest-shard-{shard}-of-{shards}.json");

    /// <summary>Reads a manifest, or null when there is none.</summary>
    /// <exception cref="Core.Batch.BatchInputException">The file is not a manifest (damaged or edited).</exception>
    public static BatchManifest? Load(string path)
    {
        if (!File.Exists(path))
        {
            return null;
        }

        try
        {
            return JsonSerializer.Deserialize<BatchManifest>(File.ReadAllText(path), Options) ?? throw new JsonException("empty");
        }
        catch (JsonException e)
        {
            throw new Core.Batch.BatchInputException($"{path} is not a batch manifest ({e.Message}): it was damaged or edited; start over with --force instead of --resume");
        }
    }

    /// <summary>Writes the manifest atomically, flushed to disk.</summary>
    public void Save(string path) =>
        AtomicFile.Write(path, temporary => File.WriteAllText(temporary, JsonSerializer.Serialize(this, Options) + "\n"), flushToDisk: true);
}
