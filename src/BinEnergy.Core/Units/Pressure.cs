namespace BinEnergy.Core.Units;

/// <summary>An absolute pressure, stored in pascals.</summary>
public readonly record struct Pressure : IComparable<Pressure>
{
    private Pressure(double pascals) => Pascals = pascals;

    public double Pascals { get; }

    public double Kilopascals => Pascals / 1000.0;

    public double Psia => Pascals / Conversions.PascalsPerPsi;

    public double InchesOfMercury => Pascals / Conversions.PascalsPerInchOfMercury;

    public static Pressure FromPascals(double pascals) => new(pascals);

    public static Pressure FromKilopascals(double kilopascals) => new(kilopascals * 1000.0);

    public static Pressure FromHectopascals(double hectopascals) => new(hectopascals * 100.0);

    public static Pressure FromPsia(double psia) => new(psia * Conversions.PascalsPerPsi);

    public static Pressure FromInchesOfMercury(double inHg) => new(inHg * Conversions.PascalsPerInchOfMercury);

    /// <summary>Reads a pressure in the display unit of <paramref name="units"/> (psia or kPa).</summary>
    public static Pressure From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromPsia(value) : FromKilopascals(value);

    /// <summary>The value in the display unit of <paramref name="units"/> (psia or kPa).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? Psia : Kilopascals;

    public int CompareTo(Pressure other) => Pascals.CompareTo(other.Pascals);

    public override string ToString() => FormattableString.Invariant($"{Kilopascals:0.###} kPa");
}
