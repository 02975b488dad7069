using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Html;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// The report page against the WHATWG HTML parser as implemented by AngleSharp: no parse
/// errors, every fixed section, every chart embedded as a PNG data URI, nothing loaded from a
/// network, and user text escaped.
/// </summary>
public class HtmlReportTests
{
    private const string Hostile = "<script>alert(1)</script>";

    private static readonly Lazy<RenderedChart[]> Charts = new(() =>
    {
        var climate = InventedClimate.Make(2);
        return
        [
            BinHoursChart.Render(ReportingSamples.Bins(climate)),
            LoadByBinChart.Render(ReportingSamples.Loads(climate)),
            PsychrometricChart.Render(ReportingSamples.Psychro(climate)),
            EconomizerModesChart.Render(ReportingSamples.Modes(climate)),
            EconomizerSavingsChart.Render(ReportingSamples.Savings(climate.Name)),
            ComparisonChart.RenderEnergy(ReportingSamples.Comparison(3)),
            ComparisonChart.RenderCost(ReportingSamples.Comparison(3)),
            MonthlyEnergyChart.Render(ReportingSamples.Monthly(climate)),
            MethodCheckChart.Render(ReportingSamples.MethodCheck(climate.Name)),
        ];
    });

    private static ReportModel Model(string studyName) => new()
    {
        StudyName = studyName,
        Run = new ReportRunInfo
        {
            Inputs =
            [
                new("Study file", "demo/invented-study.toml"),
                new("Weather", "Oxbow Ridge (invented), 8,760 hours"),
                new("Variants", "Minimum rate; Minimum +30 %; Dedicated unit with recovery; Demand-controlled"),
                new("Note from the user", Hostile),
            ],
            StudyHash = "sha256:3f5a9c0e",
            EngineVersion = "0.1.0",
            RunAt = new DateTimeOffset(2026, 3, 14, 9, 30, 0, TimeSpan.Zero),
        },
        Assumptions = new ReportAssumptions
        {
            FlowBasis = "site: dry air at 70 F and the site pressure",
            AirDensity = "0.0728 lb/ft3",
            SiteSensibleFactor = "1.05 Btu/(h cfm F)",
            BinWidth = "5 F, lower edge inclusive",
            Calendar = "8,760 hours, one invented year, local standard time",
            Schedule = "weekdays 07:00-19:00; outdoor air in occupied hours",
            DataRepairs = ["3 missing dry-bulb hours filled by linear interpolation"],
            Other = [new("Indoor setpoints", "heat to 70 F, cool to 75 F, at most 50 % RH")],
        },
        Results =
        [
            new ReportSection("Oxbow Ridge", [new ReportParagraph("Annual outdoor-air energy by variant."), new ReportChart(Charts.Value[0])])
            {
                Subsections =
                [
                    new ReportSection("Tables",
                    [
                        new ReportTable("Annual energy " + Hostile, ["Variant", "Heating (kBtu)", "Cooling (kBtu)"],
                        [
                            ["Minimum rate", "184,300", "52,300"],
                            [Hostile, "239,590", "-1.5 %"],
                        ]),
                    ]),
                    new ReportSection("Charts", Charts.Value.Skip(1).Select(c => (ReportBlock)new ReportChart(c)).ToArray()),
                ],
            },
        ],
        Warnings = ["Variant 'Demand-controlled' drops to 420 cfm at low occupancy, below the 450 cfm minimum entered " + Hostile],
    };

    private static (IHtmlDocument Document, List<string> Errors) Parse(string html)
    {
        var errors = new List<string>();
        var parser = new HtmlParser();
        parser.Error += (_, e) =>
        {
            var error = (AngleSharp.Html.Dom.Events.HtmlErrorEvent)e;
            errors.Add($"{error.Position.Line}:{error.Position.Column} {error.Message}");
        };
        return (parser.ParseDocument(html), errors);
    }

    [Fact]
    public void Report_IsValidHtml5WithEverySectionInOrder()
    {
        string html = HtmlReport.Build(Model("Invented study"));
        Directory.CreateDirectory(ChartReview.Folder);
        File.WriteAllText(Path.Combine(ChartReview.Folder, "..", "report-sample.html"), html);
        var (doc, errors) = Parse(html);

        Assert.True(errors.Count == 0, "HTML parse errors:\n" + string.Join("\n", errors));
        Assert.StartsWith("<!DOCTYPE html>", html, StringComparison.Ordinal);
        Assert.Equal("html", doc.Doctype?.Name);
        Assert.Equal("en", doc.DocumentElement.GetAttribute("lang"));
        Assert.Equal("utf-8", doc.CharacterSet, ignoreCase: true);
        var ids = doc.QuerySelectorAll("main > section").Select(s => s.Id ?? "").ToArray();
        Assert.Equal(HtmlReport.SectionIds, ids);
        Assert.Equal(["What was run", "Inputs", "Assumptions", "Results", "Warnings", "Cautions"], doc.QuerySelectorAll("main > section > h2").Select(h => h.TextContent));
        Assert.All(doc.QuerySelectorAll("nav a"), a => Assert.NotNull(doc.GetElementById(a.GetAttribute("href")!.TrimStart('#'))));
    }

    [Fact]
    public void ParseCheck_CatchesABrokenPage()
    {
        // A stray end tag and a missing doctype are parse errors in the WHATWG HTML standard
        // (section 13.2.6, tree construction); the check above must be able to fail.
        var (_, errors) = Parse("<html><body><p>x</div></body></html>");
        Assert.NotEmpty(errors);
    }

