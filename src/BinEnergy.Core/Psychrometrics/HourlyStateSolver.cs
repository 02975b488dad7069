using MathNet.Numerics.RootFinding;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Fast scalar solvers for reading a year of weather: MathNet's Newton-Raphson from a close first guess, with the
/// analytic derivative of the same handbook equations <see cref="MoistAir"/> uses (ASHRAE Handbook—Fundamentals 2017,
/// ch. 1: dew point from eqs. 5, 6 and 20; wet-bulb from eqs. 33 and 35). Two to four steps reach the root; where
/// Newton does not converge inside the bracket, or the root may not be unique, the call falls back to the Brent-based
/// <see cref="MoistAir"/> function, which is the reference the tests hold these to on every hour of the real files.
/// </summary>
internal static class HourlyStateSolver
{
    /// <summary>
    /// Newton stops after a step smaller than this, K. The returned point is the one after that step, and with
    /// quadratic convergence it is good to about (f''/2f') x step^2 (ln p_ws bends more at low temperature, so the stop is tight).
    /// </summary>
    private const double Accuracy = 1e-6;

    /// <summary>ln p_ws at the equations' lowest temperature, -100 C, over water and over ice.</summary>
    private static readonly double LnAtMinimumOverWater = Saturation.LnVapourPressure(Saturation.MinTemperatureC, HumidityOver.Water);

    private static readonly double LnAtMinimumOverIce = Saturation.LnVapourPressure(Saturation.MinTemperatureC, HumidityOver.Ice);

    /// <summary>Dew point in C from vapour pressure in Pa (eqs. 5 and 6 inverted), over water or over ice below 0 C; -100 C (the equations' lower end) for less vapour.</summary>
    public static double DewPointFromVapourPressure(double vapourPressurePa, HumidityOver over = HumidityOver.Ice)
    {
        double target = Math.Log(vapourPressurePa);
        if (!(target > (over == HumidityOver.Water ? LnAtMinimumOverWater : LnAtMinimumOverIce)))
        {
            return Saturation.MinTemperatureC; // dry air, or so little vapour that its dew point is below the equations' -100 C
        }

        // First guess: the Magnus form over water, p_ws = 611.2 exp(17.62 t / (243.12 + t)) (WMO 2008, Guide to
        // Meteorological Instruments, annex 4.B); within about 1 K of eqs. 5 and 6 between -40 and 50 C.
        double g = target - Math.Log(611.2);
        double guess = Math.Clamp(243.12 * g / (17.62 - g), Saturation.MinTemperatureC + 1, Saturation.MaxTemperatureC - 1);
        if (NewtonRaphson.TryFindRoot(t => Saturation.LnVapourPressure(t, over) - target, t => Saturation.LnVapourPressureDerivative(t, over),
                guess, Saturation.MinTemperatureC, Saturation.MaxTemperatureC, Accuracy, 50, out double root))
        {
            return root;
        }

        return MoistAir.DewPointFromVapourPressure(vapourPressurePa, over);
    }

    /// <summary>Dew point in C from humidity ratio (eq. 20 inverted, then eqs. 5 and 6), never above the dry-bulb; -100 C for dry air.</summary>
    public static double DewPoint(double humidityRatio, double pressurePa, double dryBulbC, HumidityOver over = HumidityOver.Ice) =>
        humidityRatio > 0
            ? Math.Min(DewPointFromVapourPressure(MoistAir.VapourPressureFromHumidityRatio(humidityRatio, pressurePa), over), dryBulbC)
            : Saturation.MinTemperatureC;

