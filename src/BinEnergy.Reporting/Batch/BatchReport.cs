using System.Globalization;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;
using BinEnergy.Reporting.Html;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// The cross-climate report of a batch output folder (DESIGN 15): reads every shard's
/// <c>tables/annual</c> and <c>tables/climates</c> parts and, for each headline figure (hourly
/// method; the typical year, the record's one year, or the mean of a multi-year record's complete
/// years) and variant, gives its distribution across climates (box chart), a ranking (the
/// highest and lowest 10), the figure against heating or cooling degree-days (scatter), and a
/// national table (count, lowest, quartiles, median, mean, highest). Writes <c>report.html</c>
/// and <c>summary.json</c> (with the batch's counts under <c>batch</c>, <see cref="BatchSummary"/>) into the folder. Only reads and arranges the tables; no physics.
/// </summary>
public sealed class BatchReport
{
    /// <summary>How the quartiles are taken, for the report.</summary>
    public const string QuartileNote =
        "Quartiles and median: sample quantiles of the climates' values, Hyndman and Fan (1996) definition 7 (linear interpolation between order statistics; R's default, Excel PERCENTILE.INC). Each climate counts once, whatever its population or floor area.";

    /// <summary>How many climates each end of a ranking lists.</summary>
    public const int RankingLength = 10;

    private BatchReport(PartitionedTable annual, PartitionedTable climates, DisplayUnits u, IReadOnlyList<HeadlineFigure> figures, IReadOnlyList<HeadlineRow> rows,
        IReadOnlyDictionary<string, (double Heating, double Cooling)> degreeDays, IReadOnlyList<string> warnings, System.Text.Json.Nodes.JsonObject? batch,
        IReadOnlyList<(string Climate, string Variant, IReadOnlyList<RenderedChart> Charts)> climateCharts)
    {
        Batch = batch;
        ClimateCharts = climateCharts;
        Annual = annual;
        Climates = climates;
        Units = u;
        Figures = figures;
        Rows = rows;
        DegreeDays = degreeDays;
        Warnings = warnings;
        Variants = rows.Select(r => r.Variant).Distinct().ToList();

        // Each figure's finite values per variant in climate order, gathered in one pass: the national table, the rankings,
        // the summary and the charts read them many times over (a national study has 100,000 rows and more).
        foreach (var r in rows)
        {
            foreach (var f in figures)
            {
                double v = r.Values[f.Column];
                if (double.IsFinite(v))
                {
                    var key = (f.Column, r.Variant);
                    if (!values.TryGetValue(key, out var list))
                    {
                        values[key] = list = [];
                    }

                    list.Add((r.Climate, v));
                }
            }
        }

        Shown = figures.Where(f => Variants.Any(v => ValuesOf(f, v).Any(x => x.Value != 0))).ToList();
    }

    private readonly Dictionary<(string Column, string Variant), List<(string Climate, double Value)>> values = [];

    /// <summary>A headline figure: its column, heading, unit symbol, and the degree-days it is plotted against.</summary>
    /// <param name="Column">The column in the annual table, e.g. <c>heating_kbtu</c>.</param>
    /// <param name="Label">Its heading, e.g. "Heating".</param>
    /// <param name="Unit">Its unit symbol, e.g. "kBtu".</param>
    /// <param name="AgainstHeating">Plotted against heating degree-days.</param>
    /// <param name="AgainstCooling">Plotted against cooling degree-days.</param>
    public sealed record HeadlineFigure(string Column, string Label, string Unit, bool AgainstHeating, bool AgainstCooling);

    /// <summary>One climate x variant's headline values, by figure column.</summary>
    /// <param name="Climate">The climate.</param>
    /// <param name="Variant">The variant.</param>
    /// <param name="Year">The annual table's year of the row used (<c>typical</c>, a calendar year or <c>mean</c>).</param>
    /// <param name="Values">Value per figure column.</param>
    public sealed record HeadlineRow(string Climate, string Variant, string Year, IReadOnlyDictionary<string, double> Values);

    /// <summary>The annual table of every part.</summary>
    public PartitionedTable Annual { get; }

    /// <summary>The climates table of every part.</summary>
    public PartitionedTable Climates { get; }

