using MathNet.Numerics.RootFinding;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Fast inverse solvers for reading a year of weather: dew point and thermodynamic wet-bulb
/// by MathNet's Newton-Raphson from a close first guess, with the analytic derivative of the
/// same handbook equations <see cref="MoistAir"/> uses (ASHRAE Handbook—Fundamentals 2017,
/// ch. 1, eqs. 5, 6, 20, 23, 33 and 35). Two or three steps reach 1e-6 K; when Newton does not
/// converge inside the bracket, the call falls back to the Brent-based <see cref="MoistAir"/>
/// functions, so the result is the same root either way.
/// </summary>
internal static class HourlyStateSolver
{
    private const double Accuracy = 1e-6;

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
                guess, Saturation.MinTemperatureC, Saturation.MaxTemperatureC, Accuracy, 50, out double root))
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
    public static double WetBulb(double dryBulbC, double humidityRatio, double pressurePa, double dewPointC)
    {
        double low = Math.Min(dewPointC, dryBulbC);
        if (dryBulbC - low < 1e-9)
        {
            return dryBulbC;
        }

        double t = dryBulbC;
        double p = pressurePa;
        double w = humidityRatio;
        double f(double ts) => WFromWetBulb(t, ts, p, out _) - w;
        double df(double ts)
        {
            WFromWetBulb(t, ts, p, out double d);
            return d;
        }

        // First guess: the wet-bulb depression is about a third of the dew-point depression (common practice).
        double guess = dryBulbC - (dryBulbC - low) / 3.0;
        if (NewtonRaphson.TryFindRoot(f, df, guess, low, dryBulbC, Accuracy, 50, out double root))
        {
            return root;
        }

        return MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa);
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
