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
    /// <summary>
    /// Renders every chart of the run, by the study's headline method: per climate its weather (bin hours, the
    /// psychrometric chart); per climate and charted variant (<see cref="StudyDefinition.DetailVariants"/>) the load
    /// by bin, the economizer's modes and savings, the monthly energy and the method check; across climates the
    /// comparisons of every case.
    /// </summary>
    public static IReadOnlyList<StudyChart> Charts(StudyRunResult run)
    {
        var u = StudyTables.Units(run);
        var headline = run.Study.HeadlineMethod;
        string method = IntegrationMethods.Label(headline);
        string eUnit = u.Energy.Symbol;
        double E(Energy e) => u.Energy.FromSi(e.Joules);
        var charts = new List<StudyChart>();
        var slugs = UniqueSlugs(run.Study.Climates.Select(c => c.Name).ToList());
        foreach (var climateCases in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            charts.AddRange(ClimateCharts(run, climateCases.ToList(), slugs[climateCases.Key]));
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
        charts.Add(new(ComparisonChart.EnergyFileStem, ComparisonChart.RenderEnergy(comparison), null, null));
        charts.Add(new(ComparisonChart.CostFileStem, ComparisonChart.RenderCost(comparison), null, null));
        return charts;
    }

    /// <summary>
    /// The charts of one climate: its weather (bin hours, the psychrometric chart with the economizer region of its first
    /// detailed variant), then for each variant the study details (<see cref="StudyDefinition.DetailVariants"/>) the load
    /// by bin, the economizer's modes and savings, the monthly energy and the method check; file names end in
    /// <paramref name="slug"/> (and the variant's).
    /// </summary>
    /// <param name="run">The run (its study's units, headline method and variants).</param>
    /// <param name="climateCases">The climate's cases, in variant order.</param>
    /// <param name="slug">The climate's file-name-safe name (<see cref="UniqueSlugs"/>).</param>
    public static IReadOnlyList<StudyChart> ClimateCharts(StudyRunResult run, IReadOnlyList<StudyCaseResult> climateCases, string slug)
    {
        var u = StudyTables.Units(run);
        var units = run.Study.Units;
        var headline = run.Study.HeadlineMethod;
        string method = IntegrationMethods.Label(headline);
        string tUnit = u.Temperature.Symbol;
        string eUnit = u.Energy.Symbol;
        double T(Temperature t) => u.Temperature.FromSi(t.Celsius);
        double E(Energy e) => u.Energy.FromSi(e.Joules);
        var charts = new List<StudyChart>();
        var variantSlugs = UniqueSlugs(run.Study.Variants.Select(v => v.Name).ToList(), "variant");
        var charted = DetailedVariants(run.Study);
        string climate = climateCases[0].Case.Climate.Name;
        var shown = climateCases.Where(c => charted.Contains(c.Case.Variant.Name)).ToList();
        var first = shown.FirstOrDefault() ?? climateCases[0];
        var weatherBins = first.OutdoorAir.Bins;

        charts.Add(new($"{BinHoursChart.FileStem}-{slug}", BinHoursChart.Render(new BinChartData
        {
            Subject = climate,
            TemperatureUnit = tUnit,
            Bins = weatherBins.Select(b => new BinHoursRow(T(b.Bin.Low), T(b.Bin.High), b.Bin.Occupied.Hours, b.Bin.Unoccupied.Hours,
                b.Bin.All.Hours > 0 ? T(b.Bin.All.MeanWetBulb) : null)).ToList(),
        }), climate, null));

        // The psychrometric chart shades the region of the control the modes chart of the first detailed variant shows.
        var firstEconomizer = first.Economizer;
        var firstBest = firstEconomizer?.Best(headline);
        EconomizerRegionLimits? region = firstEconomizer is null || firstBest is null ? null : EconomizerRegionLimits.For(firstBest.Control, firstEconomizer.Model, units);
        charts.Add(new($"{PsychrometricChart.FileStem}-{slug}", PsychrometricChart.Render(PsychroChartData.FromSi(
            region is null ? climate : $"{climate}, {first.Case.Variant.Name}", first.Weather.DryBulbC, first.Weather.HumidityRatio, first.Weather.Site.SitePressurePa, units, region)), climate, null));

        foreach (var c in shown)
        {
            string variant = c.Case.Variant.Name;
            string stem = slug + "-" + variantSlugs[variant];
            string subject = $"{climate}, {variant}";
            void Add(string kind, RenderedChart chart) => charts.Add(new($"{kind}-{stem}", chart, climate, variant));

            Add(LoadByBinChart.FileStem, LoadByBinChart.Render(new LoadByBinData
            {
                Subject = $"{subject} ({method})",
                TemperatureUnit = tUnit,
                EnergyUnit = eUnit,
                Bins = c.OutdoorAir.Bins.Select(b =>
                {
                    var l = b.Figures[headline].Loads;
                    return new LoadByBinRow(T(b.Bin.Low), T(b.Bin.High), E(l.Heating), E(l.CoolingSensible), E(l.CoolingLatent), E(l.Humidification));
                }).ToList(),
            }));

            if (c.Economizer is { } eco)
            {
                var best = eco.Best(headline);
                Add(EconomizerModesChart.FileStem, EconomizerModesChart.Render(new EconomizerModesData
                {
                    Subject = subject,
                    ControlName = best.Control.Describe(),
                    TemperatureUnit = tUnit,
                    Bins = eco.Bins.Select((b, i) => new EconomizerModesRow(T(b.Low), T(b.High),
                        best.ByBin[i].Hourly.HoursNoCooling, best.ByBin[i].Hourly.HoursFree, best.ByBin[i].Hourly.HoursIntegrated, best.ByBin[i].Hourly.HoursMinimum)).ToList(),
                }));
                Add(EconomizerSavingsChart.FileStem, EconomizerSavingsChart.Render(new SavingsByControlData
                {
                    Subject = $"{subject} ({method})",
                    Quantity = "Cooling coil energy saved",
                    EnergyUnit = eUnit,
                    CostUnit = eco.HasPlant ? u.Cost.Symbol : null,
                    CostQuantity = "cost saved on the energy the air system buys (compressor, reheat and preheat, fans)",
                    Controls = eco.Controls.Select(x => new ControlSavingsRow(x.Control.Describe(), E(x.Savings(headline)),
                        eco.HasPlant ? x.PurchasedSavings(headline).Cost : null)).ToList(),
                }));
            }

            Add(MonthlyEnergyChart.FileStem, MonthlyEnergyChart.Render(new MonthlyEnergyData
            {
                Subject = $"{subject} ({method})",
                EnergyUnit = eUnit,
                Series =
                [
                    new MonthlyEnergySeries("Heating", Months(c, headline, l => E(l.Heating)), ChartPalette.Heating),
                    new MonthlyEnergySeries("Sensible cooling", Months(c, headline, l => E(l.CoolingSensible)), ChartPalette.SensibleCooling),
                    new MonthlyEnergySeries("Latent cooling", Months(c, headline, l => E(l.CoolingLatent)), ChartPalette.LatentCooling),
                ],
            }));

            var annual = c.OutdoorAir.Annual;
            Add(MethodCheckChart.FileStem, MethodCheckChart.Render(new MethodCheckData
            {
                Subject = subject,
                EnergyUnit = eUnit,
                Rows = new (string Name, LoadFigure Figure)[] { ("Heating", LoadFigure.Heating), ("Sensible cooling", LoadFigure.CoolingSensible), ("Latent cooling", LoadFigure.CoolingLatent), ("Humidification", LoadFigure.Humidification) }
                    .Select(f => new MethodCheckRow(f.Name, E(annual.Hourly.Loads[f.Figure]), E(annual.JointBin.Loads[f.Figure]), E(annual.Bin.Loads[f.Figure]))).ToList(),
            }));
        }

        return charts;
    }

    /// <summary>The variants the report charts one by one: those <c>[report] detail_variants</c> names (every variant unless the study says).</summary>
    public static IReadOnlySet<string> DetailedVariants(StudyDefinition study) => study.DetailVariants.ToHashSet(StringComparer.Ordinal);

    /// <summary>The report model of a run, with its charts.</summary>
    public static ReportModel Model(StudyRunResult run, IReadOnlyList<StudyChart> charts, DateTimeOffset runAt)
    {
        var u = StudyTables.Units(run);
        var headline = run.Study.HeadlineMethod;
        var first = run.Cases[0];
        var a = first.OutdoorAir.Assumptions;
        var summary = StudySummary.Build(run);
        var repairs = run.Cases.GroupBy(c => c.Case.Climate.Name).Select(g =>
        {
            var q = g.First().Weather.Quality;
            string counts = q.TotalRepairs == 0 ? "no repairs" : string.Join("; ", q.Repairs.Select(kv => Core.Weather.QualityKeys.Describe(kv.Key, kv.Value)));
            if (q.Disagreements.Any())
            {
                counts += "; " + string.Join("; ", q.Disagreements.Select(kv => Core.Weather.QualityKeys.Describe(kv.Key, kv.Value)));
            }

            return $"{g.Key} ({g.First().Weather.Count} hours): {counts}";
        }).ToList();

        var climateTable = summary.Table("climates");
        var sections = new List<ReportSection>
        {
            new("Climates",
            [
                Table(climateTable, "Each climate's degree-days and design conditions (its site is under Inputs)"),
                .. climateTable.Notes.Select(n => new ReportParagraph(n)),
            ]),
            new($"Annual outdoor-air loads, cost and carbon ({IntegrationMethods.Label(headline)})",
            [
                Table(summary.Table("headline"), $"Per climate and variant, {IntegrationMethods.Label(headline)} (the headline method)"),
            ]),
        };
        var peaks = summary.Table("peaks");
        if (peaks.RowCount > 0)
        {
            sections.Add(new ReportSection("Peak outdoor-air loads at the design conditions",
            [
                ConditionNames(Table(peaks, "The outdoor air's load at each design condition of the climate (heating: sensible and humidification; cooling and dehumidification: the total)"), run),
            ]));
        }

        var detailed = DetailedVariants(run.Study);
        string which = detailed.Count == run.Study.Variants.Count ? string.Empty
            : " Shown for the variants the study details ([report] detail_variants: " + string.Join(", ", run.Study.DetailVariants) + "); tables/ and summary.json hold every variant.";
        var economizer = summary.Table("economizer");
        if (economizer.RowCount > 0)
        {
            sections.Add(new ReportSection("Economizer",
            [
                Table(economizer, detailed, $"Every control against the same system without an economizer: hours by mode, energy and cost saved ({IntegrationMethods.Label(headline)})"),
                new ReportParagraph("The savings are of the cooling coil (and of reheat and preheat where the system has them) against the baseline; "
                    + "the modes are counted over the hours the system runs. The per-bin modes are in tables/economizer and on each variant's modes chart." + which),
                new ReportParagraph("The economizer evaluation takes each variant's ventilation airflow as its minimum outdoor air (unless [economizer] "
                    + "min_outdoor_airflow sets one) and models the air system without energy recovery: a variant that changes only the recovery "
                    + "has its base's rows, and one that changes only the plant its base's energy at another cost. " + Unmet(run, u, headline)),
            ]));
        }

        sections.Add(new ReportSection("Method check",
        [
            Table(summary.Table("method_check"), detailed, "Each annual figure by the hourly sum, joint bins and the bin method, with each bin method's difference from hourly"),
            new ReportParagraph("When to use which: the hourly sum is the reference wherever an hourly record exists. "
                + "The bin method is the right tool when only bin data are at hand, and to explain where in the year the load falls. "
                + AssumptionText.LatentError + which),
        ]));
        if (run.Cases.Any(c => c.IsMultiYear))
        {
            sections.Add(new ReportSection("Year-to-year spread",
            [
                Table(summary.Table("spread"), $"Multi-year records: the mean of the complete years (the headline) and the lowest and highest year, {IntegrationMethods.Label(headline)}"),
                new ReportParagraph("Partial first or last years are shown in tables/annual with complete_year = 0 and are not part of the mean."),
            ]));
        }

        sections.AddRange(ChartSections(run, charts));

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
            Inputs = Inputs(run, summary),
            Assumptions = new ReportAssumptions
            {
                FlowBasis = a.FlowBasis.ToString().ToLowerInvariant(),
                AirDensity = Span(run, u.Density, c => c.OutdoorAir.Assumptions.DryAirDensity) + " of dry air (each climate's under Inputs, Weather files)",
                SiteSensibleFactor = Span(run, u.SensibleFactor, c => c.OutdoorAir.Assumptions.Factors.SensibleSi),
                BinWidth = AssumptionText.Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol),
                Calendar = a.Calendar,
                Schedule = a.Schedule + "; " + AssumptionText.Clock(a.DaylightSaving),
                DataRepairs = repairs,
            },
            Results = sections,
            Warnings = run.Warnings,
        };
    }

    /// <summary>
    /// The inputs a reader needs to repeat the run: each weather file and the site it sets; every key the study
    /// sets, as written; each variant as the keys it changes against the base; the defaults taken for keys left out.
    /// </summary>
    private static IReadOnlyList<ReportSection> Inputs(StudyRunResult run, ResultDocument summary)
    {
        var settings = run.Study.Settings
            .Select(s => (Table: s.Key[..Math.Max(s.Key.IndexOf('.', StringComparison.Ordinal), 0)], Key: s.Key[(s.Key.IndexOf('.', StringComparison.Ordinal) + 1)..], s.Value))
            .Select(s => (IReadOnlyList<string>)[s.Table, s.Key, s.Value, Meaning(s.Table, s.Key)])
            .ToList();
        var variants = run.Study.Variants
            .Select(v => (IReadOnlyList<string>)[v.Name, v.Changes.Count == 0 ? "nothing: the study's settings as they are" : string.Join("; ", v.Changes)])
            .ToList();
        int variantCount = run.Study.Variants.Count;
        var defaults = run.Cases
            .SelectMany(c => c.Case.Assumptions.Select(text => (Text: text, Variant: c.Case.Variant.Name)))
            .GroupBy(x => x.Text, StringComparer.Ordinal)
            .Select(g =>
            {
                var names = g.Select(x => x.Variant).Distinct(StringComparer.Ordinal).ToList();
                return (IReadOnlyList<string>)[g.Key, names.Count == variantCount ? "every variant" : string.Join(", ", names)];
            })
            .ToList();

        return
        [
            new ReportSection("Weather files", [Table(summary.Table("weather_files"), "Each climate's weather file, its period and hours, and the site it sets")]),
            new ReportSection("Study settings",
            [
                new ReportTable("Every key the study file sets, as written (the unit is in the key's name)", ["Table", "Key", "Value", "Meaning"], settings),
            ]),
            new ReportSection("Variants",
            [
                new ReportTable("Each variant as the settings it changes against the study's own", ["Variant", "Changes"], variants),
            ]),
            new ReportSection("Defaults taken",
            [
                new ReportTable("Keys the study leaves out, and the value the engine took for them", ["Default", "Variants"], defaults),
            ]),
        ];
    }

    private static string Meaning(string table, string key)
    {
        try
        {
            return StudyKeys.Describe(table, key).Description;
        }
        catch (KeyNotFoundException)
        {
            return string.Empty;
        }
    }

    /// <summary>A value across the climates: one value, or the lowest to the highest.</summary>
    private static string Span(StudyRunResult run, DisplayUnit unit, Func<StudyCaseResult, double> si)
    {
        var values = run.Cases.Select(si).ToList();
        double low = values.Min(), high = values.Max();
        return DisplayUnits.Text(unit, low) is var l && DisplayUnits.Text(unit, high) is var h && l == h ? l : $"{l} to {h}";
    }

    /// <summary>The charts as report sections: per climate its weather, then each charted variant; then the comparisons.</summary>
    private static IEnumerable<ReportSection> ChartSections(StudyRunResult run, IReadOnlyList<StudyChart> charts)
    {
        static ReportSection One(StudyChart c) => new(c.Chart.Title, [new ReportChart(c.Chart, c.Chart.Description)]);
        foreach (var climate in run.Study.Climates.Select(c => c.Name))
        {
            var own = charts.Where(c => c.Climate == climate).ToList();
            if (own.Count == 0)
            {
                continue;
            }

            var byVariant = own.Where(c => c.Variant is not null).GroupBy(c => c.Variant!)
                .Select(g => new ReportSection($"{climate}, {g.Key}", []) { Subsections = g.Select(One).ToList() });
            yield return new ReportSection($"Charts: {climate}", [])
            {
                Subsections = [.. own.Where(c => c.Variant is null).Select(One), .. byVariant],
            };
        }

        var across = charts.Where(c => c.Climate is null).ToList();
        if (across.Count > 0)
        {
            yield return new ReportSection("Charts across climates", []) { Subsections = across.Select(One).ToList() };
        }
    }

    /// <summary>A result table as a report table: the cells the terminal shows (<see cref="TextRenderer.Grid"/>).</summary>
    public static ReportTable Table(ResultTable table, string caption)
    {
        var (headings, rows, _) = TextRenderer.Grid(table);
        return new ReportTable(caption, headings, rows);
    }

    /// <summary>The load the economizer's baseline system could not meet, per case where it is at least 0.1 % of the baseline coil energy.</summary>
    private static string Unmet(StudyRunResult run, DisplayUnits u, IntegrationMethod method)
    {
        var unmet = run.Cases.Where(c => c.Economizer is not null)
            .Select(c => (Case: c, Baseline: c.Economizer!.Baseline.Totals[method]))
            .Where(x => x.Baseline.Unmet.Joules > 0.001 * Math.Max(x.Baseline.CoilTotal.Joules, 1))
            .Select(x => (Climate: x.Case.Case.Climate.Name, Variant: x.Case.Case.Variant.Name,
                Text: FormattableString.Invariant($"{DisplayUnits.Text(u.Energy, x.Baseline.Unmet.Joules)} ({100 * x.Baseline.Unmet.Joules / x.Baseline.CoilTotal.Joules:0.0} % of the baseline coil energy)")))
            .GroupBy(x => (x.Climate, x.Text))
            .Select(g => $"{g.Key.Climate} ({(g.Count() == run.Study.Variants.Count ? "every variant" : string.Join(", ", g.Select(x => x.Variant)))}): {g.Key.Text}")
            .ToList();
        return unmet.Count == 0
            ? "The system meets the building's cooling load in every hour (no unmet load)."
            : "Load the system could not meet at its supply airflow and temperature (the unmet load column; it is not bought, so check the system size): " + string.Join("; ", unmet) + ".";
    }

    /// <summary>The peaks table with each condition's name as people read it ("heating 99.6 % dry-bulb") in place of its table key (<c>heating_99_6</c>).</summary>
    private static ReportTable ConditionNames(ReportTable table, StudyRunResult run)
    {
        var names = run.Cases.SelectMany(c => c.OutdoorAir.Peaks?.All ?? []).GroupBy(p => p.Key).ToDictionary(g => g.Key, g => g.First().Condition, StringComparer.Ordinal);
        int at = table.Headers.ToList().IndexOf("Condition");
        return at < 0 ? table : table with
        {
            Rows = table.Rows.Select(r => (IReadOnlyList<string>)r.Select((cell, i) => i == at && names.TryGetValue(cell, out var n) ? n : cell).ToList()).ToList(),
        };
    }

    /// <summary>The rows of a result table whose <c>variant</c> is one of <paramref name="variants"/>, as a report table.</summary>
    private static ReportTable Table(ResultTable table, IReadOnlySet<string> variants, string caption)
    {
        var full = Table(table, caption);
        var keep = table["variant"].Texts;
        return full with { Rows = full.Rows.Where((_, i) => variants.Contains(keep[i])).ToList() };
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
