using BinEnergy.Reporting.Charts;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// The palette stays readable in grey and for colour-blind readers: its lightness (CIE 1976 L*
/// from WCAG 2.1 relative luminance) separates every pair of series colours, and the density
/// ramp darkens steadily.
/// </summary>
public class ChartPaletteTests
{
    [Theory]
    [InlineData("#FFFFFF", 100.0)] // white is L* 100 (CIE 1976 definition)
    [InlineData("#000000", 0.0)]   // black is L* 0 (CIE 1976 definition)
    [InlineData("#777777", 50.0)]  // sRGB grey 119 is about L* 50 (recalled from memory)
    public void Lightness_MatchesCieLab(string hex, double expected) =>
        Assert.Equal(expected, new ChartColor("probe", hex).Lightness, 0.1);

    [Fact]
    public void RelativeLuminance_MatchesWcag()
    {
        // sRGB pure green has relative luminance 0.7152 (WCAG 2.1, definition of relative luminance).
        Assert.Equal(0.7152, new ChartColor("green", "#00FF00").RelativeLuminance, 4);
    }

    [Fact]
    public void SeriesColours_DifferByAtLeast12LightnessUnits()
    {
        // 12 units of L* keep two fills apart in a grey print (common practice: about 10 or more).
        var colours = ChartPalette.Series;
        Assert.Equal(6, colours.Count);
        for (int i = 0; i < colours.Count; i++)
        {
            for (int j = i + 1; j < colours.Count; j++)
            {
                double gap = Math.Abs(colours[i].Lightness - colours[j].Lightness);
                Assert.True(gap >= 12, $"{colours[i].Name} (L* {colours[i].Lightness:0.0}) and {colours[j].Name} (L* {colours[j].Lightness:0.0}) differ by only {gap:0.0}");
            }
        }
    }

    [Fact]
    public void StackedRoles_DifferByAtLeast12LightnessUnits()
    {
        ChartColor[][] stacks =
        [
            [ChartPalette.Navy, ChartPalette.PaleBlue, ChartPalette.Orange],                                     // bin hours + wet-bulb line
            [ChartPalette.Heating, ChartPalette.SensibleCooling, ChartPalette.LatentCooling],                     // loads
            [ChartPalette.NoCooling, ChartPalette.FreeCooling, ChartPalette.Integrated, ChartPalette.MinimumOutdoorAir], // modes
        ];
        foreach (var stack in stacks)
        {
            var l = stack.Select(c => c.Lightness).Order().ToArray();
            Assert.All(l.Zip(l.Skip(1)), p => Assert.True(p.Second - p.First >= 12, string.Join(", ", stack.Select(c => c.Name))));
        }
    }

    [Fact]
    public void DensityRamp_DarkensSteadily()
    {
        var l = ChartPalette.DensityRamp.Select(c => c.Lightness).ToArray();
        Assert.All(l.Zip(l.Skip(1)), p => Assert.True(p.First - p.Second >= 12));
        Assert.True(l[0] > 85, "few hours must still show on white");
    }

    [Fact]
    public void CategoryLabels_WrapToFitOrTurn()
    {
        var (labels, rotate) = ChartCanvas.LayOutCategories(["Larkspur Flats", "Cinder Bay"], 900);
        Assert.False(rotate);
        Assert.Equal("Larkspur Flats", labels[0]);
        (labels, rotate) = ChartCanvas.LayOutCategories(InventedClimate.Names, 900);
        Assert.False(rotate);
        Assert.Equal("Pinecrest\nHollow", labels[5]);
        (_, rotate) = ChartCanvas.LayOutCategories(Enumerable.Range(0, 30).Select(i => $"Climate number {i} with a long name").ToArray(), 900);
        Assert.True(rotate);
    }
}
