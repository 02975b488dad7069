using BinEnergy.Reporting.Charts.Data;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// Climates x variants: one group of bars per climate, one bar per variant, for annual energy
/// (<see cref="RenderEnergy"/>) or annual cost (<see cref="RenderCost"/>). A variant keeps its
/// colour in both charts; past six variants the colours repeat with a hatch. Series are the
/// variants (X is the climate's index, in order of first mention).
/// </summary>
public static class ComparisonChart
{
    public const string EnergyFileStem = "comparison-energy";
    public const string CostFileStem = "comparison-cost";

    public static RenderedChart RenderEnergy(ComparisonData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        return Render(data, c => c.AnnualEnergy, c => c.EnergyRange, "Annual energy by climate and variant", $"Annual energy ({data.EnergyUnit})", EnergyFileStem,
            $"Annual energy ({data.EnergyUnit}) of every ventilation variant in every climate.", size);
    }

    public static RenderedChart RenderCost(ComparisonData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        return Render(data, c => c.AnnualCost, c => c.CostRange, "Annual cost by climate and variant", $"Annual cost ({data.CostUnit})", CostFileStem,
            $"Annual cost ({data.CostUnit}) of every ventilation variant in every climate.", size);
    }

    private static RenderedChart Render(ComparisonData data, Func<ComparisonCell, double> value, Func<ComparisonCell, (double Min, double Max)?> range, string what, string yLabel, string stem, string description, ChartSize? size)
    {
        var climates = data.Cells.Select(c => c.Climate).Distinct().ToArray();
        var variants = data.Cells.Select(c => c.Variant).Distinct().ToArray();
        var grid = new double[variants.Length][];
        for (int v = 0; v < variants.Length; v++)
        {
            grid[v] = Enumerable.Repeat(double.NaN, climates.Length).ToArray();
        }

        foreach (var cell in data.Cells)
        {
            int c = Array.IndexOf(climates, cell.Climate);
            int v = Array.IndexOf(variants, cell.Variant);
            if (!double.IsNaN(grid[v][c]))
            {
                throw new ArgumentException($"the comparison has two rows for climate '{cell.Climate}' and variant '{cell.Variant}'; each case must appear once");
            }

            grid[v][c] = value(cell);
        }

        var canvas = new ChartCanvas(ChartCanvas.TitleFor(what, data.Subject), "Climate", yLabel);
        var layers = variants.Select((name, v) => new BarLayer(name, grid[v], ChartPalette.SeriesColor(v), HatchFor(v))).ToArray();
        var bars = canvas.GroupedBars(climates.Length, layers);
        canvas.CategoryTicks(climates);
        int k = 0;
        foreach (var (name, v) in variants.Select((n, i) => (n, i)))
        {
            for (int c = 0; c < climates.Length; c++)
            {
                if (double.IsNaN(grid[v][c]))
                {
                    continue;
                }

                var cell = data.Cells.First(x => x.Climate == climates[c] && x.Variant == name);
                if (range(cell) is var (lo, hi))
                {
                    // The year-to-year range of a multi-year record: a line from the lowest to the highest complete year.
                    var line = canvas.Plot.Add.Line(bars[k].Position, lo, bars[k].Position, hi);
                    line.Color = ChartPalette.Ink.ToScottPlot();
                    line.LineWidth = 1.5f;
                }

                k++;
            }
        }

        if (climates.Length == 0)
        {
            canvas.NoData("No climates or variants to compare");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, climates.Length - 0.4);
            EconomizerSavingsChart.FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, data.Cells.Select(value).Concat(data.Cells.Select(range).Where(r => r is not null).Select(r => r!.Value.Max)));
        }

        canvas.ShowLegendBelow();
        return canvas.Render(stem, description, size ?? ChartSize.Report);
    }

    private static IHatch? HatchFor(int variant) => (variant / ChartPalette.Series.Count) switch
    {
        0 => null,
        1 => new ScottPlot.Hatches.Striped(ScottPlot.Hatches.StripeDirection.DiagonalUp),
        2 => new ScottPlot.Hatches.Dots(),
        _ => new ScottPlot.Hatches.Checker(),
    };
}
