using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// An air-to-air energy recovery device between the outdoor air and the exhaust (DESIGN 7.3):
/// sensible effectiveness e_s and latent effectiveness e_l, a frost limit below which the
/// effectiveness drops (defrost), and the pressure drop it adds on each air stream.
/// </summary>
public sealed record EnergyRecoverySettings
{
    /// <summary>Sensible effectiveness e_s, 0 to 1.</summary>
    public double SensibleEffectiveness { get; init; }

    /// <summary>Latent effectiveness e_l, 0 to 1 (0 for a sensible-only device).</summary>
    public double LatentEffectiveness { get; init; }

    /// <summary>Outdoor dry-bulb below which the device runs at <see cref="FrostEffectiveness"/>; none when null.</summary>
    public Temperature? FrostLimit { get; init; }

    /// <summary>
    /// Sensible effectiveness below the frost limit (default 0: no recovery while defrosting,
    /// the cautious assumption); the latent effectiveness falls in the same proportion.
    /// </summary>
    public double FrostEffectiveness { get; init; }

    /// <summary>Pressure drop the device adds on each of the two air streams, Pa.</summary>
    public double PressureDropPa { get; init; }

    /// <summary>
    /// Combined fan and motor efficiency for the added pressure drop (default 0.6, our
    /// assumption; a typical value for small fans, recalled from memory).
    /// </summary>
    public double FanEfficiency { get; init; } = 0.6;

    /// <summary>
    /// Whether the air bypasses the device in hours it does not recover (then the fan penalty
    /// applies only in recovering hours). Default false: the air always passes through it.
    /// </summary>
    public bool BypassWhenIdle { get; init; }

    /// <summary>What is wrong with the settings, one sentence each.</summary>
    public IEnumerable<string> Problems()
    {
        if (!(SensibleEffectiveness >= 0 && SensibleEffectiveness <= 1))
        {
            yield return FormattableString.Invariant($"sensible recovery effectiveness {SensibleEffectiveness} must be between 0 and 1 (e.g. 0.75)");
        }

        if (!(LatentEffectiveness >= 0 && LatentEffectiveness <= 1))
        {
            yield return FormattableString.Invariant($"latent recovery effectiveness {LatentEffectiveness} must be between 0 and 1 (0 for a sensible-only device)");
        }

        if (!(FrostEffectiveness >= 0 && FrostEffectiveness <= SensibleEffectiveness))
        {
            yield return FormattableString.Invariant($"frost effectiveness {FrostEffectiveness} must be between 0 and the sensible effectiveness {SensibleEffectiveness}");
        }

        if (!(PressureDropPa >= 0 && PressureDropPa <= 2500))
        {
            yield return FormattableString.Invariant($"recovery pressure drop {PressureDropPa} Pa must be between 0 and 2500 Pa (10 in. w.c.)");
        }

        if (!(FanEfficiency > 0 && FanEfficiency <= 1))
        {
            yield return FormattableString.Invariant($"fan efficiency {FanEfficiency} must be above 0 and at most 1");
        }
    }
}
