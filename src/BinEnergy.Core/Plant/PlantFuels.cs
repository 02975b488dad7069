using System.Runtime.CompilerServices;

namespace BinEnergy.Core.Plant;

/// <summary>
/// Joules bought per end use and fuel, not yet priced: the hourly sums add these and price each total once
/// (<see cref="PlantModel.Price(in PlantFuels)"/>), which equals the sum of the hours' prices since a tariff is linear in
/// the joules. Allocates nothing.
/// </summary>
public struct PlantFuels
{
    private Uses uses;

    /// <summary>Adds <paramref name="joules"/> of <paramref name="fuel"/> to one end use.</summary>
    public void Add(EndUse use, Fuel fuel, double joules) => uses[(int)use].Add(fuel, joules);

    /// <summary>Adds joules per fuel to one end use.</summary>
    public void Add(EndUse use, in FuelJoules joules) => uses[(int)use].Add(in joules);

    /// <summary>Adds another set.</summary>
    public void Add(in PlantFuels other)
    {
        for (int i = 0; i < PlantEnergy.EndUseCount; i++)
        {
            uses[i].Add(in other.uses[i]);
        }
    }

    /// <summary>The joules per fuel of one end use.</summary>
    public readonly FuelJoules this[EndUse use] => uses[(int)use];

    [InlineArray(PlantEnergy.EndUseCount)]
    private struct Uses
    {
        private FuelJoules element;
    }
}
