using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Text;

/// <summary>
/// The assumptions behind the figures as sentences, written once: the commands, the report and
/// the summary all state them in these words.
/// </summary>
public static class AssumptionText
{
    /// <summary>How volume flow became mass of dry air.</summary>
    public static string FlowBasis(FlowBasis basis) => basis switch
    {
        Core.Psychrometrics.FlowBasis.Standard => "flow basis standard: airflows are standard air, 0.075 lb/ft3 (1.2014 kg/m3) of dry air",
        Core.Psychrometrics.FlowBasis.Site => "flow basis site: airflows are dry air at 70 F (21.1 C) at the site pressure",
        _ => "flow basis actual: airflows are at the air's own state (each hour's outdoor air; a bin's evaluation state at the site pressure); the density shown is the mean",
    };

    /// <summary>The flow basis, its density and the site's sensible factor against the trade's 1.08.</summary>
    public static string SiteFactor(OutdoorAirAssumptions a, DisplayUnits u)
    {
        double againstStandard = (a.Factors.SensibleSi / AirflowFactors.StandardAir.SensibleSi - 1) * 100;
        return FormattableString.Invariant(
            $"{FlowBasis(a.FlowBasis)}: {DisplayUnits.Text(u.Density, a.DryAirDensity)} of dry air; sensible factor {DisplayUnits.Text(u.SensibleFactor, a.Factors.SensibleSi)} at W = 0, {Math.Round(againstStandard, 1) + 0.0:+0.0;-0.0;0.0} % against standard air ({DisplayUnits.Text(u.SensibleFactor, AirflowFactors.StandardAir.SensibleSi)}, the trade's 1.08)");
    }

    /// <summary>Where the bin methods evaluate a bin, and what joint bins are.</summary>
    public static string Methods(BinEvaluationPoint point, double binWidth, string binUnit, double humidityWidth, string humidityUnit) => FormattableString.Invariant(
        $"hourly: the formulas hour by hour; bin method: each {binWidth:0.##} {binUnit} dry-bulb bin at {(point == BinEvaluationPoint.Midpoint ? "its midpoint (the classic method)" : "the mean dry-bulb of its hours")} and mean coincident humidity ratio, times its hours; joint bins: each dry-bulb x {humidityWidth:0.##} {humidityUnit} humidity-ratio cell the same way. Bins sit on multiples of the width, lower edge inclusive.");

    /// <summary>The load formulas and their source.</summary>
    public const string Formulas =
        "heating m cp (T_h - T_o); sensible cooling m cp (T_o - T_c); latent m h_fg (W_o - W_max); humidification m h_fg (W_min - W_o); cp = 1.006 + 1.86 W kJ/(kg K), h_fg = 2501 kJ/kg (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 32)";

    /// <summary>Why dry-bulb bins miss latent loads.</summary>
    public const string LatentError =
        "Dry-bulb bins err most on latent loads: a bin's mean humidity ratio hides its humid hours, and only humidity above the limit counts. Joint bins close most of that error; the hourly sum has none.";

    /// <summary>How the schedule's clock relates to the weather's standard time.</summary>
    public static string Clock(DaylightSaving rule) => rule switch
    {
        DaylightSaving.NorthAmerica => "the schedule is in clock time with North American daylight saving (second Sunday in March to first Sunday in November); the weather stays in local standard time",
        DaylightSaving.Europe => "the schedule is in clock time with European daylight saving (last Sunday in March to last Sunday in October); the weather stays in local standard time",
        _ => "the schedule is in local standard time (no daylight saving)",
    };

