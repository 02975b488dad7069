using System.Globalization;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using Spectre.Console;
using static BinEnergy.Cli.Commands.DisplayValues;

namespace BinEnergy.Cli.Commands;

/// <summary>What <c>binenergy outdoor-air</c> shows: loads per bin, annual totals by both methods, peaks, assumptions.</summary>
internal sealed class OutdoorAirReport(HourlyWeather weather, OutdoorAirResult result, UnitSystem units, string source, bool noSchedule)
{
    /// <summary>The annual figures and their JSON names (the command's contract).</summary>
    public static readonly (LoadFigure Figure, string Key, string Label)[] Figures =
    [
        (LoadFigure.Heating, "heating", "Heating"),
        (LoadFigure.CoolingSensible, "cooling_sensible", "Cooling, sensible"),
        (LoadFigure.CoolingLatent, "cooling_latent", "Cooling, latent"),
        (LoadFigure.Humidification, "humidification", "Humidification"),
        (LoadFigure.RecoveredHeating, "recovered_heating", "Recovered heating"),
        (LoadFigure.RecoveredCooling, "recovered_cooling", "Recovered cooling"),
        (LoadFigure.FanEnergy, "fan_energy", "Recovery fan energy"),
    ];

    /// <summary>The cautions every output carries (DESIGN 13).</summary>
    public static readonly string[] Cautions =
    [
        "Results are estimates for comparing options, not a design calculation.",
        "The outdoor airflow must meet the ventilation code adopted locally and the judgement of the responsible licensed engineer; reducing outdoor air below the required minimum harms occupants.",
    ];

    private readonly DisplayValues d = new(units);

    private OutdoorAirAssumptions A => result.Assumptions;

    public Dictionary<string, string> UnitNames => new()
    {
        ["energy"] = d.EnergyUnit,
        ["power"] = d.PowerUnit,
        ["temperature"] = d.TemperatureUnit,
        ["humidity_ratio"] = d.HumidityRatioUnit,
        ["airflow"] = d.FlowUnit,
        ["dry_air_density"] = d.Ip ? "lb/ft3" : "kg/m3",
        ["sensible_factor"] = d.Ip ? "Btu/(h cfm F)" : "W/(L/s K)",
        ["pressure"] = d.Ip ? "psia" : "kPa",
        ["recovery_pressure"] = d.Ip ? "in. w.c." : "Pa",
        ["difference_pct"] = "% (bin minus hourly, of hourly)",
    };

    public Dictionary<string, object?> ToJson()
    {
        var json = new Dictionary<string, object?>
        {
            ["file"] = source,
            ["site"] = weather.Site.Name,
            ["hours"] = weather.Count,
            ["bin"] = Totals(result.Bin),
            ["hourly"] = Totals(result.Hourly),
            ["difference_pct"] = Figures.ToDictionary(f => f.Key, f => result.DifferencePercent(f.Figure)),
        };
        if (result.JointBin is not null)
        {
            json["joint_bin"] = Totals(result.JointBin);
            json["joint_difference_pct"] = Figures.ToDictionary(f => f.Key, f => result.JointDifferencePercent(f.Figure));
        }

        json["peaks"] = result.Peaks is null ? null : new Dictionary<string, object?>
        {
            ["heating"] = Peak(result.Peaks.Heating),
            ["cooling"] = Peak(result.Peaks.Cooling),
            ["dehumidification"] = Peak(result.Peaks.Dehumidification),
            ["method"] = result.Peaks.Method,
        };
        json["bins"] = result.Bins.Select(b =>
        {
            var row = new Dictionary<string, object?>
            {
                ["bin_low"] = d.T(b.Bin.Low),
                ["bin_high"] = d.T(b.Bin.High),
                ["bin_mid"] = d.T(b.Bin.Mid),
                ["evaluated_drybulb"] = d.T(b.EvaluatedAt),
                ["hours_ventilated"] = b.HoursVentilated,
                ["mean_humidity_ratio"] = d.W(b.MeanHumidityRatio),
            };
            foreach (var (figure, key, _) in Figures)
            {
                row[key] = d.E(b.BinMethod.Get(figure));
            }

            row["hourly"] = Totals(b.Hourly);
            return row;
        }).ToList();
        json["months"] = result.Months.Select(m =>
        {
            var row = new Dictionary<string, object?> { ["month"] = m.Month };
            foreach (var (k, v) in Totals(m.Totals))
            {
                row[k] = v;
            }

            return row;
        }).ToList();
        json["assumptions"] = Assumptions();
        json["warnings"] = result.Warnings.ToList();
        json["cautions"] = Cautions;
        json["units"] = UnitNames;
        return json;
    }