    /// <summary>
    /// Thermodynamic wet-bulb in C (eqs. 33 and 35 solved for t*), the same root as <see cref="MoistAir.WetBulb"/>:
    /// Newton between a lower bound (the dew or frost point) and the dry-bulb, on the side of 0 C the root lies on where
    /// that bracket straddles it; where the root is not unique, or Newton fails, the reference solver itself. Air at or above
    /// saturation at its dry-bulb (over ice below 0 C: a weather record's RH over water can reach past it) has its
    /// dry-bulb as wet-bulb.
    /// </summary>
    /// <param name="dryBulbC">Dry-bulb, C.</param>
    /// <param name="humidityRatio">Humidity ratio, kg/kg.</param>
    /// <param name="pressurePa">Total pressure, Pa.</param>
    /// <param name="dewPointC">The dew point over water or over ice (either is a lower bound of the wet-bulb); null: solved here.</param>
    public static double WetBulb(double dryBulbC, double humidityRatio, double pressurePa, double? dewPointC = null)
    {
        if (humidityRatio >= Saturation.HumidityRatio(dryBulbC, pressurePa))
        {
            return dryBulbC; // at or above saturation (eq. 23)
        }

        double low = Math.Min(dewPointC ?? DewPoint(humidityRatio, pressurePa, dryBulbC), dryBulbC);
        if (dryBulbC - low < 1e-3)
        {
            return MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
        }

        double high = dryBulbC;
        var residual = new WetBulbResidual(dryBulbC, humidityRatio, pressurePa, water: low >= 0.0);
        if (low < 0.0 && dryBulbC > 0.0)
        {
            // Eqs. 33 (t* at or above 0 C, over water) and 35 (below, over ice) do not meet at 0 C. Where both residuals
            // have the same sign at 0 C, the root is unique and on the side that sign points to (each residual rises
            // with t*), and Newton finds it on that side; where they differ (a narrow band with a root on each side, or
            // the step at 0 C itself), the reference solver's bisection picks it, as psychrolib does.
            var overWater = new WetBulbResidual(dryBulbC, humidityRatio, pressurePa, water: true);
            double atZeroOverIce = residual.Value(0.0), atZeroOverWater = overWater.Value(0.0);
            if (atZeroOverWater < 0 && atZeroOverIce < 0)
            {
                (low, residual) = (0.0, overWater);
            }
            else if (atZeroOverWater > 0 && atZeroOverIce > 0)
            {
                high = 0.0;
            }
            else
            {
                return MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
            }
        }

        // First guess: a third of the way down from the top of the bracket to its bottom (common practice, a rough rule).
        return NewtonRaphson.TryFindRoot(residual.Value, residual.Slope, high - (high - low) / 3.0, low, high, Accuracy * 1e-3, 50, out double root)
            ? root
            : MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
    }

    /// <summary>
    /// Eq. 33 (wet bulb over water) or 35 (ice bulb) as a residual in t*: W(t*) - W with W(t*) = (A W_s* - 1.006 (t - t*)) / D,
    /// A = a0 - a1 t*, D = a0 + 1.86 t - d1 t*, and its derivative; the saturation state of the last t* is kept, as
    /// Newton asks for the value and the slope at the same point.
    /// </summary>
    private sealed class WetBulbResidual(double t, double w, double p, bool water)
    {
        private readonly double a0 = water ? 2501.0 : 2830.0, a1 = water ? 2.326 : 0.24, d1 = water ? 4.186 : 2.1;
        private double at = double.NaN, ws, dws;

        public double Value(double ts)
        {
            Saturate(ts);
            return ((a0 - a1 * ts) * ws - 1.006 * (t - ts)) / (a0 + 1.86 * t - d1 * ts) - w;
        }

        public double Slope(double ts)
        {
            Saturate(ts);
            double n = (a0 - a1 * ts) * ws - 1.006 * (t - ts);
            double d = a0 + 1.86 * t - d1 * ts;
            return ((-a1 * ws + (a0 - a1 * ts) * dws + 1.006) * d + d1 * n) / (d * d);
        }

        /// <summary>W_s* (eq. 23) and its derivative at t*.</summary>
        private void Saturate(double ts)
        {
            if (ts == at)
            {
                return;
            }

            double pws = Math.Exp(Saturation.LnVapourPressure(ts));
            ws = MoistAir.MolecularMassRatio * pws / (p - pws);
            dws = MoistAir.MolecularMassRatio * p * pws * Saturation.LnVapourPressureDerivative(ts) / ((p - pws) * (p - pws));
            at = ts;
        }
    }
}