    /// <summary>The display units the tables were written in (their <c>binenergy.units</c> metadata).</summary>
    public DisplayUnits Units { get; }

    /// <summary>The headline figures the annual table has.</summary>
    public IReadOnlyList<HeadlineFigure> Figures { get; }

    /// <summary>One row per climate x variant.</summary>
    public IReadOnlyList<HeadlineRow> Rows { get; }

    /// <summary>Heating and cooling degree-days per climate, from the climates table.</summary>
    public IReadOnlyDictionary<string, (double Heating, double Cooling)> DegreeDays { get; }

    /// <summary>What the report noticed (climates without a climates row, ...).</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>The batch's counts (files, done, failed, warnings, rows, parts; every shard's added up), from its summaries; null when the folder has none.</summary>
    public System.Text.Json.Nodes.JsonObject? Batch { get; }

    /// <summary>The per-climate charts of the climates the batch named with <c>--charts-for</c> (<see cref="BatchClimateCharts"/>), by climate.</summary>
    public IReadOnlyList<(string Climate, string Variant, IReadOnlyList<RenderedChart> Charts)> ClimateCharts { get; }

    /// <summary>The variants in order of first mention.</summary>
    public IReadOnlyList<string> Variants { get; }

    /// <summary>The study name in the tables' metadata.</summary>
    public string StudyName => Annual.Metadata.GetValueOrDefault("binenergy.study", "study");

    /// <summary>Reads the batch output folder <paramref name="folder"/>.</summary>
    /// <exception cref="BatchReportException">No tables, no climates table, parts of different studies, unreadable parts.</exception>
    public static async Task<BatchReport> ReadAsync(string folder, CancellationToken ct = default)
    {
        if (!Directory.Exists(Path.Combine(folder, "tables")))
        {
            throw new BatchReportException($"{folder}: no tables/ folder; give the --out folder of a `binenergy batch` run");
        }

        // Only the columns the report reads: the keys and the headline figures in the study's units (a national study's annual
        // table has hundreds of thousands of rows of some sixty columns).
        var first = await PartitionedTable.FirstMetadataAsync(folder, "annual", ct) ?? ("tables/annual", new Dictionary<string, string>());
        var keep = new HashSet<string>(["climate", "variant", "year", "method", .. HeadlineFigures(UnitsOf(first.Metadata, first.Part)).Select(f => f.Column)], StringComparer.Ordinal);
        var annual = await PartitionedTable.ReadAsync(folder, "annual", keep, ct);
        if (PartitionedTable.PartFiles(folder, "climates").Count == 0)
        {
            throw new BatchReportException($"{Path.Combine(folder, "tables", "climates")}: the climates table is missing (tables/climates/<key>=<value>/part-NNNN.parquet); "
                + "the report plots every figure against the climates' degree-days: rerun the batch with this version of binenergy, which writes it");
        }

        var climates = await PartitionedTable.ReadAsync(folder, "climates", ct: ct);
        string hash = annual.Metadata.GetValueOrDefault(PartitionedTable.StudyHashKey, string.Empty);
        if (climates.Metadata.GetValueOrDefault(PartitionedTable.StudyHashKey, string.Empty) != hash)
        {
            throw new BatchReportException($"{climates.Parts[0]}: computed from another study than {annual.Parts[0]} ({PartitionedTable.StudyHashKey} differs); a report covers one study");
        }

        var u = UnitsOf(annual.Metadata, annual.Parts[0]);
        var t = annual.Table;
        foreach (string column in new[] { "climate", "variant", "year", "method" })
        {
            if (!t.HasColumn(column))
            {
                throw new BatchReportException($"{annual.Parts[0]}: the annual table has no '{column}' column; it was not written by `binenergy batch`");
            }
        }

        var figures = HeadlineFigures(u).Where(f => t.HasColumn(f.Column)).ToList();
        var rows = HeadlineRows(t, figures);
        var warnings = new List<string>();
        var degreeDays = DegreeDaysOf(climates, u, warnings);
        var missing = rows.Select(r => r.Climate).Distinct().Where(c => !degreeDays.ContainsKey(c)).ToList();
        if (missing.Count > 0)
        {
            warnings.Add($"{missing.Count} climate(s) of the annual table have no row in the climates table and are left out of the degree-day charts: {string.Join(", ", missing.Take(5))}{(missing.Count > 5 ? ", ..." : "")}.");
        }

        var batch = BatchSummary.Gather(folder, warnings);
        if (batch?["warnings"] is System.Text.Json.Nodes.JsonObject kinds)
        {
            // The inputs' own warnings (weather repairs, stopped files), by kind; each one is a row of tables/warnings.
            foreach (var (kind, count) in kinds)
            {
                warnings.Add(FormattableString.Invariant($"{kind}: {count} (each with its climate, file, line and message in tables/warnings)."));
            }
        }

        var climateCharts = BatchClimateCharts.Read(folder, hash);
        return new BatchReport(annual, climates, u, figures, rows, degreeDays, warnings, batch, climateCharts);
    }