    public void Render(IAnsiConsole console)
    {
        string e = d.EnergyUnit;
        string t = d.TemperatureUnit;
        var bins = new Table().Border(TableBorder.Rounded)
            .Title(Markup.Escape(F($"Outdoor-air loads by bin, {e} ({A.Airflow.In(units):N0} {d.FlowUnit}, {weather.Site.Name})")));
        bins.AddColumn($"Bin, {t}");
        bool recovery = A.Recovery is not null;
        bool humidify = A.MinRelativeHumidity is not null;
        var columns = new List<string> { "Hours", $"At, {t}", $"Mean W, {d.HumidityReadableUnit}", "Heating", "Cooling sens.", "Cooling lat." };
        if (humidify)
        {
            columns.Add("Humidif.");
        }

        if (recovery)
        {
            columns.AddRange(["Recov. heat", "Recov. cool"]);
        }

        columns.AddRange(["Hourly heating", "Hourly latent"]);
        foreach (var c in columns)
        {
            bins.AddColumn(new TableColumn(Markup.Escape(c)).RightAligned());
        }

        foreach (var b in result.Bins)
        {
            var cells = new List<string>
            {
                F($"{d.T(b.Bin.Low):0.##} to {d.T(b.Bin.High):0.##}"),
                b.HoursVentilated.ToString(CultureInfo.InvariantCulture),
                b.HoursVentilated == 0 ? "" : F($"{d.T(b.EvaluatedAt):0.0}"),
                b.HoursVentilated == 0 ? "" : F(d.WReadable(b.MeanHumidityRatio), d.Ip ? "0.0" : "0.00"),
                N(b.BinMethod.Heating), N(b.BinMethod.CoolingSensible), N(b.BinMethod.CoolingLatent),
            };
            if (humidify)
            {
                cells.Add(N(b.BinMethod.Humidification));
            }

            if (recovery)
            {
                cells.AddRange([N(b.BinMethod.RecoveredHeating), N(b.BinMethod.RecoveredCooling)]);
            }

            cells.AddRange([N(b.Hourly.Heating), N(b.Hourly.CoolingLatent)]);
            bins.AddRow(cells.ToArray());
        }

        console.Write(bins);

        var totals = new Table().Border(TableBorder.Rounded).Title(Markup.Escape($"Annual outdoor-air energy, {e}"));
        totals.AddColumn("Figure");
        totals.AddColumn(new TableColumn("Bin method").RightAligned());
        totals.AddColumn(new TableColumn("Hourly sum").RightAligned());
        totals.AddColumn(new TableColumn("Difference").RightAligned());
        if (result.JointBin is not null)
        {
            totals.AddColumn(new TableColumn("Joint bins").RightAligned());
            totals.AddColumn(new TableColumn("Joint difference").RightAligned());
        }

        foreach (var (figure, _, label) in Figures)
        {
            if (!recovery && figure is LoadFigure.RecoveredHeating or LoadFigure.RecoveredCooling or LoadFigure.FanEnergy)
            {
                continue;
            }

            if (!humidify && figure == LoadFigure.Humidification)
            {
                continue;
            }

            var cells = new List<string> { label, N(result.Bin.Get(figure)), N(result.Hourly.Get(figure)), Pct(result.DifferencePercent(figure)) };
            if (result.JointBin is not null)
            {
                cells.AddRange([N(result.JointBin.Get(figure)), Pct(result.JointDifferencePercent(figure))]);
            }

            totals.AddRow(cells.Select(Markup.Escape).ToArray());
        }

        totals.AddRow("Hours ventilated", result.Bin.HoursVentilated.ToString("N0", CultureInfo.InvariantCulture), result.Hourly.HoursVentilated.ToString("N0", CultureInfo.InvariantCulture), "");
        console.Write(totals);
        console.WriteLine(A.BinPoint == BinEvaluationPoint.Midpoint
            ? "Bin method: loads at each bin's midpoint and mean coincident humidity ratio, times the bin's ventilated hours. Hourly sum: the same formulas hour by hour."
            : "Bin method: loads at each bin's mean dry-bulb and mean coincident humidity ratio, times the bin's ventilated hours. Hourly sum: the same formulas hour by hour.");
        console.WriteLine("Dry-bulb bins err most on latent loads: a bin's mean humidity ratio hides its humid hours, and only humidity above the limit counts (--joint shows how joint bins close it).");

        if (result.Peaks is OutdoorAirPeaks peaks)
        {
            var p = new Table().Border(TableBorder.Rounded).Title(Markup.Escape($"Peak outdoor-air loads at this record's design conditions, {d.PowerUnit}"));
            p.AddColumn("Condition");
            p.AddColumn(new TableColumn($"Dry-bulb, {t}").RightAligned());
            p.AddColumn(new TableColumn($"Wet-bulb, {t}").RightAligned());
            p.AddColumn(new TableColumn($"Dew point, {t}").RightAligned());
            foreach (var c in (string[])["Heating", "Cooling sens.", "Cooling lat.", "Cooling total"])
            {
                p.AddColumn(new TableColumn(c).RightAligned());
            }

            if (humidify)
            {
                p.AddColumn(new TableColumn("Humidif.").RightAligned());
            }

            foreach (var peak in (OutdoorAirPeak[])[peaks.Heating, peaks.Cooling, peaks.Dehumidification])
            {
                var l = peak.Loads;
                var cells = new List<string>
                {
                    peak.Condition, F(d.T(peak.DryBulb), "0.0"), F(d.T(peak.WetBulb), "0.0"), F(d.T(peak.DewPoint), "0.0"),
                    PN(l.Heating), PN(l.CoolingSensible), PN(l.CoolingLatent), PN(l.Cooling),
                };
                if (humidify)
                {
                    cells.Add(PN(l.Humidification));
                }

                p.AddRow(cells.Select(Markup.Escape).ToArray());
            }

            console.Write(p);
            if (recovery)
            {
                console.WriteLine(F($"Peaks include the recovery device; without it: heating {PN(peaks.Heating.WithoutRecovery.Heating)}, cooling {PN(peaks.Cooling.WithoutRecovery.Cooling)} {d.PowerUnit}. Size equipment for the hours the device may be off."));
            }

            console.WriteLine(Markup.Escape("Design conditions: " + peaks.Method + "."));
        }

        var a = new Table().Border(TableBorder.Rounded).Title("Assumptions");
        a.AddColumn("Item");
        a.AddColumn("Value");
        foreach (var (k, v) in AssumptionLines())
        {
            a.AddRow(Markup.Escape(k), Markup.Escape(v));
        }

        console.Write(a);
        foreach (var w in result.Warnings)
        {
            console.MarkupLine("[yellow]Warning:[/] " + Markup.Escape(w));
        }

        foreach (var c in Cautions)
        {
            console.WriteLine("Caution: " + c);
        }
    }

