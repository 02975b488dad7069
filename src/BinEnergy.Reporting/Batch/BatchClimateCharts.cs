using System.Text;
using System.Text.Json;
using System.Text.Json.Serialization;
using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Study;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// The per-climate charts of the climates a batch names with <c>--charts-for</c>: the charts <c>run</c> draws for a
/// climate (<see cref="StudyReport.ClimateCharts"/>, its weather and each variant the study details), rendered by the shard that runs the climate
/// as its rows are written, into <c>OUT/charts/NAME-SLUG.png|svg</c>, with an index <c>OUT/charts/SLUG.json</c> (the
/// climate, the shard, the study hash, each chart's title, description and size) from which the cross-climate report,
/// in any later process, embeds them. Each file is written atomically.
/// </summary>
public static class BatchClimateCharts
{
    private static readonly JsonSerializerOptions Options = new() { WriteIndented = true };

    /// <summary>Renders and writes the charts of one climate; returns how many.</summary>
    /// <param name="folder">The batch output folder.</param>
    /// <param name="run">The climate's run: the study (climates replaced by this one) and its cases in variant order.</param>
    /// <param name="slug">The file-name-safe name (of the name given to <c>--charts-for</c>, so every shard agrees).</param>
    /// <param name="shard">The shard writing it (an index of another shard is never removed by this one).</param>
    public static int Write(string folder, StudyRunResult run, string slug, BatchShard shard)
    {
        string charts = Path.Combine(folder, "charts");
        Directory.CreateDirectory(charts);
        var rendered = StudyReport.ClimateCharts(run, run.Cases, slug);
        foreach (var (name, chart) in rendered)
        {
            AtomicFile.Write(Path.Combine(charts, name + ".png"), chart.Png);
            AtomicFile.Write(Path.Combine(charts, name + ".svg"), Encoding.UTF8.GetBytes(chart.Svg));
        }

        var index = new ChartIndex
        {
            Climate = run.Cases[0].Case.Climate.Name,
            Variant = run.Cases[0].Case.Variant.Name,
            Shard = shard.Index,
            Shards = shard.Count,
            StudyHash = run.Study.Hash,
            Charts = rendered.Select(c => new ChartEntry { Name = c.Name, Title = c.Chart.Title, Description = c.Chart.Description, Width = c.Chart.Size.Width, Height = c.Chart.Size.Height }).ToList(),
        };
        AtomicFile.Write(Path.Combine(charts, slug + ".json"), Encoding.UTF8.GetBytes(JsonSerializer.Serialize(index, Options) + "\n"));
        return rendered.Count;
    }

    /// <summary>Removes the charts a shard wrote before (a fresh start or --force of that shard).</summary>
    public static void RemoveShard(string folder, BatchShard shard)
    {
        foreach (var (path, index) in Indexes(folder).Where(i => i.Index.Shard == shard.Index && i.Index.Shards == shard.Count))
        {
            foreach (var chart in index.Charts)
            {
                File.Delete(Path.Combine(folder, "charts", chart.Name + ".png"));
                File.Delete(Path.Combine(folder, "charts", chart.Name + ".svg"));
            }

            File.Delete(path);
        }
    }

    /// <summary>The charts in <paramref name="folder"/> of the study with hash <paramref name="studyHash"/>, by climate name.</summary>
    public static IReadOnlyList<(string Climate, string Variant, IReadOnlyList<RenderedChart> Charts)> Read(string folder, string studyHash) =>
        Indexes(folder).Where(i => i.Index.StudyHash == studyHash)
            .OrderBy(i => i.Index.Climate, StringComparer.Ordinal)
            .Select(i => (i.Index.Climate, i.Index.Variant, (IReadOnlyList<RenderedChart>)i.Index.Charts
                .Where(c => File.Exists(Path.Combine(folder, "charts", c.Name + ".png")))
                .Select(c => new RenderedChart(c.Name, c.Title, c.Description, new ChartSize(c.Width, c.Height),
                    File.ReadAllBytes(Path.Combine(folder, "charts", c.Name + ".png")), File.ReadAllText(Path.Combine(folder, "charts", c.Name + ".svg")), [], false))
                .ToList()))
            .ToList();

    private static IEnumerable<(string Path, ChartIndex Index)> Indexes(string folder)
    {
        string charts = Path.Combine(folder, "charts");
        if (!Directory.Exists(charts))
        {
            yield break;
        }

        foreach (string path in Directory.EnumerateFiles(charts, "*.json").Order(StringComparer.Ordinal))
        {
            ChartIndex? index;
            try
            {
                index = JsonSerializer.Deserialize<ChartIndex>(File.ReadAllText(path), Options);
            }
            catch (JsonException)
            {
                index = null;
            }

            if (index is not null)
            {
                yield return (path, index);
            }
        }
    }

    private sealed record ChartIndex
    {
        [JsonPropertyName("climate")]
        public required string Climate { get; init; }

        [JsonPropertyName("variant")]
        public required string Variant { get; init; }

        [JsonPropertyName("shard")]
        public required int Shard { get; init; }

        [JsonPropertyName("shards")]
        public required int Shards { get; init; }

        [JsonPropertyName("study_sha256")]
        public required string StudyHash { get; init; }

        [JsonPropertyName("charts")]
        public required List<ChartEntry> Charts { get; init; }
    }

    private sealed record ChartEntry
    {
        [JsonPropertyName("name")]
        public required string Name { get; init; }

        [JsonPropertyName("title")]
        public required string Title { get; init; }

        [JsonPropertyName("description")]
        public required string Description { get; init; }

        [JsonPropertyName("width")]
        public required int Width { get; init; }

        [JsonPropertyName("height")]
        public required int Height { get; init; }
    }
}
