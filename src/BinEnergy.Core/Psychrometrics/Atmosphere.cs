using BinEnergy.Core.Units;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// The U.S. Standard Atmosphere (1976) as given in ASHRAE Handbook—Fundamentals (2017),
/// chapter 1, equations 3 and 4; valid from -5,000 m to 11,000 m (the troposphere).
/// </summary>
public static class Atmosphere
{
    /// <summary>Standard sea-level pressure, 101,325 Pa (Handbook ch. 1, eq. 3 at Z = 0).</summary>
    public const double SeaLevelPressurePa = 101_325.0;

    /// <summary>Lowest elevation accepted, in metres (Handbook ch. 1 table 1 starts at -500 m; the equation holds lower).</summary>
    public const double MinElevationM = -5_000.0;

    /// <summary>Highest elevation accepted: the top of the troposphere, 11,000 m, where eq. 3 stops holding.</summary>
    public const double MaxElevationM = 11_000.0;

    /// <summary>
    /// Standard-atmosphere pressure at an elevation: p = 101.325 (1 - 2.25577e-5 Z)^5.2559 kPa
    /// (Handbook ch. 1, eq. 3), Z in metres.
    /// </summary>
    /// <exception cref="PsychrometricException">The elevation is outside -5,000..11,000 m.</exception>
    public static double PressureAtElevationPa(double elevationM)
    {
        if (!(elevationM >= MinElevationM && elevationM <= MaxElevationM))
        {
            throw new PsychrometricException(nameof(elevationM), elevationM,
                FormattableString.Invariant($"elevation {elevationM:0.#} m is outside the standard atmosphere's range ({MinElevationM:0} to {MaxElevationM:0} m)"));
        }

        return SeaLevelPressurePa * Math.Pow(1.0 - 2.25577e-5 * elevationM, 5.2559);
    }

    /// <summary>Standard-atmosphere pressure at an elevation (Handbook ch. 1, eq. 3).</summary>
    public static Pressure PressureAt(Length elevation) => Pressure.FromPascals(PressureAtElevationPa(elevation.Metres));

    /// <summary>Standard-atmosphere temperature at an elevation: t = 15 - 0.0065 Z C (Handbook ch. 1, eq. 4).</summary>
    public static double TemperatureAtElevationC(double elevationM) => 15.0 - 0.0065 * elevationM;

    /// <summary>
    /// The elevation whose standard-atmosphere pressure is <paramref name="pressurePa"/>:
    /// eq. 3 solved for Z.
    /// </summary>
    public static double ElevationAtPressureM(double pressurePa) =>
        (1.0 - Math.Pow(pressurePa / SeaLevelPressurePa, 1.0 / 5.2559)) / 2.25577e-5;
}
