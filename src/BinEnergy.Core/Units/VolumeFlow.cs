namespace BinEnergy.Core.Units;

/// <summary>A volumetric air flow, stored in m3/s.</summary>
public readonly record struct VolumeFlow : IComparable<VolumeFlow>
{
    private VolumeFlow(double cubicMetresPerSecond) => CubicMetresPerSecond = cubicMetresPerSecond;

    public double CubicMetresPerSecond { get; }

    public double Cfm => CubicMetresPerSecond / Conversions.CubicMetresPerSecondPerCfm;

    public double LitresPerSecond => CubicMetresPerSecond * 1000.0;

    public double CubicMetresPerHour => CubicMetresPerSecond * 3600.0;

    public static VolumeFlow FromCubicMetresPerSecond(double value) => new(value);

    public static VolumeFlow FromCfm(double cfm) => new(cfm * Conversions.CubicMetresPerSecondPerCfm);

    public static VolumeFlow FromLitresPerSecond(double litresPerSecond) => new(litresPerSecond / 1000.0);

    public static VolumeFlow FromCubicMetresPerHour(double value) => new(value / 3600.0);

    /// <summary>Reads a flow in the display unit of <paramref name="units"/> (cfm or L/s).</summary>
    public static VolumeFlow From(double value, UnitSystem units) =>
        units == UnitSystem.IP ? FromCfm(value) : FromLitresPerSecond(value);

    /// <summary>The value in the display unit of <paramref name="units"/> (cfm or L/s).</summary>
    public double In(UnitSystem units) => units == UnitSystem.IP ? Cfm : LitresPerSecond;

    public static VolumeFlow operator +(VolumeFlow a, VolumeFlow b) => new(a.CubicMetresPerSecond + b.CubicMetresPerSecond);

    public static VolumeFlow operator *(double k, VolumeFlow a) => new(k * a.CubicMetresPerSecond);

    public int CompareTo(VolumeFlow other) => CubicMetresPerSecond.CompareTo(other.CubicMetresPerSecond);

    public override string ToString() => FormattableString.Invariant($"{LitresPerSecond:0.###} L/s");
}
