namespace BinEnergy.Core.Units;

/// <summary>
/// An absolute temperature, stored in degrees Celsius. Temperatures are affine: two
/// of them cannot be added, and their difference is a <see cref="TemperatureDifference"/>.
/// </summary>
public readonly record struct Temperature : IComparable<Temperature>
{
    private Temperature(double celsius) => Celsius = celsius;

    /// <summary>Degrees Celsius.</summary>
    public double Celsius { get; }

    /// <summary>Degrees Fahrenheit.</summary>
    public double Fahrenheit => Conversions.CelsiusToFahrenheit(Celsius);

    /// <summary>Kelvin.</summary>
    public double Kelvin => Celsius + 273.15;

    public static Temperature FromCelsius(double celsius) => new(celsius);

    public static Temperature FromFahrenheit(double fahrenheit) => new(Conversions.FahrenheitToCelsius(fahrenheit));

    public static Temperature FromKelvin(double kelvin) => new(kelvin - 273.15);

    /// <summary>Reads a temperature given in the display unit of <paramref name="units"/>.</summary>
    public static Temperature From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromFahrenheit(value) : FromCelsius(value);

    /// <summary>The value in the display unit of <paramref name="units"/> (F or C).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? Fahrenheit : Celsius;

    public static TemperatureDifference operator -(Temperature a, Temperature b) =>
        TemperatureDifference.FromKelvin(a.Celsius - b.Celsius);

    public static Temperature operator +(Temperature a, TemperatureDifference d) => new(a.Celsius + d.Kelvin);

    public static Temperature operator -(Temperature a, TemperatureDifference d) => new(a.Celsius - d.Kelvin);

    public static bool operator <(Temperature a, Temperature b) => a.Celsius < b.Celsius;

    public static bool operator >(Temperature a, Temperature b) => a.Celsius > b.Celsius;

    public static bool operator <=(Temperature a, Temperature b) => a.Celsius <= b.Celsius;

    public static bool operator >=(Temperature a, Temperature b) => a.Celsius >= b.Celsius;

    public int CompareTo(Temperature other) => Celsius.CompareTo(other.Celsius);

    public override string ToString() => FormattableString.Invariant($"{Celsius:0.###} C");
}
