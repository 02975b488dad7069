using BinEnergy.Core.Plant;
using BinEnergy.Core.Study;
using BinEnergy.Core.Study.Results;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Lays a study run out as long-format result tables (DESIGN 11): <c>annual</c>, <c>bins</c>,
/// <c>monthly</c>, <c>economizer</c>, <c>peaks</c> and optionally <c>hourly</c>, one row per
/// climate x variant x (method | bin | month | control | condition | hour), with a unit
/// suffix on every numeric column in the study's display units.
/// </summary>
public static class StudyTables
{
    /// <summary>The table names, in the order they are written.</summary>
    public static IReadOnlyList<string> Names { get; } = ["annual", "bins", "monthly", "economizer", "peaks", "hourly"];

    /// <summary>Builds the tables of a run (<c>hourly</c> only when the run kept its hours and <paramref name="hourly"/> is set).</summary>
    public static IReadOnlyList<ResultTable> Build(StudyRunResult run, bool hourly)
    {
        var u = Units(run);
        var tables = new List<ResultTable> { Annual(run, u), Bins(run, u), Monthly(run, u), Economizer(run, u), Peaks(run, u) };
        if (hourly)
        {
            tables.Add(Hourly(run, u));
        }

        return tables;
    }

    internal static DisplayUnits Units(StudyRunResult run)
    {
        double oil = run.Cases.Count > 0 ? run.Cases[0].Case.Plant.OilJoulesPerGallon : FuelUnits.DefaultOilBtuPerGallon * Core.Units.Conversions.JoulesPerBtu;
        return new DisplayUnits(run.Study.Units, run.Study.Currency, oil);
    }

    private static ResultTable LoadColumns(ResultTable t, DisplayUnits u)
    {
        string e = u.Energy;
        return t.Number($"heating_{e}").Number($"cooling_sensible_{e}").Number($"cooling_latent_{e}").Number($"humidification_{e}")
            .Number($"recovered_heating_{e}").Number($"recovered_cooling_{e}").Number("fan_kwh")
            .Number("electricity_kwh").Number($"gas_{u.Gas}").Number($"oil_{u.Oil}")
            .Number($"heating_{u.Cost}").Number($"cooling_{u.Cost}").Number($"other_{u.Cost}").Number(u.Cost).Number("carbon_kg");
    }

    private static object[] LoadValues(LoadFigures f, DisplayUnits u)
    {
        var total = f.Total;
        return
        [
            u.E(f.HeatingJ), u.E(f.CoolingSensibleJ), u.E(f.CoolingLatentJ), u.E(f.HumidificationJ),
            u.E(f.RecoveredHeatingJ), u.E(f.RecoveredCoolingJ), DisplayUnits.Kwh(f.FanJ),
            DisplayUnits.Kwh(total.ElectricityJ), u.GasUnits(total.GasJ), u.OilUnits(total.OilJ),
            f.HeatingSite.Cost, f.CoolingSite.Cost, f.OtherSite.Cost, total.Cost, total.CarbonKg,
        ];
    }

    private static ResultTable Annual(StudyRunResult run, DisplayUnits u)
    {
        var t = LoadColumns(new ResultTable("annual").Text("climate").Text("variant").Text("method").Integer("hours_ventilated"), u);
        foreach (var c in run.Cases)
        {
            foreach (var (method, f) in new[] { ("bin", c.AnnualBin), ("hourly", c.AnnualHourly) })
            {
                t.AddRow([c.Case.Climate.Name, c.Case.Variant.Name, method, (int)Math.Round(f.HoursVentilated), .. LoadValues(f, u)]);
            }
        }

        return t;
    }

    private static ResultTable Bins(StudyRunResult run, DisplayUnits u)
    {
        string tu = u.Temp;
        var t = LoadColumns(new ResultTable("bins").Text("climate").Text("variant").Text("method")
            .Number($"bin_low_{tu}").Number($"bin_high_{tu}").Number($"bin_mid_{tu}").Number($"evaluated_drybulb_{tu}")
            .Integer("hours").Integer("hours_occupied").Integer("hours_ventilated")
            .Number($"mean_humidity_ratio_{u.Ratio}").Number($"mean_coincident_wetbulb_{tu}"), u);
        foreach (var c in run.Cases)
        {
            foreach (var b in c.Bins)
            {
                t.AddRow([c.Case.Climate.Name, c.Case.Variant.Name, "bin", u.T(b.LowC), u.T(b.HighC), u.T(b.MidC), u.T(b.EvaluatedAtC),
                    b.Hours, b.HoursOccupied, (int)Math.Round(b.Loads.HoursVentilated), b.MeanHumidityRatio, u.T(b.MeanCoincidentWetBulbC),
                    .. LoadValues(b.Loads, u)]);
            }
        }

        return t;
    }

