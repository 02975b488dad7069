using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Charts.Data;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// How one figure spreads across climates: for each variant a box from the lower to the upper
/// quartile with the median across it, whiskers to the lowest and highest climate, a diamond at
/// the mean, and every climate as a dot beside the box. Series: per variant a line series of the
/// five box values (lowest, lower quartile, median, upper quartile, highest) at X = the variant's
/// index, and a line series of the climates' values (the dots).
/// </summary>
public static class DistributionChart
{
    public static RenderedChart Render(DistributionData data, string fileStem, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var canvas = new ChartCanvas(ChartCanvas.TitleFor(data.Figure + " across climates", data.Subject), "Variant", $"{data.Figure} ({data.Unit})");
        var all = new List<double>();
        for (int v = 0; v < data.Variants.Count; v++)
        {
            var (name, values) = data.Variants[v];
            var d = FigureDistribution.Of(values);
            var color = ChartPalette.SeriesColor(v);
            if (d.Count == 0)
            {
                continue;
            }

            var boxes = canvas.Plot.Add.Boxes([new Box
            {
                Position = v - 0.12,
                BoxMin = d.LowerQuartile,
                BoxMiddle = d.Median,
                BoxMax = d.UpperQuartile,
                WhiskerMin = d.Min,
                WhiskerMax = d.Max,
                Width = 0.4,
            }]);
            boxes.FillColor = color.ToScottPlot().WithAlpha(0.55);
            boxes.LineColor = ChartPalette.Ink.ToScottPlot();
            boxes.LineWidth = 1.2f;
            canvas.Record(new PlottedSeries(name + " box", PlottedSeriesKind.Line, Enumerable.Repeat((double)v, 5).ToArray(), [d.Min, d.LowerQuartile, d.Median, d.UpperQuartile, d.Max]));

            var mean = canvas.Plot.Add.Marker(v - 0.12, d.Mean, MarkerShape.FilledDiamond, 10, ChartPalette.Ink.ToScottPlot());
            mean.MarkerLineColor = Colors.White;

            // Each climate as a dot to the right of the box, spread sideways by a fixed sequence so equal values stay visible.
            var finite = values.Where(double.IsFinite).ToArray();
            var xs = finite.Select((_, i) => v + 0.18 + 0.16 * ((i * 0.618034) % 1.0)).ToArray();
            var dots = canvas.Plot.Add.ScatterPoints(xs, finite, color.ToScottPlot());
            dots.MarkerSize = 6;
            dots.MarkerShape = MarkerShape.FilledCircle;
            dots.MarkerLineColor = ChartPalette.Ink.ToScottPlot();
            dots.MarkerLineWidth = 0.8f;
            canvas.Record(new PlottedSeries(name, PlottedSeriesKind.Line, xs, finite));
            all.AddRange(finite);
        }

        canvas.CategoryTicks(data.Variants.Select(v => v.Variant).ToArray());
        if (all.Count == 0)
        {
            canvas.NoData("No climate has this figure");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, data.Variants.Count - 0.4);
            EconomizerSavingsChart.FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, all);
            canvas.LegendFill("Quartiles (box), median (line), lowest to highest (whiskers)", ChartPalette.Rule);
            canvas.LegendLine("Mean", ChartPalette.Ink, 0, LinePattern.Solid, MarkerShape.FilledDiamond);
            canvas.LegendLine("One climate", ChartPalette.Rule, 0, LinePattern.Solid, MarkerShape.FilledCircle);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(fileStem, $"{data.Figure} ({data.Unit}) of each variant across {all.Count / Math.Max(1, data.Variants.Count)} climates: quartiles, median, mean, lowest and highest, and every climate.", size ?? ChartSize.Report);
    }
}
