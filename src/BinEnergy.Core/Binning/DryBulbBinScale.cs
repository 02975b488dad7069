using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>
/// The rule that puts a dry-bulb into a bin (DESIGN 6): bins of width w in the display unit,
/// aligned to multiples of w, bin k covering [k w, (k+1) w), lower edge inclusive. The
/// temperature is converted to the display unit and rounded to 1e-6 of it first, so 10.0 C
/// lands in the 50-55 F bin, and a reading taken in F and stored in C lands on its own edge
/// (40 F stored as 4.444... C converts back to 40 F within 1e-14, sometimes just below it).
/// </summary>
public readonly record struct DryBulbBinScale
{
    /// <summary>Default width in IP: 5 F (common practice for bin tables).</summary>
    public const double DefaultWidthIp = 5.0;

    /// <summary>Default width in SI: 2 C (common practice for bin tables).</summary>
    public const double DefaultWidthSi = 2.0;

    /// <summary>Creates the scale; the width is in F degrees (IP) or K (SI).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The width is not between 0.1 and 50 display degrees.</exception>
    public DryBulbBinScale(double widthInDisplayUnit, UnitSystem units)
    {
        if (!(widthInDisplayUnit >= 0.1 && widthInDisplayUnit <= 50.0))
        {
            throw new ArgumentOutOfRangeException(nameof(widthInDisplayUnit), widthInDisplayUnit,
                "the bin width must be between 0.1 and 50 degrees of the display unit");
        }

        Width = widthInDisplayUnit;
        Units = units;
    }

    /// <summary>Creates the scale from a width as a temperature difference, expressed in the display unit of <paramref name="units"/>.</summary>
    public DryBulbBinScale(TemperatureDifference width, UnitSystem units)
        : this(Math.Round(width.In(units), 9), units)
    {
    }

    /// <summary>Width in the display unit (F degrees or K).</summary>
    public double Width { get; }

    /// <summary>The display unit system the bins are aligned in.</summary>
    public UnitSystem Units { get; }

    /// <summary>The width as a temperature difference.</summary>
    public TemperatureDifference WidthDifference => TemperatureDifference.From(Width, Units);

    /// <summary>The default scale of a unit system (5 F or 2 C).</summary>
    public static DryBulbBinScale Default(UnitSystem units) => new(units == UnitSystem.IP ? DefaultWidthIp : DefaultWidthSi, units);

    /// <summary>The bin index k of a dry-bulb in C: floor(round(t_display, 6) / w).</summary>
    public int IndexOf(double dryBulbC)
    {
        double t = Units == UnitSystem.IP ? dryBulbC * 1.8 + 32.0 : dryBulbC;
        t = Math.Round(t, 6);

        // The quotient is rounded to 1e-9 so an exact multiple of a width like 0.1 stays on its edge.
        return (int)Math.Floor(Math.Round(t / Width, 9));
    }

    /// <summary>Lower edge of bin k (inclusive).</summary>
    public Temperature Low(int k) => Temperature.From(k * Width, Units);

    /// <summary>Upper edge of bin k (exclusive).</summary>
    public Temperature High(int k) => Temperature.From((k + 1) * Width, Units);

    /// <summary>Midpoint of bin k, where the bin method evaluates its loads.</summary>
    public Temperature Mid(int k) => Temperature.From((k + 0.5) * Width, Units);
}
