using System.Globalization;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary>What <c>binenergy inspect</c> shows about one weather record, in display units, and its two renderings.</summary>
internal sealed class InspectReport
{
    private readonly HourlyWeather weather;
    private readonly UnitSystem units;
    private readonly string mapSource;

    public InspectReport(HourlyWeather weather, UnitSystem units, string mapSource)
    {
        this.weather = weather;
        this.units = units;
        this.mapSource = mapSource;
        Design = DesignConditions.FromRecord(weather);
        DegreeDayBaseC = Ip ? Conversions.FahrenheitToCelsius(65.0) : 18.3;
        var bases = Ip
            ? DegreeDayCurve.StandardBasesC()
            : Enumerable.Range(4, 24).Select(c => (double)c).ToArray();
        Curve = DegreeDayCurve.FromHours(weather.DryBulbC, bases);
    }

    private bool Ip => units == UnitSystem.IP;

    public DesignConditions Design { get; }

    public DegreeDayCurve Curve { get; }

    /// <summary>65 F in ip, 18.3 C in si.</summary>
    public double DegreeDayBaseC { get; }

    private double T(double c) => Ip ? Conversions.CelsiusToFahrenheit(c) : c;

    /// <summary>Degree-days in display units: F-day in ip, K-day in si.</summary>
    private double Dd(double kDays) => Ip ? kDays * 1.8 : kDays;

    private double P(double pa) => Ip ? pa / Conversions.PascalsPerPsi : pa / 1000.0;

    private double? Z(double? m) => m is double v ? (Ip ? v / Conversions.MetresPerFoot : v) : null;

    private double W(double w) => Ip ? w * Conversions.GrainsPerPound : w * 1000.0;

    public Dictionary<string, string> UnitNames => Ip
        ? new() { ["temperature"] = "F", ["degree_days"] = "F-day", ["elevation"] = "ft", ["pressure"] = "psia", ["humidity_ratio"] = "gr/lb" }
        : new() { ["temperature"] = "C", ["degree_days"] = "K-day", ["elevation"] = "m", ["pressure"] = "kPa", ["humidity_ratio"] = "g/kg" };

    public string PressureSourceText => weather.Site.PressureSource switch
    {
        SitePressureSource.StandardAtmosphereAtElevation => "standard atmosphere at the site elevation (ASHRAE Fundamentals ch. 1, eq. 3)",
        SitePressureSource.RecordMean => "mean of the record's pressure column (no elevation given)",
        _ => "sea level assumed (no elevation and no pressure column)",
    };

    public string HourlyPressureText => weather.HourlyPressureFromRecord
        ? "the pressure column of the file"
        : "the site pressure (the file has no pressure column)";

