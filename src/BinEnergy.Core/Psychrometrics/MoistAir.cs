using MathNet.Numerics.RootFinding;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Moist-air properties from ASHRAE Handbook—Fundamentals (2017), chapter 1
/// (Psychrometrics), in SI: temperatures in C, pressures in Pa, humidity ratio in kg of
/// water per kg of dry air, enthalpy in J per kg of dry air (0 C datum), specific volume
/// in m3 per kg of dry air. Inverse functions (dew point, wet-bulb) are solved with
/// MathNet's Brent root finder (Brent, 1973) on a bracket that always holds the root.
/// </summary>
/// <remarks>
/// Validity: dry-bulb -100 to 200 C (the range of the saturation equations), total
/// pressure above the saturation pressure, humidity ratio 0 or more. Outside that,
/// every method throws <see cref="PsychrometricException"/>.
/// </remarks>
public static class MoistAir
{
    /// <summary>Ratio of the molecular masses of water and dry air, 18.015268 / 28.966 = 0.621945 (Handbook ch. 1, eq. 20).</summary>
    public const double MolecularMassRatio = 0.621945;

    /// <summary>Specific heat of dry air, 1.006 kJ/(kg K), as in Handbook ch. 1, eq. 32 (here J/(kg K)).</summary>
    public const double DryAirSpecificHeat = 1006.0;

    /// <summary>Specific heat of water vapour, 1.86 kJ/(kg K), as in Handbook ch. 1, eq. 32 (here J/(kg K)).</summary>
    public const double VapourSpecificHeat = 1860.0;

    /// <summary>Enthalpy of vaporisation of water at 0 C, 2,501 kJ/kg, as in Handbook ch. 1, eq. 32 (here J/kg).</summary>
    public const double LatentHeat = 2_501_000.0;

    /// <summary>
    /// Specific heat of liquid water, 4.186 kJ/(kg K) (here J/(kg K)): the enthalpy of condensate at
    /// t C is h_w = 4.186 t kJ/kg above 0 C, the approximation Handbook—Fundamentals 2017 ch. 1 uses
    /// in its wet-bulb equation (eq. 35) and its coil-load equation.
    /// </summary>
    public const double LiquidWaterSpecificHeat = 4186.0;

    /// <summary>
    /// Heat removed per kg of water condensed at <paramref name="tC"/>, J/kg: the vapour's enthalpy
    /// h_g = 2501 + 1.86 t less the condensate's h_w = 4.186 t (kJ/kg), i.e. 2501 - 2.326 t
    /// (Handbook—Fundamentals 2017 ch. 1: the coil load m (h1 - h2) - m (W1 - W2) h_w of
    /// "cooling and dehumidifying of moist air" with eq. 32 for h).
    /// </summary>
    public static double CondensingHeat(double tC) => LatentHeat + (VapourSpecificHeat - LiquidWaterSpecificHeat) * tC;

    /// <summary>Gas constant of dry air, 287.042 J/(kg K) (Handbook ch. 1, eq. 26: 0.287042 kJ/(kg K)).</summary>
    public const double DryAirGasConstant = 287.042;

    /// <summary>Accuracy of the inverse solvers, in K (well inside the 0.02 F the tests demand).</summary>
    public const double SolverAccuracyK = 1e-7;

    /// <summary>
    /// Humidity ratio from the partial pressure of water vapour: W = 0.621945 p_w / (p - p_w)
    /// (Handbook ch. 1, eq. 20).
    /// </summary>
    public static double HumidityRatioFromVapourPressure(double vapourPressurePa, double pressurePa)
    {
        if (!(vapourPressurePa >= 0.0) || !(vapourPressurePa < pressurePa))
        {
            throw new PsychrometricException(nameof(vapourPressurePa), vapourPressurePa,
                FormattableString.Invariant($"vapour pressure {vapourPressurePa:0.##} Pa must be at least 0 and below the total pressure {pressurePa:0.##} Pa"));
        }

        return MolecularMassRatio * vapourPressurePa / (pressurePa - vapourPressurePa);
    }