    private static DisplayUnits UnitsOf(IReadOnlyDictionary<string, string> metadata, string part)
    {
        string units = metadata.GetValueOrDefault("binenergy.units", "ip");
        string currency = metadata.GetValueOrDefault("binenergy.currency", "usd");
        return units switch
        {
            "ip" => new DisplayUnits(UnitSystem.IP, currency),
            "si" => new DisplayUnits(UnitSystem.SI, currency),
            _ => throw new BatchReportException($"{part}: binenergy.units metadata is '{units}', expected ip or si; the part was not written by binenergy"),
        };
    }

    /// <summary>The headline figures in a study's units: heating, sensible and latent cooling, humidification, cost and carbon.</summary>
    public static IReadOnlyList<HeadlineFigure> HeadlineFigures(DisplayUnits u)
    {
        HeadlineFigure Load(LoadFigure f, bool heating, bool cooling)
        {
            var (name, label, unit) = FigureColumns.Of(f, u);
            return new HeadlineFigure(unit.NameFor(name), label, unit.Symbol, heating, cooling);
        }

        return
        [
            Load(LoadFigure.Heating, true, false),
            Load(LoadFigure.CoolingSensible, false, true),
            Load(LoadFigure.CoolingLatent, false, true),
            Load(LoadFigure.Humidification, true, false),
            new HeadlineFigure(u.Cost.NameFor(string.Empty), "Cost", u.Cost.Symbol, true, true),
            new HeadlineFigure(u.Carbon.NameFor("carbon"), "Carbon", u.Carbon.Symbol, true, true),
        ];
    }

    /// <summary>Per climate x variant the hourly method's row: the multi-year mean when there is one, else the record's one year.</summary>
    private static List<HeadlineRow> HeadlineRows(ResultTable t, IReadOnlyList<HeadlineFigure> figures)
    {
        var climate = t["climate"].Texts;
        var variant = t["variant"].Texts;
        var year = t["year"].Texts;
        var method = t["method"].Texts;
        var chosen = new Dictionary<(string, string), int>();
        var order = new List<(string, string)>();
        string hourly = IntegrationMethods.Name(IntegrationMethod.Hourly);
        for (int i = 0; i < t.RowCount; i++)
        {
            if (method[i] != hourly)
            {
                continue;
            }

            var key = (climate[i], variant[i]);
            if (!chosen.TryGetValue(key, out int had))
            {
                chosen[key] = i;
                order.Add(key);
            }
            else if (year[i] == Core.Study.RecordYear.MeanLabel && year[had] != Core.Study.RecordYear.MeanLabel)
            {
                chosen[key] = i;
            }
        }

        // In climate order (the variants in the study's order within each), so the charts and rankings do not depend on the
        // order the workers finished the files in.
        return order.OrderBy(k => k.Item1, StringComparer.Ordinal).Select(k =>
        {
            int i = chosen[k];
            return new HeadlineRow(k.Item1, k.Item2, year[i], figures.ToDictionary(f => f.Column, f => t[f.Column].Numbers[i]));
        }).ToList();
    }

