using MathNet.Numerics.RootFinding;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Fast dew-point solver for reading a year of weather: MathNet's Newton-Raphson from a close
/// first guess, with the analytic derivative of the same handbook equations <see cref="MoistAir"/>
/// uses (ASHRAE Handbook—Fundamentals 2017, ch. 1, eqs. 5, 6 and 20). Two or three steps reach the
/// root; when Newton does not converge inside the bracket, the call falls back to the Brent-based
/// <see cref="MoistAir"/> function, so the result is the same root either way. The wet-bulbs of a
/// record are solved all at once by <see cref="HourlyStateBatchSolver"/>.
/// </summary>
internal static class HourlyStateSolver
{
    /// <summary>
    /// Newton stops after a step smaller than this, K. The returned point is the one after that step, and with
    /// quadratic convergence it is good to about (f''/2f') x step^2 (ln p_ws bends more at low temperature, so the stop is tight).
    /// </summary>
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
}