    /// <summary>Partial pressure of water vapour from humidity ratio: eq. 20 solved for p_w.</summary>
    public static double VapourPressureFromHumidityRatio(double humidityRatio, double pressurePa)
    {
        CheckHumidityRatio(humidityRatio);
        return pressurePa * humidityRatio / (MolecularMassRatio + humidityRatio);
    }

    /// <summary>
    /// Humidity ratio from dew point: the vapour pressure is the saturation pressure at the
    /// dew point (the definition of dew point, Handbook ch. 1), then eq. 20.
    /// </summary>
    public static double HumidityRatioFromDewPoint(double dewPointC, double pressurePa) =>
        HumidityRatioFromVapourPressure(Saturation.VapourPressurePa(dewPointC), pressurePa);

    /// <summary>Humidity ratio from a dew point taken over water or over ice below 0 C (see <see cref="HumidityOver"/>), then eq. 20.</summary>
    public static double HumidityRatioFromDewPoint(double dewPointC, double pressurePa, HumidityOver over) =>
        HumidityRatioFromVapourPressure(Saturation.VapourPressurePa(dewPointC, over), pressurePa);

    /// <summary>
    /// Humidity ratio from relative humidity (0 to 1): p_w = RH p_ws(t) (the definition of
    /// relative humidity, Handbook ch. 1, eq. 12), then eq. 20.
    /// </summary>
    public static double HumidityRatioFromRelativeHumidity(double dryBulbC, double relativeHumidity, double pressurePa)
    {
        if (!(relativeHumidity >= 0.0 && relativeHumidity <= 1.0))
        {
            throw new PsychrometricException(nameof(relativeHumidity), relativeHumidity,
                FormattableString.Invariant($"relative humidity {relativeHumidity * 100:0.##} % is outside 0 to 100 %"));
        }

        return HumidityRatioFromVapourPressure(relativeHumidity * Saturation.VapourPressurePa(dryBulbC), pressurePa);
    }

    /// <summary>
    /// Humidity ratio from thermodynamic wet-bulb t*: Handbook ch. 1, eq. 33 when t* is at or
    /// above 0 C (wet bulb over liquid water), eq. 35 below 0 C (ice bulb); W_s* from eq. 21.
    /// </summary>
    public static double HumidityRatioFromWetBulb(double dryBulbC, double wetBulbC, double pressurePa)
    {
        if (wetBulbC > dryBulbC + 1e-9)
        {
            throw new PsychrometricException(nameof(wetBulbC), wetBulbC,
                FormattableString.Invariant($"wet-bulb {wetBulbC:0.##} C is above the dry-bulb {dryBulbC:0.##} C"));
        }

        double w = HumidityRatioFromWetBulbUnchecked(dryBulbC, wetBulbC, pressurePa);
        if (w < 0.0)
        {
            throw new PsychrometricException(nameof(wetBulbC), wetBulbC,
                FormattableString.Invariant($"wet-bulb {wetBulbC:0.##} C is too low for dry-bulb {dryBulbC:0.##} C: even perfectly dry air has a higher wet-bulb"));
        }

        return w;
    }

    /// <summary>Handbook ch. 1, eqs. 33 and 35, without checks (may be negative below the dry-air wet-bulb).</summary>
    internal static double HumidityRatioFromWetBulbUnchecked(double t, double tStar, double p)
    {
        double wsStar = Saturation.HumidityRatio(tStar, p);
        if (tStar >= 0.0)
        {
            return ((2501.0 - 2.326 * tStar) * wsStar - 1.006 * (t - tStar)) / (2501.0 + 1.86 * t - 4.186 * tStar);
        }

        return ((2830.0 - 0.24 * tStar) * wsStar - 1.006 * (t - tStar)) / (2830.0 + 1.86 * t - 2.1 * tStar);
    }

