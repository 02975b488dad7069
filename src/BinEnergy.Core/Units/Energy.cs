namespace BinEnergy.Core.Units;

/// <summary>An amount of energy, stored in joules. Display: kBtu (IP) or kWh (SI).</summary>
public readonly record struct Energy : IComparable<Energy>
{
    private Energy(double joules) => Joules = joules;

    public double Joules { get; }

    public double KilowattHours => Joules / Conversions.JoulesPerKilowattHour;

    public double Btu => Joules / Conversions.JoulesPerBtu;

    public double Kbtu => Btu / 1000.0;

    public double Therms => Btu / Conversions.BtuPerTherm;

    public double TonHours => Btu / Conversions.BtuPerTonHour;

    public static Energy FromJoules(double joules) => new(joules);

    public static Energy FromKilowattHours(double kwh) => new(kwh * Conversions.JoulesPerKilowattHour);

    public static Energy FromBtu(double btu) => new(btu * Conversions.JoulesPerBtu);

    public static Energy FromKbtu(double kbtu) => FromBtu(kbtu * 1000.0);

    public static Energy FromTherms(double therms) => FromBtu(therms * Conversions.BtuPerTherm);

    public static Energy FromTonHours(double tonHours) => FromBtu(tonHours * Conversions.BtuPerTonHour);

    /// <summary>Energy delivered by a power over a number of hours.</summary>
    public static Energy FromPower(Power power, double hours) => new(power.Watts * hours * 3600.0);

    /// <summary>The value in the display unit of <paramref name="units"/> (kBtu or kWh).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? Kbtu : KilowattHours;

    public static Energy operator +(Energy a, Energy b) => new(a.Joules + b.Joules);

    public static Energy operator -(Energy a, Energy b) => new(a.Joules - b.Joules);

    public int CompareTo(Energy other) => Joules.CompareTo(other.Joules);

    public override string ToString() => FormattableString.Invariant($"{KilowattHours:0.###} kWh");
}
