using MathNet.Numerics.RootFinding;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Fast inverse solvers for reading a year of weather: dew point and thermodynamic wet-bulb
/// by MathNet's Newton-Raphson from a close first guess, with the analytic derivative of the
/// same handbook equations <see cref="MoistAir"/> uses (ASHRAE Handbook—Fundamentals 2017,
/// ch. 1, eqs. 5, 6, 20, 23, 33 and 35). Two or three steps reach the root; when Newton does not
/// converge inside the bracket, the call falls back to the Brent-based <see cref="MoistAir"/>
/// functions, so the result is the same root either way.
/// </summary>
internal static class HourlyStateSolver
{
    /// <summary>
    /// Newton stops after a step smaller than this, K. The returned point is the one after that step, and with
    /// quadratic convergence it is good to about (f''/2f') x step^2, below 1e-7 K for these functions.
    /// </summary>
    private const double Accuracy = 1e-3;

    /// <summary>Step limit of the dew-point solve, K (ln p_ws bends more at low temperature, so a tighter stop is used).</summary>
    private const double DewPointAccuracy = 1e-6;

    /// <summary>Dew point in C from vapour pressure in Pa (eqs. 5 and 6 inverted).</summary>
    public static double DewPointFromVapourPressure(double vapourPressurePa)
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
        if (NewtonRaphson.TryFindRoot(t => Saturation.LnVapourPressure(t) - target, Saturation.LnVapourPressureDerivative,
                guess, Saturation.MinTemperatureC, Saturation.MaxTemperatureC, DewPointAccuracy, 50, out double root))
        {
            return root;
        }

        return MoistAir.DewPointFromVapourPressure(vapourPressurePa);
    }

    /// <summary>Dew point in C from humidity ratio (eq. 20 inverted, then eqs. 5 and 6), never above the dry-bulb; -100 C for dry air.</summary>
    public static double DewPoint(double humidityRatio, double pressurePa, double dryBulbC) =>
        humidityRatio > 0
            ? Math.Min(DewPointFromVapourPressure(MoistAir.VapourPressureFromHumidityRatio(humidityRatio, pressurePa)), dryBulbC)
            : Saturation.MinTemperatureC;

    /// <summary>
    /// Thermodynamic wet-bulb in C from dry-bulb, humidity ratio and pressure, given the dew point
    /// (the lower end of the bracket): eqs. 33 (t* at or above 0 C) and 35 (below) solved for t*.
    /// </summary>
    public static double WetBulb(double dryBulbC, double humidityRatio, double pressurePa, double dewPointC) =>
        new WetBulbProblem().Solve(dryBulbC, humidityRatio, pressurePa, dewPointC, 1.0 / 3.0);

    /// <summary>
    /// One wet-bulb problem at a time, reused hour after hour so that the Newton delegates are made once;
    /// each evaluation of eqs. 33/35 is kept so the derivative at the same point costs nothing more.
    /// </summary>
    internal sealed class WetBulbProblem
    {
        private readonly Func<double, double> f;
        private readonly Func<double, double> df;
        private double t, p, w, lastX = double.NaN, lastF, lastDf;

        public WetBulbProblem()
        {
            f = Evaluate;
            df = Derivative;
        }

        /// <summary>
        /// Solves one state. <paramref name="depressionRatio"/> is the first guess of (t - t*) / (t - t_dew): a third
        /// (common practice) on its own, or the previous hour's ratio when solving a record hour by hour.
        /// </summary>
        public double Solve(double dryBulbC, double humidityRatio, double pressurePa, double dewPointC, double depressionRatio)
        {
            double low = Math.Min(dewPointC, dryBulbC);
            if (dryBulbC - low < 1e-9)
            {
                return dryBulbC;
            }

            (t, p, w, lastX) = (dryBulbC, pressurePa, humidityRatio, double.NaN);
            double guess = dryBulbC - (dryBulbC - low) * Math.Clamp(depressionRatio, 0.01, 0.99);
            // Near 0 C eqs. 33 and 35 disagree (the wet-bulb/ice-bulb switch), so a very dry state can satisfy both, one
            // on each side of 0 C; there the Brent solver of MoistAir decides, so both paths give the same root.
            if (NewtonRaphson.TryFindRoot(f, df, guess, low, dryBulbC, Accuracy, 50, out double root) && root >= low && root <= dryBulbC
                && Math.Abs(root) > 1.5)
            {
                return root;
            }

            return MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
        }

        private double Evaluate(double x)
        {
            lastX = x;
            lastF = WFromWetBulb(t, x, p, out lastDf) - w;
            return lastF;
        }

        private double Derivative(double x)
        {
            if (x != lastX)
            {
                Evaluate(x);
            }

            return lastDf;
        }
    }

    /// <summary>Eqs. 33 and 35 with W_s* from eq. 23, and their derivative in t*.</summary>
    private static double WFromWetBulb(double t, double ts, double p, out double derivative)
    {
        double ln = Saturation.LnVapourPressure(ts);
        double pws = Math.Exp(ln);
        double dpws = pws * Saturation.LnVapourPressureDerivative(ts);
        double ws = MoistAir.MolecularMassRatio * pws / (p - pws);
        double dws = MoistAir.MolecularMassRatio * p * dpws / ((p - pws) * (p - pws));
        double a, b, c;
        if (ts >= 0.0)
        {
            (a, b, c) = (2501.0, 2.326, 4.186);
        }
        else
        {
            (a, b, c) = (2830.0, 0.24, 2.1);
        }

        double n = (a - b * ts) * ws - 1.006 * (t - ts);
        double d = a + 1.86 * t - c * ts;
        double dn = -b * ws + (a - b * ts) * dws + 1.006;
        derivative = (dn * d + n * c) / (d * d);
        return n / d;
    }
}
