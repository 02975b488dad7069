namespace BinEnergy.Core.Psychrometrics;

/// <summary>One point of a psychrometric chart curve, in SI: dry-bulb in C, humidity ratio
/// in kg of water per kg of dry air.</summary>
public readonly record struct ChartPoint(double DryBulbC, double HumidityRatio);
