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

    /// <summary>Dew point in C from vapour pressure in Pa (eqs. 5 and 6 inverted), over water or over ice below 0 C.</summary>
    public static double DewPointFromVapourPressure(double vapourPressurePa, HumidityOver over = HumidityOver.Ice)
    {
        if (!(vapourPressurePa > 0))
        {
            return Saturation.MinTemperatureC;
        }

        double target = Math.Log(vapourPressurePa);

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
    /// Newton between the frost or dew point and the dry-bulb where that bracket lies on one side of 0 C (the root is
    /// unique there); elsewhere, or where Newton fails, the reference solver itself. Air at or above saturation at its
    /// dry-bulb (over ice below 0 C: a weather record's RH over water can reach past it) has its dry-bulb as wet-bulb.
    /// </summary>
    public static double WetBulb(double dryBulbC, double humidityRatio, double pressurePa)
    {
        if (humidityRatio >= Saturation.HumidityRatio(dryBulbC, pressurePa))
        {
            return dryBulbC;
        }

        double low = DewPoint(humidityRatio, pressurePa, dryBulbC); // over ice below 0 C: the bracket MoistAir.WetBulb uses
        if (dryBulbC - low < 1e-3 || (low < 0.0 && dryBulbC > 0.0))
        {
            return MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
        }

        bool water = low >= 0.0;
        // Eq. 33 (water) or 35 (ice): W(t*) = (A(t*) W_s* - 1.006 (t - t*)) / D(t*), A = a0 - a1 t*, D = d0 + 1.86 t - d1 t*.
        double a0 = water ? 2501.0 : 2830.0, a1 = water ? 2.326 : 0.24, d0 = water ? 2501.0 : 2830.0, d1 = water ? 4.186 : 2.1;
        double Residual(double ts)
        {
            double pws = Math.Exp(Saturation.LnVapourPressure(ts));
            double ws = MoistAir.MolecularMassRatio * pws / (pressurePa - pws);
            return ((a0 - a1 * ts) * ws - 1.006 * (dryBulbC - ts)) / (d0 + 1.86 * dryBulbC - d1 * ts) - humidityRatio;
        }

        double Slope(double ts)
        {
            double pws = Math.Exp(Saturation.LnVapourPressure(ts));
            double ws = MoistAir.MolecularMassRatio * pws / (pressurePa - pws);
            double dws = MoistAir.MolecularMassRatio * pressurePa * pws * Saturation.LnVapourPressureDerivative(ts) / ((pressurePa - pws) * (pressurePa - pws));
            double n = (a0 - a1 * ts) * ws - 1.006 * (dryBulbC - ts);
            double d = d0 + 1.86 * dryBulbC - d1 * ts;
            return ((-a1 * ws + (a0 - a1 * ts) * dws + 1.006) * d + d1 * n) / (d * d);
        }

        // First guess: a third of the way down from the dry-bulb to the dew point (common practice, a rough rule).
        double guess = dryBulbC - (dryBulbC - low) / 3.0;
        return NewtonRaphson.TryFindRoot(Residual, Slope, guess, low, dryBulbC, Accuracy * 1e-3, 50, out double root)
            ? root
            : MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
    }
}
