using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Loads;

/// <summary>
/// The outdoor-air loads of a span (an hour, a bin, a month, a year) by one method, and the
/// energy the plant buys to meet them (zero when the estimate has no plant).
/// </summary>
/// <param name="Loads">The loads.</param>
/// <param name="Bought">The energy bought, per end use, with cost and carbon.</param>
public readonly record struct EnergyFigures(LoadVector Loads, PlantEnergy Bought)
{
    /// <summary>Nothing.</summary>
    public static EnergyFigures Zero => default;

    public static EnergyFigures operator +(in EnergyFigures a, in EnergyFigures b) => new(a.Loads + b.Loads, a.Bought + b.Bought);

    /// <summary>Loads and energy bought multiplied by <paramref name="factor"/>.</summary>
    public EnergyFigures Scaled(double factor) => new(Loads.Scaled(factor), Bought.Scaled(factor));
}
