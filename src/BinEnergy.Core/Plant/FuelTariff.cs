namespace BinEnergy.Core.Plant;

/// <summary>
/// The price and carbon factor of one fuel, both per joule of the fuel's heat content (or of
/// electricity), so that any billing unit converts once at the edge: a price per therm is
/// divided by 105,505,585.262 J (1 therm = 100,000 Btu, 1 Btu = 1055.05585262 J), a price per
/// kWh by 3.6e6 J.
/// </summary>
/// <param name="PricePerJoule">Money per joule of fuel bought (currency of the study).</param>
/// <param name="CarbonKgPerJoule">Kilograms of CO2-equivalent per joule of fuel bought.</param>
public sealed record FuelTariff(double PricePerJoule, double CarbonKgPerJoule)
{
    /// <summary>A fuel the study gives no price or carbon factor for: both zero.</summary>
    public static FuelTariff Free { get; } = new(0.0, 0.0);
}
