namespace BinEnergy.Reporting.Charts;

/// <summary>
/// The BinEnergy chart palette (see docs/reporting.md). Six series colours on a blue–orange
/// axis, the hue axis that red–green colour-blind readers (protanopia, deuteranopia) still
/// see, and spread in lightness so that every pair differs by at least 12 units of CIE L*:
/// a grey print or a colour-blind reader still tells any two apart. Stacked and grouped bars
/// also get a dark outline, and lines a marker, so neighbours never rely on colour alone.
/// </summary>
public static class ChartPalette
{
    /// <summary>Navy, L* 22.</summary>
    public static ChartColor Navy { get; } = new("navy", "#1D3557");

    /// <summary>Orange, L* 65.</summary>
    public static ChartColor Orange { get; } = new("orange", "#E08A2E");

    /// <summary>Steel blue, L* 50.</summary>
    public static ChartColor Steel { get; } = new("steel blue", "#3F7CAC");

    /// <summary>Pale blue, L* 78.</summary>
    public static ChartColor PaleBlue { get; } = new("pale blue", "#9CC6E8");

    /// <summary>Umber, L* 36.</summary>
    public static ChartColor Umber { get; } = new("umber", "#7A4A1C");

    /// <summary>Sand, L* 90.</summary>
    public static ChartColor Sand { get; } = new("sand", "#F2E3BC");

    /// <summary>Outlines, text and the saturation curve: near-black ink.</summary>
    public static ChartColor Ink { get; } = new("ink", "#1A1A1A");

    /// <summary>Grid lines and RH lines: mid grey.</summary>
    public static ChartColor Rule { get; } = new("rule", "#8C8C8C");

    /// <summary>
    /// Series colours in the order charts use them: the first two, three, four ... are as far
    /// apart in lightness as the set allows (22, 65, 50, 78, 36, 90). Beyond six series the
    /// colours repeat with a hatch.
    /// </summary>
    public static IReadOnlyList<ChartColor> Series { get; } = [Navy, Orange, Steel, PaleBlue, Umber, Sand];

    /// <summary>Heating energy (warm, mid-light).</summary>
    public static ChartColor Heating => Orange;

    /// <summary>Sensible cooling energy.</summary>
    public static ChartColor SensibleCooling => Steel;

    /// <summary>Latent cooling (dehumidification) energy.</summary>
    public static ChartColor LatentCooling => Navy;

    /// <summary>Economizer mode "no cooling": lightest.</summary>
    public static ChartColor NoCooling => Sand;

    /// <summary>Economizer mode "free cooling".</summary>
    public static ChartColor FreeCooling => PaleBlue;

    /// <summary>Economizer mode "integrated" (economizer plus coil).</summary>
    public static ChartColor Integrated => Steel;

    /// <summary>Economizer mode "minimum outdoor air": darkest.</summary>
    public static ChartColor MinimumOutdoorAir => Navy;

    /// <summary>
    /// Stops of the density colour ramp for hours on the psychrometric chart, few hours to
    /// many: straw, orange, umber, near-black brown. Lightness falls steadily (L* 89, 65, 36,
    /// 15), so the ramp reads the same in grey and to colour-blind readers.
    /// </summary>
    public static IReadOnlyList<ChartColor> DensityRamp { get; } =
    [
        new("straw", "#F7DE9E"),
        Orange,
        Umber,
        new("dark brown", "#3A1F08"),
    ];

    /// <summary>Colour of series <paramref name="index"/> (0-based), cycling after six.</summary>
    public static ChartColor SeriesColor(int index) => Series[((index % Series.Count) + Series.Count) % Series.Count];
}