    private IEnumerable<(string, string)> AssumptionLines()
    {
        string basis = A.FlowBasis switch
        {
            FlowBasis.Standard => "standard air, 0.075 lb/ft3 (1.2014 kg/m3) of dry air",
            FlowBasis.Site => "site: dry air at 70 F (21.1 C) at the site pressure",
            _ => "actual: each hour's outdoor air at that hour's pressure (bins: the bin's evaluation state at the site pressure); density shown is the mean",
        };
        yield return ("Airflow", F($"{A.Airflow.In(units):N0} {d.FlowUnit}"));
        yield return ("Flow basis", F($"{basis}: {Density(A.DryAirDensity):0.0000} {UnitNames["dry_air_density"]}"));
        double againstStandard = (A.Factors.SensibleSi / AirflowFactors.StandardAir.SensibleSi - 1) * 100;
        yield return ("Site sensible factor", F($"{A.Factors.Sensible(units):0.000} {UnitNames["sensible_factor"]} at W = 0, {Math.Round(againstStandard, 1) + 0.0:+0.0;-0.0;0.0} % against standard air ({AirflowFactors.StandardAir.Sensible(units):0.000}, the trade's 1.08)"));
        yield return ("Site pressure", F($"{A.SitePressure.In(units):0.000} {UnitNames["pressure"]}"));
        yield return ("Heat to / cool to", F($"{d.T(A.HeatTo):0.#} / {d.T(A.CoolTo):0.#} {d.TemperatureUnit}"));
        yield return ("Indoor humidity", F($"at most {A.MaxRelativeHumidity * 100:0.#} % RH at {d.T(A.CoolTo):0.#} {d.TemperatureUnit} (W_max {d.WReadable(A.MaxHumidityRatio):0.0} {d.HumidityReadableUnit})")
            + (A.MinRelativeHumidity is double min && A.MinHumidityRatio is HumidityRatio wmin
                ? F($"; at least {min * 100:0.#} % RH at {d.T(A.HeatTo):0.#} {d.TemperatureUnit} (W_min {d.WReadable(wmin):0.0} {d.HumidityReadableUnit})")
                : "; no humidification"));
        yield return ("Ventilation", A.Operation == VentilationOperation.Always
            ? "every hour"
            : "occupied hours: " + A.Schedule + (noSchedule ? " (no --occupied given: every hour counts as occupied)" : ""));
        yield return ("Bins", F($"{A.BinScale.Width:0.##} {(d.Ip ? "F" : "K")} wide, lower edge inclusive; loads evaluated at {(A.BinPoint == BinEvaluationPoint.Midpoint ? "each bin's midpoint (--bin-point mid)" : "the mean dry-bulb of each bin's ventilated hours (column At; --bin-point mid for the midpoint)")}"));
        yield return ("Formulas", "heating m cp (T_h - T_o); sensible cooling m cp (T_o - T_c); latent m h_fg (W_o - W_max); cp = 1.006 + 1.86 W kJ/(kg K), h_fg = 2501 kJ/kg (ASHRAE Fundamentals ch. 1, eq. 32)");
        if (A.Recovery is EnergyRecoverySettings r)
        {
            string frost = r.FrostLimit is Temperature fl ? F($"; below {d.T(fl):0.#} {d.TemperatureUnit} sensible {r.FrostEffectiveness:0.##}") : "";
            yield return ("Energy recovery", F($"sensible {r.SensibleEffectiveness:0.##}, latent {r.LatentEffectiveness:0.##}{frost}; off between the setpoints"));
            yield return ("Recovery fan", F($"{RecoveryPressure(r.PressureDropPa):0.###} {UnitNames["recovery_pressure"]} per stream, efficiency {r.FanEfficiency:0.##}: {F(d.P(A.FanPenalty), d.Ip ? "N0" : "N3")} {d.PowerUnit} {(r.BypassWhenIdle ? "in recovering hours" : "in every ventilated hour")}"));
        }

        yield return ("Calendar", A.Calendar);
    }

