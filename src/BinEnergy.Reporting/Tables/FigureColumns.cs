using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// The columns of the figures every output shows, declared once: the load figures and the energy
/// bought (annual, monthly, bin, hourly tables of commands and studies alike), the peaks, and the
/// economizer totals. Names carry their unit suffix (<c>heating_kbtu</c>, <c>cost_usd</c>).
/// </summary>
public static class FigureColumns
{
    /// <summary>The base name, heading and unit of a load figure.</summary>
    public static (string Name, string Label, DisplayUnit Unit) Of(LoadFigure figure, DisplayUnits u) => figure switch
    {
        LoadFigure.Heating => ("heating", "Heating", u.Energy),
        LoadFigure.CoolingSensible => ("cooling_sensible", "Cooling, sensible", u.Energy),
        LoadFigure.CoolingLatent => ("cooling_latent", "Cooling, latent", u.Energy),
        LoadFigure.Humidification => ("humidification", "Humidification", u.Energy),
        LoadFigure.RecoveredHeating => ("recovered_heating", "Recovered heating", u.Energy),
        LoadFigure.RecoveredCooling => ("recovered_cooling", "Recovered cooling", u.Energy),
        LoadFigure.FanEnergy => ("fan", "Fan energy", u.Electricity),
        _ => throw new ArgumentOutOfRangeException(nameof(figure), figure, "unknown figure"),
    };

    /// <summary>
    /// The load figures and, where <paramref name="show"/> has a plant, the energy bought per fuel,
    /// the cost per end use and in all, and the carbon. Figures the estimate cannot have (recovery
    /// without a device, humidification without a minimum) stay in the data and leave the terminal.
    /// </summary>
    /// <param name="u">The display units.</param>
    /// <param name="show">Which figures apply.</param>
    /// <param name="hours">Include the hours ventilated.</param>
    public static ColumnSet<EnergyFigures> Loads(DisplayUnits u, FigureSet show, bool hours = true)
    {
        var set = new ColumnSet<EnergyFigures>();
        if (hours)
        {
            set.Integer("hours_ventilated", "Hours ventilated", f => (int)Math.Round(f.Loads.HoursVentilated));
        }

        foreach (var figure in Enum.GetValues<LoadFigure>())
        {
            var (name, label, unit) = Of(figure, u);
            bool detail = figure switch
            {
                LoadFigure.Humidification => !show.Humidification,
                LoadFigure.RecoveredHeating or LoadFigure.RecoveredCooling => !show.Recovery,
                LoadFigure.FanEnergy => !show.Fans,
                _ => false,
            };
            set.Number(name, unit, label, f => f.Loads[figure].Joules, detail);
        }

        if (!show.Plant)
        {
            return set;
        }

        return set
            .Number("electricity", u.Electricity, "Electricity bought", f => f.Bought.Total.ElectricityJ, detail: true)
            .Number("gas", u.Gas, "Gas bought", f => f.Bought.Total.GasJ, detail: true)
            .Number("oil", u.Oil, "Oil bought", f => f.Bought.Total.OilJ, detail: true)
            .Number("heating", u.Cost, "Heating cost", f => f.Bought[EndUse.Heating].Cost, detail: true)
            .Number("cooling", u.Cost, "Cooling cost", f => f.Bought[EndUse.Cooling].Cost, detail: true)
            .Number("fans", u.Cost, "Fan cost", f => f.Bought[EndUse.Fans].Cost, detail: true)
            .Number("humidification", u.Cost, "Humidification cost", f => f.Bought[EndUse.Humidification].Cost, detail: true)
            .Number("backup_heating_electricity", u.Electricity, "Backup heat, electricity", f => f.Bought[EndUse.BackupHeating].ElectricityJ, detail: true)
            .Number("backup_heating_gas", u.Gas, "Backup heat, gas", f => f.Bought[EndUse.BackupHeating].GasJ, detail: true)
            .Number("backup_heating", u.Cost, "Backup heat cost", f => f.Bought[EndUse.BackupHeating].Cost, detail: true)
            .Number(string.Empty, u.Cost, "Cost", f => f.Bought.Total.Cost)
            .Number("carbon", u.Carbon, "Carbon", f => f.Bought.Total.CarbonKg);
    }

