namespace BinEnergy.Core.Units;

/// <summary>A temperature difference, stored in kelvin (1 K = 1.8 F degrees).</summary>
public readonly record struct TemperatureDifference : IComparable<TemperatureDifference>
{
    private TemperatureDifference(double kelvin) => Kelvin = kelvin;

    /// <summary>Kelvin (equal to Celsius degrees).</summary>
    public double Kelvin { get; }

    /// <summary>Fahrenheit degrees (Rankine).</summary>
    public double FahrenheitDegrees => Kelvin * 1.8;

    public static TemperatureDifference FromKelvin(double kelvin) => new(kelvin);

    public static TemperatureDifference FromFahrenheitDegrees(double degrees) => new(degrees / 1.8);

    /// <summary>Reads a difference given in the display unit of <paramref name="units"/> (F degrees or K).</summary>
    public static TemperatureDifference From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromFahrenheitDegrees(value) : FromKelvin(value);

    /// <summary>The value in the display unit of <paramref name="units"/>.</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? FahrenheitDegrees : Kelvin;

    public static TemperatureDifference operator +(TemperatureDifference a, TemperatureDifference b) => new(a.Kelvin + b.Kelvin);

    public static TemperatureDifference operator -(TemperatureDifference a, TemperatureDifference b) => new(a.Kelvin - b.Kelvin);

    public static TemperatureDifference operator -(TemperatureDifference a) => new(-a.Kelvin);

    public static TemperatureDifference operator *(double k, TemperatureDifference a) => new(k * a.Kelvin);

    public int CompareTo(TemperatureDifference other) => Kelvin.CompareTo(other.Kelvin);

    public override string ToString() => FormattableString.Invariant($"{Kelvin:0.###} K");
}
