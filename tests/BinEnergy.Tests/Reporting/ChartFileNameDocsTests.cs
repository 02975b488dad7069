using System.Text.RegularExpressions;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Study;
using BinEnergy.Tests.Reporting.Batch;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// Every chart name the user documentation mentions is one the code writes, and every name the
/// code writes is documented. The names come from running the code (the demo study's charts as
/// <c>run</c> writes them into <c>charts/</c>, and the cross-climate report's charts of the
/// same run written as a batch folder), not from a list kept by hand. In the docs a chart file
/// is written <c>NAME.png</c> or <c>NAME.svg</c> (optionally under <c>charts/</c>), and a
/// chart name with a placeholder (<c>distribution-&lt;figure&gt;</c>) in backticks on a line
/// about charts; a placeholder stands for a climate or figure name.
/// </summary>
public class ChartFileNameDocsTests
{
    private const string Placeholder = "<name>";

    private static readonly Regex FileMention = new(@"(?<!images/)(?<![A-Za-z0-9<>_\-])(?:charts/)?(?<name>[A-Za-z0-9<>_\-]+)\.(?:png|svg)\b", RegexOptions.CultureInvariant);

    private static readonly Regex PlaceholderMention = new(@"`(?<name>[a-z0-9\-]*<[a-z]+>[a-z0-9\-]*)`", RegexOptions.CultureInvariant);

    private static readonly Regex AnyPlaceholder = new("<[a-z]+>", RegexOptions.CultureInvariant);

    private static readonly Lazy<IReadOnlySet<string>> Written = new(WrittenNames);

    [Fact]
    public void EveryChartNameInTheDocs_IsOneTheCodeWrites()
    {
        var mentions = Mentions().ToList();
        Assert.NotEmpty(mentions);
        var wrong = mentions.Where(m => !Written.Value.Contains(Normalize(m.Name))).Select(m => $"{m.File}:{m.Line}: {m.Name}").ToList();
        Assert.True(wrong.Count == 0,
            "chart names in the docs that the code does not write: " + string.Join("; ", wrong)
            + ". The code writes: " + string.Join(", ", Written.Value.Order(StringComparer.Ordinal)));
    }

    [Fact]
    public void EveryChartTheCodeWrites_IsListedInTheReportingDocs()
    {
        var documented = Mentions().Where(m => m.File == Path.Combine("docs", "reporting.md")).Select(m => Normalize(m.Name)).ToHashSet(StringComparer.Ordinal);
        var missing = Written.Value.Where(n => !documented.Contains(n)).Order(StringComparer.Ordinal).ToList();
        Assert.True(missing.Count == 0, "charts the code writes that docs/reporting.md does not name: " + string.Join(", ", missing));
    }

    [Theory]
    [InlineData("See `charts/bin-hours-<climate>.png` here", "bin-hours-<climate>")]
    [InlineData("![alt](docs/images/demo-load-by-bin.png)", null)]
    [InlineData("| `charts/*.png` | what |", null)]
    [InlineData("a chart (`distribution-<figure>`) and `<script>alert(1)</script>`", "distribution-<figure>")]
    [InlineData("writes `{stem}.png` and `{stem}.svg`", null)]
    public void Mentions_AreFoundAsDocumented(string line, string? expected)
    {
        var found = MentionsIn("x.md", [line]).Select(m => m.Name).ToList();
        Assert.Equal(expected is null ? new List<string>() : new List<string> { expected }, found);
    }

    [Fact]
    public void Mentions_InAChartTable_AreEveryNameInItsFirstColumn()
    {
        string[] table =
        [
            "| File stem | Class |",
            "| --- | --- |",
            "| `outdoor-air-load-by-bin` | `LoadByBinChart` |",
            "| `comparison-annual-energy`, `comparison-annual-cost` | `ComparisonChart` |",
            "",
            "| Key | What |",
            "| --- | --- |",
            "| `bin_width_f` | not a chart |",
        ];
        Assert.Equal(["outdoor-air-load-by-bin", "comparison-annual-energy", "comparison-annual-cost"], MentionsIn("x.md", table).Select(m => m.Name));
        Assert.DoesNotContain("outdoor-air-load-by-bin", Written.Value); // the name the docs once gave, which no code writes
    }

    private static string FirstCell(string row) => row.Split('|').ElementAtOrDefault(1)?.Trim() ?? "";

    private static string Normalize(string name) => AnyPlaceholder.Replace(name, Placeholder);

