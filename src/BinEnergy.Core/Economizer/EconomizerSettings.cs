using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// The air system whose economizer is evaluated (DESIGN 8): supply flow (constant, or variable
/// between a minimum and a maximum), minimum outdoor airflow, flow basis, supply and return
/// conditions, the building's sensible load line, the coil-leaving humidity limit, the
/// controls to compare and their fixed high limits. <see cref="Validate"/> names every
/// problem by key; <see cref="EconomizerModel"/> validates before it computes.
/// </summary>
public sealed record EconomizerSettings
{
    /// <summary>Supply airflow: the constant flow, or the maximum of a variable-volume system.</summary>
    public required VolumeFlow SupplyAirflow { get; init; }

    /// <summary>
    /// How the system meets the load (default <see cref="AirSystemType.VariableVolume"/>); the
    /// baseline is the same type without an economizer.
    /// </summary>
    public AirSystemType System { get; init; } = AirSystemType.VariableVolume;

    /// <summary>
    /// Minimum supply airflow of a variable-volume system; null gives the default
    /// (<see cref="DefaultMinimumFraction"/> of the maximum, not below the minimum outdoor airflow).
    /// Only a variable-volume system may set it.
    /// </summary>
    public VolumeFlow? SupplyAirflowMin { get; init; }

    /// <summary>
    /// The supply-temperature reset of a variable-volume system by outdoor dry-bulb; null for a
    /// fixed supply temperature. Only a variable-volume system may set it.
    /// </summary>
    public SupplyTemperatureReset? Reset { get; init; }

    /// <summary>Minimum outdoor airflow (the ventilation the damper never goes below).</summary>
    public required VolumeFlow MinOutdoorAirflow { get; init; }

    /// <summary>
    /// How the volume flows turn into mass flows of dry air (DESIGN 7.1): <c>standard</c>,
    /// <c>site</c> (default), or <c>actual</c>, which for the economizer uses the dry-air
    /// density of the coil-entering (mixed) state at the site pressure for both the supply
    /// and the outdoor airflow.
    /// </summary>
    public FlowBasis FlowBasis { get; init; } = FlowBasis.Site;

    /// <summary>Supply-air (coil-leaving) dry-bulb T_s.</summary>
    public required Temperature SupplyTemperature { get; init; }

    /// <summary>Return-air dry-bulb T_r.</summary>
    public required Temperature ReturnTemperature { get; init; }

    /// <summary>Return-air relative humidity, 0 to 1.</summary>
    public required double ReturnRelativeHumidity { get; init; }

    /// <summary>The building's sensible cooling load line.</summary>
    public required BuildingLoadLine LoadLine { get; init; }

    /// <summary>Relative humidity of the air leaving the cooling coil at its wettest, 0 to 1 (default 0.90).</summary>
    public double CoilLeavingRelativeHumidity { get; init; } = 0.90;

    /// <summary>
    /// The supply fan at the (maximum) supply airflow, or none (the default of the engine; studies
    /// give their own). Drawn through the coil: its heat raises the supply air, so the coil cools to
    /// the supply temperature less the fan's temperature rise.
    /// </summary>
    public AirSystemFan? SupplyFan { get; init; }

    /// <summary>The return fan at the (maximum) supply airflow, or none: its heat raises the return air before the mixing box.</summary>
    public AirSystemFan? ReturnFan { get; init; }

    /// <summary>The part-load curve of a variable-volume system's fans (default <see cref="FanPartLoadCurve.Default"/>); constant-volume fans run at design power.</summary>
    public FanPartLoadCurve FanCurve { get; init; } = FanPartLoadCurve.Default;

    /// <summary>The controls compared with the baseline (default: the five economizer controls, integrated).</summary>
    public IReadOnlyList<EconomizerControl> Controls { get; init; } =
        EconomizerControl.EconomizerKinds.Select(k => new EconomizerControl(k, Integrated: true)).ToArray();

    /// <summary>The fixed high limits (default <see cref="HighLimits.Suggested"/>).</summary>
    public HighLimits Limits { get; init; } = HighLimits.Suggested;

    /// <summary>
    /// Where the bin method evaluates each bin (and each joint cell): the mean dry-bulb of its
    /// occupied hours (default, as for the outdoor-air loads) or its midpoint (the classic method).
    /// </summary>
    public BinEvaluationPoint BinPoint { get; init; } = BinEvaluationPoint.MeanDryBulb;

    /// <summary>
    /// Default minimum airflow of a variable-volume system as a fraction of its maximum: 0.30, a
    /// common terminal minimum (recalled from memory; the energy code adopted locally limits the
    /// airflow that may be reheated, and the ventilation code sets the outdoor air).
    /// </summary>
    public const double DefaultMinimumFraction = 0.30;

    /// <summary>True when the supply flow varies with the load.</summary>
    public bool IsVariableVolume => System == AirSystemType.VariableVolume;

    /// <summary>True when a variable-volume system's minimum airflow is the default, not the user's.</summary>
    public bool MinimumAirflowIsDefault => IsVariableVolume && !SupplyAirflowMin.HasValue;

