using System.Globalization;
using System.Text.Json;
using BinEnergy.Cli;
using BinEnergy.Tests.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Batch;

/// <summary>
/// A temporary folder with invented climates (open layout, 8,760 hours each from the test synthesizer), the example
/// study, and the means to run the command line and read its tables back through DuckDB, an outside reader.
/// </summary>
internal sealed class BatchFolder : IDisposable
{
    public BatchFolder(int climates)
    {
        Path = Directory.CreateTempSubdirectory("binenergy-batch-").FullName;
        Directory.CreateDirectory(Weather);
        for (int i = 0; i < climates; i++)
        {
            // Invented climates from mild and humid to cold and dry, each its own year.
            var weather = SyntheticWeather.Year(meanC: 4 + 2.5 * i, annualSwingK: 9 + i % 5, dailySwingK: 4 + i % 3, spreadK: 2 + i % 4, name: Names[i]);
            using var writer = new StreamWriter(File(i));
            Core.Weather.OpenLayoutWriter.Write(weather, writer);
        }

        Study = System.IO.Path.Combine(Path, "study.toml");
        System.IO.File.WriteAllText(Study, StudyText(climates));
    }

    /// <summary>Invented place names.</summary>
    public static IReadOnlyList<string> Names { get; } =
        ["Aster Flats", "Brinmoor", "Calder Reach", "Dunhollow", "Eskerby", "Fallowmere", "Gorse Point", "Hallin Ridge",
         "Ivel Bay", "Junipra", "Kestrel Ford", "Lorn Valley", "Merrow Sands", "Nettlebank", "Orrin Cove", "Pellan Heath"];

    public string Path { get; }

    public string Weather => System.IO.Path.Combine(Path, "weather");

    public string Study { get; }

    /// <summary>The weather file of climate <paramref name="i"/>.</summary>
    public string File(int i) => System.IO.Path.Combine(Weather, FormattableString.Invariant($"station-{i:D2}.csv"));

    /// <summary>The example study with one [[climate]] per invented file, named as the station list names them.</summary>
    public static string StudyText(int climates)
    {
        string text = ExampleStudy.Text.Replace("\r\n", "\n", StringComparison.Ordinal);
        int at = text.IndexOf("[[climate]]", StringComparison.Ordinal);
        int end = text.IndexOf("[schedule]", StringComparison.Ordinal);
        Assert.True(at > 0 && end > at, "the example study has its climate before its schedule");
        var blocks = Enumerable.Range(0, climates).Select(i => FormattableString.Invariant($"[[climate]]\nname = \"{Names[i]}\"\nweather = \"weather/station-{i:D2}.csv\"\n"));
        return text[..at] + string.Join("\n", blocks) + "\n" + text[end..];
    }

    /// <summary>A station list of the first <paramref name="count"/> files: weather, name and an invented region.</summary>
    public string StationList(int count, string name = "stations.csv")
    {
        string path = System.IO.Path.Combine(Path, name);
        var lines = new List<string> { "weather,name,region" };
        lines.AddRange(Enumerable.Range(0, count).Select(i => FormattableString.Invariant($"weather/station-{i:D2}.csv,{Names[i]},{(i % 2 == 0 ? "north" : "south")}")));
        System.IO.File.WriteAllLines(path, lines);
        return path;
    }

    public static (int Code, string Out, string Err) Cli(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>Every row of the tables, read by DuckDB (a batch's parts with hive partitioning when <paramref name="hive"/>), ordered by the given columns.</summary>
    public static Dictionary<string, DuckRows> Read(string folder, bool hive, Dictionary<string, string[]> order) =>
        NodeReference.Run<Dictionary<string, DuckRows>>("duckdb-tables.mjs",
            new { folder, hive, sums = order.ToDictionary(kv => kv.Key, _ => Array.Empty<string>()), rows = order });

    /// <summary>The rows as text (each value as JSON writes it) without the given columns (partitions, attributes).</summary>
    public static List<string> Rows(DuckRows table, params string[] without) =>
        table.all!.Select(r => string.Join("|", r.Where(kv => !without.Contains(kv.Key)).Select(kv => kv.Key + "=" + kv.Value.GetRawText()))).ToList();

    public static JsonElement Summary(string path) => JsonDocument.Parse(System.IO.File.ReadAllText(path)).RootElement;

    public static double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);

    public void Dispose() => Directory.Delete(Path, recursive: true);

    internal sealed record DuckRows(int rows, List<DuckColumn> columns, Dictionary<string, string> metadata, List<Dictionary<string, JsonElement>>? all);

    internal sealed record DuckColumn(string name, string type);
}
