using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>Builds the economizer settings of a variant's [economizer] table (null when there is none or it is disabled).</summary>
internal static class EconomizerSettingsBuilder
{
    /// <summary>Default total pressure of the supply fan, Pa: 3 in. w.g. (recalled from memory: a common total for a central air handler with filters, coils and ducts).</summary>
    public const double DefaultSupplyFanPressurePa = 3 * Conversions.PascalsPerInchOfWater;

    public static EconomizerSettings? Build(StudySection e, OutdoorAirSettings outdoorAir, OccupancySchedule schedule, List<string> assumptions, StudySection plant)
    {
        if (!e.Present || e.Bool("enabled") == false)
        {
            return null;
        }

        bool integrated = e.Bool("integrated") ?? true;
        var names = e.TextList("controls") ?? EconomizerControl.EconomizerKinds.Select(EconomizerControl.NameOf).ToList();
        var controls = new List<EconomizerControl>();
        foreach (var n in names.Where(n => n != "none"))
        {
            if (!EconomizerControl.TryParse(n, integrated, out var c))
            {
                throw e.ErrorAt("controls", $"\"{n}\" is not an economizer control");
            }

            controls.Add(c);
        }

        if (controls.Count == 0)
        {
            throw e.ErrorAt("controls", "name at least one economizer control to compare with the baseline (\"none\" is the baseline, always shown)");
        }

        var suggested = HighLimits.Suggested;
        var limits = new HighLimits(
            e.Number("high_limit_drybulb") is double db ? Temperature.FromCelsius(db) : suggested.DryBulb,
            e.Number("high_limit_enthalpy") is double h ? SpecificEnthalpy.FromJoulesPerKilogram(h) : suggested.Enthalpy,
            e.Number("high_limit_dewpoint") is double dp ? Temperature.FromCelsius(dp) : suggested.DewPoint);
        if (!e.Has("high_limit_drybulb") || !e.Has("high_limit_enthalpy") || !e.Has("high_limit_dewpoint"))
        {
            assumptions.Add("economizer: " + HighLimits.SuggestedNote + " (for the limits the study does not set)");
        }

        var system = AirSystemType.VariableVolume;
        if (e.Text("system") is string systemName && !AirSystemTypes.TryParse(systemName, out system))
        {
            throw e.ErrorAt("system", $"\"{systemName}\" is not an air-system type");
        }

        var settings = new EconomizerSettings
        {
            System = system,
            Reset = Reset(e),
            SupplyFan = SupplyFan(e, plant, assumptions),
            ReturnFan = e.Number("return_fan_pressure") is double rp
                ? new AirSystemFan(rp, e.Number("return_fan_efficiency") ?? FanEfficiency(plant))
                : null,
            FanCurve = FanCurve(e),
            SupplyAirflow = VolumeFlow.FromCubicMetresPerSecond(e.RequiredNumber("supply_airflow")),
            SupplyAirflowMin = e.Number("supply_airflow_min") is double min ? VolumeFlow.FromCubicMetresPerSecond(min) : null,
            MinOutdoorAirflow = MinimumOutdoorAirflow(e, outdoorAir, assumptions),
            FlowBasis = e.Has("flow_basis") ? StudyCaseBuilder.FlowBasisOf(e.Text("flow_basis")) : outdoorAir.FlowBasis,
            SupplyTemperature = Temperature.FromCelsius(e.RequiredNumber("supply_temp")),
            ReturnTemperature = Temperature.FromCelsius(e.RequiredNumber("return_temp")),
            ReturnRelativeHumidity = e.RequiredNumber("return_rh_pct") / 100.0,
            LoadLine = new BuildingLoadLine(
                Power.FromWatts(e.RequiredNumber("design_load")),
                Temperature.FromCelsius(e.RequiredNumber("design_outdoor")),
                Temperature.FromCelsius(e.RequiredNumber("balance_point"))),
            CoilLeavingRelativeHumidity = (e.Number("coil_leaving_rh_pct") ?? 90.0) / 100.0,
            Controls = controls,
            Limits = limits,
            BinPoint = outdoorAir.BinPoint,
        };
        if (settings.MinimumAirflowIsDefault)
        {
            assumptions.Add(FormattableString.Invariant($"economizer: variable-volume minimum supply airflow {EconomizerSettings.DefaultMinimumFraction * 100:0} % of the maximum, not below the minimum outdoor airflow (recalled from memory; set supply_airflow_min, the energy code adopted locally limits reheat at minimum airflow)"));
        }

        var problem = settings.Problems().FirstOrDefault();
        if (problem is not null)
        {
            string name = problem.Key.Replace("_rh", "_rh_pct", StringComparison.Ordinal);
            throw e.Has(name) ? e.ErrorAt(name, problem.Message) : new StudyFileException(e.File, e.Line, "economizer." + problem.Key, problem.Message);
        }

        return settings;
    }

