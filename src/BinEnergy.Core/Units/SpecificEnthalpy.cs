namespace BinEnergy.Core.Units;

/// <summary>
/// Moist-air specific enthalpy per unit mass of dry air, stored in J/kg on the SI datum
/// (dry air at 0 C, liquid water at 0 C).
/// </summary>
/// <remarks>
/// The IP datum is dry air at 0 F (liquid water at 32 F, the same as SI). The two
/// scales therefore differ by an offset as well as a factor: an IP value is the SI value
/// divided by 2.326 plus the enthalpy of dry air between 0 F and 32 F. Converting by the
/// factor alone is a common error (28 Btu/lb is about 47.2 kJ/kg, not 65.1). The offset
/// used here is the one implied by ASHRAE Handbook—Fundamentals (2017), ch. 1, eq. 32
/// (c_p of dry air 1.006 kJ/(kg K)), so a state converted to IP and back is unchanged.
/// </remarks>
public readonly record struct SpecificEnthalpy : IComparable<SpecificEnthalpy>
{
    /// <summary>Enthalpy of dry air from 0 F up to 32 F, in Btu/lb: 1.006 kJ/(kg K) x 17.78 K / 2.326.</summary>
    public const double IpDatumOffsetBtuPerPound = 1.006 * (32.0 / 1.8) / Conversions.KilojoulesPerKilogramPerBtuPerPound;

    private SpecificEnthalpy(double joulesPerKilogram) => JoulesPerKilogram = joulesPerKilogram;

    /// <summary>J per kg of dry air, 0 C datum.</summary>
    public double JoulesPerKilogram { get; }

    /// <summary>kJ per kg of dry air, 0 C datum.</summary>
    public double KilojoulesPerKilogram => JoulesPerKilogram / 1000.0;

    /// <summary>Btu per lb of dry air, 0 F datum.</summary>
    public double BtuPerPound => KilojoulesPerKilogram / Conversions.KilojoulesPerKilogramPerBtuPerPound + IpDatumOffsetBtuPerPound;

    public static SpecificEnthalpy FromJoulesPerKilogram(double value) => new(value);

    public static SpecificEnthalpy FromKilojoulesPerKilogram(double value) => new(value * 1000.0);

    /// <summary>From Btu per lb of dry air on the 0 F datum.</summary>
    public static SpecificEnthalpy FromBtuPerPound(double value) =>
        new((value - IpDatumOffsetBtuPerPound) * Conversions.KilojoulesPerKilogramPerBtuPerPound * 1000.0);

    /// <summary>Reads an enthalpy in the display unit and datum of <paramref name="units"/>.</summary>
    public static SpecificEnthalpy From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromBtuPerPound(value) : FromKilojoulesPerKilogram(value);

    /// <summary>The value in the display unit and datum of <paramref name="units"/>.</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? BtuPerPound : KilojoulesPerKilogram;

    public int CompareTo(SpecificEnthalpy other) => JoulesPerKilogram.CompareTo(other.JoulesPerKilogram);

    public override string ToString() => FormattableString.Invariant($"{KilojoulesPerKilogram:0.###} kJ/kg");
}
