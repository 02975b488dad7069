using System.Globalization;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy inspect</c> shows about one weather record: the record, its climate, design conditions and data repairs.</summary>
public static class InspectDocument
{
    /// <summary>Where the site pressure came from, in words.</summary>
    public static string PressureSource(SitePressureSource source) => source switch
    {
        SitePressureSource.StandardAtmosphereAtElevation => "standard atmosphere at the site elevation (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 3)",
        SitePressureSource.RecordMean => "mean of the record's pressure column (no elevation given)",
        _ => "sea level assumed (no elevation and no pressure column)",
    };

    /// <summary>The document of a record and its climate summary; <paramref name="source"/> names the file and how it was read.</summary>
    public static ResultDocument Build(HourlyWeather weather, ClimateSummary climate, DisplayUnits u, string source)
    {
        var s = weather.Site;
        var doc = new ResultDocument("Weather record: " + s.Name);
        string hoursNote = weather.Count == 8760 ? string.Empty : weather.Count == 8784 ? " (leap year)" : " (not a full year: annual figures are for these hours)";
        doc.Add(new ColumnSet<HourlyWeather>()
            .Text("file", "File", _ => source)
            .Text("site", "Site", w => w.Site.Name)
            .Number("latitude", DisplayUnit.Number, "Latitude", w => w.Site.Latitude ?? double.NaN)
            .Number("longitude", DisplayUnit.Number, "Longitude", w => w.Site.Longitude ?? double.NaN)
            .Number("utc_offset_h", DisplayUnit.Number, "UTC offset, h", w => w.Site.UtcOffsetHours ?? double.NaN)
            .Integer("hours", "Hours" + hoursNote, w => w.Count)
            .Text("period_start", "First hour (hour-beginning, local standard time)", w => w.Times[0].ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture))
            .Text("period_end", "Last hour", w => w.Times[^1].ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture))
            .Text("calendar", "Calendar", w => w.Calendar.Note)
            .Text("typical_year", "Typical year", w => w.Calendar.IsTypicalYear ? "yes" : "no")
            .Number("elevation", u.Length, "Elevation", w => w.Site.ElevationM ?? double.NaN)
            .Number("site_pressure", u.Pressure, "Site pressure", w => w.Site.SitePressurePa)
            .Text("site_pressure_source", "Site pressure from", w => PressureSource(w.Site.PressureSource))
            .Text("hourly_pressure_source", "Each hour's pressure from", w => w.HourlyPressureFromRecord ? "the pressure column of the file" : "the site pressure (the file has no pressure column)")
            .Number("pressure_mean", u.Pressure, "Mean hourly pressure", w => w.PressurePa.Average())
            .Text("humidity_over", "Dew points and RH", w => HumidityConventions.Describe(w.HumidityOver))
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Title = "Weather record", Layout = TableLayout.Record }, [weather]));

        doc.Add(new ColumnSet<ClimateSummary>()
            .Number("drybulb_min", u.Temperature, "Dry-bulb, lowest", c => c.MinDryBulbC)
            .Number("drybulb_mean", u.Temperature, "Dry-bulb, mean", c => c.MeanDryBulbC)
            .Number("drybulb_max", u.Temperature, "Dry-bulb, highest", c => c.MaxDryBulbC)
            .Text("degree_day_method", "Degree-day method", c => DegreeDayMethods.Name(c.DegreeDayMethod))
            .Number("degree_day_base", u.Temperature, "Degree-day base", c => c.DegreeDayBaseC)
            .Number("heating_degree_days", u.DegreeDays, "Heating degree-days", c => c.HeatingKDays)
            .Number("cooling_degree_days", u.DegreeDays, "Cooling degree-days", c => c.CoolingKDays)
            .Fill(new ResultTable("climate") { Title = "Dry-bulb and degree-days", Layout = TableLayout.Record, Notes = { "Degree-days " + DegreeDayMethods.Describe(climate.DegreeDayMethod) + "; --degree-days chooses the method." } }, [climate]));

        var curve = climate.Curve;
        doc.Add(new ColumnSet<int>()
            .Number("base", u.Temperature.WithFormat("0.#"), "Base", i => curve.BasesC[i])
            .Number("heating", u.DegreeDays, "Heating", i => curve.HeatingKDays[i])
            .Number("cooling", u.DegreeDays, "Cooling", i => curve.CoolingKDays[i])
            .Fill(new ResultTable("degree_day_curve") { Title = "Degree-days by base (balance point), " + DegreeDayMethods.Describe(curve.Method), TerminalEvery = u.DegreeDayCurveTerminalStep }, Enumerable.Range(0, curve.BasesC.Length)));

        var d = climate.Design;
        var design = new List<DesignRow>
        {
            new("heating_99_6", "Heating 99.6 % dry-bulb") { DryBulbC = d.Heating996DryBulbC },
            new("heating_99", "Heating 99 % dry-bulb") { DryBulbC = d.Heating990DryBulbC },
        };
        design.AddRange(d.Cooling.Select(c => new DesignRow(Key("cooling", c.AnnualPercent), Inv($"Cooling {c.AnnualPercent:0.#} % dry-bulb / MCWB"))
        {
            DryBulbC = c.DryBulbC,
            WetBulbC = c.MeanCoincidentWetBulbC,
            Hours = c.CoincidentHours,
        }));
        design.AddRange(d.Dehumidification.Select(h => new DesignRow(Key("dehumidification", h.AnnualPercent), Inv($"Dehumidification {h.AnnualPercent:0.#} % dew point / MCDB"))
        {
            DewPointC = h.DewPointC,
            HumidityRatio = h.HumidityRatio,
            MeanCoincidentDryBulbC = h.MeanCoincidentDryBulbC,
            Hours = h.CoincidentHours,
        }));
        design.AddRange(d.Enthalpy.Select(e => new DesignRow(Key("enthalpy", e.AnnualPercent), Inv($"Enthalpy {e.AnnualPercent:0.#} % / MCDB"))
        {
            EnthalpyJPerKg = e.EnthalpyJPerKg,
            MeanCoincidentDryBulbC = e.MeanCoincidentDryBulbC,
            Hours = e.CoincidentHours,
        }));
        var table = new ColumnSet<DesignRow>()
            .Text("condition", "Key", r => r.Key, detail: true)
            .Text("label", "Condition", r => r.Label)
            .Number("drybulb", u.Temperature, "Dry-bulb", r => r.DryBulbC)
            .Number("mean_coincident_wetbulb", u.Temperature, "MCWB", r => r.WetBulbC)
            .Number("dewpoint", u.Temperature, "Dew point", r => r.DewPointC)
            .Number("humidity_ratio", u.Moisture, "Humidity ratio", r => r.HumidityRatio)
            .Number("enthalpy", u.Enthalpy, "Enthalpy", r => r.EnthalpyJPerKg)
            .Number("mean_coincident_drybulb", u.Temperature, "MCDB", r => r.MeanCoincidentDryBulbC)
            .Number("coincident_hours", DisplayUnit.Count, "Hours averaged", r => r.Hours > 0 ? r.Hours : double.NaN)
            .Fill(new ResultTable("design") { Title = "Design conditions from this record", Layout = TableLayout.Keyed, KeyColumn = "condition" }, design);
        table.Notes.Add("Percentiles: " + DesignConditions.QuantileMethod + ".");
        table.Notes.Add(char.ToUpperInvariant(CoincidentHours.Definition[0]) + CoincidentHours.Definition[1..] + ".");
        table.Notes.Add("Dehumidification humidity ratio: at the design dew point and the site pressure.");
        doc.Add(table);

        var q = weather.Quality;
        doc.Add(new ColumnSet<KeyValuePair<string, int>>()
            .Text("what", "What", kv => kv.Key)
            .Integer("count", "Count", kv => kv.Value)
            .Text("first_occurrences", "First occurrences", kv => string.Join("; ", q.Examples.GetValueOrDefault(kv.Key)?.Take(3) ?? []))
            .Fill(new ResultTable("repairs") { Title = "Data repairs and checks", Layout = TableLayout.Keyed, KeyColumn = "what" }, q.Counts));
        doc.NoteAll(NoteKind.Note, q.Warnings);
        if (q.Counts.Count == 0)
        {
            doc.Note(NoteKind.Note, "No value was repaired and every check passed.");
        }

        doc.Note(NoteKind.Caution, Cautions.DesignConditions);
        return doc;
    }

    private static string Key(string kind, double percent) => kind + "_" + percent.ToString("0.#", CultureInfo.InvariantCulture).Replace('.', '_');

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);

    private sealed record DesignRow(string Key, string Label)
    {
        public double DryBulbC { get; init; } = double.NaN;

        public double WetBulbC { get; init; } = double.NaN;

        public double DewPointC { get; init; } = double.NaN;

        public double HumidityRatio { get; init; } = double.NaN;

        public double EnthalpyJPerKg { get; init; } = double.NaN;

        public double MeanCoincidentDryBulbC { get; init; } = double.NaN;

        public int Hours { get; init; }
    }
}
