using BinEnergy.Core.Binning;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>The state at which the bin methods evaluate a dry-bulb bin or a joint cell.</summary>
public static class BinEvaluation
{
    /// <summary>
    /// The dry-bulb, C, at which a bin (or cell) with midpoint <paramref name="mid"/> and the
    /// statistics <paramref name="hours"/> of the hours that count is evaluated: their mean
    /// dry-bulb for <see cref="BinEvaluationPoint.MeanDryBulb"/>, else (or without hours) the midpoint.
    /// </summary>
    public static double DryBulbC(BinEvaluationPoint point, Temperature mid, in CellStatistics hours) =>
        point == BinEvaluationPoint.MeanDryBulb && hours.Hours > 0 ? hours.MeanDryBulbC : mid.Celsius;
}
