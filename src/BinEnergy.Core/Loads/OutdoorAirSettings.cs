using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// What an outdoor-air load estimate needs (DESIGN 7.1-7.3): the airflow (a volume flow, or
/// the ventilation rate procedure's people and area rates), how volume turns into mass (flow
/// basis), when the air runs, the indoor targets and an optional energy recovery device.
/// </summary>
/// <remarks>
/// The airflow must meet the code adopted locally and the judgement of the responsible
/// licensed engineer; these settings only estimate what that air costs.
/// </remarks>
public sealed record OutdoorAirSettings
{
    /// <summary>The outdoor airflow; when null, <see cref="Ventilation"/> gives it.</summary>
    public VolumeFlow? Airflow { get; init; }

    /// <summary>People and area rates (ASHRAE 62.1 ventilation rate procedure); the required minimum when <see cref="Airflow"/> is also given.</summary>
    public VentilationRate? Ventilation { get; init; }

    /// <summary>Flow basis (default <see cref="Psychrometrics.FlowBasis.Site"/>).</summary>
    public FlowBasis FlowBasis { get; init; } = FlowBasis.Site;

    /// <summary>When the air runs (default occupied hours).</summary>
    public VentilationOperation Operation { get; init; } = VentilationOperation.Occupied;

    /// <summary>The occupancy schedule (default always occupied).</summary>
    public OccupancySchedule Schedule { get; init; } = OccupancySchedule.Always;

    /// <summary>Heating setpoint T_h: outdoor air colder than this is heated to it.</summary>
    public required Temperature HeatTo { get; init; }

    /// <summary>Cooling setpoint T_c: outdoor air warmer than this is cooled to it.</summary>
    public required Temperature CoolTo { get; init; }

    /// <summary>Maximum indoor relative humidity at T_c, 0 to 1 (gives W_max).</summary>
    public required double MaxRelativeHumidity { get; init; }

    /// <summary>Minimum indoor relative humidity at T_h, 0 to 1 (gives W_min); no humidification when null.</summary>
    public double? MinRelativeHumidity { get; init; }

    /// <summary>
    /// Electric power of the fan that moves the outdoor air, per unit of outdoor airflow, W per m3/s
    /// (specific fan power; P = V dp / eta for a total pressure dp and efficiency eta, see
    /// <see cref="Plant.FanPower"/>). Charged in every ventilated hour in proportion to the hour's
    /// airflow; zero (the default of the engine; studies give their own default) for none.
    /// </summary>
    public double VentilationFanWattsPerCubicMetrePerSecond { get; init; }

    /// <summary>An energy recovery device, or none.</summary>
    public EnergyRecoverySettings? Recovery { get; init; }

    /// <summary>
    /// Optional airflow multipliers by hour of the day (24 values, 0 to 1, index 0 for the hour
    /// beginning at 00:00 local time of the record): each ventilated hour's airflow is
    /// <see cref="EffectiveAirflow"/> times the hour's multiplier, e.g. demand-controlled
    /// ventilation (<see cref="VentilationRate.DemandControlledMultipliers"/>). Null for a
    /// constant airflow.
    /// </summary>
    /// <remarks>
    /// Reducing outdoor air below what the occupants need harms them: a profile must follow the
    /// locally adopted code and the responsible licensed engineer's control design.
    /// </remarks>
    public IReadOnlyList<double>? AirflowMultipliers { get; init; }

    /// <summary>The airflow multiplier of the hour beginning at <paramref name="hourOfDay"/> (1 without a profile).</summary>
    public double AirflowMultiplier(int hourOfDay) => AirflowMultipliers is { } profile ? profile[hourOfDay] : 1.0;

    /// <summary>
    /// Where the bin method evaluates each bin: by default at the mean dry-bulb of the bin's
    /// ventilated hours, which reproduces the hourly sensible loads; <see cref="BinEvaluationPoint.Midpoint"/>
    /// for the classic method that published bin tables (hours only) allow.
    /// </summary>
    public BinEvaluationPoint BinPoint { get; init; } = BinEvaluationPoint.MeanDryBulb;

    /// <summary>The airflow used: <see cref="Airflow"/>, else the ventilation rate procedure's V_oz.</summary>
    public VolumeFlow EffectiveAirflow => Airflow ?? Ventilation?.OutdoorAirflow
        ?? throw new InvalidOperationException("no airflow: give Airflow or Ventilation");

    /// <summary>What is wrong with the settings, one sentence each (empty when usable).</summary>
    public IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        if (Airflow is null && Ventilation is null)
        {
            problems.Add("no airflow: give a volume flow, or people and area rates");
        }

        if (Airflow is VolumeFlow v && !(v.CubicMetresPerSecond >= 0 && v.Cfm <= 1e7))
        {
            problems.Add(FormattableString.Invariant($"airflow {v.Cfm:0.#} cfm ({v.LitresPerSecond:0.#} L/s) must be zero or more and at most 10,000,000 cfm"));
        }

        if (Ventilation is not null)
        {
            problems.AddRange(Ventilation.Problems());
        }

        if (!(HeatTo.Celsius >= -30 && HeatTo.Celsius <= 40) || !(CoolTo.Celsius >= -30 && CoolTo.Celsius <= 40))
        {
            problems.Add(FormattableString.Invariant($"setpoints must lie between -30 C and 40 C (-22 F and 104 F); got heating {Describe(HeatTo)}, cooling {Describe(CoolTo)}"));
        }
        else if (HeatTo > CoolTo)
        {
            problems.Add(FormattableString.Invariant($"the heating setpoint {Describe(HeatTo)} is above the cooling setpoint {Describe(CoolTo)}"));
        }

        if (!(MaxRelativeHumidity > 0 && MaxRelativeHumidity <= 1))
        {
            problems.Add(FormattableString.Invariant($"maximum indoor RH {MaxRelativeHumidity * 100:0.#} % must be above 0 and at most 100 %"));
        }

        if (MinRelativeHumidity is double min && !(min > 0 && min < 1))
        {
            problems.Add(FormattableString.Invariant($"minimum indoor RH {min * 100:0.#} % must be above 0 and below 100 %"));
        }

        else if (MinRelativeHumidity is double lo && MaxRelativeHumidity > 0 && problems.Count == 0
            && lo * Saturation.VapourPressurePa(HeatTo.Celsius) >= MaxRelativeHumidity * Saturation.VapourPressurePa(CoolTo.Celsius))
        {
            // Comparing vapour pressures compares humidity ratios at any one total pressure (Handbook ch. 1, eq. 20).
            problems.Add(FormattableString.Invariant(
                $"minimum RH {lo * 100:0.#} % at the heating setpoint holds as much water as the maximum RH {MaxRelativeHumidity * 100:0.#} % at the cooling setpoint or more: lower the minimum or raise the maximum"));
        }

        if (AirflowMultipliers is { } profile && (profile.Count != 24 || profile.Any(f => !(f >= 0 && f <= 1))))
        {
            problems.Add(FormattableString.Invariant($"the airflow multipliers must be 24 values (one per hour of the day), each from 0 to 1; got {profile.Count} values"));
        }

        if (Recovery is not null)
        {
            problems.AddRange(Recovery.Problems());
        }

        return problems;
    }

    private static string Describe(Temperature t) => FormattableString.Invariant($"{t.Celsius:0.#} C ({t.Fahrenheit:0.#} F)");
}
