using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using CsvHelper;
using Spectre.Console;
using static BinEnergy.Cli.Commands.DisplayValues;

namespace BinEnergy.Cli.Commands;

/// <summary>What <c>binenergy bins</c> shows: the bin table (whole, split, or joint) in display units, as a terminal table, CSV or JSON.</summary>
internal sealed class BinsReport(HourlyWeather weather, BinTable table, OccupancySchedule schedule, UnitSystem units, string source)
{
    /// <summary>The CSV columns of the dry-bulb table, in order (the command's contract).</summary>
    public static readonly string[] CsvColumns =
        ["bin_low", "bin_high", "bin_mid", "hours", "hours_occupied", "hours_unoccupied", "mean_drybulb", "mean_humidity_ratio", "mean_coincident_wetbulb", "mean_enthalpy"];

    private readonly DisplayValues d = new(units);

    public IReadOnlyList<BinGroup>? Groups { get; init; }

    public string SplitName { get; init; } = "month";

    public JointBinTable? Joint { get; init; }

    public Dictionary<string, string> UnitNames => new()
    {
        ["temperature"] = d.TemperatureUnit,
        ["bin_width"] = d.Ip ? "F" : "K",
        ["humidity_ratio"] = d.HumidityRatioUnit,
        ["enthalpy"] = d.EnthalpyUnit + (d.Ip ? " (dry air, 0 F datum)" : " (dry air, 0 C datum)"),
        ["humidity_width"] = d.HumidityReadableUnit,
    };

    public string ToCsv()
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        using (var csv = CsvWriter.Create(text, new CsvWriterOptions { NewLine = "\n", FormatProvider = CultureInfo.InvariantCulture }, leaveOpen: true))
        {
            string? group = Groups is null ? null : SplitName;
            if (group is not null)
            {
                csv.WriteField(group);
            }

            if (Joint is not null)
            {
                foreach (var c in (string[])["bin_low", "bin_high", "bin_mid", "humidity_ratio_low", "humidity_ratio_high"])
                {
                    csv.WriteField(c);
                }

                foreach (var c in CsvColumns.Skip(3))
                {
                    csv.WriteField(c);
                }

                csv.EndRecord();
                foreach (var cell in Joint.Cells)
                {
                    WriteNumbers(csv, [d.T(cell.DryBulbLow), d.T(cell.DryBulbHigh), d.T(cell.DryBulbMid), d.W(cell.HumidityLow), d.W(cell.HumidityHigh)]);
                    WriteStats(csv, cell.All, cell.Occupied, cell.Unoccupied);
                    csv.EndRecord();
                }
            }
            else
            {
                foreach (var c in CsvColumns)
                {
                    csv.WriteField(c);
                }

                csv.EndRecord();
                foreach (var (label, t) in Tables())
                {
                    foreach (var row in t.Rows)
                    {
                        if (group is not null)
                        {
                            csv.WriteField(label);
                        }

                        WriteNumbers(csv, [d.T(row.Low), d.T(row.High), d.T(row.Mid)]);
                        WriteStats(csv, row.All, row.Occupied, row.Unoccupied);
                        csv.EndRecord();
                    }
                }
            }
        }

