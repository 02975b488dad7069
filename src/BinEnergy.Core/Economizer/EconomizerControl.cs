using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// One economizer control: a high-limit rule (<see cref="HighLimitKind"/>) and whether the
/// economizer is integrated (keeps 100 % outdoor air while the coil trims) or
/// non-integrated (locks out to minimum outdoor air whenever the coil must run), DESIGN 8.
/// </summary>
/// <param name="Kind">The high-limit rule.</param>
/// <param name="Integrated">True for an integrated economizer. Ignored for <see cref="HighLimitKind.None"/>.</param>
public readonly record struct EconomizerControl(HighLimitKind Kind, bool Integrated = true)
{
    /// <summary>The baseline: no economizer.</summary>
    public static EconomizerControl None { get; } = new(HighLimitKind.None);

    /// <summary>The five economizer controls (not the baseline), in a fixed order.</summary>
    public static IReadOnlyList<HighLimitKind> EconomizerKinds { get; } =
    [
        HighLimitKind.FixedDryBulb,
        HighLimitKind.DifferentialDryBulb,
        HighLimitKind.FixedEnthalpy,
        HighLimitKind.DifferentialEnthalpy,
        HighLimitKind.FixedDewPoint,
    ];

    /// <summary>Every control name, in order: the baseline first.</summary>
    public static IReadOnlyList<string> Names { get; } =
        ["none", "fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"];

    /// <summary>The control's name as used on the command line and as a JSON key.</summary>
    public string Name => NameOf(Kind);

    /// <summary>A short description of the disabling rule.</summary>
    public string Rule => Kind switch
    {
        HighLimitKind.None => "no economizer (minimum outdoor air always)",
        HighLimitKind.FixedDryBulb => "off when outdoor dry-bulb > dry-bulb limit",
        HighLimitKind.DifferentialDryBulb => "off when outdoor dry-bulb > return dry-bulb",
        HighLimitKind.FixedEnthalpy => "off when outdoor enthalpy > enthalpy limit or dry-bulb > dry-bulb limit",
        HighLimitKind.DifferentialEnthalpy => "off when outdoor enthalpy > return enthalpy or dry-bulb > dry-bulb limit",
        HighLimitKind.FixedDewPoint => "off when outdoor dew point > dew-point limit or dry-bulb > dry-bulb limit",
        _ => throw new ArgumentOutOfRangeException(nameof(Kind), Kind, "unknown high-limit kind"),
    };

    /// <summary>The name of a high-limit kind (<c>fixed-drybulb</c>, ...).</summary>
    public static string NameOf(HighLimitKind kind) => Names[(int)kind];

    /// <summary>Reads a control name (case-insensitive); false when it is not one of <see cref="Names"/>.</summary>
    public static bool TryParse(string name, bool integrated, out EconomizerControl control)
    {
        for (int i = 0; i < Names.Count; i++)
        {
            if (string.Equals(Names[i], name.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                control = new EconomizerControl((HighLimitKind)i, integrated);
                return true;
            }
        }

        control = None;
        return false;
    }

    /// <summary>
    /// The high-limit rule of DESIGN 8: true when this control lets the economizer run at the
    /// given outdoor state. Every control also needs the outdoor air cooler than the return
    /// air (T_o &lt; T_r); that part is applied by <see cref="EconomizerModel"/>, not here.
    /// </summary>
    /// <param name="outdoorDryBulbC">Outdoor dry-bulb, C.</param>
    /// <param name="outdoorEnthalpyJPerKg">Outdoor enthalpy, J/kg dry air (0 C datum).</param>
    /// <param name="outdoorDewPointC">Outdoor dew point, C.</param>
    /// <param name="returnDryBulbC">Return-air dry-bulb, C.</param>
    /// <param name="returnEnthalpyJPerKg">Return-air enthalpy, J/kg dry air.</param>
    /// <param name="limits">The fixed limits.</param>
    public bool HighLimitAllows(
        double outdoorDryBulbC,
        double outdoorEnthalpyJPerKg,
        double outdoorDewPointC,
        double returnDryBulbC,
        double returnEnthalpyJPerKg,
        HighLimits limits) => Kind switch
        {
            HighLimitKind.None => false,
            HighLimitKind.FixedDryBulb => !(outdoorDryBulbC > limits.DryBulb.Celsius),
            HighLimitKind.DifferentialDryBulb => !(outdoorDryBulbC > returnDryBulbC),
            HighLimitKind.FixedEnthalpy => !(outdoorEnthalpyJPerKg > limits.Enthalpy.JoulesPerKilogram || outdoorDryBulbC > limits.DryBulb.Celsius),
            HighLimitKind.DifferentialEnthalpy => !(outdoorEnthalpyJPerKg > returnEnthalpyJPerKg || outdoorDryBulbC > limits.DryBulb.Celsius),
            HighLimitKind.FixedDewPoint => !(outdoorDewPointC > limits.DewPoint.Celsius || outdoorDryBulbC > limits.DryBulb.Celsius),
            _ => false,
        };

    /// <summary>Name plus "integrated" or "non-integrated", for tables and messages.</summary>
    public string Describe() => Kind == HighLimitKind.None ? Name : Name + (Integrated ? " (integrated)" : " (non-integrated)");

    /// <summary>The limits this control uses, in words, in the display unit of <paramref name="units"/>.</summary>
    public string LimitsText(HighLimits limits, UnitSystem units)
    {
        string t = units == UnitSystem.IP ? "F" : "C";
        string h = units == UnitSystem.IP ? "Btu/lb" : "kJ/kg";
        string db = FormattableString.Invariant($"dry-bulb {limits.DryBulb.In(units):0.#} {t}");
        return Kind switch
        {
            HighLimitKind.None => "",
            HighLimitKind.FixedDryBulb => db,
            HighLimitKind.DifferentialDryBulb => "return dry-bulb",
            HighLimitKind.FixedEnthalpy => FormattableString.Invariant($"enthalpy {limits.Enthalpy.In(units):0.#} {h}, {db}"),
            HighLimitKind.DifferentialEnthalpy => "return enthalpy, " + db,
            HighLimitKind.FixedDewPoint => FormattableString.Invariant($"dew point {limits.DewPoint.In(units):0.#} {t}, {db}"),
            _ => "",
        };
    }
}
