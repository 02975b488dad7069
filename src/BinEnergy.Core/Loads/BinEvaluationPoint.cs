namespace BinEnergy.Core.Loads;

/// <summary>
/// Where the bin method evaluates each bin's loads. The default is <see cref="MeanDryBulb"/>: with
/// 5 F bins the midpoint misses the hourly heating by up to 4.5 % and the sensible cooling by
/// 5 to 8 % on the six real check files, the mean dry-bulb by less than 0.1 % (docs/loads.md).
/// </summary>
public enum BinEvaluationPoint
{
    /// <summary>
    /// The bin's midpoint dry-bulb with its mean coincident humidity ratio: the classic bin
    /// method (DESIGN 7.2; ASHRAE Handbook—Fundamentals, ch. 19, bin method), usable with
    /// published bin tables that give hours only.
    /// </summary>
    Midpoint,

    /// <summary>
    /// The mean dry-bulb of the bin's ventilated hours with their mean coincident humidity
    /// ratio (the default). Sensible loads are linear in the dry-bulb within a bin that lies
    /// wholly on one side of a setpoint, so this reproduces the hourly sensible loads except in
    /// the bin that holds the setpoint.
    /// </summary>
    MeanDryBulb,
}
