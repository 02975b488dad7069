namespace BinEnergy.Core.Climate;

/// <summary>A cooling design condition: the dry-bulb exceeded in a given share of the hours, with its mean coincident wet-bulb.</summary>
/// <param name="AnnualPercent">Share of the hours above the design dry-bulb, percent (0.4, 1 or 2).</param>
/// <param name="DryBulbC">The design dry-bulb, C.</param>
/// <param name="MeanCoincidentWetBulbC">Mean wet-bulb of the hours at the data level nearest the design dry-bulb (<see cref="BinEnergy.Core.Climate.CoincidentHours"/>), C.</param>
/// <param name="CoincidentHours">How many hours that mean is taken over.</param>
public sealed record CoolingDesignPoint(double AnnualPercent, double DryBulbC, double MeanCoincidentWetBulbC, int CoincidentHours);