    /// <summary>Relative humidity (0 to 1) from humidity ratio: p_w from eq. 20, over p_ws(t) (eq. 12).</summary>
    public static double RelativeHumidity(double dryBulbC, double humidityRatio, double pressurePa) =>
        VapourPressureFromHumidityRatio(humidityRatio, pressurePa) / Saturation.VapourPressurePa(dryBulbC);

    /// <summary>
    /// Dew point in C from humidity ratio: the temperature whose saturation pressure (eqs. 5
    /// and 6) equals the vapour pressure (eq. 20 inverted), found by
    /// Brent's method on ln p_ws over -100..200 C.
    /// </summary>
    public static double DewPoint(double humidityRatio, double pressurePa) => DewPoint(humidityRatio, pressurePa, HumidityOver.Ice);

    /// <summary>Dew point in C from humidity ratio, over water or over ice below 0 C (see <see cref="HumidityOver"/>).</summary>
    public static double DewPoint(double humidityRatio, double pressurePa, HumidityOver over)
    {
        double pw = VapourPressureFromHumidityRatio(humidityRatio, pressurePa);
        return DewPointFromVapourPressure(pw, over);
    }

    /// <summary>Dew point in C from vapour pressure in Pa (eqs. 5 and 6 inverted; Brent's method), over ice below 0 C.</summary>
    public static double DewPointFromVapourPressure(double vapourPressurePa) => DewPointFromVapourPressure(vapourPressurePa, HumidityOver.Ice);

    /// <summary>Dew point in C from vapour pressure in Pa, over water or over ice below 0 C (eqs. 5 and 6 inverted; Brent's method).</summary>
    public static double DewPointFromVapourPressure(double vapourPressurePa, HumidityOver over)
    {
        double lnLow = Saturation.LnVapourPressure(Saturation.MinTemperatureC, over);
        double lnHigh = Saturation.LnVapourPressure(Saturation.MaxTemperatureC, over);
        double target = Math.Log(vapourPressurePa);
        if (!(target >= lnLow && target <= lnHigh))
        {
            throw new PsychrometricException(nameof(vapourPressurePa), vapourPressurePa,
                FormattableString.Invariant($"vapour pressure {vapourPressurePa:G4} Pa gives a dew point outside -100 to 200 C"));
        }

        return Brent.FindRoot(t => Saturation.LnVapourPressure(t, over) - target,
            Saturation.MinTemperatureC, Saturation.MaxTemperatureC, SolverAccuracyK, 200);
    }

    /// <summary>
    /// Thermodynamic wet-bulb in C from dry-bulb and humidity ratio: eqs. 33 and 35 solved for
    /// t* between the dew point and the dry-bulb, by Brent's method, or by bisection where the
    /// bracket straddles 0 C (see the comment in the body).
    /// </summary>
    public static double WetBulb(double dryBulbC, double humidityRatio, double pressurePa)
    {
        CheckDryBulb(dryBulbC);
        double ws = Saturation.HumidityRatio(dryBulbC, pressurePa);
        if (humidityRatio > ws * (1 + 1e-9))
        {
            throw new PsychrometricException(nameof(humidityRatio), humidityRatio,
                FormattableString.Invariant($"humidity ratio {humidityRatio:0.######} kg/kg is above saturation ({ws:0.######}) at {dryBulbC:0.##} C"));
        }

        // The bracket's low end: the frost or dew point, or -100 C (the equations' end) for air with less vapour than that.
        double pw = VapourPressureFromHumidityRatio(humidityRatio, pressurePa);
        double low = pw > Saturation.VapourPressurePa(Saturation.MinTemperatureC) ? DewPointFromVapourPressure(pw) : Saturation.MinTemperatureC;
        low = Math.Min(low, dryBulbC);
        if (dryBulbC - low < SolverAccuracyK)
        {
            return dryBulbC;
        }

        // The residual is scaled by h_fg / c_p (about 2,486 K per kg/kg), the slope of a wet-bulb
        // line, so that it reads in kelvin and the solver's tolerance means the same at every state.
        const double scale = LatentHeat / DryAirSpecificHeat;
        double f(double tStar) => (HumidityRatioFromWetBulbUnchecked(dryBulbC, tStar, pressurePa) - humidityRatio) * scale;
        if (f(low) >= 0)
        {
            return low;
        }

        if (f(dryBulbC) <= 0)
        {
            return dryBulbC; // saturated to within rounding
        }

        // Eqs. 33 (over water) and 35 (over ice) do not meet exactly at 0 C, so a narrow band of
        // states has a root on each side (up to about 0.7 K apart). Where the bracket straddles
        // 0 C, bisection over [dew point, dry-bulb] picks the root, the same convention as the
        // reference implementation psychrolib; elsewhere the root is unique and Brent is faster.
        if (low < 0.0 && dryBulbC > 0.0)
        {
            return Bisection.FindRoot(f, low, dryBulbC, SolverAccuracyK, 200);
        }

        return Brent.FindRoot(f, low, dryBulbC, SolverAccuracyK, 200);
    }

