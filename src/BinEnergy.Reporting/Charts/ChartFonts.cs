using ScottPlot;
using SkiaSharp;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// The chart typeface: DejaVu Sans, bundled in this assembly (Fonts/, Bitstream Vera licence,
/// see Fonts/LICENSE-DejaVu.txt) so that charts show the same text on a machine with no system
/// fonts. Registered with ScottPlot once, under <see cref="FamilyName"/>, ahead of the system
/// font lookup.
/// </summary>
internal static class ChartFonts
{
    /// <summary>The name charts ask ScottPlot for; resolved only by the bundled files.</summary>
    public const string FamilyName = "BinEnergy Sans";

    private static readonly Lock Gate = new();
    private static bool registered;

    public static void EnsureRegistered()
    {
        lock (Gate)
        {
            if (registered)
            {
                return;
            }

            Fonts.FontResolvers.Insert(0, new BundledResolver(Load("DejaVuSans.ttf"), Load("DejaVuSans-Bold.ttf")));
            registered = true;
        }
    }

    private static SKTypeface Load(string file)
    {
        string name = "BinEnergy.Reporting.Fonts." + file;
        using var stream = typeof(ChartFonts).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"embedded font {name} is missing from the assembly");
        return SKTypeface.FromStream(stream)
            ?? throw new InvalidOperationException($"embedded font {name} could not be read");
    }

    private sealed class BundledResolver(SKTypeface regular, SKTypeface bold) : IFontResolver
    {
        public SKTypeface? CreateTypeface(string fontName, FontWeight weight, FontSlant slant, FontSpacing spacing) =>
            Pick(fontName, weight >= FontWeight.SemiBold);

        public SKTypeface? CreateTypeface(string fontName, bool bold, bool italic) => Pick(fontName, bold);

        private SKTypeface? Pick(string fontName, bool isBold) =>
            fontName == FamilyName ? (isBold ? bold : regular) : null;
    }
}
