using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Charts.Data;

/// <summary>
/// Input of <see cref="PsychrometricChart"/>, all in display units: the hourly outdoor states
/// (dry-bulb, humidity ratio), the saturation curve, lines of constant relative humidity and,
/// optionally, the economizer's enabled region. The curves are computed in Core
/// (<see cref="ChartCurves"/>); <see cref="FromSi"/> does that and converts units.
/// </summary>
public sealed record PsychroChartData
{
    /// <summary>What the chart is about (climate), shown in the title; may be empty.</summary>
    public string Subject { get; init; } = "";

    /// <summary>Display unit of dry-bulb, e.g. "F".</summary>
    public required string TemperatureUnit { get; init; }

    /// <summary>Display unit of humidity ratio, e.g. "gr/lb" or "g/kg".</summary>
    public required string HumidityRatioUnit { get; init; }

    /// <summary>Note on the total pressure the curves are drawn at, e.g. "at 14.2 psia (site)"; may be empty.</summary>
    public string PressureNote { get; init; } = "";

    /// <summary>Dry-bulb of each hour.</summary>
    public required IReadOnlyList<double> HourDryBulb { get; init; }

    /// <summary>Humidity ratio of each hour, same length as <see cref="HourDryBulb"/>.</summary>
    public required IReadOnlyList<double> HourHumidityRatio { get; init; }

    /// <summary>The saturation curve (100 % RH) across the chart.</summary>
    public required ChartLine SaturationCurve { get; init; }

    /// <summary>Lines of constant relative humidity, each labelled (e.g. "20 %").</summary>
    public IReadOnlyList<ChartLine> RelativeHumidityLines { get; init; } = [];

    /// <summary>Polygon of the outdoor states where the economizer is enabled, or null.</summary>
    public ChartLine? EconomizerRegion { get; init; }

    /// <summary>The control whose region is drawn (e.g. "differential-enthalpy (integrated)"),
    /// named in the title; empty when there is no region or its control is not known.</summary>
    public string ControlName { get; init; } = "";

    /// <summary>Width of a density cell in the temperature unit; null picks about 45 cells across.</summary>
    public double? DryBulbCell { get; init; }

    /// <summary>Height of a density cell in the humidity-ratio unit; null picks about 30 cells up.</summary>
    public double? HumidityRatioCell { get; init; }

    /// <summary>
    /// Builds the chart input from SI hourly values (C, kg/kg) at one total pressure: curves
    /// from <see cref="ChartCurves"/> over the data's dry-bulb range (padded to whole 5 F or
    /// 5 C steps), RH lines at 20 % steps, the economizer region when limits are given, and
    /// display units F and gr/lb (IP) or C and g/kg (SI).
    /// </summary>
    public static PsychroChartData FromSi(
        string subject,
        IReadOnlyList<double> dryBulbC,
        IReadOnlyList<double> humidityRatio,
        double pressurePa,
        UnitSystem units,
        EconomizerRegionLimits? economizer = null)
    {
        if (dryBulbC.Count != humidityRatio.Count)
        {
            throw new ArgumentException($"dry-bulb has {dryBulbC.Count} hours but humidity ratio has {humidityRatio.Count}; they must match");
        }

        var u = new DisplayUnits(units);
        double step = 5.0 / u.TemperatureDifference.FromSi(1.0);
        double lo = dryBulbC.Count > 0 ? dryBulbC.Min() : -10.0;
        double hi = dryBulbC.Count > 0 ? dryBulbC.Max() : 40.0;
        double fromC = Temperature.From(Math.Floor(Temperature.FromCelsius(lo).In(units) / 5.0) * 5.0, units).Celsius;
        double toC = Temperature.From(Math.Ceiling(Temperature.FromCelsius(hi).In(units) / 5.0) * 5.0, units).Celsius;
        if (toC - fromC < step)
        {
            toC = fromC + step;
        }

        ChartLine Line(string label, IReadOnlyList<ChartPoint> points) =>
            new(label, points.Select(p => u.Temperature.FromSi(p.DryBulbC)).ToArray(), points.Select(p => u.Moisture.FromSi(p.HumidityRatio)).ToArray());

        var rh = ChartCurves.RelativeHumiditySteps
            .Select(r => Line(FormattableString.Invariant($"{r * 100:0} %"), ChartCurves.RelativeHumidityCurve(r, fromC, toC, pressurePa)))
            .ToArray();
        var region = economizer is null
            ? null
            : Line(economizer.Label, ChartCurves.EconomizerRegion(fromC, pressurePa, economizer.DryBulbLimitC, economizer.EnthalpyLimitJPerKg, economizer.DewPointLimitC));

        return new PsychroChartData
        {
            Subject = subject,
            TemperatureUnit = u.Temperature.Symbol,
            HumidityRatioUnit = u.Moisture.Symbol,
            PressureNote = "Curves drawn at " + DisplayUnits.Text(u.Pressure, pressurePa, "0.00"),
            HourDryBulb = dryBulbC.Select(u.Temperature.FromSi).ToArray(),
            HourHumidityRatio = humidityRatio.Select(u.Moisture.FromSi).ToArray(),
            SaturationCurve = Line("Saturation (100 %)", ChartCurves.SaturationCurve(fromC, toC, pressurePa)),
            RelativeHumidityLines = rh,
            EconomizerRegion = region,
            ControlName = economizer?.ControlName ?? "",
        };
    }
}
