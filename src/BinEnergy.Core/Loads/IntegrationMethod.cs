namespace BinEnergy.Core.Loads;

/// <summary>
/// How a figure is integrated over the year (DESIGN 15). Every annual, monthly, bin and
/// economizer figure is computed by all three; a study names one as its headline.
/// </summary>
public enum IntegrationMethod
{
    /// <summary>The sum over the record's hours, each hour at its own state (the default headline).</summary>
    Hourly,

    /// <summary>
    /// Joint dry-bulb x humidity-ratio bins: each cell evaluated at its evaluation dry-bulb and
    /// mean humidity ratio, times its hours. Closes most of the latent and enthalpy-control error
    /// of one-dimensional bins.
    /// </summary>
    JointBin,

    /// <summary>
    /// The classic bin method: each dry-bulb bin evaluated at its evaluation point (the mean
    /// dry-bulb of its hours by default, or its midpoint) and mean coincident humidity ratio,
    /// times its hours (ASHRAE Handbook—Fundamentals, ch. 19, bin method). The right tool when only
    /// bin data are at hand and to explain the year; it misses latent loads.
    /// </summary>
    Bin,
}