    /// <summary>
    /// The smallest supply airflow: the set minimum of a variable-volume system, else its default
    /// (the larger of <see cref="DefaultMinimumFraction"/> of the maximum and the minimum outdoor
    /// airflow); the constant airflow of the other types.
    /// </summary>
    public VolumeFlow MinimumSupplyAirflow => !IsVariableVolume
        ? SupplyAirflow
        : SupplyAirflowMin ?? VolumeFlow.FromCubicMetresPerSecond(Math.Min(SupplyAirflow.CubicMetresPerSecond,
            Math.Max(DefaultMinimumFraction * SupplyAirflow.CubicMetresPerSecond, MinOutdoorAirflow.CubicMetresPerSecond)));

    /// <summary>True when the limits are the suggested defaults (recalled from memory), not the user's.</summary>
    public bool LimitsAreSuggested => Limits == HighLimits.Suggested;

    /// <summary>True when <paramref name="other"/> describes the same system and controls (the controls compared in order, by value).</summary>
    public bool SameSystemAs(EconomizerSettings other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return Controls.SequenceEqual(other.Controls) && this with { Controls = other.Controls } == other;
    }

    /// <summary>The same settings with every control made integrated or non-integrated.</summary>
    public EconomizerSettings WithIntegration(bool integrated) =>
        this with { Controls = Controls.Select(c => c with { Integrated = integrated }).ToArray() };

    /// <summary>Every problem with these settings; empty when they describe a workable system.</summary>
    public IReadOnlyList<EconomizerSettingsProblem> Problems()
    {
        var problems = new List<EconomizerSettingsProblem>();
        void Add(string key, string message) => problems.Add(new(key, message));

        double vs = SupplyAirflow.CubicMetresPerSecond;
        if (!(vs > 0) || !double.IsFinite(vs))
        {
            Add("supply_airflow", "the supply airflow must be above zero");
        }

        double vsMin = MinimumSupplyAirflow.CubicMetresPerSecond;
        if (SupplyAirflowMin.HasValue && !IsVariableVolume)
        {
            Add("supply_airflow_min", $"a minimum supply airflow belongs to a variable-volume system, but system is \"{AirSystemTypes.Name(System)}\": leave supply_airflow_min out or set system = \"variable-volume\"");
        }
        else if (SupplyAirflowMin.HasValue && !(vsMin > 0 && vsMin <= vs))
        {
            Add("supply_airflow_min", "the minimum supply airflow must be above zero and not above the (maximum) supply airflow");
        }

        if (Reset is not null)
        {
            if (!IsVariableVolume)
            {
                Add("supply_temp_reset_max", $"a supply-temperature reset belongs to a variable-volume system, but system is \"{AirSystemTypes.Name(System)}\" (a single-zone system's supply temperature already follows the load)");
            }
            else
            {
                problems.AddRange(Reset.Problems(SupplyTemperature, ReturnTemperature));
            }
        }

        double voa = MinOutdoorAirflow.CubicMetresPerSecond;
        if (!(voa >= 0) || !double.IsFinite(voa))
        {
            Add("min_outdoor_airflow", "the minimum outdoor airflow must be zero or more");
        }
        else if (voa > vsMin * (1 + 1e-12))
        {
            Add("min_outdoor_airflow", IsVariableVolume
                ? "the minimum outdoor airflow is above the minimum supply airflow: the outdoor air is part of the supply air, so raise the minimum supply airflow or lower the outdoor airflow"
                : "the minimum outdoor airflow is above the supply airflow: the outdoor air is part of the supply air");
        }

        if (!(ReturnTemperature.Celsius > SupplyTemperature.Celsius))
        {
            Add("supply_temp", "the supply temperature must be below the return temperature");
        }

        if (!(SupplyTemperature.Celsius >= 0 && SupplyTemperature.Celsius <= 30))
        {
            Add("supply_temp", "the supply temperature must be between 0 and 30 C (32 to 86 F) for a cooling coil");
        }

        if (!(ReturnTemperature.Celsius >= 5 && ReturnTemperature.Celsius <= 45))
        {
            Add("return_temp", "the return temperature must be between 5 and 45 C (41 to 113 F)");
        }

        if (!(ReturnRelativeHumidity >= 0 && ReturnRelativeHumidity < 1))
        {
            Add("return_rh", "the return relative humidity must be from 0 up to (not including) 100 %");
        }

        if (!(CoilLeavingRelativeHumidity > 0 && CoilLeavingRelativeHumidity <= 1))
        {
            Add("coil_leaving_rh", "the coil-leaving relative humidity must be above 0 and at most 100 %");
        }

        problems.AddRange(LoadLine.Problems());
        if (SupplyFan is not null)
        {
            problems.AddRange(SupplyFan.Problems("supply_fan"));
        }

        if (ReturnFan is not null)
        {
            problems.AddRange(ReturnFan.Problems("return_fan"));
        }

        if (IsVariableVolume && vs > 0 && (SupplyFan is not null || ReturnFan is not null))
        {
            problems.AddRange(FanCurve.Problems(vsMin / vs));
        }

        if (Controls.Count == 0)
        {
            Add("controls", "name at least one control to compare with the baseline");
        }

        var seen = new HashSet<string>();
        foreach (var c in Controls)
        {
            if (!seen.Add(c.Describe()))
            {
                Add("controls", $"the control {c.Describe()} is listed twice");
            }
        }

        return problems;
    }

    /// <summary>Throws <see cref="EconomizerSettingsException"/> listing every problem, or returns these settings.</summary>
    public EconomizerSettings Validate()
    {
        var problems = Problems();
        if (problems.Count > 0)
        {
            throw new EconomizerSettingsException(problems);
        }

        return this;
    }
}
