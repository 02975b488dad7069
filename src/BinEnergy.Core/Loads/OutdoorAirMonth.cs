namespace BinEnergy.Core.Loads;

/// <summary>One calendar month's outdoor-air energy, summed hour by hour.</summary>
/// <param name="Month">Month number, 1-12.</param>
/// <param name="Totals">The month's totals (hourly method).</param>
public sealed record OutdoorAirMonth(int Month, OutdoorAirTotals Totals);