    /// <summary>The peak load columns: the design state and the rates at it.</summary>
    public static ColumnSet<OutdoorAirPeak> Peaks(DisplayUnits u, bool recovery) => new ColumnSet<OutdoorAirPeak>()
        .Number("drybulb", u.Temperature, "Dry-bulb", p => p.DryBulb.Celsius)
        .Number("wetbulb", u.Temperature, "Wet-bulb", p => p.WetBulb.Celsius)
        .Number("dewpoint", u.Temperature, "Dew point", p => p.DewPoint.Celsius)
        .Number("humidity_ratio", u.Moisture, "Humidity ratio", p => p.HumidityRatio.KilogramsPerKilogram)
        .Number("sensible", u.Power, "Sensible (heating or cooling)", p => p.Sensible.Watts)
        .Number("latent", u.Power, "Latent (humidification or dehumidification)", p => p.Latent.Watts)
        .Number("total", u.Power, "Total", p => p.Total.Watts)
        .Number("total_without_recovery", u.Power, "Total without recovery", p => p.TotalWithoutRecovery.Watts, detail: !recovery);

    /// <summary>An economizer control's totals by one method, with its savings against the baseline.</summary>
    public static ColumnSet<(EconomizerControlResult Control, IntegrationMethod Method)> Economizer(DisplayUnits u, bool plant)
    {
        var set = new ColumnSet<(EconomizerControlResult Control, IntegrationMethod Method)>()
            .Number("hours_free", u.Hours, "Free cooling", x => x.Control.Totals[x.Method].HoursFree)
            .Number("hours_integrated", u.Hours, "Integrated", x => x.Control.Totals[x.Method].HoursIntegrated)
            .Number("hours_minimum", u.Hours, "Minimum outdoor air", x => x.Control.Totals[x.Method].HoursMinimum)
            .Number("hours_no_cooling", u.Hours, "No cooling", x => x.Control.Totals[x.Method].HoursNoCooling)
            .Number("coil_sensible", u.Energy, "Coil, sensible", x => x.Control.Totals[x.Method].CoilSensible.Joules, detail: true)
            .Number("coil_latent", u.Energy, "Coil, latent", x => x.Control.Totals[x.Method].CoilLatent.Joules, detail: true)
            .Number("coil_total", u.Energy, "Coil total", x => x.Control.Totals[x.Method].CoilTotal.Joules)
            .Number("savings", u.Energy, "Savings", x => x.Control.Savings(x.Method).Joules)
            .Number("savings", u.Percent, "Share of baseline saved", x => x.Control.SavingsPercent(x.Method) ?? double.NaN)
            .Number("reheat", u.Energy, "Reheat", x => x.Control.Totals[x.Method].Reheat.Joules)
            .Number("preheat", u.Energy, "Preheat", x => x.Control.Totals[x.Method].Preheat.Joules)
            .Number("savings_heating", u.Energy, "Reheat and preheat saved", x => x.Control.HeatingSavings(x.Method).Joules)
            .Number("unmet", u.Energy, "Unmet load", x => x.Control.Totals[x.Method].Unmet.Joules)
            .Number("fans", u.Electricity, "Fans", x => x.Control.Totals[x.Method].Fans.Joules);
        if (!plant)
        {
            return set;
        }

        return set
            .Number("compressor", u.Electricity, "Compressor", x => x.Control.Totals[x.Method].Compressor.ElectricityJ, detail: true)
            .Number("compressor", u.Cost, "Compressor cost", x => x.Control.Totals[x.Method].Compressor.Cost, detail: true)
            .Number("compressor_carbon", u.Carbon, "Compressor carbon", x => x.Control.Totals[x.Method].Compressor.CarbonKg, detail: true)
            .Number("savings_compressor", u.Electricity, "Compressor saved", x => x.Control.CompressorSavings(x.Method).ElectricityJ)
            .Number("heating", u.Cost, "Reheat and preheat cost", x => x.Control.Totals[x.Method].Heating.Cost, detail: true)
            .Number("fans", u.Cost, "Fan cost", x => x.Control.Totals[x.Method].FanElectricity.Cost, detail: true)
            .Number("purchased", u.Cost, "Cost of everything bought", x => x.Control.Totals[x.Method].Purchased.Cost, detail: true)
            .Number("heating_carbon", u.Carbon, "Reheat and preheat carbon", x => x.Control.Totals[x.Method].Heating.CarbonKg, detail: true)
            .Number("savings", u.Cost, "Cost saved", x => x.Control.PurchasedSavings(x.Method).Cost)
            .Number("savings_carbon", u.Carbon, "Carbon saved", x => x.Control.PurchasedSavings(x.Method).CarbonKg, detail: true);
    }

    /// <summary>The economizer control's name as tables write it (<c>none</c> for the baseline).</summary>
    public static string ControlName(EconomizerControlResult c) => c.Control.Name;

    /// <summary><c>integrated</c>, <c>non-integrated</c> or <c>none</c>.</summary>
    public static string Integration(EconomizerControlResult c) =>
        c.Control.Kind == HighLimitKind.None ? "none" : c.Control.Integrated ? "integrated" : "non-integrated";
}