    [Fact]
    public void Report_StatesRunInfoAssumptionsAndCautions()
    {
        var (doc, _) = Parse(HtmlReport.Build(Model("Invented study")));
        string run = doc.GetElementById("run")!.TextContent;
        Assert.Contains("sha256:3f5a9c0e", run, StringComparison.Ordinal);
        Assert.Contains("BinEnergy 0.1.0", run, StringComparison.Ordinal);
        Assert.Contains("2026-03-14 09:30 UTC+00:00", run, StringComparison.Ordinal);
        Assert.Contains("demo/invented-study.toml", run, StringComparison.Ordinal);

        var assumptions = doc.GetElementById("assumptions")!;
        var terms = assumptions.QuerySelectorAll("dt").Select(d => d.TextContent).ToArray();
        Assert.Equal(["Flow basis", "Air density", "Sensible factor", "Bins", "Calendar", "Schedule", "Data repairs", "Indoor setpoints"], terms);
        Assert.Contains("1.05 Btu/(h cfm F) at the site; 1.08 Btu/(h cfm F) (standard air, 0.075 lb/ft3)", assumptions.TextContent, StringComparison.Ordinal);
        Assert.Contains("3 missing dry-bulb hours", assumptions.TextContent, StringComparison.Ordinal);

        string cautions = doc.GetElementById("cautions")!.TextContent;
        Assert.Contains("estimates for comparing options", cautions, StringComparison.Ordinal);
        Assert.Contains("code adopted locally", cautions, StringComparison.Ordinal);
        Assert.Contains("licensed engineer", cautions, StringComparison.Ordinal);
        Assert.Contains("below the required minimum harms occupants", cautions, StringComparison.Ordinal);
        Assert.Contains("estimates for comparing options", doc.QuerySelector("header .banner")!.TextContent, StringComparison.Ordinal);
        Assert.Single(doc.GetElementById("warnings")!.QuerySelectorAll("li"));
    }

    [Fact]
    public void Report_EmbedsEveryChartAndLoadsNothing()
    {
        string html = HtmlReport.Build(Model("Invented study"));
        var (doc, _) = Parse(html);
        var images = doc.QuerySelectorAll("figure.chart img").Cast<IHtmlImageElement>().ToArray();
        Assert.Equal(Charts.Value.Select(c => c.FileStem), doc.QuerySelectorAll("figure.chart").Select(f => f.GetAttribute("data-chart")));
        for (int i = 0; i < images.Length; i++)
        {
            string src = images[i].GetAttribute("src")!;
            Assert.StartsWith("data:image/png;base64,", src, StringComparison.Ordinal);
            Assert.Equal(Charts.Value[i].Png, Convert.FromBase64String(src["data:image/png;base64,".Length..]));
            Assert.False(string.IsNullOrWhiteSpace(images[i].AlternativeText));
        }

        Assert.Empty(doc.QuerySelectorAll("script, link, iframe, object, embed"));
        Assert.DoesNotContain("http://", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("https://", html, StringComparison.OrdinalIgnoreCase);
        Assert.All(doc.QuerySelectorAll("[src]"), e => Assert.StartsWith("data:", e.GetAttribute("src")!, StringComparison.Ordinal));
    }

    [Fact]
    public void Report_EscapesUserText()
    {
        string html = HtmlReport.Build(Model(Hostile));
        var (doc, errors) = Parse(html);
        Assert.Empty(errors);
        Assert.Empty(doc.QuerySelectorAll("script"));
        Assert.Equal(Hostile, doc.QuerySelector("h1")!.TextContent);
        Assert.StartsWith(Hostile, doc.Title, StringComparison.Ordinal);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html, StringComparison.Ordinal);
        Assert.DoesNotContain(Hostile, html, StringComparison.Ordinal);
        Assert.Equal(Hostile, doc.QuerySelectorAll("tbody th").Last().TextContent);
        Assert.Equal("\"quoted\" &amp; 'single'", HtmlReport.Escape("\"quoted\" & 'single'").Replace("&quot;", "\"").Replace("&#39;", "'"));
    }

    [Fact]
    public void Report_RightAlignsNumbersAndRefusesRaggedTables()
    {
        var (doc, _) = Parse(HtmlReport.Build(Model("Invented study")));
        var cells = doc.QuerySelectorAll("tbody td").ToArray();
        Assert.All(cells, c => Assert.Equal("num", c.ClassName));
        var ragged = Model("x") with { Results = [new ReportSection("t", [new ReportTable("ragged", ["a", "b"], [["1"]])])] };
        Assert.Contains("row 1 has 1 cells", Assert.Throws<ArgumentException>(() => HtmlReport.Build(ragged)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_LeavesOnlyTheFinishedPage()
    {
        string folder = Path.Combine(RepoPaths.Root, "tests", "BinEnergy.Tests", "artifacts", "report-write");
        if (Directory.Exists(folder))
        {
            Directory.Delete(folder, true);
        }

        string path = Path.Combine(folder, "report.html");
        HtmlReport.Write(Model("Invented study"), path);
        Assert.Equal(["report.html"], Directory.GetFiles(folder).Select(Path.GetFileName));
        Assert.Equal(HtmlReport.Build(Model("Invented study")), File.ReadAllText(path));
    }
}
