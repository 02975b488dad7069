namespace BinEnergy.Core.Loads;

/// <summary>One calendar month's outdoor-air figures by the three methods.</summary>
/// <param name="Month">Month number, 1-12.</param>
/// <param name="Figures">The month's figures: hourly sum; joint bins (each month x dry-bulb x humidity cell); the bin method (the month's own dry-bulb bins).</param>
public sealed record OutdoorAirMonth(int Month, ByMethod<EnergyFigures> Figures);
