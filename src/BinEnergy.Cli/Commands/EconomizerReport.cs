using System.Globalization;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Units;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary>What <c>binenergy economizer</c> shows, in display units: the controls table, the per-bin modes of the best control, the assumptions.</summary>
internal sealed class EconomizerReport(EconomizerEvaluation result, UnitSystem units, string schedule)
{
    private static readonly string[] MonthNames = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

    private bool Ip => units == UnitSystem.IP;

    private string EnergyUnit => Ip ? "kBtu" : "kWh";

    private double E(Energy e) => e.In(units);

    public IReadOnlyList<string> Assumptions => [$"occupied schedule: {schedule}", .. result.Assumptions(units)];

    public Dictionary<string, object?> ToJson()
    {
        var controls = new Dictionary<string, object?>();
        foreach (var c in result.Controls)
        {
            controls[c.Control.Name] = ControlJson(c);
        }

        return new Dictionary<string, object?>
        {
            ["site"] = result.Weather.Site.Name,
            ["hours"] = result.Weather.Count,
            ["hours_occupied"] = result.OccupiedHours,
            ["baseline"] = ControlJson(result.Baseline),
            ["controls"] = controls,
            ["bins"] = result.Bins.Select((row, b) => BinJson(row, b)).ToList(),
            ["assumptions"] = Assumptions,
            ["units"] = UnitNames(),
        };
    }

    private Dictionary<string, object?> ControlJson(EconomizerControlResult c)
    {
        var json = new Dictionary<string, object?>
        {
            ["integrated"] = c.Control.Kind == HighLimitKind.None ? null : c.Control.Integrated,
            ["rule"] = c.Control.Rule,
            ["bin"] = TotalsJson(c.Bin, c.BinSavings, c.BinSavingsPercent),
            ["hourly"] = TotalsJson(c.Hourly, c.HourlySavings, c.HourlySavingsPercent),
        };
        if (c.JointBin is not null)
        {
            json["joint_bin"] = TotalsJson(c.JointBin, c.JointBinSavings!.Value, c.JointBin.SavingsPercentAgainst(result.Baseline.JointBin!));
        }

        json["difference_pct"] = new Dictionary<string, object?>
        {
            ["coil_total"] = c.CoilDifferencePercent,
            ["savings"] = c.SavingsDifferencePercent,
        };
        json["monthly"] = c.ByMonth.Select((m, i) => new Dictionary<string, object?>
        {
            ["month"] = i + 1,
            ["coil_sensible"] = E(m.CoilSensible),
            ["coil_latent"] = E(m.CoilLatent),
            ["coil_total"] = E(m.CoilTotal),
            ["hours_free"] = m.HoursFree,
            ["hours_integrated"] = m.HoursIntegrated,
        }).ToList();
        return json;
    }

    private Dictionary<string, object?> TotalsJson(EconomizerTotals t, Energy savings, double? pct)
    {
        var json = BinTotalsJson(t);
        json["savings"] = E(savings);
        json["savings_pct"] = pct;
        return json;
    }

    private Dictionary<string, object?> BinJson(EconomizerBinRow row, int b)
    {
        var perControl = new Dictionary<string, object?>();
        foreach (var c in result.Controls.Prepend(result.Baseline))
        {
            string key = c.Control.Kind == HighLimitKind.None && ReferenceEquals(c, result.Baseline) ? "baseline" : c.Control.Name;
            perControl[key] = new Dictionary<string, object?>
            {
                ["bin"] = BinTotalsJson(c.ByBin[b]),
                ["hourly"] = BinTotalsJson(c.ByBinHourly[b]),
            };
        }

        return new Dictionary<string, object?>
        {
            ["bin_low"] = row.Low.In(units),
            ["bin_high"] = row.High.In(units),
            ["bin_mid"] = row.Mid.In(units),
            ["evaluated_drybulb"] = row.EvaluatedAt.In(units),
            ["hours_occupied"] = row.OccupiedHours,
            ["mean_humidity_ratio"] = row.OccupiedHours > 0 ? row.MeanHumidityRatio.KilogramsPerKilogram : null,
            ["enthalpy"] = row.OccupiedHours > 0 ? row.Enthalpy.In(units) : null,
            ["controls"] = perControl,
        };
    }