    private static Dictionary<string, (double Heating, double Cooling)> DegreeDaysOf(PartitionedTable climates, DisplayUnits u, List<string> warnings)
    {
        var t = climates.Table;
        string heating = u.DegreeDays.NameFor("heating_degree_days"), cooling = u.DegreeDays.NameFor("cooling_degree_days");
        foreach (string column in new[] { "climate", heating, cooling })
        {
            if (!t.HasColumn(column))
            {
                throw new BatchReportException($"{climates.Parts[0]}: the climates table has no '{column}' column (its units must be those of the annual table)");
            }
        }

        var result = new Dictionary<string, (double, double)>(StringComparer.Ordinal);
        for (int i = 0; i < t.RowCount; i++)
        {
            if (!result.TryAdd(t["climate"].Texts[i], (t[heating].Numbers[i], t[cooling].Numbers[i])))
            {
                warnings.Add($"climate '{t["climate"].Texts[i]}' has more than one row in the climates table; the first is used.");
            }
        }

        return result;
    }

    /// <summary>The values of a figure for a variant, one per climate, with the climate.</summary>
    public IReadOnlyList<(string Climate, double Value)> ValuesOf(HeadlineFigure figure, string variant) =>
        values.TryGetValue((figure.Column, variant), out var list) ? list : [];

    /// <summary>The figures any climate has a non-zero value of (a study without a plant has no cost; a dry study no humidification).</summary>
    public IReadOnlyList<HeadlineFigure> Shown { get; }

    /// <summary>The national table: per figure and variant, count, lowest, quartiles, median, mean and highest across climates.</summary>
    public ResultTable National() =>
        new ColumnSet<(HeadlineFigure Figure, string Variant, FigureDistribution D)>()
            .Text("figure", "Figure", x => x.Figure.Label)
            .Text("variant", "Variant", x => x.Variant)
            .Text("unit", "Unit", x => x.Figure.Unit)
            .Integer("climates", "Climates", x => x.D.Count)
            .Number("min", DisplayUnit.Count, "Lowest", x => x.D.Min)
            .Number("lower_quartile", DisplayUnit.Count, "25 %", x => x.D.LowerQuartile)
            .Number("median", DisplayUnit.Count, "Median", x => x.D.Median)
            .Number("upper_quartile", DisplayUnit.Count, "75 %", x => x.D.UpperQuartile)
            .Number("mean", DisplayUnit.Count, "Mean", x => x.D.Mean)
            .Number("max", DisplayUnit.Count, "Highest", x => x.D.Max)
            .Fill(new ResultTable("national") { Title = "Across climates: each headline figure by variant (hourly method)" },
                Shown.SelectMany(f => Variants.Select(v => (f, v, FigureDistribution.Of(ValuesOf(f, v).Select(x => x.Value))))));

    /// <summary>The ranking: per figure and variant the <see cref="RankingLength"/> highest and lowest climates.</summary>
    public ResultTable Ranking() =>
        new ColumnSet<(HeadlineFigure Figure, string Variant, string End, int Rank, string Climate, double Value)>()
            .Text("figure", "Figure", x => x.Figure.Label)
            .Text("variant", "Variant", x => x.Variant)
            .Text("end", "End", x => x.End)
            .Integer("rank", "Rank", x => x.Rank)
            .Text("climate", "Climate", x => x.Climate)
            .Text("unit", "Unit", x => x.Figure.Unit)
            .Number("value", DisplayUnit.Count, "Value", x => x.Value)
            .Fill(new ResultTable("ranking") { Title = $"The {RankingLength} highest and lowest climates of each figure and variant", ShowInTerminal = false },
                Shown.SelectMany(f => Variants.SelectMany(v => Ends(f, v))));

    private IEnumerable<(HeadlineFigure, string, string, int, string, double)> Ends(HeadlineFigure f, string variant)
    {
        var values = ValuesOf(f, variant);
        var high = values.OrderByDescending(x => x.Value).ThenBy(x => x.Climate, StringComparer.Ordinal).Take(RankingLength);
        var low = values.OrderBy(x => x.Value).ThenBy(x => x.Climate, StringComparer.Ordinal).Take(RankingLength);
        return high.Select((x, i) => (f, variant, "highest", i + 1, x.Climate, x.Value))
            .Concat(low.Select((x, i) => (f, variant, "lowest", i + 1, x.Climate, x.Value)));
    }

