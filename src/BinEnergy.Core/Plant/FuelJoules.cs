namespace BinEnergy.Core.Plant;

/// <summary>
/// Joules bought per fuel, not yet priced: sums of hours are priced once (<see cref="PlantModel.Price(in FuelJoules)"/>), which
/// gives the sum of the hours' prices because a tariff is a price and a carbon factor per joule (DESIGN 9).
/// </summary>
public struct FuelJoules
{
    /// <summary>Electricity, J.</summary>
    public double ElectricityJ;

    /// <summary>Gas heat content, J.</summary>
    public double GasJ;

    /// <summary>Oil heat content, J.</summary>
    public double OilJ;

    /// <summary>Adds <paramref name="joules"/> of <paramref name="fuel"/>.</summary>
    public void Add(Fuel fuel, double joules)
    {
        switch (fuel)
        {
            case Fuel.Electricity:
                ElectricityJ += joules;
                break;
            case Fuel.Gas:
                GasJ += joules;
                break;
            default:
                OilJ += joules;
                break;
        }
    }

    /// <summary>Adds another set of joules.</summary>
    public void Add(in FuelJoules other)
    {
        ElectricityJ += other.ElectricityJ;
        GasJ += other.GasJ;
        OilJ += other.OilJ;
    }
}
