namespace BinEnergy.Reporting.Units;

/// <summary>
/// How one quantity is shown: the suffix its column names carry (<c>kbtu</c> in
/// <c>heating_kbtu</c>), the symbol people read (<c>kBtu</c>), the conversion from the engine's
/// SI value, and the number format of the terminal and report. Only unit changes, no physics.
/// </summary>
/// <param name="Suffix">Column-name suffix, lower snake case; empty for a quantity named without a unit.</param>
/// <param name="Symbol">The unit as people write it; empty for a pure number.</param>
/// <param name="FromSi">SI value to display value.</param>
/// <param name="Format">.NET number format for text outputs (e.g. <c>N0</c>, <c>0.0</c>).</param>
/// <param name="Digits">The digits CSV tables keep (<see cref="FileDigits.Default"/> when not given); Parquet keeps full precision.</param>
public sealed record DisplayUnit(string Suffix, string Symbol, Func<double, double> FromSi, string Format, FileDigits? Digits = null)
{
    /// <summary>The digits CSV tables keep of this quantity.</summary>
    public FileDigits FileDigits => Digits ?? FileDigits.Default;

    /// <summary>A pure number, shown as it is.</summary>
    public static DisplayUnit Number { get; } = new(string.Empty, string.Empty, v => v, "0.###");

    /// <summary>A count (hours, people), shown whole with thousands separators.</summary>
    public static DisplayUnit Count { get; } = new(string.Empty, string.Empty, v => v, "N0", FileDigits.Decimals(3));

    /// <summary>An angle in degrees (latitude north, longitude east), shown to four decimals.</summary>
    public static DisplayUnit Degrees { get; } = new("deg", "°", v => v, "0.####", FileDigits.Decimals(4));

    /// <summary>A column name: <paramref name="baseName"/> with this unit's suffix.</summary>
    public string NameFor(string baseName) => Suffix.Length == 0 ? baseName : baseName.Length == 0 ? Suffix : baseName + "_" + Suffix;

    /// <summary>The same unit with another number format.</summary>
    public DisplayUnit WithFormat(string format) => this with { Format = format };
}