    /// <summary>The sentences of an outdoor-air estimate's assumptions.</summary>
    public static IEnumerable<string> OutdoorAir(OutdoorAirAssumptions a, DisplayUnits u, bool noSchedule)
    {
        yield return SiteFactor(a, u);
        yield return "indoor targets: heat to " + u.Show(a.HeatTo) + ", cool to " + u.Show(a.CoolTo)
            + FormattableString.Invariant($", at most {a.MaxRelativeHumidity * 100:0.#} % RH at the cooling setpoint (W_max {DisplayUnits.Text(u.Moisture, a.MaxHumidityRatio.KilogramsPerKilogram)})")
            + (a.MinRelativeHumidity is double min && a.MinHumidityRatio is HumidityRatio wmin
                ? FormattableString.Invariant($", at least {min * 100:0.#} % RH at the heating setpoint (W_min {DisplayUnits.Text(u.Moisture, wmin.KilogramsPerKilogram)})")
                : ", no humidification");
        yield return a.Operation == VentilationOperation.Always
            ? "ventilation every hour"
            : "ventilation in occupied hours: " + a.Schedule + (noSchedule ? " (no schedule given: every hour counts as occupied)" : string.Empty)
                + "; " + Clock(a.DaylightSaving);
        yield return Methods(a.BinPoint, a.BinScale.Width, u.TemperatureDifference.Symbol, a.HumidityScale.Width, u.Moisture.Symbol);
        yield return "formulas: " + Formulas;
        if (a.Recovery is EnergyRecoverySettings r)
        {
            string frost = r.FrostLimit is Temperature fl ? FormattableString.Invariant($"; below {u.Show(fl)} sensible {r.FrostEffectiveness:0.##}") : string.Empty;
            yield return FormattableString.Invariant($"energy recovery: sensible {r.SensibleEffectiveness:0.##}, latent {r.LatentEffectiveness:0.##}{frost}; off between the setpoints; ")
                + $"{DisplayUnits.Text(u.PressureDrop, r.PressureDropPa)} per stream at fan efficiency {r.FanEfficiency.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)}: "
                + $"{DisplayUnits.Text(u.Power, a.FanPenalty.Watts)} {(r.BypassWhenIdle ? "in recovering hours" : "in every ventilated hour")}"
                + (r.PressureDropPa > 0 ? string.Empty
                    : " (at zero pressure drop the device costs no fan energy: give its pressure drop; a wheel or plate exchanger typically adds 0.5 to 1 in. w.g., 125 to 250 Pa, on each air stream, recalled from memory)");
        }

        yield return a.VentilationFanPower.Watts > 0
            ? $"ventilation fan {DisplayUnits.Text(u.Power, a.VentilationFanPower.Watts)} at the design outdoor airflow, in every ventilated hour (fan energy, as electricity)"
            : "no ventilation fan energy (set to zero)";
        yield return "calendar: " + a.Calendar;
    }

