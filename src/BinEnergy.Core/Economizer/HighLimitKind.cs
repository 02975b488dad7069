namespace BinEnergy.Core.Economizer;

/// <summary>
/// The high-limit rule that decides when an air-side economizer is disabled (DESIGN 8).
/// The names are the trade's own terms for these rules.
/// </summary>
public enum HighLimitKind
{
    /// <summary>No economizer: the outdoor-air damper stays at its minimum (the baseline).</summary>
    None,

    /// <summary>Disabled when the outdoor dry-bulb is above a fixed limit.</summary>
    FixedDryBulb,

    /// <summary>Disabled when the outdoor dry-bulb is above the return-air dry-bulb.</summary>
    DifferentialDryBulb,

    /// <summary>Disabled when the outdoor enthalpy is above a fixed limit or the dry-bulb above the dry-bulb limit.</summary>
    FixedEnthalpy,

    /// <summary>Disabled when the outdoor enthalpy is above the return-air enthalpy or the dry-bulb above the dry-bulb limit.</summary>
    DifferentialEnthalpy,

    /// <summary>Disabled when the outdoor dew point is above a fixed limit or the dry-bulb above the dry-bulb limit.</summary>
    FixedDewPoint,
}
