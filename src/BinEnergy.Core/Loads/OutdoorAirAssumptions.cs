using BinEnergy.Core.Binning;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>The assumptions behind an outdoor-air estimate, for outputs to state.</summary>
/// <param name="Airflow">The outdoor airflow used.</param>
/// <param name="FlowBasis">How volume became mass of dry air.</param>
/// <param name="DryAirDensity">Dry-air density of the flow basis, kg/m3 (for <c>actual</c>, the mean over the ventilated hours).</param>
/// <param name="Factors">Airflow factors at that density and W = 0 (the site's "1.08").</param>
/// <param name="SitePressure">Site pressure for the indoor targets and the site basis.</param>
/// <param name="HeatTo">Heating setpoint.</param>
/// <param name="CoolTo">Cooling setpoint.</param>
/// <param name="MaxRelativeHumidity">Maximum indoor RH at the cooling setpoint, 0 to 1.</param>
/// <param name="MinRelativeHumidity">Minimum indoor RH at the heating setpoint, 0 to 1, or none.</param>
/// <param name="MaxHumidityRatio">W_max.</param>
/// <param name="MinHumidityRatio">W_min, or none.</param>
/// <param name="Operation">When the air runs.</param>
/// <param name="Schedule">The occupancy schedule's text.</param>
/// <param name="BinScale">The dry-bulb bins.</param>
/// <param name="BinPoint">Where the bin method evaluates each bin.</param>
/// <param name="Recovery">The recovery device, or none.</param>
/// <param name="FanPenalty">Added fan power of the recovery device while air flows through it.</param>
/// <param name="Calendar">How the record's hours sit on the calendar.</param>
public sealed record OutdoorAirAssumptions(
    VolumeFlow Airflow,
    FlowBasis FlowBasis,
    double DryAirDensity,
    AirflowFactors Factors,
    Pressure SitePressure,
    Temperature HeatTo,
    Temperature CoolTo,
    double MaxRelativeHumidity,
    double? MinRelativeHumidity,
    HumidityRatio MaxHumidityRatio,
    HumidityRatio? MinHumidityRatio,
    VentilationOperation Operation,
    string Schedule,
    DryBulbBinScale BinScale,
    BinEvaluationPoint BinPoint,
    EnergyRecoverySettings? Recovery,
    Power FanPenalty,
    string Calendar)
{
    /// <summary>The humidity-ratio bins of the joint-bin method.</summary>
    public HumidityBinScale HumidityScale { get; init; } = HumidityBinScale.Default(BinScale.Units);

    /// <summary>Power of the fan that moves the outdoor air at the design airflow (zero for none).</summary>
    public Power VentilationFanPower { get; init; }

    /// <summary>The daylight-saving rule the schedule's clock follows.</summary>
    public Schedules.DaylightSaving DaylightSaving { get; init; }
}
