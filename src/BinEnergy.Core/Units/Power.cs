namespace BinEnergy.Core.Units;

/// <summary>A heat or electric power, stored in watts.</summary>
public readonly record struct Power : IComparable<Power>
{
    private Power(double watts) => Watts = watts;

    public double Watts { get; }

    public double Kilowatts => Watts / 1000.0;

    public double BtuPerHour => Watts * 3600.0 / Conversions.JoulesPerBtu;

    public double Tons => BtuPerHour / Conversions.BtuPerTonHour;

    public static Power FromWatts(double watts) => new(watts);

    public static Power FromKilowatts(double kilowatts) => new(kilowatts * 1000.0);

    public static Power FromBtuPerHour(double btuPerHour) => new(btuPerHour * Conversions.JoulesPerBtu / 3600.0);

    public static Power FromTons(double tons) => FromBtuPerHour(tons * Conversions.BtuPerTonHour);

    /// <summary>Reads a power in the display unit of <paramref name="units"/> (Btu/h or kW).</summary>
    public static Power From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromBtuPerHour(value) : FromKilowatts(value);

    /// <summary>The value in the display unit of <paramref name="units"/> (Btu/h or kW).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? BtuPerHour : Kilowatts;

    public static Power operator +(Power a, Power b) => new(a.Watts + b.Watts);

    public static Power operator -(Power a, Power b) => new(a.Watts - b.Watts);

    public int CompareTo(Power other) => Watts.CompareTo(other.Watts);

    public override string ToString() => FormattableString.Invariant($"{Watts:0.###} W");
}
