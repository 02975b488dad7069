namespace BinEnergy.Core.Plant;

/// <summary>
/// Energy bought at the site, per fuel, in joules (of electricity, or of the fuel's heat
/// content), with its cost and carbon. Adds up across hours, bins and end uses.
/// </summary>
/// <param name="ElectricityJ">Electricity, J.</param>
/// <param name="GasJ">Gas heat content, J.</param>
/// <param name="OilJ">Oil heat content, J.</param>
/// <param name="Cost">Money, in the study's currency.</param>
/// <param name="CarbonKg">Kilograms of CO2-equivalent.</param>
public readonly record struct SiteEnergy(double ElectricityJ, double GasJ, double OilJ, double Cost, double CarbonKg)
{
    /// <summary>Nothing bought.</summary>
    public static SiteEnergy Zero => default;

    /// <summary>Joules of one fuel.</summary>
    public double Of(Fuel fuel) => fuel switch
    {
        Fuel.Electricity => ElectricityJ,
        Fuel.Gas => GasJ,
        Fuel.Oil => OilJ,
        _ => throw new ArgumentOutOfRangeException(nameof(fuel), fuel, "unknown fuel"),
    };

    /// <summary><paramref name="joules"/> of <paramref name="fuel"/> priced and weighed with its tariff.</summary>
    public static SiteEnergy Buy(Fuel fuel, double joules, FuelTariff tariff) => new(
        fuel == Fuel.Electricity ? joules : 0.0,
        fuel == Fuel.Gas ? joules : 0.0,
        fuel == Fuel.Oil ? joules : 0.0,
        joules * tariff.PricePerJoule,
        joules * tariff.CarbonKgPerJoule);

    /// <summary>Every amount multiplied by <paramref name="factor"/>.</summary>
    public SiteEnergy Scaled(double factor) => new(ElectricityJ * factor, GasJ * factor, OilJ * factor, Cost * factor, CarbonKg * factor);

    public static SiteEnergy operator +(SiteEnergy a, SiteEnergy b) => new(
        a.ElectricityJ + b.ElectricityJ, a.GasJ + b.GasJ, a.OilJ + b.OilJ, a.Cost + b.Cost, a.CarbonKg + b.CarbonKg);

    public static SiteEnergy operator -(SiteEnergy a, SiteEnergy b) => new(
        a.ElectricityJ - b.ElectricityJ, a.GasJ - b.GasJ, a.OilJ - b.OilJ, a.Cost - b.Cost, a.CarbonKg - b.CarbonKg);
}