    /// <summary>
    /// The economizer's minimum outdoor airflow: the study's <c>min_outdoor_airflow</c>, else the variant's own
    /// ventilation airflow (so a variant that changes the ventilation rate changes the economizer's minimum too).
    /// A set value that differs from the ventilation airflow is stated, since the two then tell different stories.
    /// </summary>
    private static VolumeFlow MinimumOutdoorAirflow(StudySection e, OutdoorAirSettings outdoorAir, List<string> assumptions)
    {
        var ventilation = outdoorAir.EffectiveAirflow;
        if (e.Number("min_outdoor_airflow") is not double set)
        {
            assumptions.Add(FormattableString.Invariant(
                $"economizer: minimum outdoor airflow = this variant's ventilation airflow ({ventilation.Cfm:N0} cfm, {ventilation.LitresPerSecond:N0} L/s; set economizer.min_outdoor_airflow to give another)"));
            return ventilation;
        }

        if (Math.Abs(set - ventilation.CubicMetresPerSecond) > 0.005 * Math.Max(set, ventilation.CubicMetresPerSecond))
        {
            var given = VolumeFlow.FromCubicMetresPerSecond(set);
            assumptions.Add(FormattableString.Invariant(
                $"economizer: minimum outdoor airflow {given.Cfm:N0} cfm ({given.LitresPerSecond:N0} L/s) as the study sets it, not this variant's ventilation airflow ({ventilation.Cfm:N0} cfm); leave min_outdoor_airflow out to follow the variant"));
        }

        return VolumeFlow.FromCubicMetresPerSecond(set);
    }

    private static double FanEfficiency(StudySection plant) => plant.Number("fan_efficiency") ?? PlantSettingsBuilder.DefaultFanEfficiency;

    /// <summary>The supply fan: the study's pressure and efficiency, else the default pressure (stated), none at pressure 0.</summary>
    private static AirSystemFan? SupplyFan(StudySection e, StudySection plant, List<string> assumptions)
    {
        double efficiency = e.Number("supply_fan_efficiency") ?? FanEfficiency(plant);
        if (e.Number("supply_fan_pressure") is double p)
        {
            return p > 0 ? new AirSystemFan(p, efficiency) : null;
        }

        assumptions.Add(FormattableString.Invariant($"economizer: supply fan 3 in. w.g. (750 Pa) total pressure at efficiency {efficiency:0.##} (recalled from memory; set supply_fan_pressure, 0 for none)"));
        return new AirSystemFan(DefaultSupplyFanPressurePa, efficiency);
    }

    /// <summary>The fan part-load curve of <c>fan_curve</c> (four coefficients), else the default.</summary>
    private static FanPartLoadCurve FanCurve(StudySection e)
    {
        if (e.NumberList("fan_curve") is not { } c)
        {
            return FanPartLoadCurve.Default;
        }

        if (c.Count != 4)
        {
            throw e.ErrorAt("fan_curve", $"the fan curve takes four coefficients [c0, c1, c2, c3] of c0 + c1 f + c2 f^2 + c3 f^3, not {c.Count}");
        }

        return new FanPartLoadCurve(c[0], c[1], c[2], c[3]);
    }

    /// <summary>The supply-temperature reset of the three keys, null when none is set; a partial reset names the missing key.</summary>
    private static SupplyTemperatureReset? Reset(StudySection e)
    {
        string[] keys = ["supply_temp_reset_max", "supply_temp_reset_outdoor_low", "supply_temp_reset_outdoor_high"];
        var given = keys.Where(e.Has).ToList();
        if (given.Count == 0)
        {
            return null;
        }

        string? missing = keys.FirstOrDefault(k => !e.Has(k));
        if (missing is not null)
        {
            throw e.ErrorAt(given[0], $"a supply-temperature reset needs all three of {string.Join(", ", keys)}; {missing} is missing");
        }

        return new SupplyTemperatureReset(
            Temperature.FromCelsius(e.RequiredNumber(keys[0])),
            Temperature.FromCelsius(e.RequiredNumber(keys[1])),
            Temperature.FromCelsius(e.RequiredNumber(keys[2])));
    }
}
