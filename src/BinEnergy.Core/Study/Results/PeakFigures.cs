namespace BinEnergy.Core.Study.Results;

/// <summary>One design condition of a case and the outdoor-air load at it, in SI.</summary>
/// <param name="Condition">Name, e.g. <c>heating_99_6</c>, <c>cooling_0_4</c>, <c>dehumidification_0_4</c>.</param>
/// <param name="DryBulbC">Dry-bulb of the condition, C.</param>
/// <param name="CoincidentC">The coincident temperature (mean coincident wet-bulb for cooling, dew point for dehumidification, else NaN), C.</param>
/// <param name="HumidityRatio">Humidity ratio of the condition, kg/kg.</param>
/// <param name="SensibleW">Sensible outdoor-air load at the condition, W (heating positive for heating conditions).</param>
/// <param name="LatentW">Latent outdoor-air load at the condition, W.</param>
/// <param name="TotalW">Total outdoor-air load at the condition, W.</param>
public sealed record PeakFigures(string Condition, double DryBulbC, double CoincidentC, double HumidityRatio, double SensibleW, double LatentW, double TotalW);
