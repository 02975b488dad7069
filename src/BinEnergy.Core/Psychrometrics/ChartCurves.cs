namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// The curves a dry-bulb vs humidity-ratio psychrometric chart is drawn with, computed from
/// the moist-air relations of ASHRAE Handbook—Fundamentals (2017), chapter 1: the saturation
/// curve (eq. 23 through <see cref="Saturation.HumidityRatio"/>), lines of constant relative
/// humidity (eq. 12 and eq. 20 through <see cref="MoistAir.HumidityRatioFromRelativeHumidity"/>),
/// and the region of outdoor states in which an economizer is enabled for a given high limit.
/// All in SI at one total pressure; charts convert to display units.
/// </summary>
/// <remarks>
/// Curves are sampled every <c>stepK</c> kelvin from <c>fromC</c> to <c>toC</c>, both ends
/// included. The range must lie inside the saturation equations' range (-100 to 200 C) and
/// below the boiling point at the pressure, otherwise <see cref="PsychrometricException"/>.
/// </remarks>
public static class ChartCurves
{
    /// <summary>Default sampling step along dry-bulb, K (smooth at report size).</summary>
    public const double DefaultStepK = 0.5;

    /// <summary>The relative humidities of the usual chart grid, 20 % steps below saturation (0 to 1).</summary>
    public static IReadOnlyList<double> RelativeHumiditySteps { get; } = [0.2, 0.4, 0.6, 0.8];

    /// <summary>Saturation humidity ratio W_s(t) at the pressure (Handbook ch. 1, eq. 23).</summary>
    public static IReadOnlyList<ChartPoint> SaturationCurve(double fromC, double toC, double pressurePa, double stepK = DefaultStepK) =>
        Sample(fromC, toC, stepK, t => Saturation.HumidityRatio(t, pressurePa));

    /// <summary>
    /// Humidity ratio at a constant relative humidity (0 to 1): p_w = RH p_ws(t)
    /// (Handbook ch. 1, eq. 12), then eq. 20.
    /// </summary>
    public static IReadOnlyList<ChartPoint> RelativeHumidityCurve(double relativeHumidity, double fromC, double toC, double pressurePa, double stepK = DefaultStepK) =>
        Sample(fromC, toC, stepK, t => MoistAir.HumidityRatioFromRelativeHumidity(t, relativeHumidity, pressurePa));

    /// <summary>
    /// Humidity ratio on a line of constant moist-air enthalpy (J per kg of dry air, 0 C datum):
    /// Handbook ch. 1, eq. 32, h = 1006 t + W (2,501,000 + 1860 t), solved for W. Negative
    /// results (the line lies below dry air at this dry-bulb) are returned as they are.
    /// </summary>
    public static double HumidityRatioAtEnthalpy(double dryBulbC, double enthalpyJPerKg) =>
        (enthalpyJPerKg - MoistAir.DryAirSpecificHeat * dryBulbC) / (MoistAir.LatentHeat + MoistAir.VapourSpecificHeat * dryBulbC);

    /// <summary>
    /// The polygon of outdoor states (dry-bulb from <paramref name="fromC"/> up to the
    /// dry-bulb high limit) in which the economizer is enabled: below the saturation curve and,
    /// when given, below the enthalpy limit line (eq. 32) and below the humidity ratio of the
    /// dew-point limit (eq. 20 at the saturation pressure of the dew point). Fixed and
    /// differential controls share this shape; for a differential control pass the return-air
    /// dry-bulb, enthalpy or dew point as the limit. Vertices run along the top boundary from
    /// left to right, then down to W = 0 and back; an empty list when the limit is at or below
    /// <paramref name="fromC"/>.
    /// </summary>
    /// <param name="fromC">Left edge of the chart, C.</param>
    /// <param name="pressurePa">Total pressure, Pa.</param>
    /// <param name="dryBulbLimitC">Dry-bulb above which the economizer is off, C.</param>
    /// <param name="enthalpyLimitJPerKg">Enthalpy above which it is off (0 C datum), or null.</param>
    /// <param name="dewPointLimitC">Dew point above which it is off, C, or null.</param>
    /// <param name="stepK">Sampling step along dry-bulb, K.</param>
    public static IReadOnlyList<ChartPoint> EconomizerRegion(
        double fromC,
        double pressurePa,
        double dryBulbLimitC,
        double? enthalpyLimitJPerKg = null,
        double? dewPointLimitC = null,
        double stepK = DefaultStepK)
    {
        if (!(dryBulbLimitC > fromC))
        {
            return [];
        }

        double dewPointCap = dewPointLimitC is double dp ? MoistAir.HumidityRatioFromDewPoint(dp, pressurePa) : double.PositiveInfinity;
        double Top(double t)
        {
            double w = Math.Min(Saturation.HumidityRatio(t, pressurePa), dewPointCap);
            if (enthalpyLimitJPerKg is double h)
            {
                w = Math.Min(w, HumidityRatioAtEnthalpy(t, h));
            }

            return Math.Max(w, 0.0);
        }

        var top = Sample(fromC, dryBulbLimitC, stepK, Top);
        var polygon = new List<ChartPoint>(top.Count + 2);
        polygon.AddRange(top);
        polygon.Add(new ChartPoint(dryBulbLimitC, 0.0));
        polygon.Add(new ChartPoint(fromC, 0.0));
        return polygon;
    }

    private static List<ChartPoint> Sample(double fromC, double toC, double stepK, Func<double, double> humidityRatio)
    {
        if (!(stepK > 0.0) || !double.IsFinite(fromC) || !double.IsFinite(toC) || toC < fromC)
        {
            throw new ArgumentException(FormattableString.Invariant(
                $"chart range {fromC} to {toC} C with step {stepK} K is not a finite increasing range with a positive step"));
        }

        int steps = (int)Math.Ceiling((toC - fromC) / stepK - 1e-9);
        var points = new List<ChartPoint>(steps + 1);
        for (int i = 0; i <= steps; i++)
        {
            double t = i == steps ? toC : fromC + i * stepK;
            points.Add(new ChartPoint(t, humidityRatio(t)));
        }

        return points;
    }
}
