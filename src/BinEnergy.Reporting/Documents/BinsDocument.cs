using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy bins</c> shows: the dry-bulb bin table, split by month or time of day, or joint with humidity.</summary>
public static class BinsDocument
{
    /// <summary>The document of a bin table.</summary>
    /// <param name="weather">The record.</param>
    /// <param name="table">Its dry-bulb bins with the schedule's occupancy.</param>
    /// <param name="schedule">The schedule's text.</param>
    /// <param name="u">Display units.</param>
    /// <param name="source">The weather file and how it was read.</param>
    /// <param name="split">The split (name and groups), or null.</param>
    /// <param name="joint">Joint dry-bulb x humidity bins, or null.</param>
    public static ResultDocument Build(HourlyWeather weather, BinTable table, string schedule, DisplayUnits u, string source,
        (string Name, IReadOnlyList<BinGroup> Groups)? split = null, JointBinTable? joint = null)
    {
        var doc = new ResultDocument(Inv($"Dry-bulb bins of {table.Scale.Width:0.##} {u.TemperatureDifference.Symbol}: {weather.Site.Name}"))
        {
            CsvTable = joint is not null ? "joint" : split is not null ? "groups" : "bins",
        };
        doc.Add(new ColumnSet<BinTable>()
            .Text("file", "File", _ => source)
            .Text("site", "Site", _ => weather.Site.Name)
            .Integer("hours", "Hours", t => t.Hours)
            .Integer("hours_occupied", "Occupied", t => t.OccupiedHours)
            .Integer("hours_unoccupied", "Unoccupied", t => t.UnoccupiedHours)
            .Number("bin_width", u.TemperatureDifference, "Bin width", t => t.Scale.WidthDifference.Kelvin)
            .Text("schedule", "Schedule", _ => schedule)
            .Text("calendar", "Calendar", _ => weather.Calendar.Note)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Title = "Record and schedule", Layout = TableLayout.Record, ShowInTerminal = false }, [table]));

        var bins = new ColumnSet<BinRow>()
            .Number("bin_low", u.Temperature, "Bin from", r => r.Low.Celsius)
            .Number("bin_high", u.Temperature, "to", r => r.High.Celsius)
            .Number("bin_mid", u.Temperature, "Mid", r => r.Mid.Celsius, detail: true)
            .Add(Statistics(u), r => (r.All, r.Occupied, r.Unoccupied));
        doc.Add(bins.Fill(new ResultTable("bins") { Title = doc.Title, ShowInTerminal = split is null && joint is null }, table.Rows));

        if (split is var (name, groups))
        {
            var labels = groups.Select(g => name == "month" ? g.Key.ToString(CultureInfo.InvariantCulture) : g.Label).ToList();
            doc.Add(new ColumnSet<(string Group, BinRow Row)>()
                .Text(name, name == "month" ? "Month" : "Block", x => x.Group)
                .Add(bins, x => x.Row)
                .Fill(new ResultTable("groups") { ShowInTerminal = false }, groups.SelectMany((g, i) => g.Table.Rows.Select(r => (labels[i], r)))));
            var grid = new ColumnSet<int>()
                .Number("bin_low", u.Temperature, "Bin from", b => table.Rows[b].Low.Celsius)
                .Number("bin_high", u.Temperature, "to", b => table.Rows[b].High.Celsius);
            for (int g = 0; g < groups.Count; g++)
            {
                var group = groups[g];
                grid.Integer(ColumnName(name, group), group.Label, b => group.Table.Rows[b].All.Hours);
            }

            grid.Integer("all", "All", b => table.Rows[b].All.Hours);
            var hours = grid.Fill(new ResultTable("hours_by_" + name) { Title = Inv($"Hours per {table.Scale.Width:0.##} {u.TemperatureDifference.Symbol} bin and {name}: {weather.Site.Name}") },
                Enumerable.Range(0, table.Rows.Count));
            hours.Notes.Add("Means per group: use --json or --csv.");
            doc.Add(hours);
        }

        if (joint is not null)
        {
            doc.Add(new ColumnSet<JointBinCell>()
                .Number("bin_low", u.Temperature, "Bin from", c => c.DryBulbLow.Celsius)
                .Number("bin_high", u.Temperature, "to", c => c.DryBulbHigh.Celsius)
                .Number("bin_mid", u.Temperature, "Mid", c => c.DryBulbMid.Celsius)
                .Number("humidity_ratio_low", u.Moisture, "Humidity ratio from", c => c.HumidityLow.KilogramsPerKilogram)
                .Number("humidity_ratio_high", u.Moisture, "to", c => c.HumidityHigh.KilogramsPerKilogram)
                .Add(Statistics(u), c => (c.All, c.Occupied, c.Unoccupied))
                .Fill(new ResultTable("joint") { ShowInTerminal = false }, joint.Cells));
            var columns = joint.Cells.Select(c => c.HumidityIndex).Distinct().Order().ToList();
            var grid = new ColumnSet<BinRow>()
                .Number("bin_low", u.Temperature, "Bin from", r => r.Low.Celsius)
                .Number("bin_high", u.Temperature, "to", r => r.High.Celsius);
            foreach (int j in columns)
            {
                string label = Inv($"{u.Moisture.FromSi(joint.HumidityScale.Low(j).KilogramsPerKilogram):0.##}-{u.Moisture.FromSi(joint.HumidityScale.High(j).KilogramsPerKilogram):0.##}");
                grid.Integer("hours_w" + j.ToString(CultureInfo.InvariantCulture), label,
                    r => joint.Cells.FirstOrDefault(x => x.DryBulbIndex == r.Index && x.HumidityIndex == j)?.All.Hours ?? 0);
            }

            var hours = grid.Fill(new ResultTable("joint_hours")
            {
                Title = $"Hours per dry-bulb bin ({u.Temperature.Symbol}, rows) and humidity-ratio bin ({u.Moisture.Symbol}, columns): {weather.Site.Name}",
            }, table.Rows);
            hours.Notes.Add("Cell means (dry-bulb, humidity ratio, wet-bulb, enthalpy) per occupancy class: use --json or --csv.");
            doc.Add(hours);
        }

        doc.Note(NoteKind.Note, Inv($"Hours: {table.Hours} ({weather.Calendar.Note}). Occupied: {table.OccupiedHours}, unoccupied: {table.UnoccupiedHours}; schedule \"{schedule}\"."));
        doc.Note(NoteKind.Note, "Bins sit on multiples of the width, lower edge inclusive (50 F belongs to 50-55 F). Means are over the bin's hours; the mean coincident wet-bulb (MCWB) is the mean of the hourly wet-bulbs.");
        doc.Note(NoteKind.Note, $"Enthalpy in {u.Enthalpy.Symbol} of dry air on the {u.EnthalpyDatum} datum.");
        return doc;
    }

    /// <summary>Hours and means of a bin or cell: all hours, then the occupied and unoccupied means (in the data, not the terminal).</summary>
    private static ColumnSet<(BinStatistics All, BinStatistics Occupied, BinStatistics Unoccupied)> Statistics(DisplayUnits u)
    {
        var set = new ColumnSet<(BinStatistics All, BinStatistics Occupied, BinStatistics Unoccupied)>()
            .Integer("hours", "Hours", s => s.All.Hours)
            .Integer("hours_occupied", "Occupied", s => s.Occupied.Hours)
            .Integer("hours_unoccupied", "Unoccupied", s => s.Unoccupied.Hours)
            .Add(Means(u, string.Empty, string.Empty, false), s => s.All);
        return set
            .Add(Means(u, "occupied_", "Occupied ", true), s => s.Occupied)
            .Add(Means(u, "unoccupied_", "Unoccupied ", true), s => s.Unoccupied);
    }

    private static ColumnSet<BinStatistics> Means(DisplayUnits u, string prefix, string label, bool detail) => new ColumnSet<BinStatistics>()
        .Number(prefix + "mean_drybulb", u.Temperature, label + "Mean dry-bulb", s => s.MeanDryBulb.Celsius, detail)
        .Number(prefix + "mean_humidity_ratio", u.Moisture, label + "Mean W", s => s.MeanHumidityRatio.KilogramsPerKilogram, detail)
        .Number(prefix + "mean_coincident_wetbulb", u.Temperature, label + "MCWB", s => s.MeanWetBulb.Celsius, detail)
        .Number(prefix + "mean_enthalpy", u.Enthalpy, label + "Mean h", s => s.MeanEnthalpy.JoulesPerKilogram, detail);

    private static string ColumnName(string split, BinGroup group) => split == "month"
        ? CultureInfo.InvariantCulture.DateTimeFormat.GetAbbreviatedMonthName(group.Key).ToLowerInvariant()
        : "block_" + new string(group.Label.Select(c => char.IsAsciiDigit(c) ? c : '_').ToArray()).Trim('_');

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
