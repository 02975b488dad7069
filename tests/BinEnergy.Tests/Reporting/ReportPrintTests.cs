using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;
using AngleSharp.Html.Parser;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Html;
using BinEnergy.Reporting.Study;
using BinEnergy.Tests.Support;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// The demo report printed to PDF by headless Chromium (Debian's <c>chromium</c>, <c>--print-to-pdf</c>) on Letter
/// and A4 paper, read back with poppler's <c>pdftotext -bbox</c>: every column heading of every printed table is
/// on the page of its caption, no word lies past the page's edge, every page has its number, and no page but the
/// last is mostly blank.
/// </summary>
public sealed partial class ReportPrintTests(ITestOutputHelper log) : IDisposable
{
    /// <summary>The environment variable <c>./test.sh</c> sets after saying plainly that Chromium or poppler is not installed.</summary>
    public const string AbsentNotedVariable = "BINENERGY_BROWSER_ABSENT_NOTED";

    private static readonly Lazy<string> DemoHtml = new(() =>
    {
        var run = StudyRunner.Run(StudyFileReader.Read(Path.Combine(RepoPaths.Root, "weather-samples", "demo", "demo-study.toml")), false, null, CancellationToken.None);
        return HtmlReport.Build(StudyReport.Model(run, StudyReport.Charts(run), DateTimeOffset.UnixEpoch));
    });

    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-print-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Theory]
    [InlineData("letter", 612.0, 792.0)] // US Letter, 8.5 x 11 in at 72 pt/in (ANSI/ASME Y14.1)
    [InlineData("a4", 595.28, 841.89)] // A4, 210 x 297 mm at 72 pt/in (ISO 216)
    public void DemoReport_PrintsEveryTableWhole_OnNumberedPages(string paper, double widthPt, double heightPt)
    {
        if (!ToolsPresent())
        {
            return;
        }

        // The page leaves the paper to the browser (@page size auto): Chromium prints Letter unless told; A4 as a user's print dialog would set it.
        string html = paper == "a4" ? DemoHtml.Value.Replace("</head>", "<style>@page { size: A4; }</style>\n</head>", StringComparison.Ordinal) : DemoHtml.Value;
        string page = Path.Combine(folder, "report.html");
        File.WriteAllText(page, html);
        string pdf = Path.Combine(folder, "report.pdf");
        Run("chromium", ["--headless", "--no-sandbox", "--disable-gpu", "--no-pdf-header-footer", "--user-data-dir=" + Path.Combine(folder, "profile"), "--print-to-pdf=" + pdf, new Uri(page).AbsoluteUri]);
        string bbox = Path.Combine(folder, "words.html");
        Run("pdftotext", ["-bbox", pdf, bbox]);
        var pages = Pages(File.ReadAllText(bbox));
        log.WriteLine($"{paper}: {pages.Count} pages");
        Assert.InRange(pages.Count, 10, 40);

        for (int p = 0; p < pages.Count; p++)
        {
            var pg = pages[p];
            Assert.Equal(widthPt, pg.Width, 0.5);
            Assert.Equal(heightPt, pg.Height, 0.5);
            var outside = pg.Words.Where(w => w.XMin < 0 || w.XMax > pg.Width + 0.5 || w.YMax > pg.Height + 0.5).Select(w => w.Text).ToList();
            Assert.True(outside.Count == 0, $"page {p + 1}: words past the page's edge: {string.Join(" ", outside.Take(10))}");
            Assert.Contains($"Page {p + 1} of {pages.Count}", pg.Text, StringComparison.Ordinal);
            if (p < pages.Count - 1)
            {
                // Content (the captions under the charts, the table rows) reaches at least the middle of every page but the last.
                double bottom = pg.Words.Where(w => w.YMax < pg.Height - 40).Select(w => w.YMax).DefaultIfEmpty(0).Max();
                Assert.True(bottom > 0.5 * pg.Height, $"page {p + 1} of {pages.Count} is mostly blank: its content ends at {bottom:0} pt of {pg.Height:0}");
            }
        }

        // Every table the printed page shows (the parts of a wide table, not the screen's whole one): its headings on its caption's page.
        var doc = new HtmlParser().ParseDocument(html);
        var tables = doc.QuerySelectorAll("table").Where(t => t.Closest(".screen-only") is null).ToList();
        Assert.True(tables.Count >= 8, $"the report has {tables.Count} printed tables");
        foreach (var table in tables)
        {
            string caption = table.QuerySelector("caption")!.TextContent;
            var start = Tokens(caption).ToList();
            int at = pages.FindIndex(pg => Contains(pg.Tokens, start));
            Assert.True(at >= 0, $"the table '{caption}' is not in the PDF");
            var missing = table.QuerySelectorAll("thead th").SelectMany(th => Tokens(th.TextContent)).Where(t => !pages[at].TokenSet.Contains(t)).Distinct().ToList();
            Assert.True(missing.Count == 0, $"page {at + 1}, table '{caption}': headings not on the page: {string.Join(", ", missing)}");
        }
    }

    private bool ToolsPresent()
    {
        bool present = Which("chromium") && Which("pdftotext");
        if (present)
        {
            return true;
        }

        Assert.True(Environment.GetEnvironmentVariable(AbsentNotedVariable) == "1",
            "Chromium or poppler-utils is not installed (apt-get install chromium poppler-utils), so the print test cannot run; ./test.sh reports this and leaves it out");
        log.WriteLine("Chromium or pdftotext is not installed: this test did not run (./test.sh said so).");
        return false;
    }

    private static bool Which(string program) =>
        (Environment.GetEnvironmentVariable("PATH") ?? string.Empty).Split(':').Any(d => File.Exists(Path.Combine(d, program)));

    private static void Run(string program, IEnumerable<string> args)
    {
        var info = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            info.ArgumentList.Add(a);
        }

        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        process.StandardOutput.ReadToEnd();
        Assert.True(process.WaitForExit(TimeSpan.FromMinutes(2)), $"{program} did not finish in 2 minutes");
        Assert.True(process.ExitCode == 0, $"{program} exited {process.ExitCode}: {stderr.Result}");
    }

    private sealed record Word(double XMin, double YMin, double XMax, double YMax, string Text);

    private sealed record Page(double Width, double Height, IReadOnlyList<Word> Words)
    {
        public string Text { get; } = string.Join(" ", Words.Select(w => w.Text));

        public IReadOnlyList<string> Tokens { get; } = Words.SelectMany(w => ReportPrintTests.Tokens(w.Text)).ToList();

        public IReadOnlySet<string> TokenSet => Tokens.ToHashSet(StringComparer.Ordinal);
    }

    private static List<Page> Pages(string bbox)
    {
        var pages = new List<Page>();
        foreach (Match page in PageElement().Matches(bbox))
        {
            var words = WordElement().Matches(page.Groups["body"].Value).Select(w => new Word(
                D(w.Groups["x0"].Value), D(w.Groups["y0"].Value), D(w.Groups["x1"].Value), D(w.Groups["y1"].Value),
                System.Net.WebUtility.HtmlDecode(w.Groups["text"].Value))).ToList();
            pages.Add(new Page(D(page.Groups["w"].Value), D(page.Groups["h"].Value), words));
        }

        return pages;
    }

    private static double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);

    /// <summary>Words as compared: split at spaces, hyphens and slashes (where a narrow column wraps), without punctuation.</summary>
    private static IEnumerable<string> Tokens(string text) =>
        Separators().Split(text).Select(t => t.Trim(',', '.', '(', ')', ':', ';', '%', '"')).Where(t => t.Length > 0);

    private static bool Contains(IReadOnlyList<string> tokens, IReadOnlyList<string> run)
    {
        for (int i = 0; i + run.Count <= tokens.Count; i++)
        {
            if (run.Select((t, k) => tokens[i + k] == t).All(x => x))
            {
                return true;
            }
        }

        return false;
    }

    [GeneratedRegex(@"<page width=""(?<w>[\d.]+)"" height=""(?<h>[\d.]+)"">(?<body>.*?)</page>", RegexOptions.Singleline)]
    private static partial Regex PageElement();

    [GeneratedRegex(@"<word xMin=""(?<x0>[-\d.]+)"" yMin=""(?<y0>[-\d.]+)"" xMax=""(?<x1>[-\d.]+)"" yMax=""(?<y1>[-\d.]+)"">(?<text>[^<]*)</word>")]
    private static partial Regex WordElement();

    [GeneratedRegex(@"[\s\-/–—]+")]
    private static partial Regex Separators();
}