    /// <summary>The charts: per shown figure its distribution and its scatter against heating and/or cooling degree-days.</summary>
    public IReadOnlyList<(HeadlineFigure Figure, RenderedChart Chart)> Charts()
    {
        var charts = new List<(HeadlineFigure Figure, Func<RenderedChart> Render)>();
        string baseText = DisplayUnits.Text(Units.Temperature, Units.DegreeDayBaseC, "0.#");
        foreach (var f in Shown)
        {
            string slug = StudyReport.Slug(f.Label, "figure");
            var distribution = new DistributionData
            {
                Subject = StudyName,
                Figure = f.Label,
                Unit = f.Unit,
                Variants = Variants.Select(v => (v, (IReadOnlyList<double>)ValuesOf(f, v).Select(x => x.Value).ToList())).ToList(),
            };
            charts.Add((f, () => DistributionChart.Render(distribution, "distribution-" + slug)));
            foreach (var (heating, name) in new[] { (true, "heating"), (false, "cooling") })
            {
                if (heating ? !f.AgainstHeating : !f.AgainstCooling)
                {
                    continue;
                }

                var scatter = new DegreeDayScatterData
                {
                    Subject = StudyName,
                    Figure = f.Label,
                    Unit = f.Unit,
                    DegreeDays = $"{char.ToUpperInvariant(name[0])}{name[1..]} degree-days, base {baseText} ({Units.DegreeDays.Symbol})",
                    Variants = Variants.Select(v => (v, (IReadOnlyList<(double, double)>)ValuesOf(f, v)
                        .Where(x => DegreeDays.ContainsKey(x.Climate))
                        .Select(x => (heating ? DegreeDays[x.Climate].Heating : DegreeDays[x.Climate].Cooling, x.Value)).ToList())).ToList(),
                };
                string stem = $"{slug}-against-{name}-degree-days";
                charts.Add((f, () => DegreeDayScatterChart.Render(scatter, stem)));
            }
        }

        // Each chart is its own plot and image: they are drawn side by side on every core, in their order.
        return charts.AsParallel().AsOrdered().Select(c => (c.Figure, c.Render())).ToList();
    }

