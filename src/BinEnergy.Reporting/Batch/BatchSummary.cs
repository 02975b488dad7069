using System.Text.Json;
using System.Text.Json.Nodes;
using BinEnergy.Core.Study;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// A batch's <c>summary.json</c>: one file for the cross-climate report's figures (study, national table, ranking,
/// warnings, cautions: <see cref="BatchReport.Summary"/>) and the batch's counts under the key <c>batch</c> (files,
/// done, failed, warnings by kind, rows per table, parts, hashes). A shard of several writes its counts alone into
/// <c>summary-shard-I-of-N.json</c>; <c>batch-report</c> adds them up under <c>batch</c> of the one <c>summary.json</c>.
/// Each file is replaced atomically.
/// </summary>
public static class BatchSummary
{
    /// <summary>The key of the counts.</summary>
    public const string BatchKey = "batch";

    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    private static readonly string[] Summed = ["files", "done", "failed", "parts"];

    /// <summary>One shard's counts as the <c>batch</c> object.</summary>
    public static JsonObject Counts(BatchOutputSettings settings, BatchCounts counts) => new()
    {
        ["study"] = settings.Study.Name,
        ["study_sha256"] = settings.Study.Hash,
        ["inputs_sha256"] = settings.Inputs.Hash,
        ["engine_version"] = StudyRunner.EngineVersion,
        ["shard"] = settings.Shard.Index,
        ["shards"] = settings.Shard.Count,
        ["partition_by"] = settings.PartitionBy,
        ["files"] = counts.Files,
        ["done"] = counts.Done,
        ["failed"] = counts.Failed,
        ["warnings"] = Object(counts.Warnings),
        ["rows"] = Object(counts.Rows),
        ["parts"] = counts.Parts,
    };

    /// <summary>Writes <paramref name="path"/>: the report's figures (or nothing) and the counts (when known) under <c>batch</c>.</summary>
    public static void Write(string path, JsonObject? figures, JsonNode? batch)
    {
        var root = figures?.DeepClone().AsObject() ?? [];
        if (batch is not null)
        {
            root[BatchKey] = batch.DeepClone();
        }

        string json = root.ToJsonString(Indented) + "\n";
        AtomicFile.Write(path, temporary => File.WriteAllText(temporary, json), flushToDisk: true);
    }

    /// <summary>
    /// The counts of the batch in <paramref name="folder"/>: the shards' summaries added up (with <c>shards_finished</c>
    /// and the shards that have none or stopped early named in <paramref name="warnings"/>), else the <c>batch</c> object of
    /// an unsharded batch's <c>summary.json</c>; null when there is neither.
    /// </summary>
    public static JsonObject? Gather(string folder, List<string> warnings)
    {
        var shards = Directory.Exists(folder) ? Directory.GetFiles(folder, "summary-shard-*-of-*.json").Order(StringComparer.Ordinal).ToList() : [];
        if (shards.Count == 0)
        {
            return Read(Path.Combine(folder, "summary.json"))?[BatchKey]?.AsObject() is JsonObject one ? (JsonObject)one.DeepClone() : null;
        }

        JsonObject? sum = null;
        var seen = new SortedSet<int>();
        int count = 0;
        foreach (string file in shards)
        {
            if (Read(file)?[BatchKey] is not JsonObject shard)
            {
                warnings.Add($"{Path.GetFileName(file)} holds no batch counts: it was damaged or edited; the counts leave it out.");
                continue;
            }

            count = shard["shards"]?.GetValue<int>() ?? 0;
            int index = shard["shard"]?.GetValue<int>() ?? -1;
            seen.Add(index);
            if (shard["done"]?.GetValue<int>() + shard["failed"]?.GetValue<int>() < shard["files"]?.GetValue<int>())
            {
                warnings.Add(FormattableString.Invariant($"shard {index} of {count} stopped before its end ({shard["done"]} done and {shard["failed"]} failed of {shard["files"]} inputs): rerun it with --resume, then batch-report again."));
            }

            if (sum is null)
            {
                sum = (JsonObject)shard.DeepClone();
                sum.Remove("shard");
                continue;
            }

            foreach (string key in Summed)
            {
                sum[key] = sum[key]!.GetValue<int>() + shard[key]!.GetValue<int>();
            }

            foreach (string key in new[] { "warnings", "rows" })
            {
                var total = sum[key]!.AsObject();
                foreach (var (k, v) in shard[key]!.AsObject())
                {
                    total[k] = (total[k]?.GetValue<int>() ?? 0) + v!.GetValue<int>();
                }

                sum[key] = Object(total.OrderBy(kv => kv.Key, StringComparer.Ordinal).Select(kv => KeyValuePair.Create(kv.Key, kv.Value!.GetValue<int>())));
            }
        }

        if (sum is null)
        {
            return null;
        }

        sum["shards_finished"] = seen.Count;
        var missing = Enumerable.Range(0, count).Where(i => !seen.Contains(i)).ToList();
        if (missing.Count > 0)
        {
            warnings.Add(FormattableString.Invariant($"{missing.Count} of {count} shards have not finished (no summary-shard-I-of-{count}.json for shard {string.Join(", ", missing)}): the report covers the finished ones only."));
        }

        return sum;
    }

    private static JsonObject? Read(string path)
    {
        if (!File.Exists(path))
        {
            return null;
        }

        try
        {
            return JsonNode.Parse(File.ReadAllText(path)) as JsonObject;
        }
        catch (JsonException)
        {
            return null;
        }
    }

    private static JsonObject Object(IEnumerable<KeyValuePair<string, int>> counts)
    {
        var o = new JsonObject();
        foreach (var (k, v) in counts)
        {
            o[k] = v;
        }

        return o;
    }
}
