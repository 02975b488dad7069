using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>Builds the economizer settings of a variant's [economizer] table (null when there is none or it is disabled).</summary>
internal static class EconomizerSettingsBuilder
{
    public static EconomizerSettings? Build(StudySection e, OutdoorAirSettings outdoorAir, OccupancySchedule schedule, List<string> assumptions)
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
            SupplyAirflow = VolumeFlow.FromCubicMetresPerSecond(e.RequiredNumber("supply_airflow")),
            SupplyAirflowMin = e.Number("supply_airflow_min") is double min ? VolumeFlow.FromCubicMetresPerSecond(min) : null,
            MinOutdoorAirflow = VolumeFlow.FromCubicMetresPerSecond(e.RequiredNumber("min_outdoor_airflow")),
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
