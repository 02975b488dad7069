using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>
/// Resolves a variant's tables into the engines' settings (outdoor air, recovery, schedule,
/// bins, plant, economizer). Problems the engines' own checks find are reported as study-file
/// errors at the key's line.
/// </summary>
public static class StudyCaseBuilder
{
    /// <summary>Builds every climate x variant case of a study (climates outer, variants inner).</summary>
    public static IReadOnlyList<StudyCase> Build(StudyDefinition study)
    {
        var perVariant = study.Variants.Select(v => (Variant: v, Parts: BuildVariant(study, v))).ToList();
        return study.Climates.SelectMany(c => perVariant.Select(p => p.Parts with { Climate = c })).ToList();
    }

    /// <summary>The occupancy schedule and dry-bulb bin scale of a study's base variant (for the commands that only bin weather).</summary>
    public static (OccupancySchedule Schedule, DryBulbBinScale Scale) Binning(StudyDefinition study) =>
        (Schedule(study.Variants[0].Sections["schedule"]), Scale(study, study.Variants[0].Sections["study"]));

    private static DryBulbBinScale Scale(StudyDefinition study, StudySection s) => s.Number("bin_width") is double k
        ? new DryBulbBinScale(TemperatureDifference.FromKelvin(k), study.Units)
        : DryBulbBinScale.Default(study.Units);

    private static StudyCase BuildVariant(StudyDefinition study, StudyVariant variant)
    {
        var s = variant.Sections;
        var assumptions = new List<string>();
        var schedule = Schedule(s["schedule"]);
        var outdoorAir = OutdoorAir(s["ventilation"], s["recovery"], s["plant"], schedule, assumptions) with
        {
            BinPoint = s["study"].Text("bin_point") is "midpoint" or "mid" ? BinEvaluationPoint.Midpoint : BinEvaluationPoint.MeanDryBulb,
        };
        var scale = Scale(study, s["study"]);
        var plant = s["plant"].Present ? PlantSettingsBuilder.Build(s["plant"], assumptions, DesignAirflow(s["economizer"], outdoorAir)) : null;
        if (plant is null)
        {
            assumptions.Add("no [plant] table: loads only; no energy bought, cost or carbon");
        }

        var economizer = EconomizerSettingsBuilder.Build(s["economizer"], outdoorAir, schedule, assumptions, s["plant"]);
        return new StudyCase(study.Climates[0], variant, outdoorAir, scale, plant, assumptions) { Economizer = economizer };
    }

    /// <summary>
    /// The design airflow a heat-pump capacity per unit of airflow multiplies, m3/s: the air system's
    /// supply airflow when the study has an enabled [economizer], else the ventilation airflow.
    /// </summary>
    private static (double CubicMetresPerSecond, string Source) DesignAirflow(StudySection economizer, OutdoorAirSettings outdoorAir) =>
        economizer.Present && economizer.Bool("enabled") != false && economizer.Number("supply_airflow") is double supply
            ? (supply, "economizer.supply_airflow")
            : ((outdoorAir.Airflow ?? outdoorAir.Ventilation?.OutdoorAirflow)?.CubicMetresPerSecond ?? 0.0, "the ventilation airflow");

