namespace BinEnergy.Core.Study.Results;

/// <summary>One design condition of a case and the outdoor-air load at it (from the outdoor-air engine), in SI.</summary>
/// <param name="Condition">Name: <c>heating_99_6</c>, <c>cooling_0_4</c> or <c>dehumidification_0_4</c>.</param>
/// <param name="DryBulbC">Dry-bulb of the design state (mean coincident dry-bulb for dehumidification), C.</param>
/// <param name="WetBulbC">Wet-bulb of the design state, C.</param>
/// <param name="DewPointC">Dew point of the design state, C.</param>
/// <param name="HumidityRatio">Humidity ratio of the design state, kg/kg.</param>
/// <param name="SensibleW">Sensible load at the condition (heating for the heating condition), W, with recovery.</param>
/// <param name="LatentW">Latent load (humidification for the heating condition), W, with recovery.</param>
/// <param name="TotalW">Sensible plus latent, W, with recovery.</param>
/// <param name="TotalWithoutRecoveryW">The same total without the recovery device, W.</param>
public sealed record PeakFigures(string Condition, double DryBulbC, double WetBulbC, double DewPointC, double HumidityRatio,
    double SensibleW, double LatentW, double TotalW, double TotalWithoutRecoveryW);