    private Dictionary<string, object?> BinTotalsJson(EconomizerTotals t) => new()
    {
        ["hours_no_cooling"] = t.HoursNoCooling,
        ["hours_free"] = t.HoursFree,
        ["hours_integrated"] = t.HoursIntegrated,
        ["hours_minimum"] = t.HoursMinimum,
        ["coil_sensible"] = E(t.CoilSensible),
        ["coil_latent"] = E(t.CoilLatent),
        ["coil_total"] = E(t.CoilTotal),
    };

    private Dictionary<string, string> UnitNames() => Ip
        ? new() { ["temperature"] = "F", ["energy"] = "kBtu", ["humidity_ratio"] = "lb/lb", ["enthalpy"] = "Btu/lb (dry air, 0 F datum)", ["hours"] = "h", ["savings_pct"] = "% of baseline coil energy" }
        : new() { ["temperature"] = "C", ["energy"] = "kWh", ["humidity_ratio"] = "kg/kg", ["enthalpy"] = "kJ/kg (dry air, 0 C datum)", ["hours"] = "h", ["savings_pct"] = "% of baseline coil energy" };

    public void Render(IAnsiConsole console)
    {
        console.MarkupLine(Markup.Escape($"Economizer evaluation: {result.Weather.Site.Name}, {result.OccupiedHours} occupied hours of {result.Weather.Count}"));

        var table = new Table().Border(TableBorder.Rounded).Title(Markup.Escape($"Controls against the baseline, hourly sum (coil energy in {EnergyUnit})"));
        foreach (var head in new[] { "Control", "Free h", "Integrated h", "Minimum OA h", "No cooling h", "Coil sensible", "Coil latent", "Coil total", "Savings", "Savings %" })
        {
            table.AddColumn(head == "Control" ? new TableColumn(head) : new TableColumn(head).RightAligned());
        }

        foreach (var c in result.Controls.Prepend(result.Baseline))
        {
            var t = c.Hourly;
            string name = ReferenceEquals(c, result.Baseline) ? "baseline (no economizer)" : c.Control.Describe();
            table.AddRow(Markup.Escape(name), F(t.HoursFree, 0), F(t.HoursIntegrated, 0), F(t.HoursMinimum, 0), F(t.HoursNoCooling, 0),
                F(E(t.CoilSensible), 0), F(E(t.CoilLatent), 0), F(E(t.CoilTotal), 0), Signed(E(c.HourlySavings)), Pct(c.HourlySavingsPercent));
        }

        console.Write(table);

        var methods = new Table().Border(TableBorder.Rounded).Title(Markup.Escape($"Bin method against the hourly sum (coil energy in {EnergyUnit})"));
        methods.AddColumn("Control");
        var heads = new List<string> { "Coil total, bin", "Coil total, hourly", "Difference %", "Savings, bin", "Savings, hourly", "Savings % bin", "Savings % hourly" };
        if (result.HasJointBins)
        {
            heads.AddRange(["Savings, joint bins", "Savings % joint"]);
        }

        foreach (var head in heads)
        {
            methods.AddColumn(new TableColumn(head).RightAligned());
        }

        foreach (var c in result.Controls.Prepend(result.Baseline))
        {
            string name = ReferenceEquals(c, result.Baseline) ? "baseline (no economizer)" : c.Control.Describe();
            var cells = new List<string>
            {
                Markup.Escape(name), F(E(c.Bin.CoilTotal), 0), F(E(c.Hourly.CoilTotal), 0), Pct(c.CoilDifferencePercent),
                Signed(E(c.BinSavings)), Signed(E(c.HourlySavings)), Pct(c.BinSavingsPercent), Pct(c.HourlySavingsPercent),
            };
            if (result.HasJointBins)
            {
                cells.Add(Signed(E(c.JointBinSavings!.Value)));
                cells.Add(Pct(c.JointBin!.SavingsPercentAgainst(result.Baseline.JointBin!)));
            }

            methods.AddRow([.. cells]);
        }

        console.Write(methods);
        if (result.Controls.Any(c => c.HourlySavings.Joules < 0 || c.BinSavings.Joules < 0))
        {
            console.WriteLine("Negative savings: that control adds coil energy, because it lets in outdoor air that is cooler but more humid (higher enthalpy) than the return air.");
        }

        RenderBins(console, result.Best);
        RenderMonths(console, result.Best);

        console.WriteLine("Assumptions:");
        foreach (var a in Assumptions)
        {
            console.WriteLine("  - " + a);
        }

        console.WriteLine("Results are estimates for comparing options. The energy code adopted locally governs which economizer controls and high limits are allowed; " +
            "the minimum outdoor airflow must meet the local ventilation code and the judgement of the responsible licensed engineer.");
    }