    private static OccupancySchedule Schedule(StudySection schedule)
    {
        string text = schedule.Text("occupied") ?? "always";
        var holidays = new List<DateOnly>();
        foreach (var h in schedule.TextList("holidays") ?? [])
        {
            if (!DateOnly.TryParseExact(h, "yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture, System.Globalization.DateTimeStyles.None, out var d))
            {
                throw schedule.ErrorAt("holidays", $"\"{h}\" is not a date written as YYYY-MM-DD, e.g. \"2026-12-25\"");
            }

            holidays.Add(d);
        }

        var rule = schedule.Text("daylight_saving") switch
        {
            "north-america" => DaylightSaving.NorthAmerica,
            "europe" => DaylightSaving.Europe,
            _ => DaylightSaving.None,
        };
        try
        {
            return OccupancySchedule.Parse(text, holidays).WithDaylightSaving(rule);
        }
        catch (ScheduleSyntaxException e)
        {
            throw schedule.ErrorAt("occupied", e.Message);
        }
    }

    private static OutdoorAirSettings OutdoorAir(StudySection v, StudySection recovery, StudySection plant, OccupancySchedule schedule, List<string> assumptions)
    {
        if (!v.Present)
        {
            throw new StudyFileException(v.File, null, "ventilation",
                "the study has no [ventilation] table; add one with airflow_cfm (or airflow_ls), heat_to_f, cool_to_f and max_rh_pct");
        }

        VentilationRate? rate = null;
        bool anyRate = v.Has("people") || v.Has("area") || v.Has("per_person") || v.Has("per_area");
        if (anyRate)
        {
            rate = new VentilationRate(
                v.Number("people") ?? 0,
                VolumeFlow.FromCubicMetresPerSecond(v.Number("per_person") ?? 0),
                v.Number("area") ?? 0,
                (v.Number("per_area") ?? 0) * 1000.0,
                v.Number("zone_effectiveness") ?? 1.0);
            if (rate.BreathingZoneAirflow.CubicMetresPerSecond <= 0)
            {
                throw v.ErrorAt(v.Has("people") ? "people" : "area",
                    "people and area rates give no airflow: give people with per_person_cfm, and/or area_ft2 with per_area_cfm, all above zero");
            }
        }
        else if (v.Has("zone_effectiveness"))
        {
            throw v.ErrorAt("zone_effectiveness", "zone_effectiveness applies to the people-and-area rates; give people, per_person_cfm, area_ft2 and per_area_cfm too, or remove it");
        }

        double? airflow = v.Number("airflow");
        if (airflow is null && rate is null)
        {
            throw new StudyFileException(v.File, v.Line, "ventilation.airflow_cfm",
                "[ventilation] needs the outdoor airflow: airflow_cfm (or airflow_ls), or people, per_person_cfm, area_ft2 and per_area_cfm");
        }

        var multipliers = DemandControl(v, rate, airflow, assumptions);

        var heatTo = Temperature.FromCelsius(v.RequiredNumber("heat_to"));
        var coolTo = Temperature.FromCelsius(v.RequiredNumber("cool_to"));
        if (heatTo > coolTo)
        {
            throw v.ErrorAt("heat_to", "the heating setpoint is above the cooling setpoint; heat_to must be at or below cool_to");
        }

        var settings = new OutdoorAirSettings
        {
            Airflow = airflow is double a ? VolumeFlow.FromCubicMetresPerSecond(a) : null,
            Ventilation = rate,
            FlowBasis = FlowBasisOf(v.Text("flow_basis")),
            Operation = v.Text("operation") == "always" ? VentilationOperation.Always : VentilationOperation.Occupied,
            Schedule = schedule,
            HeatTo = heatTo,
            CoolTo = coolTo,
            MaxRelativeHumidity = v.RequiredNumber("max_rh_pct") / 100.0,
            MinRelativeHumidity = v.Number("min_rh_pct") is double min && min > 0 ? min / 100.0 : null,
            Recovery = Recovery(recovery, plant),
            AirflowMultipliers = multipliers,
            VentilationFanWattsPerCubicMetrePerSecond = VentilationFan(v, plant, assumptions),
        };
        if (!v.Has("flow_basis"))
        {
            assumptions.Add("flow basis site: dry air at 70 F (21.1 C) and the site pressure (ventilation.flow_basis not given)");
        }

        var problems = settings.Problems();
        if (problems.Count > 0)
        {
            throw new StudyFileException(v.File, v.Line, "ventilation", string.Join("; ", problems));
        }

        return settings;
    }

    /// <summary>
    /// The airflow multipliers of <c>occupancy_profile</c> (demand-controlled ventilation by the
    /// ventilation rate procedure: the people part follows the profile, the area part stays), or
    /// null without one.
    /// </summary>
    private static double[]? DemandControl(StudySection v, VentilationRate? rate, double? airflow, List<string> assumptions)
    {
        var profile = v.NumberList("occupancy_profile");
        if (profile is null)
        {
            return null;
        }

        if (airflow is not null || rate is null)
        {
            throw v.ErrorAt("occupancy_profile",
                "an occupancy profile resets the people part of the people-and-area rates, so it needs people, per_person_cfm (and area_ft2, per_area_cfm) without airflow_cfm; remove airflow_cfm (or airflow_ls) or remove occupancy_profile");
        }

        if (profile.Count != 24)
        {
            throw v.ErrorAt("occupancy_profile",
                $"give 24 fractions, one per hour of the day from the hour beginning 00:00 to the hour beginning 23:00; got {profile.Count}");
        }

        if (!(rate.People * rate.PerPerson.CubicMetresPerSecond > 0))
        {
            throw v.ErrorAt("occupancy_profile",
                "an occupancy profile resets the people part of the airflow, but people x per_person_cfm is zero; give people and per_person_cfm, or remove occupancy_profile");
        }

        var multipliers = rate.DemandControlledMultipliers(profile);
        assumptions.Add(FormattableString.Invariant(
            $"demand-controlled ventilation: hourly airflow (R_p P_z x occupancy fraction + R_a A_z) / E_z, from {multipliers.Min() * 100:0.#} % to {multipliers.Max() * 100:0.#} % of the design airflow; the occupancy fractions must reflect real occupancy and the control must meet the local code (too little outdoor air harms occupants)"));
        return multipliers;
    }

    /// <summary>
    /// Default total pressure of the ventilation fan, Pa: 1 in. w.g. (248.84 Pa, <see cref="Conversions.PascalsPerInchOfWater"/>)
    /// for moving outdoor air through an intake, filter and ducts (recalled from memory; the design
    /// of the system governs).
    /// </summary>
    public const double DefaultVentilationFanPressurePa = Conversions.PascalsPerInchOfWater;

    /// <summary>
    /// The ventilation fan's power per unit outdoor airflow, W per m3/s: <c>fan_power</c>, or
    /// <c>fan_pressure</c> (default <see cref="DefaultVentilationFanPressurePa"/>) over the plant's
    /// fan efficiency, P / V = dp / eta (<see cref="Plant.FanPower"/>).
    /// </summary>
    private static double VentilationFan(StudySection v, StudySection plant, List<string> assumptions)
    {
        if (v.Has("fan_power") && v.Has("fan_pressure"))
        {
            throw v.ErrorAt("fan_pressure", "give the ventilation fan either as fan_power or as fan_pressure (with plant.fan_efficiency), not both");
        }

        if (v.Number("fan_power") is double perFlow)
        {
            return perFlow;
        }

        double efficiency = plant.Number("fan_efficiency") ?? PlantSettingsBuilder.DefaultFanEfficiency;
        if (v.Number("fan_pressure") is double pressure)
        {
            return pressure / efficiency;
        }

        assumptions.Add(FormattableString.Invariant($"ventilation fan: 1 in. w.g. (250 Pa) total pressure at fan efficiency {efficiency:0.##} (recalled from memory; set ventilation.fan_power or fan_pressure, 0 for none)"));
        return DefaultVentilationFanPressurePa / efficiency;
    }

    private static EnergyRecoverySettings? Recovery(StudySection r, StudySection plant)
    {
        if (!r.Present || r.Bool("enabled") == false)
        {
            return null;
        }

        double es = r.Has("sensible_effectiveness") ? r.RequiredNumber("sensible_effectiveness") : throw r.Missing("sensible_effectiveness");
        if (r.Has("frost_limit") != r.Has("frost_effectiveness"))
        {
            throw r.ErrorAt(r.Has("frost_limit") ? "frost_limit" : "frost_effectiveness",
                "give frost_limit_f (or _c) and frost_effectiveness together, or neither");
        }

        double frost = r.Number("frost_effectiveness") ?? 0.0;
        if (frost > es)
        {
            throw r.ErrorAt("frost_effectiveness", "the effectiveness below the frost limit cannot exceed the sensible effectiveness");
        }

        var settings = new EnergyRecoverySettings
        {
            SensibleEffectiveness = es,
            LatentEffectiveness = r.Number("latent_effectiveness") ?? 0.0,
            FrostLimit = r.Number("frost_limit") is double f ? Temperature.FromCelsius(f) : null,
            FrostEffectiveness = frost,
            PressureDropPa = r.Number("pressure_drop") ?? 0.0,
            FanEfficiency = r.Number("fan_efficiency") ?? plant.Number("fan_efficiency") ?? PlantSettingsBuilder.DefaultFanEfficiency,
            BypassWhenIdle = r.Bool("bypass_when_idle") ?? false,
        };
        var problems = settings.Problems().ToList();
        if (problems.Count > 0)
        {
            throw new StudyFileException(r.File, r.Line, "recovery", string.Join("; ", problems));
        }

        return settings;
    }

    internal static FlowBasis FlowBasisOf(string? text) => text switch
    {
        "standard" => FlowBasis.Standard,
        "actual" => FlowBasis.Actual,
        _ => FlowBasis.Site,
    };
}
