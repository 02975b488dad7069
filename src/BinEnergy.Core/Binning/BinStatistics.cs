using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>
/// The hours of one bin and one occupancy class, with their mean weather (DESIGN 6): mean
/// dry-bulb, mean coincident humidity ratio (the mean of W over the bin's hours), mean
/// coincident wet-bulb (the mean of the hourly wet-bulbs, not the wet-bulb of the mean state)
/// and mean enthalpy (0 C datum inside). Means are NaN when the bin has no hours.
/// </summary>
public sealed record BinStatistics(
    int Hours,
    Temperature MeanDryBulb,
    HumidityRatio MeanHumidityRatio,
    Temperature MeanWetBulb,
    SpecificEnthalpy MeanEnthalpy)
{
    /// <summary>A bin class with no hours.</summary>
    public static BinStatistics Empty { get; } = new(0, Temperature.FromCelsius(double.NaN),
        HumidityRatio.FromKilogramsPerKilogram(double.NaN), Temperature.FromCelsius(double.NaN),
        SpecificEnthalpy.FromJoulesPerKilogram(double.NaN));

    /// <summary>The statistics of one occupancy class out of the three.</summary>
    public static BinStatistics Pick(OccupancyClass occupancy, BinStatistics all, BinStatistics occupied, BinStatistics unoccupied) => occupancy switch
    {
        OccupancyClass.All => all,
        OccupancyClass.Occupied => occupied,
        OccupancyClass.Unoccupied => unoccupied,
        _ => throw new ArgumentOutOfRangeException(nameof(occupancy), occupancy, "unknown occupancy class"),
    };

    /// <summary>True when no hour falls in this bin and class.</summary>
    public bool IsEmpty => Hours == 0;
}