    private void RenderBins(IAnsiConsole console, EconomizerControlResult best)
    {
        string tu = Ip ? "F" : "C";
        var table = new Table().Border(TableBorder.Rounded)
            .Title(Markup.Escape($"Modes by bin, best control: {best.Control.Describe()} (hourly hours per mode; bin method's mode at the bin state)"));
        foreach (var head in new[] { $"Bin ({tu})", "Occupied h", Ip ? "Mean W (gr/lb)" : "Mean W (g/kg)", Ip ? "h (Btu/lb)" : "h (kJ/kg)", "Free h", "Integrated h", "Minimum OA h", "No cooling h", "Bin-method mode", $"Coil, hourly ({EnergyUnit})", $"Coil, bin ({EnergyUnit})" })
        {
            table.AddColumn(head.StartsWith("Bin (", StringComparison.Ordinal) || head == "Bin-method mode" ? new TableColumn(head) : new TableColumn(head).RightAligned());
        }

        for (int b = 0; b < result.Bins.Count; b++)
        {
            var row = result.Bins[b];
            if (row.OccupiedHours == 0)
            {
                continue;
            }

            var h = best.ByBinHourly[b];
            var m = best.ByBin[b];
            double w = row.MeanHumidityRatio.KilogramsPerKilogram * (Ip ? Conversions.GrainsPerPound : 1000.0);
            table.AddRow(Inv($"{row.Low.In(units):0.#} to {row.High.In(units):0.#}"), F(row.OccupiedHours, 0), F(w, Ip ? 0 : 1), F(row.Enthalpy.In(units), 1),
                F(h.HoursFree, 0), F(h.HoursIntegrated, 0), F(h.HoursMinimum, 0), F(h.HoursNoCooling, 0), ModeName(m),
                F(E(h.CoilTotal), 0), F(E(m.CoilTotal), 0));
        }

        console.Write(table);
    }

    private void RenderMonths(IAnsiConsole console, EconomizerControlResult best)
    {
        var table = new Table().Border(TableBorder.Rounded).Title(Markup.Escape($"Coil energy by month, hourly sum ({EnergyUnit})"));
        table.AddColumn("Month");
        table.AddColumn(new TableColumn("Baseline").RightAligned());
        table.AddColumn(new TableColumn(Markup.Escape(best.Control.Describe())).RightAligned());
        table.AddColumn(new TableColumn("Savings").RightAligned());
        for (int m = 0; m < 12; m++)
        {
            var b = result.Baseline.ByMonth[m];
            var c = best.ByMonth[m];
            if (b.Hours == 0)
            {
                continue;
            }

            table.AddRow(MonthNames[m], F(E(b.CoilTotal), 0), F(E(c.CoilTotal), 0), Signed(E(c.SavingsAgainst(b))));
        }

        console.Write(table);
    }

    private static string ModeName(EconomizerTotals t) =>
        t.HoursFree > 0 ? "free cooling"
        : t.HoursIntegrated > 0 ? "integrated"
        : t.HoursMinimum > 0 ? "minimum OA"
        : "no cooling";

    private static string Pct(double? v) => v is double d ? Inv($"{d:+0.0;-0.0;0.0}") : "n/a";

    private static string Signed(double v) => v.ToString("+#,0;-#,0;0", CultureInfo.InvariantCulture);

    private static string F(double v, int digits) => v.ToString("N" + digits, CultureInfo.InvariantCulture);

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
