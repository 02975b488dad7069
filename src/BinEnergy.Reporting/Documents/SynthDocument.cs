using System.Globalization;
using BinEnergy.Core.Weather.Synthesis;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Text;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy synth</c> shows: the monthly statistics asked for beside those the synthesized year has.</summary>
public static class SynthDocument
{
    /// <summary>How far a month may miss its mean daily maximum or minimum before the command warns, K.</summary>
    public const double ExtremeToleranceK = 0.5;

    /// <summary>How far a month may miss its daily range, K.</summary>
    public const double RangeToleranceK = 1.0;

    /// <summary>How far a month may miss its mean dew point, K.</summary>
    public const double DewPointToleranceK = 0.5;

    /// <summary>The document of a synthesized year written to <paramref name="outPath"/>.</summary>
    public static ResultDocument Build(SynthesisResult r, MonthlyClimate climate, string outPath, DisplayUnits u)
    {
        var doc = new ResultDocument($"{climate.Name}: a synthesized year");
        doc.Add(new ColumnSet<SynthesisResult>()
            .Text("out", "Written to", _ => outPath)
            .Integer("hours", "Hours", x => x.Weather.Count)
            .Text("seed", "Seed", x => x.Seed.ToString(CultureInfo.InvariantCulture))
            .Integer("year", "Calendar year", x => x.Weather.Calendar.Year)
            .Number("station_pressure", u.Pressure, "Station pressure (standard atmosphere at the elevation)", x => x.Weather.Site.SitePressurePa)
            .Number("elevation", u.Length, "Elevation", _ => climate.ElevationM)
            .Integer("temperature_passes", "Correction passes, dry-bulb", x => x.TemperaturePasses)
            .Integer("dewpoint_passes", "Correction passes, dew point", x => x.DewPointPasses)
            .Integer("range_floored_days", "Days whose range was raised to the minimum", x => x.RangeFlooredDays)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Title = "Written", Layout = TableLayout.Record }, [r]));
        doc.Add(new ColumnSet<MonthCheck>()
            .Integer("month", "Month", m => m.Month)
            .Number("drybulb_max_target", u.Temperature, "Max asked", m => m.TargetMaxC)
            .Number("drybulb_max", u.Temperature, "Max made", m => m.MaxC)
            .Number("drybulb_min_target", u.Temperature, "Min asked", m => m.TargetMinC)
            .Number("drybulb_min", u.Temperature, "Min made", m => m.MinC)
            .Number("range_target", u.TemperatureDifference.WithFormat("0.0"), "Range asked", m => m.TargetRangeK)
            .Number("range", u.TemperatureDifference.WithFormat("0.0"), "Range made", m => m.RangeK)
            .Number("dewpoint_target", u.Temperature, "Dew point asked", m => m.TargetDewPointC)
            .Number("dewpoint", u.Temperature, "Dew point made", m => m.DewPointC)
            .Number("spread_target", u.TemperatureDifference.WithFormat("0.0"), "Spread asked", m => m.TargetSpreadK)
            .Number("spread", u.TemperatureDifference.WithFormat("0.0"), "Spread made", m => m.SpreadK)
            .Fill(new ResultTable("months") { Title = "Monthly statistics asked for and made" }, r.Months));

        string d = u.TemperatureDifference.Symbol;
        doc.Note(NoteKind.Note, string.Create(CultureInfo.InvariantCulture,
            $"Wrote {outPath}: {r.Weather.Count:N0} hours of {r.Weather.Calendar.Year}, seed {r.Seed}, station pressure {DisplayUnits.Text(u.Pressure, r.Weather.Site.SitePressurePa)} (standard atmosphere at {DisplayUnits.Text(u.Length, climate.ElevationM)})."));
        doc.Note(NoteKind.Note, string.Create(CultureInfo.InvariantCulture,
            $"The sample was corrected toward the monthly targets; largest monthly errors {u.TemperatureDifference.FromSi(r.WorstExtremeErrorK):0.000} {d} (max/min), {u.TemperatureDifference.FromSi(r.WorstRangeErrorK):0.000} {d} (range), {u.TemperatureDifference.FromSi(r.WorstDewPointErrorK):0.000} {d} (dew point). The spread is not corrected."));
        if (r.RangeFlooredDays > 0)
        {
            doc.Note(NoteKind.Note, string.Create(CultureInfo.InvariantCulture, $"Repaired: {r.RangeFlooredDays} days drawn with a daily range under {WeatherSynthesizer.MinDailyRangeK} K were raised to it."));
        }

        if (r.WorstExtremeErrorK > ExtremeToleranceK || r.WorstRangeErrorK > RangeToleranceK || r.WorstDewPointErrorK > DewPointToleranceK)
        {
            doc.Note(NoteKind.Warning, "The synthesized year misses its monthly targets by more than 0.5 K (max, min, dew point) or 1 K (range); check the monthly file (a dew point close to the daily minimum cannot always be met).");
        }

        doc.Note(NoteKind.Caution, Cautions.InventedWeather);
        return doc;
    }
}
