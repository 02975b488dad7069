namespace BinEnergy.Core.Units;

/// <summary>A length (used for elevation), stored in metres.</summary>
public readonly record struct Length : IComparable<Length>
{
    private Length(double metres) => Metres = metres;

    public double Metres { get; }

    public double Feet => Metres / Conversions.MetresPerFoot;

    public static Length FromMetres(double metres) => new(metres);

    public static Length FromFeet(double feet) => new(feet * Conversions.MetresPerFoot);

    /// <summary>Reads a length in the display unit of <paramref name="units"/> (ft or m).</summary>
    public static Length From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromFeet(value) : FromMetres(value);

    /// <summary>The value in the display unit of <paramref name="units"/> (ft or m).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? Feet : Metres;

    public int CompareTo(Length other) => Metres.CompareTo(other.Metres);

    public override string ToString() => FormattableString.Invariant($"{Metres:0.###} m");
}