    public Dictionary<string, object?> ToJson()
    {
        var d = Design;
        var s = weather.Site;
        return new Dictionary<string, object?>
        {
            ["file"] = mapSource,
            ["site"] = s.Name,
            ["latitude"] = s.Latitude,
            ["longitude"] = s.Longitude,
            ["utc_offset_h"] = s.UtcOffsetHours,
            ["hours"] = weather.Count,
            ["period_start"] = weather.Times[0].ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture),
            ["period_end"] = weather.Times[^1].ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture),
            ["calendar"] = weather.Calendar.Note,
            ["typical_year"] = weather.Calendar.IsTypicalYear,
            ["elevation"] = Z(s.ElevationM),
            ["site_pressure"] = P(s.SitePressurePa),
            ["site_pressure_source"] = PressureSourceText,
            ["hourly_pressure_source"] = HourlyPressureText,
            ["pressure_mean"] = P(weather.PressurePa.Average()),
            ["drybulb_min"] = T(weather.DryBulbC.Min()),
            ["drybulb_mean"] = T(weather.DryBulbC.Average()),
            ["drybulb_max"] = T(weather.DryBulbC.Max()),
            ["degree_day_base"] = T(DegreeDayBaseC),
            ["heating_degree_days"] = Dd(DegreeDays.Heating(weather.DryBulbC, DegreeDayBaseC)),
            ["cooling_degree_days"] = Dd(DegreeDays.Cooling(weather.DryBulbC, DegreeDayBaseC)),
            ["degree_day_curve"] = Curve.BasesC.Select((b, i) => new Dictionary<string, double>
            {
                ["base"] = Math.Round(T(b), 6),
                ["heating"] = Dd(Curve.HeatingKDays[i]),
                ["cooling"] = Dd(Curve.CoolingKDays[i]),
            }).ToList(),
            ["heating_99_6"] = T(d.Heating996DryBulbC),
            ["heating_99"] = T(d.Heating990DryBulbC),
            ["cooling_0_4"] = T(d.Cooling[0].DryBulbC),
            ["cooling_0_4_mcwb"] = T(d.Cooling[0].MeanCoincidentWetBulbC),
            ["cooling_1"] = T(d.Cooling[1].DryBulbC),
            ["cooling_1_mcwb"] = T(d.Cooling[1].MeanCoincidentWetBulbC),
            ["cooling_2"] = T(d.Cooling[2].DryBulbC),
            ["cooling_2_mcwb"] = T(d.Cooling[2].MeanCoincidentWetBulbC),
            ["dehumidification_0_4_dewpoint"] = T(d.Dehumidification[0].DewPointC),
            ["dehumidification_0_4_mcdb"] = T(d.Dehumidification[0].MeanCoincidentDryBulbC),
            ["dehumidification_0_4_humidity_ratio"] = W(d.Dehumidification[0].HumidityRatio),
            ["dehumidification_1_dewpoint"] = T(d.Dehumidification[1].DewPointC),
            ["dehumidification_1_mcdb"] = T(d.Dehumidification[1].MeanCoincidentDryBulbC),
            ["dehumidification_1_humidity_ratio"] = W(d.Dehumidification[1].HumidityRatio),
            ["percentile_method"] = DesignConditions.QuantileMethod,
            ["coincidence_window"] = Ip ? DesignConditions.CoincidenceWindowK * 1.8 : DesignConditions.CoincidenceWindowK,
            ["repairs"] = weather.Quality.Counts.ToDictionary(kv => kv.Key, kv => kv.Value),
            ["repair_examples"] = weather.Quality.Examples.ToDictionary(kv => kv.Key, kv => kv.Value.ToList()),
            ["notes"] = weather.Quality.Warnings.ToList(),
            ["units"] = UnitNames,
        };
    }

    public void Render(IAnsiConsole console)
    {
        var u = UnitNames;
        string t = u["temperature"];
        var s = weather.Site;
        var record = new Table().Border(TableBorder.Rounded).Title("Weather record");
        record.AddColumn("Item");
        record.AddColumn("Value");
        void Row(Table table, string k, string v) => table.AddRow(Markup.Escape(k), Markup.Escape(v));
        Row(record, "File", mapSource);
        Row(record, "Site", s.Name + (s.Latitude is double la && s.Longitude is double lo ? F($"  ({la:0.###}, {lo:0.###})") : ""));
        Row(record, "Hours", weather.Count.ToString(CultureInfo.InvariantCulture) + (weather.Count == 8760 ? "" : weather.Count == 8784 ? " (leap year)" : " (not a full year: annual figures are for these hours)"));
        Row(record, "Period", F($"{weather.Times[0]:yyyy-MM-dd HH:mm} to {weather.Times[^1]:yyyy-MM-dd HH:mm} (hour-beginning, local standard time)"));
        Row(record, "Calendar", weather.Calendar.Note);
        Row(record, "UTC offset", s.UtcOffsetHours is double off ? F($"{off:+0.##;-0.##;0} h") : "not given");
        Row(record, "Elevation", Z(s.ElevationM) is double z ? F($"{z:N0} {u["elevation"]}") : "not given");
        Row(record, "Site pressure", F($"{P(s.SitePressurePa):0.000} {u["pressure"]}, {PressureSourceText}"));
        Row(record, "Hourly pressure", F($"{HourlyPressureText}; mean {P(weather.PressurePa.Average()):0.000} {u["pressure"]}"));
        console.Write(record);

        var climate = new Table().Border(TableBorder.Rounded).Title("Dry-bulb and degree-days (from the hours)");
        climate.AddColumn("Quantity");
        climate.AddColumn(new TableColumn("Value").RightAligned());
        climate.AddColumn("Unit");
        climate.AddRow("Dry-bulb min / mean / max", F($"{T(weather.DryBulbC.Min()):0.0} / {T(weather.DryBulbC.Average()):0.0} / {T(weather.DryBulbC.Max()):0.0}"), t);
        string baseText = Ip ? "65 F" : "18.3 C";
        climate.AddRow($"Heating degree-days, base {baseText}", F($"{Dd(DegreeDays.Heating(weather.DryBulbC, DegreeDayBaseC)):N0}"), u["degree_days"]);
        climate.AddRow($"Cooling degree-days, base {baseText}", F($"{Dd(DegreeDays.Cooling(weather.DryBulbC, DegreeDayBaseC)):N0}"), u["degree_days"]);
        console.Write(climate);

        var curve = new Table().Border(TableBorder.Rounded).Title("Degree-days by base (balance point)");
        curve.AddColumn(new TableColumn($"Base, {t}").RightAligned());
        curve.AddColumn(new TableColumn($"Heating, {u["degree_days"]}").RightAligned());
        curve.AddColumn(new TableColumn($"Cooling, {u["degree_days"]}").RightAligned());
        int step = Ip ? 5 : 2;
        for (int i = 0; i < Curve.BasesC.Length; i += step)
        {
            curve.AddRow(F($"{T(Curve.BasesC[i]):0}"), F($"{Dd(Curve.HeatingKDays[i]):N0}"), F($"{Dd(Curve.CoolingKDays[i]):N0}"));
        }

        console.Write(curve);

        var d = Design;
        var design = new Table().Border(TableBorder.Rounded).Title("Design conditions from this record");
        design.AddColumn("Condition");
        design.AddColumn(new TableColumn($"Value, {t}").RightAligned());
        design.AddColumn(new TableColumn($"Coincident, {t}").RightAligned());
        design.AddColumn(new TableColumn("Hours in window").RightAligned());
        design.AddRow("Heating 99.6 % dry-bulb", F($"{T(d.Heating996DryBulbC):0.0}"), "", "");
        design.AddRow("Heating 99 % dry-bulb", F($"{T(d.Heating990DryBulbC):0.0}"), "", "");
        foreach (var c in d.Cooling)
        {
            design.AddRow(F($"Cooling {c.AnnualPercent:0.#} % dry-bulb / MCWB"), F($"{T(c.DryBulbC):0.0}"), F($"{T(c.MeanCoincidentWetBulbC):0.0}"), c.CoincidentHours.ToString(CultureInfo.InvariantCulture));
        }

        foreach (var h in d.Dehumidification)
        {
            design.AddRow(F($"Dehumidification {h.AnnualPercent:0.#} % dew point / MCDB"), F($"{T(h.DewPointC):0.0} ({W(h.HumidityRatio):0.#} {u["humidity_ratio"]})"), F($"{T(h.MeanCoincidentDryBulbC):0.0}"), h.CoincidentHours.ToString(CultureInfo.InvariantCulture));
        }

        console.Write(design);
        console.WriteLine(F($"Percentiles: {DesignConditions.QuantileMethod}. Coincident means over the hours within {(Ip ? DesignConditions.CoincidenceWindowK * 1.8 : DesignConditions.CoincidenceWindowK):0.##} {(Ip ? "F" : "K")} of the design value."));

        var repairs = new Table().Border(TableBorder.Rounded).Title("Data repairs and checks");
        repairs.AddColumn("What");
        repairs.AddColumn(new TableColumn("Count").RightAligned());
        repairs.AddColumn("First occurrences");
        if (weather.Quality.Counts.Count == 0)
        {
            repairs.AddRow("none", "0", "");
        }

        foreach (var (k, v) in weather.Quality.Counts)
        {
            var examples = weather.Quality.Examples.GetValueOrDefault(k);
            repairs.AddRow(Markup.Escape(k), v.ToString(CultureInfo.InvariantCulture), Markup.Escape(examples is null ? "" : string.Join("\n", examples.Take(3))));
        }

        console.Write(repairs);
        foreach (var w in weather.Quality.Warnings)
        {
            console.WriteLine("Note: " + w);
        }

        console.WriteLine("Caution: design conditions here come from this one record; size equipment from the design data your local code adopts, with the judgement of the responsible licensed engineer.");
    }

    private static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