    /// <summary>Moist-air specific enthalpy in J/kg dry air: h = 1.006 t + W (2501 + 1.86 t) kJ/kg (Handbook ch. 1, eq. 32).</summary>
    public static double Enthalpy(double dryBulbC, double humidityRatio) =>
        DryAirSpecificHeat * dryBulbC + humidityRatio * (LatentHeat + VapourSpecificHeat * dryBulbC);

    /// <summary>Dry-bulb in C from enthalpy and humidity ratio: eq. 32 solved for t.</summary>
    public static double DryBulbFromEnthalpy(double enthalpyJPerKg, double humidityRatio) =>
        (enthalpyJPerKg - LatentHeat * humidityRatio) / (DryAirSpecificHeat + VapourSpecificHeat * humidityRatio);

    /// <summary>
    /// Specific volume of moist air per kg dry air, m3/kg: v = 0.287042 (t + 273.15)(1 + 1.607858 W) / p
    /// (Handbook ch. 1, eq. 26, p in kPa).
    /// </summary>
    public static double SpecificVolume(double dryBulbC, double humidityRatio, double pressurePa) =>
        DryAirGasConstant * (dryBulbC + 273.15) * (1.0 + 1.607858 * humidityRatio) / pressurePa;

    /// <summary>Moist-air density, kg of moist air per m3: rho = (1 + W) / v (Handbook ch. 1, eq. 11 with v from eq. 26).</summary>
    public static double Density(double dryBulbC, double humidityRatio, double pressurePa) =>
        (1.0 + humidityRatio) / SpecificVolume(dryBulbC, humidityRatio, pressurePa);

    /// <summary>Dry-air density of a moist-air state, kg of dry air per m3 of mixture: 1 / v (eq. 26).</summary>
    public static double DryAirDensity(double dryBulbC, double humidityRatio, double pressurePa) =>
        1.0 / SpecificVolume(dryBulbC, humidityRatio, pressurePa);

    /// <summary>Humid specific heat, J/(kg dry air K): 1.006 + 1.86 W kJ/(kg K), the derivative of eq. 32 in t.</summary>
    public static double HumidSpecificHeat(double humidityRatio) => DryAirSpecificHeat + VapourSpecificHeat * humidityRatio;

    internal static void CheckDryBulb(double dryBulbC)
    {
        if (!(dryBulbC >= Saturation.MinTemperatureC && dryBulbC <= Saturation.MaxTemperatureC))
        {
            throw new PsychrometricException(nameof(dryBulbC), dryBulbC,
                FormattableString.Invariant($"dry-bulb {dryBulbC:0.##} C is outside -100 to 200 C, the range of the handbook's equations"));
        }
    }

    internal static void CheckHumidityRatio(double humidityRatio)
    {
        if (!(humidityRatio >= 0.0) || double.IsInfinity(humidityRatio))
        {
            throw new PsychrometricException(nameof(humidityRatio), humidityRatio,
                FormattableString.Invariant($"humidity ratio {humidityRatio} kg/kg must be 0 or more"));
        }
    }
}
