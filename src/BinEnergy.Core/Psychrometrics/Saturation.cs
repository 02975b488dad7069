namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Saturation vapour pressure of water, Hyland and Wexler (1983) as given in ASHRAE
/// Handbook—Fundamentals (2017), chapter 1: over ice, eq. 5 (-100 to 0 C), over liquid
/// water, eq. 6 (0 to 200 C). The switch is at the triple point, 0.01 C, as in the
/// handbook's tables.
/// </summary>
public static class Saturation
{
    /// <summary>Lowest dry-bulb for which eq. 5 holds, C.</summary>
    public const double MinTemperatureC = -100.0;

    /// <summary>Highest dry-bulb for which eq. 6 holds, C.</summary>
    public const double MaxTemperatureC = 200.0;

    /// <summary>Triple point of water, C: below it the vapour is in equilibrium with ice.</summary>
    public const double TriplePointC = 0.01;

    // Handbook ch. 1, eq. 5 coefficients (over ice).
    internal const double C1 = -5.6745359e3;
    internal const double C2 = 6.3925247;
    internal const double C3 = -9.6778430e-3;
    internal const double C4 = 6.2215701e-7;
    internal const double C5 = 2.0747825e-9;
    internal const double C6 = -9.4840240e-13;
    internal const double C7 = 4.1635019;

    // Handbook ch. 1, eq. 6 coefficients (over liquid water).
    internal const double C8 = -5.8002206e3;
    internal const double C9 = 1.3914993;
    internal const double C10 = -4.8640239e-2;
    internal const double C11 = 4.1764768e-5;
    internal const double C12 = -1.4452093e-8;
    internal const double C13 = 6.5459673;

    /// <summary>
    /// Saturation vapour pressure p_ws in Pa at a temperature in C: Handbook ch. 1,
    /// eq. 5 at or below the triple point, eq. 6 above it.
    /// </summary>
    /// <exception cref="PsychrometricException">The temperature is outside -100..200 C.</exception>
    public static double VapourPressurePa(double temperatureC)
    {
        if (!(temperatureC >= MinTemperatureC && temperatureC <= MaxTemperatureC))
        {
            throw new PsychrometricException(nameof(temperatureC), temperatureC,
                FormattableString.Invariant($"temperature {temperatureC:0.##} C is outside the range of the saturation equations (-100 to 200 C)"));
        }

        return Math.Exp(LnVapourPressure(temperatureC));
    }

    /// <summary>
    /// Saturation vapour pressure in Pa over ice below the triple point (<see cref="HumidityOver.Ice"/>, as
    /// <see cref="VapourPressurePa(double)"/>) or over liquid water at every temperature (<see cref="HumidityOver.Water"/>:
    /// Handbook ch. 1, eq. 6, extended below 0 C to supercooled water).
    /// </summary>
    /// <exception cref="PsychrometricException">The temperature is outside -100..200 C.</exception>
    public static double VapourPressurePa(double temperatureC, HumidityOver over)
    {
        _ = VapourPressurePa(temperatureC); // the range check
        return Math.Exp(LnVapourPressure(temperatureC, over));
    }

    /// <summary>Natural log of p_ws in Pa (Handbook ch. 1, eqs. 5 and 6), no range check.</summary>
    internal static double LnVapourPressure(double temperatureC) => LnVapourPressure(temperatureC, HumidityOver.Ice);

    /// <summary>Natural log of p_ws in Pa, over ice below the triple point or over water at every temperature (eq. 6 extended), no range check.</summary>
    internal static double LnVapourPressure(double temperatureC, HumidityOver over)
    {
        double t = temperatureC + 273.15;
        if (temperatureC <= TriplePointC && over == HumidityOver.Ice)
        {
            return C1 / t + C2 + t * (C3 + t * (C4 + t * (C5 + t * C6))) + C7 * Math.Log(t);
        }

        return C8 / t + C9 + t * (C10 + t * (C11 + t * C12)) + C13 * Math.Log(t);
    }

    /// <summary>
    /// Derivative of ln p_ws with respect to temperature, 1/K: eqs. 5 and 6 differentiated term
    /// by term (for Newton steps in the hourly solvers), no range check.
    /// </summary>
    internal static double LnVapourPressureDerivative(double temperatureC, HumidityOver over = HumidityOver.Ice)
    {
        double t = temperatureC + 273.15;
        if (temperatureC <= TriplePointC && over == HumidityOver.Ice)
        {
            return -C1 / (t * t) + C3 + t * (2 * C4 + t * (3 * C5 + t * 4 * C6)) + C7 / t;
        }

        return -C8 / (t * t) + C10 + t * (2 * C11 + t * 3 * C12) + C13 / t;
    }

    /// <summary>
    /// Saturation humidity ratio W_s in kg/kg at a temperature and total pressure:
    /// Handbook ch. 1, eq. 23, W_s = 0.621945 p_ws / (p - p_ws).
    /// </summary>
    public static double HumidityRatio(double temperatureC, double pressurePa)
    {
        double pws = VapourPressurePa(temperatureC);
        if (pws >= pressurePa)
        {
            throw new PsychrometricException(nameof(temperatureC), temperatureC,
                FormattableString.Invariant($"water boils at {temperatureC:0.##} C under {pressurePa / 1000:0.###} kPa; no saturated moist-air state exists"));
        }

        return MoistAir.MolecularMassRatio * pws / (pressurePa - pws);
    }
}
