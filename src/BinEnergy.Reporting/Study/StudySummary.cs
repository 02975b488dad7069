using BinEnergy.Core.Climate;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// The summary of a run, one document for <c>summary.json</c>, <c>run --json</c> and the terminal:
/// the study, its hash and the engine version; per climate x variant the headline figures (by the
/// study's headline method), the method check, the economizer savings, the assumptions; the
/// warnings and cautions.
/// </summary>
public static class StudySummary
{
    /// <summary>The summary document of a run.</summary>
    public static ResultDocument Build(StudyRunResult run)
    {
        var u = StudyTables.Units(run);
        var show = StudyTables.Show(run);
        var headline = run.Study.HeadlineMethod;
        var doc = new ResultDocument($"{run.Study.Name} ({IntegrationMethods.Label(headline)}; the other methods are in the tables and the report)");
        doc.Add(new ColumnSet<StudyRunResult>()
            .Text("study", "Study", r => r.Study.Name)
            .Text("study_file", "Study file", r => r.Study.File)
            .Text("study_sha256", "Study SHA-256", r => r.Study.Hash)
            .Text("engine_version", "Engine version", r => r.EngineVersion)
            .Text("units", "Units", _ => u.Name)
            .Text("currency", "Currency", r => r.Study.Currency)
            .Text("headline_method", "Headline method", _ => IntegrationMethods.Name(headline))
            .Integer("climates", "Climates", r => r.Study.Climates.Count)
            .Integer("variants", "Variants", r => r.Study.Variants.Count)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record, ShowInTerminal = false }, [run]));

        doc.Add(WeatherFiles(run, u));
        var climates = run.Cases.GroupBy(c => c.Case.Climate.Name)
            .Select(g => (Case: g.First(), DegreeDays: StudyTables.DegreeDaysPerYear(g.First(), run.Study.DegreeDayMethod, u.DegreeDayBaseC), Design: g.First().OutdoorAir.Design!))
            .ToList();
        doc.Add(new ColumnSet<(StudyCaseResult Case, (double Heating, double Cooling) DegreeDays, DesignConditions Design)>()
            .Text("climate", "Climate", x => x.Case.Case.Climate.Name)
            .Text("site", "Site in the file", x => x.Case.Weather.Site.Name, detail: true)
            .Integer("hours_in_record", "Hours", x => x.Case.Weather.Count, detail: true)
            .Text("humidity_over", "Dew points over", x => x.Case.Weather.HumidityOver == Core.Psychrometrics.HumidityOver.Water ? "water" : "ice", detail: true)
            .Number("elevation", u.Length, "Elevation", x => x.Case.Weather.Site.ElevationM ?? double.NaN, detail: true)
            .Number("site_pressure", u.Pressure, "Site pressure", x => x.Case.Weather.Site.SitePressurePa, detail: true)
            .Number("dry_air_density", u.Density, "Dry-air density", x => x.Case.OutdoorAir.Assumptions.DryAirDensity, detail: true)
            .Number("site_sensible_factor", u.SensibleFactor, "Sensible factor", x => x.Case.OutdoorAir.Assumptions.Factors.SensibleSi, detail: true)
            .Text("degree_day_method", "Degree-days", _ => DegreeDayMethods.Name(run.Study.DegreeDayMethod), detail: true)
            .Number("heating_degree_days", u.DegreeDays, "HDD " + u.Temperature.FromSi(u.DegreeDayBaseC).ToString("0.#", System.Globalization.CultureInfo.InvariantCulture), x => x.DegreeDays.Heating)
            .Number("cooling_degree_days", u.DegreeDays, "CDD " + u.Temperature.FromSi(u.DegreeDayBaseC).ToString("0.#", System.Globalization.CultureInfo.InvariantCulture), x => x.DegreeDays.Cooling)
            .Number("heating_99_6_drybulb", u.Temperature, "Heating 99.6 %", x => x.Design.Heating996DryBulbC)
            .Number("cooling_0_4_drybulb", u.Temperature, "Cooling 0.4 %", x => x.Design.Cooling[0].DryBulbC)
            .Number("cooling_0_4_mcwb", u.Temperature, "MCWB", x => x.Design.Cooling[0].MeanCoincidentWetBulbC)
            .Number("dehumidification_0_4_dewpoint", u.Temperature, "Dew point 0.4 %", x => x.Design.Dehumidification[0].DewPointC)
            .Fill(new ResultTable("climates")
            {
                Title = "Climates: the degree-days and design conditions of each record (the site of each in weather_files)",
                ShowInTerminal = false,
                Notes =
                {
                    "Degree-days " + DegreeDayMethods.Describe(run.Study.DegreeDayMethod) + " ([study] degree_days), base " + DisplayUnits.Text(u.Temperature, u.DegreeDayBaseC) + ".",
                    "Design conditions from each record (a multi-year record: its complete years, and degree-days per complete year): " + DesignConditions.Basis + ".",
                },
            }, climates));

        doc.Add(new ColumnSet<StudyCaseResult>()
            .Add(StudyTables.CaseColumns, c => c)
            .Text("weather", "Weather file", c => c.Case.Climate.WeatherPath, detail: true)
            .Integer("hours_in_record", "Hours in the record", c => c.Weather.Count, detail: true)
            .Number("airflow", u.Airflow, "Airflow", c => c.Case.OutdoorAir.EffectiveAirflow.CubicMetresPerSecond)
            .Add(FigureColumns.Loads(u, show), c => c.OutdoorAir.Annual[headline])
            .Fill(new ResultTable("headline") { Title = $"Annual outdoor-air figures, {IntegrationMethods.Label(headline)}" }, run.Cases));

        doc.Add(new ColumnSet<(StudyCaseResult Case, CaseYear Year)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Text("year", "Year", x => x.Year.Year.Label)
            .Integer("complete_year", "Complete year", x => x.Year.Year.Complete ? 1 : 0)
            .Integer("hours_in_year", "Hours", x => x.Year.Year.Hours)
            .Add(FigureColumns.Loads(u, show), x => x.Year.OutdoorAir.Annual[headline])
            .Fill(new ResultTable("years") { Title = "Each calendar year of the records", ShowInTerminal = false },
                run.Cases.SelectMany(c => c.Years.Select(y => (c, y)))));

        doc.Add(new ColumnSet<(StudyCaseResult Case, Spread Spread)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Text("figure", "Figure", x => x.Spread.Figure)
            .Text("unit", "Unit", x => x.Spread.Unit)
            .Integer("years", "Complete years", x => x.Spread.Years)
            .Number("mean", DisplayUnit.Count, "Mean year", x => x.Spread.Mean)
            .Number("min", DisplayUnit.Count, "Lowest year", x => x.Spread.Min)
            .Number("max", DisplayUnit.Count, "Highest year", x => x.Spread.Max)
            .Fill(new ResultTable("spread") { Title = $"Year-to-year spread of the complete years, {IntegrationMethods.Label(headline)}", ShowInTerminal = false },
                run.Cases.Where(c => c.IsMultiYear).SelectMany(c => Spreads(c, u, headline).Select(sp => (c, sp)))));

        doc.Add(new ColumnSet<(StudyCaseResult Case, MethodCheck.Row Row)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Add(MethodCheck.Columns(u), x => x.Row)
            .Fill(new ResultTable("method_check") { Title = "Each annual figure by the three methods", ShowInTerminal = false },
                run.Cases.SelectMany(c => MethodCheck.Rows(c.OutdoorAir, c.Economizer, u).Select(r => (c, r)))));

        doc.Add(new ColumnSet<(StudyCaseResult Case, EconomizerControlResult Control)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Text("control", "Control", x => FigureColumns.ControlName(x.Control))
            .Text("integration", "Integration", x => FigureColumns.Integration(x.Control))
            .Add(FigureColumns.Economizer(u, show.Plant), x => (x.Control, headline))
            .Fill(new ResultTable("economizer") { Title = $"Economizer controls against the baseline, {IntegrationMethods.Label(headline)}", ShowInTerminal = false },
                run.Cases.Where(c => c.Economizer is not null).SelectMany(c => c.Economizer!.Controls.Select(x => (c, x)))));

        doc.Add(StudyTables.Peaks(run.Cases, u, show, showInTerminal: false));

        doc.Add(new ColumnSet<(StudyCaseResult Case, string Text)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Text("assumption", "Assumption", x => x.Text)
            .Fill(new ResultTable("case_assumptions") { ShowInTerminal = false },
                run.Cases.SelectMany(c => CaseAssumptions(c, u).Select(a => (c, a)))));

        doc.NoteAll(NoteKind.Warning, run.Warnings);
        doc.NoteAll(NoteKind.Caution, Cautions.OutdoorAir);
        return doc;
    }

    /// <summary>
    /// The weather file of each climate: the file, the site and station its header names, the layout it was read
    /// with, its period and hours, and the site it sets (elevation, site pressure and where it came from, the
    /// dry-air density of the flow basis and the sensible factor).
    /// </summary>
    public static ResultTable WeatherFiles(StudyRunResult run, DisplayUnits u) =>
        new ColumnSet<StudyCaseResult>()
            .Text("climate", "Climate", c => c.Case.Climate.Name)
            .Text("weather_file", "Weather file", c => Path.GetFileName(c.Case.Climate.WeatherPath))
            .Text("source", "Source (site in the file; layout)", c => Source(c))
            .Text("period", "Period", c => StudyTables.Period(c.Weather))
            .Integer("hours_in_record", "Hours", c => c.Weather.Count)
            .Number("elevation", u.Length, "Elevation", c => c.Weather.Site.ElevationM ?? double.NaN)
            .Number("site_pressure", u.Pressure, "Site pressure", c => c.Weather.Site.SitePressurePa)
            .Text("site_pressure_from", "Pressure from", c => c.Weather.Site.PressureSource switch
            {
                Core.Weather.SitePressureSource.StandardAtmosphereAtElevation => "standard atmosphere at the elevation",
                Core.Weather.SitePressureSource.RecordMean => "the record's mean pressure",
                _ => "sea level (assumed)",
            })
            .Number("dry_air_density", u.Density, "Dry-air density", c => c.OutdoorAir.Assumptions.DryAirDensity)
            .Number("site_sensible_factor", u.SensibleFactor, "Sensible factor", c => c.OutdoorAir.Assumptions.Factors.SensibleSi)
            .Fill(new ResultTable("weather_files") { Title = "The weather files and the site each sets", ShowInTerminal = false },
                run.Cases.GroupBy(c => c.Case.Climate.Name).Select(g => g.First()));

    private static string Source(StudyCaseResult c)
    {
        var site = c.Weather.Site;
        string name = string.IsNullOrWhiteSpace(site.Name) ? "no site name" : site.Name;
        string station = site.StationId is { Length: > 0 } id ? $", station {id}" : string.Empty;
        string layout = c.Case.Climate.Map is { } map ? (map.Contains(Path.DirectorySeparatorChar) ? Path.GetFileName(map) + " map" : map + " layout") : "open layout";
        return $"{name}{station}; {layout}";
    }

    /// <summary>A figure's mean year and its lowest and highest complete year.</summary>
    /// <param name="Figure">The figure.</param>
    /// <param name="Unit">Its unit symbol.</param>
    /// <param name="Years">How many complete years.</param>
    /// <param name="Mean">The mean year's value.</param>
    /// <param name="Min">The lowest complete year's.</param>
    /// <param name="Max">The highest complete year's.</param>
    public sealed record Spread(string Figure, string Unit, int Years, double Mean, double Min, double Max);

    /// <summary>The spread of each figure over a multi-year case's complete years, by <paramref name="method"/> (empty when it has none).</summary>
    public static IEnumerable<Spread> Spreads(StudyCaseResult c, DisplayUnits u, IntegrationMethod method)
    {
        var complete = c.Years.Where(y => y.Year.Complete).Select(y => y.OutdoorAir.Annual[method]).ToList();
        if (complete.Count == 0)
        {
            yield break;
        }

        var show = FigureSet.Of(c.OutdoorAir);
        var mean = c.OutdoorAir.Annual[method];
        foreach (var figure in new[] { Core.Loads.LoadFigure.Heating, Core.Loads.LoadFigure.CoolingSensible, Core.Loads.LoadFigure.CoolingLatent, Core.Loads.LoadFigure.Humidification })
        {
            var (_, label, unit) = FigureColumns.Of(figure, u);
            var values = complete.Select(f => unit.FromSi(f.Loads[figure].Joules)).ToList();
            yield return new Spread(label, unit.Symbol, complete.Count, unit.FromSi(mean.Loads[figure].Joules), values.Min(), values.Max());
        }

        if (show.Plant)
        {
            var costs = complete.Select(f => f.Bought.Total.Cost).ToList();
            yield return new Spread("Cost", u.Cost.Symbol, complete.Count, mean.Bought.Total.Cost, costs.Min(), costs.Max());
        }
    }

    /// <summary>The assumptions of one case: the defaults the study left to the engine, then how the figures were made.</summary>
    public static IEnumerable<string> CaseAssumptions(StudyCaseResult c, DisplayUnits u)
    {
        var a = c.OutdoorAir.Assumptions;
        return
        [
            .. c.Case.Assumptions,
            AssumptionText.SiteFactor(a, u),
            "schedule: " + a.Schedule + "; " + AssumptionText.Clock(a.DaylightSaving),
            "calendar: " + a.Calendar,
            AssumptionText.Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol),
            "plant energy of the hourly method uses each hour's outdoor dry-bulb for the COP curves; the bin methods use each bin's or cell's evaluation dry-bulb",
            c.Case.Plant is { } plant ? "humidification: " + plant.Humidifier switch
            {
                Core.Plant.HumidifierType.SteamGas => $"gas-fired steam humidifier, efficiency {plant.HumidifierEfficiency:0.##}",
                Core.Plant.HumidifierType.Adiabatic => "adiabatic humidifier (the evaporation's heat is bought as heating)",
                _ => $"electric steam humidifier, efficiency {plant.HumidifierEfficiency:0.##}",
            } : "no [plant] table: loads only, nothing is bought",
        ];
    }

    /// <summary>The summary as indented JSON text (<c>summary.json</c>).</summary>
    public static string ToJson(StudyRunResult run) => JsonRenderer.Render(Build(run));
}
