using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// The fixed high-limit set points of the economizer controls (DESIGN 8): a dry-bulb limit
/// (the whole rule of <see cref="HighLimitKind.FixedDryBulb"/>, and the companion dry-bulb
/// limit of the enthalpy and dew-point controls), an enthalpy limit and a dew-point limit.
/// The differential controls compare with the return air instead and ignore these values
/// (except the companion dry-bulb limit).
/// </summary>
/// <remarks>
/// The enthalpy limit is a <see cref="SpecificEnthalpy"/> so that a limit given in IP
/// (0 F datum) converts through the state to SI (0 C datum): 28 Btu/lb is about
/// 47.2 kJ/kg, not the 65.1 kJ/kg a bare factor of 2.326 would give.
/// </remarks>
/// <param name="DryBulb">Dry-bulb limit: above it the economizer is disabled.</param>
/// <param name="Enthalpy">Outdoor enthalpy limit of the fixed-enthalpy control.</param>
/// <param name="DewPoint">Outdoor dew-point limit of the fixed-dew-point control.</param>
public sealed record HighLimits(Temperature DryBulb, SpecificEnthalpy Enthalpy, Temperature DewPoint)
{
    /// <summary>
    /// Suggested limits: 75 F dry-bulb, 28 Btu/lb enthalpy (about 47.2 kJ/kg), 55 F dew point.
    /// Recalled from memory of the high-limit tables in energy standards for dry and marine
    /// climates (humid climates often use a lower dry-bulb limit, 65 to 70 F, and several
    /// codes forbid some controls in some climate zones). They are starting values only:
    /// the energy code adopted where the building stands governs the choice.
    /// </summary>
    public static HighLimits Suggested { get; } = new(
        Temperature.FromFahrenheit(75.0), // recalled from memory
        SpecificEnthalpy.FromBtuPerPound(28.0), // recalled from memory
        Temperature.FromFahrenheit(55.0)); // recalled from memory

    /// <summary>The note shown beside the suggested limits.</summary>
    public const string SuggestedNote =
        "suggested high limits (75 F / 23.9 C dry-bulb, 28 Btu/lb / 47.2 kJ/kg enthalpy, 55 F / 12.8 C dew point) are recalled from memory, not taken from a code table; " +
        "the energy code adopted locally governs the choice of control and limit";
}
