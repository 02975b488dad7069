namespace BinEnergy.Core.Loads;

/// <summary>Where the bin method evaluates each bin's loads.</summary>
public enum BinEvaluationPoint
{
    /// <summary>
    /// The bin's midpoint dry-bulb with its mean coincident humidity ratio: the classic bin
    /// method (DESIGN 7.2), usable with published bin tables that give hours only.
    /// </summary>
    Midpoint,

    /// <summary>
    /// The bin's mean dry-bulb with its mean coincident humidity ratio. Sensible loads are
    /// linear in the dry-bulb within a bin that lies wholly on one side of a setpoint, so this
    /// reproduces the hourly sensible loads except in the bin that holds the setpoint.
    /// </summary>
    MeanDryBulb,
}
