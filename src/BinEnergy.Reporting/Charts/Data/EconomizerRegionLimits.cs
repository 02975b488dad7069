using BinEnergy.Core.Economizer;
using BinEnergy.Core.Units;

namespace BinEnergy.Reporting.Charts.Data;

/// <summary>
/// The high limit whose enabled region a psychrometric chart shades, in SI (as
/// <see cref="BinEnergy.Core.Psychrometrics.ChartCurves.EconomizerRegion"/> takes it). For a
/// differential control pass the return-air dry-bulb, enthalpy or dew point;
/// <see cref="For"/> does that for a control of an economizer model.
/// </summary>
/// <param name="Label">Legend text, e.g. "Economizer enabled (fixed dry-bulb 65 F)".</param>
/// <param name="DryBulbLimitC">Dry-bulb above which the economizer is off, C.</param>
/// <param name="EnthalpyLimitJPerKg">Enthalpy limit, J/kg dry air, 0 C datum, or null.</param>
/// <param name="DewPointLimitC">Dew-point limit, C, or null.</param>
public sealed record EconomizerRegionLimits(string Label, double DryBulbLimitC, double? EnthalpyLimitJPerKg = null, double? DewPointLimitC = null)
{
    /// <summary>The control the region belongs to, as the other charts name it (e.g.
    /// "differential-enthalpy (integrated)"); shown in the chart title. Empty when not known.</summary>
    public string ControlName { get; init; } = "";

    /// <summary>
    /// The region in which <paramref name="control"/> enables the economizer of
    /// <paramref name="model"/>: its high limit (DESIGN 8) and, for every control, outdoor air
    /// cooler than the return air (<see cref="EconomizerModel.IsEnabled"/>). A fixed limit uses
    /// the settings' value, a differential limit the return air's; the dry-bulb edge is the lower
    /// of the dry-bulb limit (where the control has one) and the return dry-bulb.
    /// </summary>
    /// <exception cref="ArgumentException">The control is the no-economizer baseline, which has no region.</exception>
    public static EconomizerRegionLimits For(EconomizerControl control, EconomizerModel model, UnitSystem units)
    {
        ArgumentNullException.ThrowIfNull(model);
        var limits = model.Settings.Limits;
        double returnC = model.Settings.ReturnTemperature.Celsius;
        double dryBulb = Math.Min(limits.DryBulb.Celsius, returnC);
        var (edge, enthalpy, dewPoint) = control.Kind switch
        {
            HighLimitKind.FixedDryBulb => (dryBulb, (double?)null, (double?)null),
            HighLimitKind.DifferentialDryBulb => (returnC, null, null),
            HighLimitKind.FixedEnthalpy => (dryBulb, limits.Enthalpy.JoulesPerKilogram, null),
            HighLimitKind.DifferentialEnthalpy => (dryBulb, model.ReturnEnthalpyJPerKg, null),
            HighLimitKind.FixedDewPoint => (dryBulb, null, limits.DewPoint.Celsius),
            _ => throw new ArgumentException($"control '{control.Describe()}' has no economizer, so no enabled region to draw", nameof(control)),
        };

        string text = control.LimitsText(limits, units);
        string symbol = units == UnitSystem.IP ? "F" : "C";
        if (control.Kind != HighLimitKind.DifferentialDryBulb && returnC < limits.DryBulb.Celsius)
        {
            text += FormattableString.Invariant($", below return air {model.Settings.ReturnTemperature.In(units):0.#} {symbol}");
        }

        return new EconomizerRegionLimits($"Economizer enabled ({text})", edge, enthalpy, dewPoint) { ControlName = control.Describe() };
    }
}
