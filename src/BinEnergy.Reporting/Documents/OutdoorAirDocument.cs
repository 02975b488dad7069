using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy outdoor-air</c> shows: the method check, loads by bin and month, peaks, assumptions.</summary>
public static class OutdoorAirDocument
{
    /// <summary>The document of a one-case run.</summary>
    /// <param name="run">The case.</param>
    /// <param name="u">Display units.</param>
    /// <param name="source">The weather file and how it was read, for the heading.</param>
    /// <param name="headline">The headline method.</param>
    /// <param name="noSchedule">True when no schedule was given (every hour counts as occupied).</param>
    public static ResultDocument Build(StudyCaseResult run, DisplayUnits u, string source, IntegrationMethod headline, bool noSchedule)
    {
        var r = run.OutdoorAir;
        var a = r.Assumptions;
        var show = FigureSet.Of(r);
        var doc = new ResultDocument($"Outdoor-air loads: {run.Weather.Site.Name}, {DisplayUnits.Text(u.Airflow, a.Airflow.CubicMetresPerSecond)}") { CsvTable = "bins" };
        doc.Add(new ColumnSet<StudyCaseResult>()
            .Text("file", "Weather file", _ => source)
            .Text("site", "Site", c => c.Weather.Site.Name)
            .Integer("hours_in_record", "Hours in the record", c => c.Weather.Count)
            .Number("airflow", u.Airflow, "Outdoor airflow", _ => a.Airflow.CubicMetresPerSecond)
            .Text("headline_method", "Headline method", _ => IntegrationMethods.Name(headline))
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Title = "Estimate", Layout = TableLayout.Record }, [run]));

        var check = MethodCheck.Columns(u).Fill(new ResultTable("method_check") { Title = RecordPeriod.Title(run.Weather, "outdoor-air energy by method") }, MethodCheck.Rows(r, null, u));
        check.Notes.Add($"Headline: {IntegrationMethods.Label(headline)}. The differences are each bin method's error against the hourly sum, in percent of it.");
        doc.Add(check);
        doc.Add(new ColumnSet<IntegrationMethod>()
            .Text("method", "Method", IntegrationMethods.Name)
            .Add(FigureColumns.Loads(u, show), m => r.Annual[m])
            .Fill(new ResultTable("annual") { Layout = TableLayout.Keyed, KeyColumn = "method", ShowInTerminal = false, Transpose = true }, IntegrationMethods.All));

        if (run.IsMultiYear)
        {
            var years = new ColumnSet<CaseYear>()
                .Text("year", "Year", y => y.Year.Label)
                .Integer("complete_year", "Complete", y => y.Year.Complete ? 1 : 0)
                .Integer("hours_in_year", "Hours", y => y.Year.Hours)
                .Add(FigureColumns.Loads(u, show), y => y.OutdoorAir.Annual[headline])
                .Fill(new ResultTable("years") { Title = $"Each calendar year, {IntegrationMethods.Label(headline)}" }, run.Years);
            years.Notes.Add($"The figures above are the mean of the {r.YearsAveraged} complete years; a partial year (complete 0) is shown on its own and not mixed in.");
            doc.Add(years);
        }

        doc.Add(BinTable(r, u, show));
        doc.Add(MonthTable(r, u, show));
        if (r.Peaks is OutdoorAirPeaks peaks)
        {
            var table = new ColumnSet<OutdoorAirPeak>().Text("condition", "Condition", p => p.Key).Add(FigureColumns.Peaks(u, show.Recovery), p => p)
                .Fill(new ResultTable("peaks") { Title = "Peak outdoor-air loads at this record's design conditions", Layout = TableLayout.Keyed, KeyColumn = "condition", Transpose = true }, peaks.All);
            table.Notes.Add("heating_99_6: 99.6 % heating dry-bulb; cooling_0_4: 0.4 % cooling dry-bulb with its mean coincident wet-bulb; dehumidification_0_4: 0.4 % dew point with its mean coincident dry-bulb.");
            table.Notes.Add("Design conditions: " + peaks.Method + ".");
            if (show.Recovery)
            {
                table.Notes.Add("Peaks include the recovery device; size equipment for the hours the device may be off (the total without recovery).");
            }

            doc.Add(table);
        }

        doc.Add(AssumptionValues(r, u));
        doc.NoteAll(NoteKind.Assumption, AssumptionText.OutdoorAir(a, u, noSchedule));
        doc.Note(NoteKind.Note, AssumptionText.LatentError);
        doc.NoteAll(NoteKind.Warning, run.Warnings);
        if (RecordPeriod.Warning(run.Weather) is string partial)
        {
            doc.Note(NoteKind.Warning, partial);
        }

        doc.NoteAll(NoteKind.Caution, Cautions.OutdoorAir);
        return doc;
    }

    /// <summary>One row per dry-bulb bin: the bin method's loads and the exact loads of the bin's own hours beside them (joint bins in the data).</summary>
    private static ResultTable BinTable(OutdoorAirResult r, DisplayUnits u, FigureSet show)
    {
        var set = new ColumnSet<OutdoorAirBinRow>()
            .Number("bin_low", u.Temperature, "Bin from", b => b.Bin.Low.Celsius)
            .Number("bin_high", u.Temperature, "to", b => b.Bin.High.Celsius)
            .Integer("hours_ventilated", "Hours", b => b.HoursVentilated)
            .Number("evaluated_drybulb", u.Temperature, "At", b => b.EvaluatedAt.Celsius)
            .Number("mean_humidity_ratio", u.Moisture, "Mean W", b => b.MeanHumidityRatio.KilogramsPerKilogram);
        foreach (var (method, prefix, label, visible) in new[]
        {
            (IntegrationMethod.Bin, "bin_", "Bin ", new[] { LoadFigure.Heating, LoadFigure.CoolingSensible, LoadFigure.CoolingLatent }),
            (IntegrationMethod.Hourly, "hourly_", "Hourly ", new[] { LoadFigure.Heating, LoadFigure.CoolingLatent }),
            (IntegrationMethod.JointBin, "joint_bin_", "Joint ", Array.Empty<LoadFigure>()),
        })
        {
            foreach (var figure in Enum.GetValues<LoadFigure>())
            {
                var (name, figureLabel, unit) = FigureColumns.Of(figure, u);
                bool relevant = figure switch
                {
                    LoadFigure.Humidification => show.Humidification,
                    LoadFigure.RecoveredHeating or LoadFigure.RecoveredCooling => show.Recovery && method == IntegrationMethod.Bin,
                    _ => true,
                };
                bool detail = !(visible.Contains(figure) || (relevant && method == IntegrationMethod.Bin && figure != LoadFigure.FanEnergy));
                set.Number(prefix + name, unit, label + figureLabel.ToLowerInvariant(), b => b.Figures[method].Loads[figure].Joules, detail);
            }
        }

        var table = set.Fill(new ResultTable("bins") { Title = $"Outdoor-air loads by dry-bulb bin, {u.Energy.Symbol}" }, r.Bins);
        table.Notes.Add(r.Assumptions.BinPoint == BinEvaluationPoint.Midpoint
            ? "Bin method: loads at each bin's midpoint and mean coincident humidity ratio, times its ventilated hours; hourly: the same bin's hours one by one."
            : "Bin method: loads at each bin's mean dry-bulb (At) and mean coincident humidity ratio, times its ventilated hours; hourly: the same bin's hours one by one.");
        return table;
    }

    private static ResultTable MonthTable(OutdoorAirResult r, DisplayUnits u, FigureSet show)
    {
        var set = new ColumnSet<OutdoorAirMonth>().Integer("month", "Month", m => m.Month);
        foreach (var (method, prefix, label) in new[] { (IntegrationMethod.Hourly, "hourly_", ""), (IntegrationMethod.JointBin, "joint_bin_", "Joint "), (IntegrationMethod.Bin, "bin_", "Bin ") })
        {
            set.Add(FigureColumns.Loads(u, show with { Plant = false }, hours: method == IntegrationMethod.Hourly)
                .Prefixed(prefix, label, detail: method != IntegrationMethod.Hourly), m => m.Figures[method]);
        }

        return set.Fill(new ResultTable("months") { Title = $"Outdoor-air loads by month, hourly sum, {u.Energy.Symbol}" }, r.Months);
    }

    /// <summary>The assumptions as typed values (JSON); the terminal states them as sentences.</summary>
    private static ResultTable AssumptionValues(OutdoorAirResult r, DisplayUnits u)
    {
        var a = r.Assumptions;
        var rec = a.Recovery;
        return new ColumnSet<OutdoorAirAssumptions>()
            .Number("airflow", u.Airflow, "Airflow", x => x.Airflow.CubicMetresPerSecond)
            .Text("flow_basis", "Flow basis", x => x.FlowBasis.ToString().ToLowerInvariant())
            .Number("dry_air_density", u.Density, "Dry-air density", x => x.DryAirDensity)
            .Number("sensible_factor", u.SensibleFactor, "Sensible factor at W = 0", x => x.Factors.SensibleSi)
            .Number("site_pressure", u.Pressure, "Site pressure", x => x.SitePressure.Pascals)
            .Number("heat_to", u.Temperature, "Heat to", x => x.HeatTo.Celsius)
            .Number("cool_to", u.Temperature, "Cool to", x => x.CoolTo.Celsius)
            .Number("max_rh", u.RelativeHumidity, "Maximum indoor RH", x => x.MaxRelativeHumidity)
            .Number("min_rh", u.RelativeHumidity, "Minimum indoor RH", x => x.MinRelativeHumidity ?? double.NaN)
            .Number("max_humidity_ratio", u.Moisture, "W_max", x => x.MaxHumidityRatio.KilogramsPerKilogram)
            .Number("min_humidity_ratio", u.Moisture, "W_min", x => x.MinHumidityRatio?.KilogramsPerKilogram ?? double.NaN)
            .Text("ventilate", "Ventilate", x => x.Operation == VentilationOperation.Always ? "always" : "occupied")
            .Text("schedule", "Schedule", x => x.Schedule)
            .Number("bin_width", u.TemperatureDifference, "Bin width", x => x.BinScale.WidthDifference.Kelvin)
            .Text("bin_point", "Bin evaluation point", x => x.BinPoint == BinEvaluationPoint.Midpoint ? "mid" : "mean")
            .Number("humidity_bin_width", DisplayUnit.Number, "Humidity bin width (" + u.Moisture.Symbol + ")", x => x.HumidityScale.Width)
            .Number("recovery_sensible_effectiveness", DisplayUnit.Number, "Recovery sensible effectiveness", _ => rec?.SensibleEffectiveness ?? double.NaN)
            .Number("recovery_latent_effectiveness", DisplayUnit.Number, "Recovery latent effectiveness", _ => rec?.LatentEffectiveness ?? double.NaN)
            .Number("recovery_pressure_drop", u.PressureDrop, "Recovery pressure drop per stream", _ => rec?.PressureDropPa ?? double.NaN)
            .Number("recovery_fan_power", u.Power, "Recovery fan power", x => rec is null ? double.NaN : x.FanPenalty.Watts)
            .Text("calendar", "Calendar", x => x.Calendar)
            .Fill(new ResultTable("assumptions_values") { Layout = TableLayout.Record, ShowInTerminal = false }, [a]);
    }
}
