using BinEnergy.Reporting.Charts.Data;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// One figure against the climates' degree-days: a point per climate, a colour and marker per
/// variant. Series: per variant a line series of its points (X degree-days, Y the figure), as drawn.
/// </summary>
public static class DegreeDayScatterChart
{
    private static readonly MarkerShape[] Shapes = [MarkerShape.FilledCircle, MarkerShape.FilledSquare, MarkerShape.FilledTriangleUp, MarkerShape.FilledDiamond, MarkerShape.FilledTriangleDown, MarkerShape.OpenCircle];

    public static RenderedChart Render(DegreeDayScatterData data, string fileStem, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var canvas = new ChartCanvas(ChartCanvas.TitleFor(data.Figure + " against " + data.DegreeDays.Split(',')[0].ToLowerInvariant(), data.Subject), data.DegreeDays, $"{data.Figure} ({data.Unit})");
        var ys = new List<double>();
        var xs = new List<double>();
        for (int v = 0; v < data.Variants.Count; v++)
        {
            var (name, points) = data.Variants[v];
            var finite = points.Where(p => double.IsFinite(p.DegreeDays) && double.IsFinite(p.Value)).ToArray();
            var color = ChartPalette.SeriesColor(v);
            var shape = Shapes[v % Shapes.Length];
            canvas.Record(new PlottedSeries(name, PlottedSeriesKind.Line, finite.Select(p => p.DegreeDays).ToArray(), finite.Select(p => p.Value).ToArray()));
            canvas.LegendLine(name, color, 0, LinePattern.Solid, shape);
            if (finite.Length == 0)
            {
                continue;
            }

            var dots = canvas.Plot.Add.ScatterPoints(finite.Select(p => p.DegreeDays).ToArray(), finite.Select(p => p.Value).ToArray(), color.ToScottPlot());
            dots.MarkerSize = 8;
            dots.MarkerShape = shape;
            dots.MarkerLineColor = ChartPalette.Ink.ToScottPlot();
            dots.MarkerLineWidth = 0.8f;
            xs.AddRange(finite.Select(p => p.DegreeDays));
            ys.AddRange(finite.Select(p => p.Value));
        }

        if (ys.Count == 0)
        {
            canvas.NoData("No climate has both degree-days and this figure");
        }
        else
        {
            double high = Math.Max(1, xs.Max());
            canvas.Plot.Axes.SetLimitsX(-0.03 * high, high * 1.05); // a margin so climates with no degree-days are not cut by the axis
            EconomizerSavingsChart.FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, ys);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(fileStem, $"{data.Figure} ({data.Unit}) of every climate and variant against the climate's {data.DegreeDays}.", size ?? ChartSize.Report);
    }
}