    private Dictionary<string, object?> Assumptions() => new()
    {
        ["airflow"] = A.Airflow.In(units),
        ["flow_basis"] = A.FlowBasis.ToString().ToLowerInvariant(),
        ["dry_air_density"] = Density(A.DryAirDensity),
        ["sensible_factor"] = A.Factors.Sensible(units),
        ["site_pressure"] = A.SitePressure.In(units),
        ["heat_to"] = d.T(A.HeatTo),
        ["cool_to"] = d.T(A.CoolTo),
        ["max_rh_pct"] = A.MaxRelativeHumidity * 100,
        ["min_rh_pct"] = A.MinRelativeHumidity * 100,
        ["max_humidity_ratio"] = A.MaxHumidityRatio.KilogramsPerKilogram,
        ["min_humidity_ratio"] = A.MinHumidityRatio?.KilogramsPerKilogram,
        ["ventilate"] = A.Operation == VentilationOperation.Always ? "always" : "occupied",
        ["schedule"] = A.Schedule,
        ["bin_width"] = A.BinScale.Width,
        ["bin_point"] = A.BinPoint == BinEvaluationPoint.Midpoint ? "mid" : "mean",
        ["recovery"] = A.Recovery is EnergyRecoverySettings r ? new Dictionary<string, object?>
        {
            ["sensible_effectiveness"] = r.SensibleEffectiveness,
            ["latent_effectiveness"] = r.LatentEffectiveness,
            ["frost_limit"] = r.FrostLimit is Temperature fl ? d.T(fl) : null,
            ["frost_effectiveness"] = r.FrostEffectiveness,
            ["pressure_drop"] = RecoveryPressure(r.PressureDropPa),
            ["fan_efficiency"] = r.FanEfficiency,
            ["bypass_when_idle"] = r.BypassWhenIdle,
            ["fan_power"] = d.P(A.FanPenalty),
        } : null,
        ["calendar"] = A.Calendar,
    };