    /// <summary>The sentences of an economizer evaluation's assumptions.</summary>
    /// <param name="e">The evaluation.</param>
    /// <param name="u">The display units.</param>
    /// <param name="schedule">The occupancy schedule's text.</param>
    /// <param name="methods">The sentence on the methods (<see cref="Methods"/> with the case's bins).</param>
    public static IEnumerable<string> Economizer(EconomizerEvaluation e, DisplayUnits u, string schedule, string methods)
    {
        var s = e.Settings;
        var m = e.Model;
        string Flow(VolumeFlow v) => DisplayUnits.Text(u.Airflow, v.CubicMetresPerSecond);
        double xMin = s.MinOutdoorAirflow.CubicMetresPerSecond / s.SupplyAirflow.CubicMetresPerSecond;
        yield return "occupied schedule: " + schedule;
        yield return s.System switch
        {
            AirSystemType.VariableVolume => $"air system variable-volume: supply airflow {Flow(s.MinimumSupplyAirflow)}{(s.MinimumAirflowIsDefault ? " (default minimum, recalled from memory)" : string.Empty)} to {Flow(s.SupplyAirflow)}, following the building load m_s = Q_b / (c_p (T_r - T_s)) between those bounds; below what the minimum airflow delivers, the reheat is counted as heating",
            AirSystemType.SingleZone => $"air system single-zone: constant supply airflow {Flow(s.SupplyAirflow)} whose supply temperature follows the load, T_s = T_r - Q_b / (m_s c_p), never below {u.Show(s.SupplyTemperature)}; no reheat",
            _ => $"air system constant-volume-reheat: constant supply airflow {Flow(s.SupplyAirflow)} cooled to {u.Show(s.SupplyTemperature)} in every cooling hour and reheated back to what the load needs (reheat counted as heating)",
        };
        if (s.Reset is { } reset && s.IsVariableVolume)
        {
            yield return $"supply-temperature reset: {u.Show(reset.MaxSupply)} at and below {u.Show(reset.OutdoorLow)} outdoors, falling linearly to {u.Show(s.SupplyTemperature)} at and above {u.Show(reset.OutdoorHigh)}";
        }

        yield return (s.SupplyFan, s.ReturnFan) switch
        {
            (null, null) => "no fans counted (supply fan pressure 0): the coil sees no fan heat",
            var (sf, rf) => string.Join("; ", new[]
            {
                sf is null ? null : $"supply fan {DisplayUnits.Text(u.PressureDrop, sf.TotalPressurePa)} at efficiency {sf.Efficiency.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)}: {DisplayUnits.Text(u.Power, sf.DesignPowerW(s.SupplyAirflow))} at the supply airflow, its heat after the coil",
                rf is null ? null : $"return fan {DisplayUnits.Text(u.PressureDrop, rf.TotalPressurePa)} at efficiency {rf.Efficiency.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)}: {DisplayUnits.Text(u.Power, rf.DesignPowerW(s.SupplyAirflow))}, its heat in the return air",
                s.IsVariableVolume ? "fan power at part flow P / P_design = " + s.FanCurve.Describe() + (s.FanCurve == FanPartLoadCurve.Default ? " (an energy-code baseline curve, recalled from memory)" : " (set by the user)") : null,
                "fans run in every occupied hour",
            }.Where(x => x is not null)),
        };
        yield return "mixed air below the supply temperature is preheated (counted as heating, as is reheat" + (e.HasPlant ? ", bought through the plant's heating" : string.Empty) + "); the baseline is the same system without an economizer";
        yield return FormattableString.Invariant($"minimum outdoor airflow {Flow(s.MinOutdoorAirflow)} (outdoor fraction at least {xMin * 100:0.#} % at full supply airflow{(s.IsVariableVolume ? ", more at reduced airflow" : string.Empty)})");
        yield return FlowBasis(s.FlowBasis).Replace("the air's own state (each hour's outdoor air; a bin's evaluation state at the site pressure); the density shown is the mean", "the coil-entering (mixed-air) state", StringComparison.Ordinal);
        yield return FormattableString.Invariant($"supply (coil-leaving) temperature {u.Show(s.SupplyTemperature)}; coil-leaving humidity at most {s.CoilLeavingRelativeHumidity * 100:0} % RH at the supply temperature ({DisplayUnits.Text(u.Moisture, m.CoilLeavingHumidityLimit)})");
        yield return FormattableString.Invariant($"return air {u.Show(s.ReturnTemperature)} at {s.ReturnRelativeHumidity * 100:0} % RH: humidity ratio {DisplayUnits.Text(u.Moisture, m.ReturnHumidityRatio)}, enthalpy {DisplayUnits.Text(u.Enthalpy, m.ReturnEnthalpyJPerKg)}");
        yield return $"building sensible cooling load {DisplayUnits.Text(u.Power, s.LoadLine.DesignLoad.Watts)} at {u.Show(s.LoadLine.DesignOutdoor)} outdoors, falling linearly to zero at the {u.Show(s.LoadLine.BalancePoint)} balance point (no cooling below it)";
        yield return $"site pressure {DisplayUnits.Text(u.Pressure, m.SitePressurePa)} for the indoor states; each hour's outdoor enthalpy and dew point from the record";
        yield return "mixing linear in dry-bulb and humidity ratio; the coil cools the mixed air to the supply temperature; coil energy is that of the coil only; reheat and preheat are shown beside it"
            + (e.HasPlant ? "; compressor electricity is the coil energy over the cooling COP at the outdoor dry-bulb" : string.Empty);
        yield return "the economizer runs only when the outdoor air is cooler than the return air and the control's high limit allows it; integrated controls keep 100 % outdoor air while the coil trims, non-integrated ones lock out to minimum outdoor air whenever the coil must run";
        yield return $"{e.OccupiedHours} occupied hours of {e.Weather.Count}; the system runs in occupied hours only";
        yield return methods;
        yield return s.LimitsAreSuggested
            ? "high limits: " + HighLimits.SuggestedNote
            : $"high limits set by the user: dry-bulb {u.Show(s.Limits.DryBulb)}, enthalpy {DisplayUnits.Text(u.Enthalpy, s.Limits.Enthalpy.JoulesPerKilogram)}, dew point {u.Show(s.Limits.DewPoint)}; the energy code adopted locally governs the choice of control and limit";
        if (s.MinOutdoorAirflow.CubicMetresPerSecond == 0)
        {
            yield return "caution: the minimum outdoor airflow is zero, so outside economizer hours the building gets no ventilation air; occupied buildings need the minimum their ventilation code requires";
        }
    }
}
