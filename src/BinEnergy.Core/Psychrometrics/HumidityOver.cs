namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// What a dew point and a relative humidity are relative to below 0 C: saturation over liquid
/// (supercooled) water, or over ice. Above the triple point both are over liquid water.
/// </summary>
public enum HumidityOver
{
    /// <summary>
    /// Over liquid water at every temperature: the meteorological convention for dew points and RH in
    /// weather records (recalled from memory: the WMO reports humidity relative to water, also below 0 C).
    /// Saturation pressure from Handbook ch. 1, eq. 6, extended below 0 C.
    /// </summary>
    Water,

    /// <summary>
    /// Over ice below the triple point (a frost point): the handbook's definitions (ch. 1, eqs. 5 and 6), and the
    /// reference library psychrolib's.
    /// </summary>
    Ice,
}

/// <summary>The humidity conventions in words, for messages and outputs.</summary>
public static class HumidityConventions
{
    /// <summary>The reading of a dew point under a convention, e.g. "over liquid water".</summary>
    public static string Words(HumidityOver over) => over == HumidityOver.Water ? "over liquid water" : "as frost points (over ice)";

    /// <summary>A record's convention in one sentence.</summary>
    public static string Describe(HumidityOver over) => over == HumidityOver.Water
        ? "over liquid water at every temperature (the usual weather convention; humidity_over = \"ice\" reads frost points)"
        : "below 0 C, dew points as frost points and RH over ice (humidity_over = \"ice\")";
}
