using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The named hourly columns an <see cref="HourlyWeather"/> is built from, all in SI and all one entry per hour. The
/// dew point, wet-bulb and enthalpy are derived where not given.
/// </summary>
public sealed record HourlyColumns
{
    /// <summary>Start of each hour in local standard time (for a typical year, in the calendar year chosen for weekdays).</summary>
    public required DateTime[] Times { get; init; }

    /// <summary>Dry-bulb per hour, C.</summary>
    public required double[] DryBulbC { get; init; }

    /// <summary>Humidity ratio per hour, kg/kg.</summary>
    public required double[] HumidityRatio { get; init; }

    /// <summary>Station pressure per hour, Pa (the site pressure where the file has none).</summary>
    public required double[] PressurePa { get; init; }

    /// <summary>Dew point per hour, C, in the <see cref="HumidityOver"/> convention; derived from the humidity ratio when null.</summary>
    public double[]? DewPointC { get; init; }

    /// <summary>Thermodynamic wet-bulb per hour, C; solved (Handbook ch. 1, eqs. 33 and 35) when null.</summary>
    public double[]? WetBulbC { get; init; }

    /// <summary>Enthalpy per hour, J/kg dry air (0 C datum); computed (Handbook ch. 1, eq. 32) when null.</summary>
    public double[]? EnthalpyJPerKg { get; init; }

    /// <summary>What the dew points (and the file's RH) are relative to below 0 C; liquid water by default.</summary>
    public HumidityOver HumidityOver { get; init; } = HumidityOver.Water;
}