    private Dictionary<string, object?> Totals(OutdoorAirTotals totals)
    {
        var json = Figures.ToDictionary(f => f.Key, f => (object?)d.E(totals.Get(f.Figure)));
        json["hours_ventilated"] = totals.HoursVentilated;
        return json;
    }

    private Dictionary<string, object?> Peak(OutdoorAirPeak peak)
    {
        Dictionary<string, object?> Rates(OutdoorAirLoadRates r) => new()
        {
            ["heating"] = d.P(r.Heating),
            ["cooling_sensible"] = d.P(r.CoolingSensible),
            ["cooling_latent"] = d.P(r.CoolingLatent),
            ["cooling_total"] = d.P(r.Cooling),
            ["humidification"] = d.P(r.Humidification),
            ["recovered_heating"] = d.P(r.RecoveredHeating),
            ["recovered_cooling"] = d.P(r.RecoveredCooling),
        };

        var json = new Dictionary<string, object?>
        {
            ["condition"] = peak.Condition,
            ["drybulb"] = d.T(peak.DryBulb),
            ["wetbulb"] = d.T(peak.WetBulb),
            ["dewpoint"] = d.T(peak.DewPoint),
            ["humidity_ratio"] = d.W(peak.HumidityRatio),
        };
        foreach (var (k, v) in Rates(peak.Loads))
        {
            json[k] = v;
        }

        json["without_recovery"] = Rates(peak.WithoutRecovery);
        return json;
    }

    private double Density(double kgPerM3) => d.Ip ? kgPerM3 / Conversions.KilogramsPerPound * Conversions.CubicMetresPerCubicFoot : kgPerM3;

    private double RecoveryPressure(double pa) => d.Ip ? pa / Conversions.PascalsPerInchOfWater : pa;

    private string N(Energy e) => F(d.E(e), "N0");

    private string PN(Power p) => F(d.P(p), d.Ip ? "N0" : "N2");

    private static string Pct(double? p) => p is double v ? F(Math.Round(v, 1) + 0.0, "+0.0;-0.0;0.0") + " %" : "n/a";
}
