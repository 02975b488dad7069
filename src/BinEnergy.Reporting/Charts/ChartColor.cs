using System.Globalization;

namespace BinEnergy.Reporting.Charts;

/// <summary>A named colour of the chart palette, as sRGB hex (#RRGGBB).</summary>
public readonly record struct ChartColor(string Name, string Hex)
{
    /// <summary>Red, green and blue, 0 to 255.</summary>
    public (byte R, byte G, byte B) Rgb => (Channel(1), Channel(3), Channel(5));

    /// <summary>
    /// Relative luminance Y (0 black to 1 white) from the sRGB channels, by the definition in
    /// WCAG 2.1 (linearised sRGB weighted 0.2126, 0.7152, 0.0722): what a grey print keeps.
    /// </summary>
    public double RelativeLuminance
    {
        get
        {
            static double Linear(byte c)
            {
                double v = c / 255.0;
                return v <= 0.04045 ? v / 12.92 : Math.Pow((v + 0.055) / 1.055, 2.4);
            }

            var (r, g, b) = Rgb;
            return 0.2126 * Linear(r) + 0.7152 * Linear(g) + 0.0722 * Linear(b);
        }
    }

    /// <summary>CIE 1976 lightness L* (0 to 100) of the colour, from its relative luminance
    /// (D65 white, Y_n = 1): the grey level a reader sees.</summary>
    public double Lightness
    {
        get
        {
            double y = RelativeLuminance;
            return y > 216.0 / 24389.0 ? 116.0 * Math.Cbrt(y) - 16.0 : y * 24389.0 / 27.0;
        }
    }

    internal ScottPlot.Color ToScottPlot() => new(Channel(1), Channel(3), Channel(5));

    private byte Channel(int start) => byte.Parse(Hex.AsSpan(start, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture);
}
