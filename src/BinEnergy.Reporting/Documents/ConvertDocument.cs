using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy convert</c> shows: the record written in the open layout and its repairs.</summary>
public static class ConvertDocument
{
    /// <summary>The document of a record written to <paramref name="outPath"/>.</summary>
    public static ResultDocument Build(HourlyWeather weather, string outPath)
    {
        var doc = new ResultDocument($"Wrote {weather.Count} hours of {weather.Site.Name} to {outPath} in the open layout");
        doc.Add(new ColumnSet<HourlyWeather>()
            .Text("out", "Written to", _ => outPath)
            .Integer("hours", "Hours", w => w.Count)
            .Text("calendar", "Calendar", w => w.Calendar.Note)
            .Integer("repairs", "Repaired values", w => w.Quality.TotalRepairs)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record, ShowInTerminal = false }, [weather]));
        doc.Add(new ColumnSet<KeyValuePair<string, int>>()
            .Text("what", "What", kv => kv.Key)
            .Integer("count", "Count", kv => kv.Value)
            .Fill(new ResultTable("repair_counts") { ShowInTerminal = false }, weather.Quality.Counts));
        doc.Note(NoteKind.Note, $"{weather.Quality.TotalRepairs} repairs counted; see binenergy inspect.");
        return doc;
    }
}