        return text.ToString();
    }

    public Dictionary<string, object?> ToJson()
    {
        var json = new Dictionary<string, object?>
        {
            ["file"] = source,
            ["site"] = weather.Site.Name,
            ["hours"] = table.Hours,
            ["hours_occupied"] = table.OccupiedHours,
            ["hours_unoccupied"] = table.UnoccupiedHours,
            ["bin_width"] = table.Scale.Width,
            ["bin_rule"] = "bins on multiples of the width, lower edge inclusive; temperatures rounded to 1e-6 of the display unit first",
            ["schedule"] = schedule.Text,
            ["calendar"] = weather.Calendar.Note,
            ["bins"] = table.Rows.Select(BinJson).ToList(),
        };
        if (Groups is not null)
        {
            json["split"] = SplitName;
            json["groups"] = Groups.Select(g => new Dictionary<string, object?>
            {
                [SplitName] = SplitName == "month" ? g.Key : g.Label,
                ["hours"] = g.Table.Hours,
                ["bins"] = g.Table.Rows.Select(BinJson).ToList(),
            }).ToList();
        }

        if (Joint is not null)
        {
            json["humidity_width"] = Joint.HumidityScale.Width;
            json["joint"] = Joint.Cells.Select(c =>
            {
                var j = new Dictionary<string, object?>
                {
                    ["bin_low"] = d.T(c.DryBulbLow),
                    ["bin_high"] = d.T(c.DryBulbHigh),
                    ["bin_mid"] = d.T(c.DryBulbMid),
                    ["humidity_ratio_low"] = d.W(c.HumidityLow),
                    ["humidity_ratio_high"] = d.W(c.HumidityHigh),
                };
                AddStats(j, c.All, c.Occupied, c.Unoccupied);
                return j;
            }).ToList();
        }

        json["units"] = UnitNames;
        return json;
    }

    public void Render(IAnsiConsole console)
    {
        string t = d.TemperatureUnit;
        if (Joint is not null)
        {
            RenderJoint(console);
        }
        else if (Groups is not null)
        {
            RenderGroups(console);
        }
        else
        {
            var grid = new Table().Border(TableBorder.Rounded)
                .Title(Markup.Escape(F($"Dry-bulb bins of {table.Scale.Width:0.##} {(d.Ip ? "F" : "K")}: {weather.Site.Name}")));
            grid.AddColumn($"Bin, {t}");
            foreach (var c in (string[])["Mid", "Hours", "Occupied", "Unoccupied", $"Mean dry-bulb, {t}", $"Mean W, {d.HumidityReadableUnit}", $"MCWB, {t}", $"Mean h, {d.EnthalpyUnit}"])
            {
                grid.AddColumn(new TableColumn(Markup.Escape(c)).RightAligned());
            }

            foreach (var r in table.Rows)
            {
                grid.AddRow(Edges(r.Low, r.High), F(d.T(r.Mid), "0.#"), I(r.All.Hours), I(r.Occupied.Hours), I(r.Unoccupied.Hours),
                    F(d.T(r.All.MeanDryBulb), "0.0"), r.All.IsEmpty ? "" : F(d.WReadable(r.All.MeanHumidityRatio), d.Ip ? "0.0" : "0.00"),
                    F(d.T(r.All.MeanWetBulb), "0.0"), F(d.H(r.All.MeanEnthalpy), "0.00"));
            }

            grid.AddRow("[bold]Total[/]", "", I(table.Hours), I(table.OccupiedHours), I(table.UnoccupiedHours), "", "", "", "");
            console.Write(grid);
        }

        console.WriteLine(F($"Hours: {table.Hours} ({weather.Calendar.Note}). Occupied: {table.OccupiedHours}, unoccupied: {table.UnoccupiedHours}; schedule \"{schedule.Text}\"."));
        console.WriteLine("Bins sit on multiples of the width, lower edge inclusive (50 F belongs to 50-55 F). Means are over the bin's hours; the mean coincident wet-bulb (MCWB) is the mean of the hourly wet-bulbs.");
        if (d.Ip)
        {
            console.WriteLine("Enthalpy in Btu/lb of dry air on the 0 F datum.");
        }
    }

    private IEnumerable<(string Label, BinTable Table)> Tables() =>
        Groups is null ? [("", table)] : Groups.Select(g => (SplitName == "month" ? g.Key.ToString(CultureInfo.InvariantCulture) : g.Label, g.Table));

    private void RenderGroups(IAnsiConsole console)
    {
        var grid = new Table().Border(TableBorder.Rounded)
            .Title(Markup.Escape(F($"Hours per {table.Scale.Width:0.##} {(d.Ip ? "F" : "K")} bin and {SplitName}: {weather.Site.Name}")));
        grid.AddColumn($"Bin, {d.TemperatureUnit}");
        foreach (var g in Groups!)
        {
            grid.AddColumn(new TableColumn(Markup.Escape(g.Label)).RightAligned());
        }

        grid.AddColumn(new TableColumn("All").RightAligned());
        for (int b = 0; b < table.Rows.Count; b++)
        {
            var cells = new List<string> { Edges(table.Rows[b].Low, table.Rows[b].High) };
            cells.AddRange(Groups!.Select(g => I(g.Table.Rows[b].All.Hours)));
            cells.Add(I(table.Rows[b].All.Hours));
            grid.AddRow(cells.ToArray());
        }

        var totals = new List<string> { "[bold]Total[/]" };
        totals.AddRange(Groups!.Select(g => I(g.Table.Hours)));
        totals.Add(I(table.Hours));
        grid.AddRow(totals.ToArray());
        console.Write(grid);
        console.WriteLine("Means per group: use --json or --csv.");
    }

    private void RenderJoint(IAnsiConsole console)
    {
        var j = Joint!;
        var columns = j.Cells.Select(c => c.HumidityIndex).Distinct().Order().ToList();
        var grid = new Table().Border(TableBorder.Rounded)
            .Title(Markup.Escape(F($"Hours per dry-bulb bin ({d.TemperatureUnit}, rows) and humidity-ratio bin ({d.HumidityReadableUnit}, columns): {weather.Site.Name}")));
        grid.AddColumn($"Bin, {d.TemperatureUnit}");
        foreach (int c in columns)
        {
            var low = j.HumidityScale.Low(c);
            var high = j.HumidityScale.High(c);
            grid.AddColumn(new TableColumn(F($"{d.WReadable(low):0.##}-{d.WReadable(high):0.##}")).RightAligned());
        }

        foreach (var row in table.Rows)
        {
            var cells = new List<string> { Edges(row.Low, row.High) };
            foreach (int c in columns)
            {
                var cell = j.Cells.FirstOrDefault(x => x.DryBulbIndex == row.Index && x.HumidityIndex == c);
                cells.Add(cell is null ? "" : I(cell.All.Hours));
            }

            grid.AddRow(cells.ToArray());
        }

        console.Write(grid);
        console.WriteLine("Cell means (dry-bulb, humidity ratio, wet-bulb, enthalpy) per occupancy class: use --json or --csv.");
    }

    private Dictionary<string, object?> BinJson(BinRow r)
    {
        var j = new Dictionary<string, object?>
        {
            ["bin_low"] = d.T(r.Low),
            ["bin_high"] = d.T(r.High),
            ["bin_mid"] = d.T(r.Mid),
        };
        AddStats(j, r.All, r.Occupied, r.Unoccupied);
        return j;
    }

    private void AddStats(Dictionary<string, object?> j, BinStatistics all, BinStatistics occupied, BinStatistics unoccupied)
    {
        j["hours"] = all.Hours;
        j["hours_occupied"] = occupied.Hours;
        j["hours_unoccupied"] = unoccupied.Hours;
        Means(j, all);
        j["occupied"] = Means([], occupied);
        j["unoccupied"] = Means([], unoccupied);
    }

    private Dictionary<string, object?> Means(Dictionary<string, object?> j, BinStatistics s)
    {
        j["mean_drybulb"] = d.T(s.MeanDryBulb);
        j["mean_humidity_ratio"] = d.W(s.MeanHumidityRatio);
        j["mean_coincident_wetbulb"] = d.T(s.MeanWetBulb);
        j["mean_enthalpy"] = d.H(s.MeanEnthalpy);
        return j;
    }

    private void WriteStats(CsvWriter csv, BinStatistics all, BinStatistics occupied, BinStatistics unoccupied)
    {
        csv.WriteField(I(all.Hours));
        csv.WriteField(I(occupied.Hours));
        csv.WriteField(I(unoccupied.Hours));
        WriteNumbers(csv, [d.T(all.MeanDryBulb), d.W(all.MeanHumidityRatio), d.T(all.MeanWetBulb), d.H(all.MeanEnthalpy)]);
    }

    /// <summary>Numbers at a fixed precision (a millionth of the display unit; W to 1e-7), empty for an empty bin.</summary>
    private static void WriteNumbers(CsvWriter csv, double?[] values)
    {
        foreach (var v in values)
        {
            csv.WriteField(v is double x ? Math.Round(x, 7).ToString("0.#######", CultureInfo.InvariantCulture) : "");
        }
    }

    private string Edges(Temperature low, Temperature high) => F($"{d.T(low):0.##} to {d.T(high):0.##}");

    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
