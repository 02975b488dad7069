namespace BinEnergy.Reporting.Charts.Data;

/// <summary>
/// The high limit whose enabled region a psychrometric chart shades, in SI (as
/// <see cref="BinEnergy.Core.Psychrometrics.ChartCurves.EconomizerRegion"/> takes it). For a
/// differential control pass the return-air dry-bulb, enthalpy or dew point.
/// </summary>
/// <param name="Label">Legend text, e.g. "Economizer enabled (fixed dry-bulb 65 F)".</param>
/// <param name="DryBulbLimitC">Dry-bulb above which the economizer is off, C.</param>
/// <param name="EnthalpyLimitJPerKg">Enthalpy limit, J/kg dry air, 0 C datum, or null.</param>
/// <param name="DewPointLimitC">Dew-point limit, C, or null.</param>
public sealed record EconomizerRegionLimits(string Label, double DryBulbLimitC, double? EnthalpyLimitJPerKg = null, double? DewPointLimitC = null);
