using System.Globalization;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy economizer</c> shows: the controls against the baseline, savings by method, modes by bin and coil energy by month.</summary>
public static class EconomizerDocument
{
    /// <summary>The document of an evaluation.</summary>
    /// <param name="e">The evaluation.</param>
    /// <param name="u">Display units.</param>
    /// <param name="headline">The headline method.</param>
    /// <param name="schedule">The occupancy schedule's text.</param>
    /// <param name="methods">The sentence on the methods with the case's bins (<see cref="AssumptionText.Methods"/>).</param>
    /// <param name="ventilation">The minimum outdoor air's own annual figures at the headline method; its humidification, when there is
    /// any (an indoor minimum RH), is shown with what the humidifier buys.</param>
    public static ResultDocument Build(EconomizerEvaluation e, DisplayUnits u, IntegrationMethod headline, string schedule, string methods, EnergyFigures? ventilation = null)
    {
        string method = IntegrationMethods.Label(headline);
        var doc = new ResultDocument($"Economizer evaluation: {e.Weather.Site.Name}, {AirSystemTypes.Name(e.Settings.System)} system, {e.OccupiedHours} occupied hours of {e.Weather.Count}") { CsvTable = "by_method" };
        doc.Add(new ColumnSet<EconomizerEvaluation>()
            .Text("site", "Site", x => x.Weather.Site.Name)
            .Integer("hours", "Hours", x => x.Weather.Count)
            .Integer("hours_occupied", "Occupied hours", x => x.OccupiedHours)
            .Text("system", "Air system", x => AirSystemTypes.Name(x.Settings.System))
            .Text("headline_method", "Headline method", _ => IntegrationMethods.Name(headline))
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record, ShowInTerminal = false }, [e]));

        var columns = FigureColumns.Economizer(u, e.HasPlant);
        doc.Add(new ColumnSet<EconomizerControlResult>()
            .Text("control", "Key", FigureColumns.ControlName, detail: true)
            .Text("label", "Control", c => c.Control.Kind == HighLimitKind.None ? "baseline (no economizer)" : c.Control.Describe())
            .Text("integration", "Integration", FigureColumns.Integration, detail: true)
            .Add(columns, c => (c, headline))
            .Fill(new ResultTable("controls")
            {
                Title = $"Controls against the baseline, {method} (coil energy in {u.Energy.Symbol}, hours per mode)",
                Layout = TableLayout.Keyed,
                KeyColumn = "control",
            }, e.BaselineAndControls));

        if (ventilation is { Loads.Humidification.Joules: > 0 } v)
        {
            doc.Add(new ColumnSet<EnergyFigures>()
                .Number("humidification", u.Energy, "Humidification load", f => f.Loads.Humidification.Joules)
                .Number("humidifier_electricity", u.Electricity, "Electricity bought", f => f.Bought[Core.Plant.EndUse.Humidification].ElectricityJ)
                .Number("humidifier_gas", u.Gas, "Gas bought", f => f.Bought[Core.Plant.EndUse.Humidification].GasJ)
                .Number("humidifier", u.Cost, "Cost", f => f.Bought[Core.Plant.EndUse.Humidification].Cost)
                .Fill(new ResultTable("humidification")
                {
                    Title = $"Humidifying the minimum outdoor air to the indoor minimum, {method} (the same with and without an economizer)",
                    Layout = TableLayout.Record,
                }, [v]));
        }

        var check = new ColumnSet<EconomizerControlResult>()
            .Text("control", "Control", c => c.Control.Describe())
            .Number("hourly_savings", u.Energy, "Hourly", c => c.Savings(IntegrationMethod.Hourly).Joules)
            .Number("joint_bin_savings", u.Energy, "Joint bins", c => c.Savings(IntegrationMethod.JointBin).Joules)
            .Number("bin_savings", u.Energy, "Bin method", c => c.Savings(IntegrationMethod.Bin).Joules)
            .Number("joint_bin_difference", u.Percent, "Joint bins vs hourly", c => c.SavingsDifferencePercent(IntegrationMethod.JointBin) ?? double.NaN)
            .Number("bin_difference", u.Percent, "Bin method vs hourly", c => c.SavingsDifferencePercent(IntegrationMethod.Bin) ?? double.NaN)
            .Fill(new ResultTable("savings_by_method") { Title = $"Coil energy saved by each method ({u.Energy.Symbol})" }, e.Controls);
        check.Notes.Add("Bin methods err on economizer savings where a bin's mean humidity hides its humid hours; the hourly sum is the reference.");
        doc.Add(check);

        doc.Add(new ColumnSet<(EconomizerControlResult Control, IntegrationMethod Method)>()
            .Text("control", "Control", x => FigureColumns.ControlName(x.Control))
            .Text("integration", "Integration", x => FigureColumns.Integration(x.Control))
            .Text("method", "Method", x => IntegrationMethods.Name(x.Method))
            .Add(columns, x => x)
            .Fill(new ResultTable("by_method") { ShowInTerminal = false }, e.BaselineAndControls.SelectMany(c => IntegrationMethods.All.Select(m => (c, m)))));

        var best = e.Best(headline);
        var rows = Enumerable.Range(0, e.Bins.Count).Where(b => e.Bins[b].OccupiedHours > 0).ToList();
        doc.Add(new ColumnSet<int>()
            .Number("bin_low", u.Temperature, "Bin from", b => e.Bins[b].Low.Celsius)
            .Number("bin_high", u.Temperature, "to", b => e.Bins[b].High.Celsius)
            .Integer("hours_occupied", "Occupied hours", b => e.Bins[b].OccupiedHours)
            .Number("mean_humidity_ratio", u.Moisture, "Mean W", b => e.Bins[b].MeanHumidityRatio.KilogramsPerKilogram)
            .Number("enthalpy", u.Enthalpy, "h", b => e.Bins[b].Enthalpy.JoulesPerKilogram)
            .Number("hours_free", u.Hours, "Free", b => best.ByBin[b].Hourly.HoursFree)
            .Number("hours_integrated", u.Hours, "Integrated", b => best.ByBin[b].Hourly.HoursIntegrated)
            .Number("hours_minimum", u.Hours, "Minimum OA", b => best.ByBin[b].Hourly.HoursMinimum)
            .Number("hours_no_cooling", u.Hours, "No cooling", b => best.ByBin[b].Hourly.HoursNoCooling)
            .Text("bin_method_mode", "Bin-method mode", b => ModeName(best.ByBin[b].Bin))
            .Number("hourly_coil_total", u.Energy, "Coil, hourly", b => best.ByBin[b].Hourly.CoilTotal.Joules)
            .Number("joint_bin_coil_total", u.Energy, "Coil, joint", b => best.ByBin[b].JointBin.CoilTotal.Joules)
            .Number("bin_coil_total", u.Energy, "Coil, bin", b => best.ByBin[b].Bin.CoilTotal.Joules)
            .Number("hourly_reheat", u.Energy, "Reheat, hourly", b => best.ByBin[b].Hourly.Reheat.Joules)
            .Number("hourly_preheat", u.Energy, "Preheat, hourly", b => best.ByBin[b].Hourly.Preheat.Joules, detail: true)
            .Fill(new ResultTable("bins") { Title = $"Modes by bin, best control: {best.Control.Describe()} (hours per mode hour by hour; the bin method's mode at the bin state)" }, rows));

        doc.Add(new ColumnSet<int>()
            .Integer("month", "Month", m => m + 1)
            .Number("baseline_coil_total", u.Energy, "Baseline", m => e.Baseline.ByMonth[m].CoilTotal.Joules)
            .Number("coil_total", u.Energy, best.Control.Describe(), m => best.ByMonth[m].CoilTotal.Joules)
            .Number("savings", u.Energy, "Savings", m => best.ByMonth[m].SavingsAgainst(e.Baseline.ByMonth[m]).Joules)
            .Number("baseline_reheat", u.Energy, "Baseline reheat", m => e.Baseline.ByMonth[m].Reheat.Joules)
            .Number("reheat", u.Energy, "Reheat", m => best.ByMonth[m].Reheat.Joules)
            .Number("baseline_preheat", u.Energy, "Baseline preheat", m => e.Baseline.ByMonth[m].Preheat.Joules, detail: true)
            .Number("preheat", u.Energy, "Preheat", m => best.ByMonth[m].Preheat.Joules, detail: true)
            .Number("fans", u.Electricity, "Fans", m => e.Baseline.ByMonth[m].Fans.Joules)
            .Fill(new ResultTable("months") { Title = $"Coil energy and reheat by month, hourly sum ({u.Energy.Symbol})" }, Enumerable.Range(0, 12).Where(m => e.Baseline.ByMonth[m].Hours > 0)));

        if (e.Controls.Any(c => IntegrationMethods.All.Any(m => c.Savings(m).Joules < 0)))
        {
            doc.Note(NoteKind.Note, "Negative savings: that control adds coil energy, because it lets in outdoor air that is cooler but more humid (higher enthalpy) than the return air.");
        }

        doc.NoteAll(NoteKind.Assumption, AssumptionText.Economizer(e, u, schedule, methods));
        if (RecordPeriod.Warning(e.Weather) is string partial)
        {
            doc.Note(NoteKind.Warning, partial);
        }

        doc.NoteAll(NoteKind.Caution, Cautions.Economizer);
        return doc;
    }

    private static string ModeName(EconomizerTotals t) =>
        t.HoursFree > 0 ? "free cooling"
        : t.HoursIntegrated > 0 ? "integrated"
        : t.HoursMinimum > 0 ? "minimum OA"
        : "no cooling";
}
