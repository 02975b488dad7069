namespace BinEnergy.Core.Units;

/// <summary>
/// Exact or conventional conversion factors used at the edges. Sources: NIST Special
/// Publication 811 (2008), appendix B (exact definitions of the foot, the pound, the
/// inch of mercury at 32 F, the international-table Btu); DESIGN section 3 for the
/// energy units (1 kWh = 3412.14 Btu; 1 therm = 100,000 Btu; 1 ton-h = 12,000 Btu).
/// </summary>
public static class Conversions
{
    /// <summary>Metres in one foot (exact).</summary>
    public const double MetresPerFoot = 0.3048;

    /// <summary>Kilograms in one avoirdupois pound (exact).</summary>
    public const double KilogramsPerPound = 0.45359237;

    /// <summary>Cubic metres in one cubic foot (exact).</summary>
    public const double CubicMetresPerCubicFoot = MetresPerFoot * MetresPerFoot * MetresPerFoot;

    /// <summary>Joules in one international-table Btu (exact: 1055.05585262 J).</summary>
    public const double JoulesPerBtu = 1055.05585262;

    /// <summary>Pascals in one pound-force per square inch (NIST SP 811).</summary>
    public const double PascalsPerPsi = 6894.757293168;

    /// <summary>Pascals in one inch of mercury at 32 F (NIST SP 811).</summary>
    public const double PascalsPerInchOfMercury = 3386.389;

    /// <summary>Pascals in one inch of water column at 60 F (NIST SP 811: 248.84 Pa).</summary>
    public const double PascalsPerInchOfWater = 248.84;

    /// <summary>Grains in one pound (exact: 7,000).</summary>
    public const double GrainsPerPound = 7000.0;

    /// <summary>Joules in one kilowatt-hour (exact).</summary>
    public const double JoulesPerKilowattHour = 3.6e6;

    /// <summary>Btu in one kilowatt-hour (DESIGN section 3: 3412.14).</summary>
    public const double BtuPerKilowattHour = JoulesPerKilowattHour / JoulesPerBtu;

    /// <summary>Btu in one therm (exact: 100,000).</summary>
    public const double BtuPerTherm = 100_000.0;

    /// <summary>Btu in one ton-hour of refrigeration (exact: 12,000).</summary>
    public const double BtuPerTonHour = 12_000.0;

    /// <summary>kJ/kg in one Btu/lb (2.326, exact for the international-table Btu).</summary>
    public const double KilojoulesPerKilogramPerBtuPerPound = JoulesPerBtu / KilogramsPerPound / 1000.0;

    /// <summary>Cubic metres per second in one cubic foot per minute.</summary>
    public const double CubicMetresPerSecondPerCfm = CubicMetresPerCubicFoot / 60.0;

    /// <summary>Converts degrees Fahrenheit to degrees Celsius.</summary>
    public static double FahrenheitToCelsius(double f) => (f - 32.0) / 1.8;

    /// <summary>Converts degrees Celsius to degrees Fahrenheit.</summary>
    public static double CelsiusToFahrenheit(double c) => c * 1.8 + 32.0;
}
