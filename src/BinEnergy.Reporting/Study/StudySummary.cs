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

        doc.Add(new ColumnSet<StudyCaseResult>()
            .Add(StudyTables.CaseColumns, c => c)
            .Text("weather", "Weather file", c => c.Case.Climate.WeatherPath, detail: true)
            .Integer("hours_in_record", "Hours in the record", c => c.Weather.Count, detail: true)
            .Number("airflow", u.Airflow, "Airflow", c => c.Case.OutdoorAir.EffectiveAirflow.CubicMetresPerSecond)
            .Add(FigureColumns.Loads(u, show), c => c.OutdoorAir.Annual[headline])
            .Fill(new ResultTable("headline") { Title = $"Annual outdoor-air figures, {IntegrationMethods.Label(headline)}" }, run.Cases));

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

        doc.Add(new ColumnSet<(StudyCaseResult Case, string Text)>()
            .Add(StudyTables.CaseColumns, x => x.Case)
            .Text("assumption", "Assumption", x => x.Text)
            .Fill(new ResultTable("case_assumptions") { ShowInTerminal = false },
                run.Cases.SelectMany(c => CaseAssumptions(c, u).Select(a => (c, a)))));

        doc.NoteAll(NoteKind.Warning, run.Warnings);
        doc.NoteAll(NoteKind.Caution, Cautions.OutdoorAir);
        return doc;
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
            "humidification is met by an electric humidifier",
        ];
    }

    /// <summary>The summary as indented JSON text (<c>summary.json</c>).</summary>
    public static string ToJson(StudyRunResult run) => JsonRenderer.Render(Build(run));
}
