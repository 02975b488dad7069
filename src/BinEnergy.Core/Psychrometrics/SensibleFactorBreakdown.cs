namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Why a state's sensible airflow factor departs from the trade's 1.08 Btu/(h cfm F): the ratio
/// split into factors that multiply to the whole (ASHRAE Handbook—Fundamentals 2017, ch. 1,
/// eq. 26 for the dry-air density and eq. 32 for the humid specific heat):
/// factor / 1.08 = pressure x temperature x moisture x rounding, with
/// pressure p / 101.325 kPa, temperature T_std / T (T_std the temperature at which dry sea-level
/// air weighs 0.075 lb/ft3), moisture (1.006 + 1.86 W) / 1.006 / (1 + 1.607858 W), and rounding
/// the exact standard-air factor over 1.08.
/// </summary>
/// <param name="Ratio">The state's sensible factor over 1.08.</param>
/// <param name="Pressure">The pressure part.</param>
/// <param name="Temperature">The temperature part.</param>
/// <param name="Moisture">The moisture part (humid specific heat against the thinner dry air).</param>
/// <param name="Rounding">The standard air's exact factor over 1.08.</param>
/// <param name="StandardAirTemperatureC">The temperature at which dry sea-level air weighs 0.075 lb/ft3, C.</param>
public sealed record SensibleFactorBreakdown(double Ratio, double Pressure, double Temperature, double Moisture, double Rounding, double StandardAirTemperatureC)
{
    /// <summary>The trade's shorthand sensible factor, Btu/(h cfm F) (common practice).</summary>
    public const double TradeFactor = 1.08;

    /// <summary>The breakdown of <paramref name="state"/>'s sensible factor.</summary>
    public static SensibleFactorBreakdown Of(AirState state)
    {
        ArgumentNullException.ThrowIfNull(state);
        double standardAirKelvin = Atmosphere.SeaLevelPressurePa / (MoistAir.DryAirGasConstant * FlowBasisDensity.StandardAirDensity);
        double w = state.HumidityRatio.KilogramsPerKilogram;
        return new SensibleFactorBreakdown(
            state.Factors.SensibleIp / TradeFactor,
            state.Pressure.Pascals / Atmosphere.SeaLevelPressurePa,
            standardAirKelvin / state.DryBulb.Kelvin,
            MoistAir.HumidSpecificHeat(w) / MoistAir.DryAirSpecificHeat / (1.0 + 1.607858 * w),
            AirflowFactors.StandardAir.SensibleIp / TradeFactor,
            standardAirKelvin - 273.15);
    }
}
