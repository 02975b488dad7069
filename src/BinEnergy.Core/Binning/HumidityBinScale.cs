using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>
/// Humidity-ratio bins for joint bin tables: width in gr/lb (IP) or g/kg (SI), bin j
/// covering [j w, (j+1) w), lower edge inclusive, after rounding the converted value to 1e-6
/// (the same rule as <see cref="DryBulbBinScale"/>).
/// </summary>
public readonly record struct HumidityBinScale
{
    /// <summary>Default width in IP: 10 gr/lb (about 1.4 g/kg; our choice, fine enough to follow the latent threshold).</summary>
    public const double DefaultWidthIp = 10.0;

    /// <summary>Default width in SI: 1 g/kg (our choice).</summary>
    public const double DefaultWidthSi = 1.0;

    /// <summary>Creates the scale; the width is in gr/lb (IP) or g/kg (SI).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The width is not between 0.01 and 100 display units.</exception>
    public HumidityBinScale(double widthInDisplayUnit, UnitSystem units)
    {
        if (!(widthInDisplayUnit >= 0.01 && widthInDisplayUnit <= 100.0))
        {
            throw new ArgumentOutOfRangeException(nameof(widthInDisplayUnit), widthInDisplayUnit,
                "the humidity bin width must be between 0.01 and 100 (gr/lb in ip, g/kg in si)");
        }

        Width = widthInDisplayUnit;
        Units = units;
    }

    /// <summary>Width in gr/lb (IP) or g/kg (SI).</summary>
    public double Width { get; }

    /// <summary>The display unit system.</summary>
    public UnitSystem Units { get; }

    /// <summary>The default scale of a unit system (10 gr/lb or 1 g/kg).</summary>
    public static HumidityBinScale Default(UnitSystem units) => new(units == UnitSystem.IP ? DefaultWidthIp : DefaultWidthSi, units);

    private double PerKgPerKg => Units == UnitSystem.IP ? Conversions.GrainsPerPound : 1000.0;

    /// <summary>The bin index j of a humidity ratio in kg/kg.</summary>
    public int IndexOf(double humidityRatio) =>
        (int)Math.Floor(Math.Round(Math.Round(humidityRatio * PerKgPerKg, 6) / Width, 9));

    /// <summary>Lower edge of bin j (inclusive).</summary>
    public HumidityRatio Low(int j) => HumidityRatio.FromKilogramsPerKilogram(j * Width / PerKgPerKg);

    /// <summary>Upper edge of bin j (exclusive).</summary>
    public HumidityRatio High(int j) => HumidityRatio.FromKilogramsPerKilogram((j + 1) * Width / PerKgPerKg);

    /// <summary>Midpoint of bin j.</summary>
    public HumidityRatio Mid(int j) => HumidityRatio.FromKilogramsPerKilogram((j + 0.5) * Width / PerKgPerKg);
}
