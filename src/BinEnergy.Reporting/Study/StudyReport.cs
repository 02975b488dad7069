using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;
using BinEnergy.Reporting.Html;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Maps a finished study run onto the chart inputs and the HTML report model, and writes
/// <c>charts/*.png|svg</c> and <c>report.html</c> into the run's output folder. It only
/// reformats and converts results the engine computed; no physics here (the psychrometric
/// chart's curves come from Core's <see cref="Core.Psychrometrics.ChartCurves"/>).
/// </summary>
public static class StudyReport
{
    /// <summary>Renders every chart of the run (per climate: for the first variant; across climates: all cases), by the study's headline method.</summary>
    public static IReadOnlyList<(string Name, RenderedChart Chart)> Charts(StudyRunResult run)
    {
        var u = StudyTables.Units(run);
        var units = run.Study.Units;
        var headline = run.Study.HeadlineMethod;
        string method = IntegrationMethods.Label(headline);
        string tUnit = u.Temperature.Symbol;
        string eUnit = u.Energy.Symbol;
        double T(Temperature t) => u.Temperature.FromSi(t.Celsius);
        double E(Energy e) => u.Energy.FromSi(e.Joules);
        var charts = new List<(string, RenderedChart)>();

        var slugs = UniqueSlugs(run.Study.Climates.Select(c => c.Name).ToList());
        foreach (var climateCases in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            var first = climateCases.First();
            string climate = climateCases.Key;
            string slug = slugs[climate];
            string subject = $"{climate}, {first.Case.Variant.Name}";
            var bins = first.OutdoorAir.Bins;

            charts.Add(($"{BinHoursChart.FileStem}-{slug}", BinHoursChart.Render(new BinChartData
            {
                Subject = climate,
                TemperatureUnit = tUnit,
                Bins = bins.Select(b => new BinHoursRow(T(b.Bin.Low), T(b.Bin.High), b.Bin.Occupied.Hours, b.Bin.Unoccupied.Hours,
                    b.Bin.All.Hours > 0 ? T(b.Bin.All.MeanWetBulb) : null)).ToList(),
            })));

            charts.Add(($"{LoadByBinChart.FileStem}-{slug}", LoadByBinChart.Render(new LoadByBinData
            {
                Subject = $"{subject} ({method})",
                TemperatureUnit = tUnit,
                EnergyUnit = eUnit,
                Bins = bins.Select(b =>
                {
                    var l = b.Figures[headline].Loads;
                    return new LoadByBinRow(T(b.Bin.Low), T(b.Bin.High), E(l.Heating), E(l.CoolingSensible), E(l.CoolingLatent), E(l.Humidification));
                }).ToList(),
            })));

            // The psychrometric chart shades the region of the control the modes chart shows.
            var eco = first.Economizer;
            var best = eco?.Best(headline);
            EconomizerRegionLimits? region = eco is null || best is null ? null : EconomizerRegionLimits.For(best.Control, eco.Model, units);
            charts.Add(($"{PsychrometricChart.FileStem}-{slug}", PsychrometricChart.Render(PsychroChartData.FromSi(
                eco is null ? climate : subject, first.Weather.DryBulbC, first.Weather.HumidityRatio, first.Weather.Site.SitePressurePa, units, region))));

            if (eco is not null && best is not null)
            {
                charts.Add(($"{EconomizerModesChart.FileStem}-{slug}", EconomizerModesChart.Render(new EconomizerModesData
                {
                    Subject = subject,
                    ControlName = best.Control.Describe(),
                    TemperatureUnit = tUnit,
                    Bins = eco.Bins.Select((b, i) => new EconomizerModesRow(T(b.Low), T(b.High),
                        best.ByBin[i].Hourly.HoursNoCooling, best.ByBin[i].Hourly.HoursFree, best.ByBin[i].Hourly.HoursIntegrated, best.ByBin[i].Hourly.HoursMinimum)).ToList(),
                })));
                charts.Add(($"{EconomizerSavingsChart.FileStem}-{slug}", EconomizerSavingsChart.Render(new SavingsByControlData
                {
                    Subject = $"{subject} ({method})",
                    Quantity = "Cooling coil energy saved",
                    EnergyUnit = eUnit,
                    CostUnit = eco.HasPlant ? u.Cost.Symbol : null,
                    CostQuantity = "cost saved on the energy the air system buys (compressor, reheat and preheat, fans)",
                    Controls = eco.Controls.Select(c => new ControlSavingsRow(c.Control.Describe(), E(c.Savings(headline)),
                        eco.HasPlant ? c.PurchasedSavings(headline).Cost : null)).ToList(),
                })));
            }

            charts.Add(($"{MonthlyEnergyChart.FileStem}-{slug}", MonthlyEnergyChart.Render(new MonthlyEnergyData
            {
                Subject = $"{subject} ({method})",
                EnergyUnit = eUnit,
                Series =
                [
                    new MonthlyEnergySeries("Heating", Months(first, headline, l => E(l.Heating)), ChartPalette.Heating),
                    new MonthlyEnergySeries("Sensible cooling", Months(first, headline, l => E(l.CoolingSensible)), ChartPalette.SensibleCooling),
                    new MonthlyEnergySeries("Latent cooling", Months(first, headline, l => E(l.CoolingLatent)), ChartPalette.LatentCooling),
                ],
            })));

            var annual = first.OutdoorAir.Annual;
            charts.Add(($"{MethodCheckChart.FileStem}-{slug}", MethodCheckChart.Render(new MethodCheckData
            {
                Subject = subject,
                EnergyUnit = eUnit,
                Rows = new (string Name, LoadFigure Figure)[] { ("Heating", LoadFigure.Heating), ("Sensible cooling", LoadFigure.CoolingSensible), ("Latent cooling", LoadFigure.CoolingLatent), ("Humidification", LoadFigure.Humidification) }
                    .Select(f => new MethodCheckRow(f.Name, E(annual.Hourly.Loads[f.Figure]), E(annual.JointBin.Loads[f.Figure]), E(annual.Bin.Loads[f.Figure]))).ToList(),
            })));
        }

        var comparison = new ComparisonData
        {
            Subject = $"{run.Study.Name} ({method})",
            EnergyUnit = eUnit + " outdoor-air load",
            CostUnit = u.Cost.Symbol,
            Cells = run.Cases.Select(c =>
            {
                var years = c.Years.Where(y => y.Year.Complete).Select(y => y.OutdoorAir.Annual[headline]).ToList();
                bool spread = c.IsMultiYear && years.Count > 1;
                return new ComparisonCell(c.Case.Climate.Name, c.Case.Variant.Name,
                    E(c.OutdoorAir.Annual[headline].Loads.ThermalTotal), c.OutdoorAir.Annual[headline].Bought.Total.Cost)
                {
                    EnergyRange = spread ? (years.Min(y => E(y.Loads.ThermalTotal)), years.Max(y => E(y.Loads.ThermalTotal))) : null,
                    CostRange = spread ? (years.Min(y => y.Bought.Total.Cost), years.Max(y => y.Bought.Total.Cost)) : null,
                };
            }).ToList(),
        };
        charts.Add((ComparisonChart.EnergyFileStem, ComparisonChart.RenderEnergy(comparison)));
        charts.Add((ComparisonChart.CostFileStem, ComparisonChart.RenderCost(comparison)));
        return charts;
    }