    /// <summary>The summary document (<c>summary.json</c>): the study, the parts read, the national table, the ranking, warnings and cautions.</summary>
    public ResultDocument Summary()
    {
        var doc = new ResultDocument($"{StudyName}: {Rows.Select(r => r.Climate).Distinct().Count():N0} climates x {Variants.Count} variants (hourly method)");
        doc.Add(new ColumnSet<BatchReport>()
            .Text("study", "Study", r => r.StudyName)
            .Text("study_sha256", "Study SHA-256", r => r.Annual.Metadata.GetValueOrDefault(PartitionedTable.StudyHashKey, string.Empty))
            .Text("engine_version", "Engine version", r => r.Annual.Metadata.GetValueOrDefault("binenergy.engine_version", string.Empty))
            .Text("units", "Units", r => r.Units.Name)
            .Text("method", "Method", _ => IntegrationMethods.Name(IntegrationMethod.Hourly))
            .Integer("climates", "Climates", r => r.Rows.Select(x => x.Climate).Distinct().Count())
            .Integer("variants", "Variants", r => r.Variants.Count)
            .Integer("annual_parts", "Annual parts read", r => r.Annual.Parts.Count)
            .Integer("climates_parts", "Climates parts read", r => r.Climates.Parts.Count)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record, ShowInTerminal = false }, [this]));
        doc.Add(National());
        doc.Add(Ranking());
        doc.NoteAll(NoteKind.Warning, Warnings);
        doc.NoteAll(NoteKind.Caution, Cautions.OutdoorAir);
        return doc;
    }

    /// <summary>The report page's model with the charts.</summary>
    public ReportModel Model(IReadOnlyList<(HeadlineFigure Figure, RenderedChart Chart)> charts, DateTimeOffset runAt)
    {
        var national = National();
        var ranking = Ranking();
        var sections = new List<ReportSection>
        {
            new("Across climates",
            [
                StudyReport.Table(national, "Each headline figure by variant across climates (hourly method; typical year, the record's year, or the mean of a multi-year record's complete years)"),
                new ReportParagraph(QuartileNote),
            ]),
        };
        foreach (var f in Shown)
        {
            var blocks = new List<ReportBlock>();
            blocks.AddRange(charts.Where(c => c.Figure == f).Select(c => new ReportChart(c.Chart, c.Chart.Description)));
            foreach (string v in Variants)
            {
                blocks.Add(RankingTable(ranking, f, v));
            }

            sections.Add(new ReportSection($"{f.Label} ({f.Unit})", blocks));
        }

        foreach (var (climate, _, climateCharts) in ClimateCharts)
        {
            // Each chart's own title names its variant (the weather charts belong to every variant).
            sections.Add(new ReportSection($"Charts: {climate}", [.. climateCharts.Select(c => new ReportChart(c, c.Description))]));
        }

        return new ReportModel
        {
            StudyName = StudyName,
            Run = new ReportRunInfo
            {
                Inputs =
                [
                    new ReportKeyValue("climates", Rows.Select(r => r.Climate).Distinct().Count().ToString("N0", CultureInfo.InvariantCulture)),
                    new ReportKeyValue("variants", string.Join(", ", Variants)),
                    new ReportKeyValue("units", Units.Description),
                    new ReportKeyValue("tables read", $"{Annual.Parts.Count} annual and {Climates.Parts.Count} climates part file(s)"),
                    .. ClimateCharts.Count == 0 ? [] : new[] { new ReportKeyValue("per-climate charts", string.Join(", ", ClimateCharts.Select(c => c.Climate))) },
                    .. Batch is null ? [] : new[] { new ReportKeyValue("inputs", FormattableString.Invariant($"{Batch["files"]} files: {Batch["done"]} ran, {Batch["failed"]} stopped by a problem (tables/warnings)")) },
                ],
                StudyHash = Annual.Metadata.GetValueOrDefault(PartitionedTable.StudyHashKey, string.Empty),
                EngineVersion = Annual.Metadata.GetValueOrDefault("binenergy.engine_version", string.Empty),
                RunAt = runAt,
            },
            Assumptions = new ReportAssumptions
            {
                FlowBasis = "as the study sets it, at each climate's site pressure (tables/climates)",
                AirDensity = "each climate's own, from its site pressure (see the climates table)",
                SiteSensibleFactor = "each climate's own (see the climates table)",
                BinWidth = "not used here: every figure is the hourly method's sum over the record's hours",
                Calendar = "each record's own (tables/climates: hours and period)",
                Schedule = "the study's schedule, the same in every climate",
                DataRepairs = Batch?["warnings"] is System.Text.Json.Nodes.JsonObject repairs && repairs["weather-repairs"] is { } repaired
                    ? [FormattableString.Invariant($"{repaired} climates had repairs to their weather data (counted per kind in each climate's rows of tables/warnings, kind weather-repairs)")]
                    : [],
                Other =
                [
                    new ReportKeyValue("degree-days", $"{Climates.Table["degree_day_method"].Texts.FirstOrDefault() ?? "daily-mean"}, base {DisplayUnits.Text(Units.Temperature, Units.DegreeDayBaseC, "0.#")}"),
                    new ReportKeyValue("year shown", "typical year, the record's one year, or the mean of a multi-year record's complete years"),
                ],
            },
            Inputs = [WeatherFiles()],
            Results = sections,
            Warnings = Warnings,
        };
    }

    /// <summary>How many climates the report lists one by one under Inputs; a larger batch points to tables/climates.</summary>
    public const int ListedClimates = 200;

    /// <summary>Each climate's weather file and the site it sets, from the climates table (up to <see cref="ListedClimates"/> climates).</summary>
    private ReportSection WeatherFiles()
    {
        var t = Climates.Table;
        int n = t.RowCount;
        if (n > ListedClimates)
        {
            return new ReportSection("Weather files", [new ReportParagraph(FormattableString.Invariant(
                $"{n:N0} climates: each one's weather file, site, station, elevation, site pressure, hours and period are in tables/climates."))]);
        }

        // The columns a reader needs to know where each figure comes from, headed as people read them.
        var columns = new List<(string Heading, Func<int, string> Cell)>
        {
            ("Climate", i => t["climate"].Texts[i]),
            ("Weather file", i => Path.GetFileName(t["weather"].Texts[i])),
            ("Site in the file", i => t["site"].Texts[i]),
        };
        if (t.HasColumn("station_id"))
        {
            columns.Add(("Station", i => t["station_id"].Texts[i]));
        }

        columns.Add(("Period", i => t["period"].Texts[i]));
        columns.Add(("Hours", i => t["hours_in_record"].Integers[i].ToString("N0", CultureInfo.InvariantCulture)));
        foreach (var (key, label, unit) in new[] { ("elevation", "Elevation", Units.Length), ("site_pressure", "Site pressure", Units.Pressure) })
        {
            if (t.HasColumn(unit.NameFor(key)))
            {
                var c = t[unit.NameFor(key)];
                columns.Add((label + ", " + unit.Symbol, i => double.IsFinite(c.Numbers[i]) ? c.Numbers[i].ToString(unit.Format, CultureInfo.InvariantCulture) : string.Empty));
            }
        }

        // In climate order: the parts hold the climates in the order the workers finished them.
        var rows = Enumerable.Range(0, n).OrderBy(i => t["climate"].Texts[i], StringComparer.Ordinal)
            .Select(i => (IReadOnlyList<string>)columns.Select(c => c.Cell(i)).ToList()).ToList();
        return new ReportSection("Weather files",
            [new ReportTable("Each climate's weather file and the site it sets (tables/climates has the degree-days and design conditions too)", columns.Select(c => c.Heading).ToList(), rows)]);
    }

    private static ReportTable RankingTable(ResultTable ranking, HeadlineFigure f, string variant)
    {
        var rows = Enumerable.Range(0, ranking.RowCount).Where(i => ranking["figure"].Texts[i] == f.Label && ranking["variant"].Texts[i] == variant).ToList();
        var high = rows.Where(i => ranking["end"].Texts[i] == "highest").ToList();
        var low = rows.Where(i => ranking["end"].Texts[i] == "lowest").ToList();
        string V(int i) => ranking["value"].Numbers[i].ToString("N0", CultureInfo.InvariantCulture);
        var highNames = high.Select(i => ranking["climate"].Texts[i]).ToHashSet(StringComparer.Ordinal);
        if (low.Any(i => highNames.Contains(ranking["climate"].Texts[i])))
        {
            // Twenty climates or fewer: the two ends overlap and together hold every climate, so one list, highest first.
            var all = high.Concat(low.AsEnumerable().Reverse().Where(i => !highNames.Contains(ranking["climate"].Texts[i]))).ToList();
            return new ReportTable($"{f.Label}, {variant}: every climate, highest first ({f.Unit})", ["Rank", "Climate", $"{f.Label} ({f.Unit})"],
                all.Select((i, k) => (IReadOnlyList<string>)[(k + 1).ToString(CultureInfo.InvariantCulture), ranking["climate"].Texts[i], V(i)]).ToList());
        }

        var cells = Enumerable.Range(0, Math.Max(high.Count, low.Count)).Select(k => (IReadOnlyList<string>)
        [
            (k + 1).ToString(CultureInfo.InvariantCulture),
            k < high.Count ? ranking["climate"].Texts[high[k]] : "", k < high.Count ? V(high[k]) : "",
            k < low.Count ? ranking["climate"].Texts[low[k]] : "", k < low.Count ? V(low[k]) : "",
        ]).ToList();
        return new ReportTable($"{f.Label}, {variant}: the {RankingLength} highest and lowest climates ({f.Unit})",
            ["Rank", "Highest", $"{f.Label} ({f.Unit})", "Lowest", $"{f.Label} ({f.Unit})"], cells);
    }

    /// <summary>Reads <paramref name="folder"/> and writes its <c>report.html</c> and <c>summary.json</c> (each atomically); returns the report.</summary>
    public static async Task<BatchReport> WriteAsync(string folder, DateTimeOffset runAt, CancellationToken ct = default)
    {
        var report = await ReadAsync(folder, ct);
        var charts = report.Charts();
        string html = HtmlReport.Build(report.Model(charts, runAt));
        BatchSummary.Write(Path.Combine(folder, "summary.json"), JsonRenderer.Build(report.Summary()), report.Batch);
        AtomicFile.Write(Path.Combine(folder, "report.html"), System.Text.Encoding.UTF8.GetBytes(html));
        return report;
    }
}
