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
        // The demo details two of its four variants ([report] detail_variants): per climate 2 weather charts and 5 per detailed variant, + 2 comparisons.
        Assert.Equal(["minimum", "recovery-wheel"], run.Study.DetailVariants);
        Assert.Equal(climates * (2 + 2 * 5) + 2, charts.Count);
        Assert.Equal(charts.Count, charts.Select(c => c.Name).Distinct().Count());
        Assert.DoesNotContain(charts, c => c.Variant is "plus-30" or "heat-pump");

        foreach (var group in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            var first = group.First();
            string slug = group.Key;
            var wheel = group.Single(c => c.Case.Variant.Name == "recovery-wheel");
            var wheelLoads = charts.Single(c => c.Name == $"load-by-bin-{slug}-recovery-wheel").Chart;
            Assert.Equal(wheel.OutdoorAir.Annual[run.Study.HeadlineMethod].Loads.Heating.Kbtu, wheelLoads.SeriesLabelled(LoadByBinChart.HeatingLabel).Total, 3);
            var hours = charts.Single(c => c.Name == "bin-hours-" + slug).Chart;
            // Hours sum to the record; occupied hours to the schedule's.
            Assert.Equal(first.Weather.Count, hours.SeriesLabelled(BinHoursChart.OccupiedLabel).Total + hours.SeriesLabelled(BinHoursChart.UnoccupiedLabel).Total, 9);
            Assert.Equal(first.Occupied.Count(o => o), hours.SeriesLabelled(BinHoursChart.OccupiedLabel).Total, 9);

            var loads = charts.Single(c => c.Name == $"load-by-bin-{slug}-minimum").Chart;
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

    [Fact]
    public void DemoReport_StatesItsInputs()
    {
        var run = Demo.Value;
        var model = StudyReport.Model(run, StudyReport.Charts(run), DateTimeOffset.UnixEpoch);
        string html = HtmlReport.Build(model);
        var inputs = new AngleSharp.Html.Parser.HtmlParser().ParseDocument(html).GetElementById("inputs")!;
        string text = inputs.TextContent;

        // Each weather file with its site: the demo's invented Alcor Mesa sits at 5,249 ft (its file's header).
        foreach (var c in run.Study.Climates)
        {
            Assert.Contains(Path.GetFileName(c.WeatherPath), text, StringComparison.Ordinal);
        }

        Assert.Contains("5,249", text, StringComparison.Ordinal);
        // Each variant as what it changes, as the study file writes it.
        Assert.Contains("ventilation.airflow_cfm = 3170", text, StringComparison.Ordinal);
        Assert.Contains("recovery.enabled = true", text, StringComparison.Ordinal);
        Assert.Contains("plant.heating_fuel = \"heat-pump\"", text, StringComparison.Ordinal);
        // Prices, carbon factors, the economizer and recovery settings, with what each key means.
        foreach (string key in new[] { "price_gas_per_therm", "carbon_electricity_kg_per_kwh", "high_limit_enthalpy_btu_lb", "sensible_effectiveness", "supply_temp_f" })
        {
            Assert.Contains(key, text, StringComparison.Ordinal);
        }

        Assert.Contains("Electricity price.", text, StringComparison.Ordinal);
        // The defaults the engine took are stated with the variants they apply to.
        Assert.Contains("recalled from memory", text, StringComparison.Ordinal);

        // Results: the peaks and economizer tables, and the method check of the detailed variants only.
        var results = model.Results.Select(r => r.Heading).ToList();
        Assert.Contains("Peak outdoor-air loads at the design conditions", results);
        Assert.Contains("Economizer", results);
        var check = (ReportTable)model.Results.Single(r => r.Heading == "Method check").Blocks[0];
        Assert.All(check.Rows, r => Assert.Contains(r[1], new[] { "minimum", "recovery-wheel" }));
        Assert.Equal(run.Cases.Count(c => c.Case.Variant.Name is "minimum" or "recovery-wheel"), check.Rows.Select(r => r[0] + "/" + r[1]).Distinct().Count());
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
