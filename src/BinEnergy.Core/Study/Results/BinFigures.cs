namespace BinEnergy.Core.Study.Results;

/// <summary>One dry-bulb bin of one case: its edges (C), hours, mean coincident humidity and the bin-method loads.</summary>
/// <param name="LowC">Lower edge (inclusive), C.</param>
/// <param name="HighC">Upper edge (exclusive), C.</param>
/// <param name="MidC">Midpoint, C.</param>
/// <param name="EvaluatedAtC">Dry-bulb at which the bin method evaluated the loads (the mean of the ventilated hours, or the midpoint), C.</param>
/// <param name="Hours">Hours in the bin.</param>
/// <param name="HoursOccupied">Occupied hours in the bin.</param>
/// <param name="MeanHumidityRatio">Mean coincident humidity ratio, kg/kg.</param>
/// <param name="MeanCoincidentWetBulbC">Mean coincident wet-bulb, C.</param>
/// <param name="Loads">Loads of the bin (bin method).</param>
public sealed record BinFigures(
    double LowC,
    double HighC,
    double MidC,
    double EvaluatedAtC,
    int Hours,
    int HoursOccupied,
    double MeanHumidityRatio,
    double MeanCoincidentWetBulbC,
    LoadFigures Loads);