    private static IEnumerable<(string File, int Line, string Name)> Mentions()
    {
        var files = new[] { "README.md" }.Concat(Directory.EnumerateFiles(Path.Combine(RepoPaths.Root, "docs"), "*.md").Select(f => Path.GetRelativePath(RepoPaths.Root, f)));
        return files.SelectMany(f => MentionsIn(f, File.ReadAllLines(Path.Combine(RepoPaths.Root, f))));
    }

    private static IEnumerable<(string File, int Line, string Name)> MentionsIn(string file, IReadOnlyList<string> lines)
    {
        bool chartTable = false;
        for (int i = 0; i < lines.Count; i++)
        {
            var names = FileMention.Matches(lines[i]).Select(m => m.Groups["name"].Value).ToList();
            if (lines[i].Contains("chart", StringComparison.OrdinalIgnoreCase))
            {
                names.AddRange(PlaceholderMention.Matches(lines[i]).Select(m => m.Groups["name"].Value));
            }

            // A table whose first heading names charts or file stems: every name in backticks in its first column is a chart.
            bool row = lines[i].TrimStart().StartsWith('|');
            if (row && (i == 0 || !lines[i - 1].TrimStart().StartsWith('|')))
            {
                string heading = FirstCell(lines[i]);
                chartTable = heading.Contains("chart", StringComparison.OrdinalIgnoreCase) || heading.Contains("stem", StringComparison.OrdinalIgnoreCase);
            }
            else if (row && chartTable && !FirstCell(lines[i]).StartsWith("---", StringComparison.Ordinal))
            {
                names.AddRange(Regex.Matches(FirstCell(lines[i]), "`(?:charts/)?(?<name>[^`]+?)(?:\\.png|\\.svg)?`").Select(m => m.Groups["name"].Value));
            }
            else if (!row)
            {
                chartTable = false;
            }

            foreach (string name in names.Distinct(StringComparer.Ordinal))
            {
                yield return (file, i + 1, name);
            }
        }
    }

    /// <summary>The chart names the code writes for the demo study, with its climate and figure names replaced by a placeholder.</summary>
    private static IReadOnlySet<string> WrittenNames()
    {
        var run = StudyRunner.Run(StudyFileReader.Read(Path.Combine(RepoPaths.Root, "weather-samples", "demo", "demo-study.toml")), false, null, CancellationToken.None);
        var climates = StudyReport.UniqueSlugs(run.Study.Climates.Select(c => c.Name).ToList()).Values;
        var variants = StudyReport.UniqueSlugs(run.Study.Variants.Select(v => v.Name).ToList(), "variant").Values;
        var climateVariants = climates.SelectMany(c => variants.Select(v => (Slug: c + "-" + v, Name: Placeholder + "-" + Placeholder))).ToList();
        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (name, _) in StudyReport.Charts(run))
        {
            // A variant's chart ends in its climate and variant (load-by-bin-<climate>-<variant>).
            var pair = climateVariants.Where(p => name.EndsWith("-" + p.Slug, StringComparison.Ordinal)).OrderByDescending(p => p.Slug.Length).FirstOrDefault();
            names.Add(pair.Slug is null ? Replace(name, climates) : name[..^pair.Slug.Length] + pair.Name);
        }

        string folder = Path.Combine(Path.GetTempPath(), "binenergy-chart-names-" + Guid.NewGuid().ToString("N"));
        try
        {
            BatchFolder.Write(run, folder, shards: 1);
            var report = BatchReport.ReadAsync(folder).GetAwaiter().GetResult();
            var figures = report.Figures.Select(f => StudyReport.Slug(f.Label, "figure")).ToList();
            foreach (var (_, chart) in report.Charts())
            {
                names.Add(Replace(chart.FileStem, figures));
            }
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }

        return names;
    }

    /// <summary>Replaces a name (climate or figure slug) at the start or end of a chart name by the placeholder, longest names first.</summary>
    private static string Replace(string chartName, IEnumerable<string> slugs)
    {
        foreach (string slug in slugs.OrderByDescending(s => s.Length))
        {
            if (chartName.EndsWith("-" + slug, StringComparison.Ordinal))
            {
                return chartName[..^slug.Length] + Placeholder;
            }

            if (chartName.StartsWith(slug + "-", StringComparison.Ordinal))
            {
                return Placeholder + chartName[slug.Length..];
            }
        }

        return chartName;
    }
}