    private static ResultTable Monthly(StudyRunResult run, DisplayUnits u)
    {
        var t = LoadColumns(new ResultTable("monthly").Text("climate").Text("variant").Text("method").Integer("month").Integer("hours_ventilated"), u);
        foreach (var c in run.Cases)
        {
            foreach (var (month, f) in c.Months)
            {
                t.AddRow([c.Case.Climate.Name, c.Case.Variant.Name, "hourly", month, (int)Math.Round(f.HoursVentilated), .. LoadValues(f, u)]);
            }
        }

        return t;
    }

    private static ResultTable Economizer(StudyRunResult run, DisplayUnits u)
    {
        string e = u.Energy;
        var t = new ResultTable("economizer").Text("climate").Text("variant").Text("method").Text("control").Text("integration")
            .Number("hours_no_cooling").Number("hours_free").Number("hours_integrated").Number("hours_minimum")
            .Number($"coil_sensible_{e}").Number($"coil_latent_{e}").Number($"coil_total_{e}").Number($"savings_{e}")
            .Number("compressor_kwh").Number($"compressor_{u.Cost}").Number("compressor_carbon_kg")
            .Number("savings_compressor_kwh").Number($"savings_{u.Cost}").Number("savings_carbon_kg");
        foreach (var c in run.Cases)
        {
            foreach (var x in c.Economizer)
            {
                t.AddRow(c.Case.Climate.Name, c.Case.Variant.Name, x.Method, x.Control, x.Control == "none" ? "none" : x.Integrated ? "integrated" : "non-integrated",
                    x.HoursNoCooling, x.HoursFree, x.HoursIntegrated, x.HoursMinimum,
                    u.E(x.CoilSensibleJ), u.E(x.CoilLatentJ), u.E(x.CoilTotalJ), u.E(x.SavingsJ),
                    DisplayUnits.Kwh(x.Compressor.ElectricityJ), x.Compressor.Cost, x.Compressor.CarbonKg,
                    DisplayUnits.Kwh(x.CompressorSavings.ElectricityJ), x.CompressorSavings.Cost, x.CompressorSavings.CarbonKg);
            }
        }

        return t;
    }

    private static ResultTable Peaks(StudyRunResult run, DisplayUnits u)
    {
        string tu = u.Temp;
        var t = new ResultTable("peaks").Text("climate").Text("variant").Text("condition")
            .Number($"drybulb_{tu}").Number($"wetbulb_{tu}").Number($"dewpoint_{tu}").Number($"humidity_ratio_{u.Ratio}")
            .Number($"sensible_{u.Power}").Number($"latent_{u.Power}").Number($"total_{u.Power}").Number($"total_without_recovery_{u.Power}");
        foreach (var c in run.Cases)
        {
            foreach (var p in c.Peaks)
            {
                t.AddRow(c.Case.Climate.Name, c.Case.Variant.Name, p.Condition, u.T(p.DryBulbC), u.T(p.WetBulbC), u.T(p.DewPointC), p.HumidityRatio,
                    u.P(p.SensibleW), u.P(p.LatentW), u.P(p.TotalW), u.P(p.TotalWithoutRecoveryW));
            }
        }

        return t;
    }

    private static ResultTable Hourly(StudyRunResult run, DisplayUnits u)
    {
        string tu = u.Temp;
        var t = LoadColumns(new ResultTable("hourly").Text("climate").Text("variant").Text("method").Text("time").Integer("month").Integer("hour")
            .Integer("occupied").Number($"drybulb_{tu}").Number($"humidity_ratio_{u.Ratio}"), u);
        foreach (var c in run.Cases)
        {
            var hours = c.Hours ?? throw new InvalidOperationException("the run did not keep its hours; run with --hourly");
            var w = c.Weather;
            for (int i = 0; i < hours.Count; i++)
            {
                var time = w.Times[i];
                t.AddRow([c.Case.Climate.Name, c.Case.Variant.Name, "hourly", time.ToString("yyyy-MM-dd'T'HH:mm", System.Globalization.CultureInfo.InvariantCulture),
                    time.Month, time.Hour, c.Occupied[i] ? 1 : 0, u.T(w.DryBulbC[i]), w.HumidityRatio[i], .. LoadValues(hours[i], u)]);
            }
        }

        return t;
    }
}
