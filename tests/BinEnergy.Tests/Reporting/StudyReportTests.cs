using BinEnergy.Core.Study;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Html;
using BinEnergy.Reporting.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>The demo study's charts and report: what is plotted is what the engine computed.</summary>
public class StudyReportTests
{
    private static readonly Lazy<StudyRunResult> Demo = new(() =>
        StudyRunner.Run(StudyFileReader.Read(Path.Combine(RepoPaths.Root, "weather-samples", "demo", "demo-study.toml")), false, null, CancellationToken.None));

    [Fact]
    public void DemoCharts_PlotTheEngineResults()
    {
        var run = Demo.Value;
        var charts = StudyReport.Charts(run);
        int climates = run.Study.Climates.Count;
        Assert.Equal(4, climates);
        Assert.Equal(climates * 7 + 2, charts.Count); // 7 per climate (with an economizer) + 2 comparisons
        Assert.Equal(charts.Count, charts.Select(c => c.Name).Distinct().Count());

        foreach (var group in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            var first = group.First();
            string slug = group.Key;
            var hours = charts.Single(c => c.Name == "bin-hours-" + slug).Chart;
            // Hours sum to the record; occupied hours to the schedule's.
            Assert.Equal(first.Weather.Count, hours.SeriesLabelled(BinHoursChart.OccupiedLabel).Total + hours.SeriesLabelled(BinHoursChart.UnoccupiedLabel).Total, 9);
            Assert.Equal(first.Occupied.Count(o => o), hours.SeriesLabelled(BinHoursChart.OccupiedLabel).Total, 9);

            var loads = charts.Single(c => c.Name == "load-by-bin-" + slug).Chart;
            Assert.Equal(first.OutdoorAir.Annual[run.Study.HeadlineMethod].Loads.Heating.Kbtu, loads.SeriesLabelled(LoadByBinChart.HeatingLabel).Total, 3);
        }
    }

    [Fact]
    public void DemoReport_EmbedsEveryChartAndEscapesText()
    {
        var run = Demo.Value;
        var charts = StudyReport.Charts(run);
        var model = StudyReport.Model(run, charts, DateTimeOffset.UnixEpoch) with { StudyName = "<script>alert(1)</script>" };
        string html = HtmlReport.Build(model);
        Assert.Equal(charts.Count, CountOf(html, "data:image/png;base64,"));
        Assert.DoesNotContain("<script>alert(1)</script>", html);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html);
        foreach (var id in HtmlReport.SectionIds)
        {
            Assert.Contains($"id=\"{id}\"", html);
        }

        Assert.Contains("licensed engineer", html);
        Assert.Contains(run.Study.Hash, html);
    }

    private static int CountOf(string text, string part)
    {
        int n = 0;
        for (int i = text.IndexOf(part, StringComparison.Ordinal); i >= 0; i = text.IndexOf(part, i + part.Length, StringComparison.Ordinal))
        {
            n++;
        }

        return n;
    }
}