    /// <summary>The report model of a run, with its charts.</summary>
    public static ReportModel Model(StudyRunResult run, IReadOnlyList<(string Name, RenderedChart Chart)> charts, DateTimeOffset runAt)
    {
        var u = StudyTables.Units(run);
        var headline = run.Study.HeadlineMethod;
        var first = run.Cases[0];
        var a = first.OutdoorAir.Assumptions;
        var summary = StudySummary.Build(run);
        var repairs = run.Cases.GroupBy(c => c.Case.Climate.Name).Select(g =>
        {
            var q = g.First().Weather.Quality;
            string counts = q.TotalRepairs == 0 ? "no repairs" : string.Join(", ", q.Repairs.Select(kv => $"{kv.Key}: {kv.Value}"));
            if (q.Disagreements.Any())
            {
                counts += "; checked, not changed: " + string.Join(", ", q.Disagreements.Select(kv => $"{kv.Key}: {kv.Value} hours where the file's own value disagrees with the humidity used"));
            }

            return $"{g.Key} ({g.First().Weather.Count} hours): {counts}";
        }).ToList();

        var climateTable = summary.Table("climates");
        var sections = new List<ReportSection>
        {
            new("Climates",
            [
                Table(climateTable, "Each climate's record: site, air density and sensible factor, degree-days and design conditions"),
                .. climateTable.Notes.Select(n => new ReportParagraph(n)),
            ]),
            new($"Annual outdoor-air loads, cost and carbon ({IntegrationMethods.Label(headline)})",
            [
                Table(summary.Table("headline"), $"Per climate and variant, {IntegrationMethods.Label(headline)} (the headline method)"),
            ]),
            new("Method check",
            [
                Table(summary.Table("method_check"), "Each annual figure by the hourly sum, joint bins and the bin method, with each bin method's difference from hourly"),
                new ReportParagraph("When to use which: the hourly sum is the reference wherever an hourly record exists. "
                    + "The bin method is the right tool when only bin data are at hand, and to explain where in the year the load falls; "
                    + "it misses latent loads because a bin's mean humidity ratio hides its humid hours. Joint dry-bulb x humidity bins close most of that error. "
                    + AssumptionText.LatentError),
            ]),
        };
        if (run.Cases.Any(c => c.IsMultiYear))
        {
            sections.Add(new ReportSection("Year-to-year spread",
            [
                Table(summary.Table("spread"), $"Multi-year records: the mean of the complete years (the headline) and the lowest and highest year, {IntegrationMethods.Label(headline)}"),
                new ReportParagraph("Partial first or last years are shown in tables/annual with complete_year = 0 and are not part of the mean."),
            ]));
        }

        foreach (var (name, chart) in charts)
        {
            sections.Add(new ReportSection(chart.Title, [new ReportChart(chart, chart.Description)]));
        }

        return new ReportModel
        {
            StudyName = run.Study.Name,
            Run = new ReportRunInfo
            {
                Inputs =
                [
                    new ReportKeyValue("study file", Path.GetFileName(run.Study.File)),
                    new ReportKeyValue("climates", string.Join(", ", run.Study.Climates.Select(c => c.Name))),
                    new ReportKeyValue("variants", string.Join(", ", run.Study.Variants.Select(v => v.Name))),
                    new ReportKeyValue("units", u.Description),
                    new ReportKeyValue("headline method", IntegrationMethods.Name(headline)),
                ],
                StudyHash = run.Study.Hash,
                EngineVersion = run.EngineVersion,
                RunAt = runAt,
            },
            Assumptions = new ReportAssumptions
            {
                FlowBasis = a.FlowBasis.ToString().ToLowerInvariant(),
                AirDensity = DisplayUnits.Text(u.Density, a.DryAirDensity) + " of dry air (first climate)",
                SiteSensibleFactor = DisplayUnits.Text(u.SensibleFactor, a.Factors.SensibleSi) + " at the first climate",
                BinWidth = AssumptionText.Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol),
                Calendar = a.Calendar,
                Schedule = a.Schedule + "; " + AssumptionText.Clock(a.DaylightSaving),
                DataRepairs = repairs,
            },
            Results = sections,
            Warnings = run.Warnings,
        };
    }

    /// <summary>A result table as a report table: the cells the terminal shows (<see cref="TextRenderer.Grid"/>).</summary>
    public static ReportTable Table(ResultTable table, string caption)
    {
        var (headings, rows, _) = TextRenderer.Grid(table);
        return new ReportTable(caption, headings, rows);
    }

    /// <summary>Writes the charts into <c>charts/</c> and the report into <c>report.html</c> of the folder being written.</summary>
    public static void WriteInto(OutputFolder output, StudyRunResult run, DateTimeOffset runAt)
    {
        var charts = Charts(run);
        foreach (var (name, chart) in charts)
        {
            File.WriteAllBytes(output.PathFor("charts", name + ".png"), chart.Png);
            File.WriteAllText(output.PathFor("charts", name + ".svg"), chart.Svg);
        }

        File.WriteAllText(output.PathFor("report.html"), HtmlReport.Build(Model(run, charts, runAt)));
    }

    private static IReadOnlyList<double> Months(StudyCaseResult c, IntegrationMethod method, Func<LoadVector, double> pick)
    {
        var values = new double[12];
        foreach (var month in c.OutdoorAir.Months)
        {
            values[month.Month - 1] += pick(month.Figures[method].Loads);
        }

        return values;
    }

    /// <summary>
    /// File-name-safe forms of distinct names that are unique among themselves: names whose
    /// <see cref="Slug"/> collides (<c>"A B"</c> and <c>"a-b"</c>, or two names without a Latin
    /// letter, which both become <c>climate</c>) get <c>-2</c>, <c>-3</c>, ... in the order given,
    /// so no chart overwrites another's file.
    /// </summary>
    public static IReadOnlyDictionary<string, string> UniqueSlugs(IReadOnlyList<string> names, string fallback = "climate")
    {
        var taken = new HashSet<string>(StringComparer.Ordinal);
        var result = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (string name in names.Distinct(StringComparer.Ordinal))
        {
            string slug = Slug(name, fallback);
            for (int n = 2; !taken.Add(slug); n++)
            {
                slug = Slug(name, fallback) + "-" + n.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }

            result[name] = slug;
        }

        return result;
    }

    /// <summary>A file-name-safe form of a name: lower case ASCII letters and digits, other runs to one dash.</summary>
    public static string Slug(string name, string fallback = "climate")
    {
        var chars = name.ToLowerInvariant().Select(ch => char.IsAsciiLetterOrDigit(ch) ? ch : '-').ToArray();
        string s = string.Join("-", new string(chars).Split('-', StringSplitOptions.RemoveEmptyEntries));
        return s.Length == 0 ? fallback : s;
    }

}
