using BinEnergy.Reporting.Charts.Data;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// Hours in each dry-bulb bin, occupied and unoccupied stacked, with the bin's mean coincident
/// wet-bulb as a line on a second (right) axis. Series: "Occupied hours", "Unoccupied hours"
/// (bars), "Mean coincident wet-bulb" (line).
/// </summary>
public static class BinHoursChart
{
    public const string FileStem = "bin-hours";
    public const string OccupiedLabel = "Occupied hours";
    public const string UnoccupiedLabel = "Unoccupied hours";
    public const string WetBulbLabel = "Mean coincident wet-bulb";

    public static RenderedChart Render(BinChartData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        string unit = data.TemperatureUnit;
        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Hours by dry-bulb bin", data.Subject), $"Dry-bulb bin ({unit})", "Hours per year");
        var rows = data.Bins.OrderBy(b => b.LowEdge).ToArray();
        var edges = rows.Select(r => (r.LowEdge, r.HighEdge)).ToArray();
        var (mid, width) = BinAxis.Layout(edges);

        canvas.StackedBars(mid, width,
        [
            new BarLayer(OccupiedLabel, rows.Select(r => r.OccupiedHours).ToArray(), ChartPalette.Navy),
            new BarLayer(UnoccupiedLabel, rows.Select(r => r.UnoccupiedHours).ToArray(), ChartPalette.PaleBlue),
        ]);

        var right = canvas.Plot.Axes.Right;
        right.Label.Text = $"Mean coincident wet-bulb ({unit})";
        right.Label.FontSize = ChartCanvas.LabelSize;
        right.TickLabelStyle.FontSize = ChartCanvas.TickSize;
        right.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = ChartCanvas.FormatTick };
        canvas.Line(WetBulbLabel, mid, rows.Select(r => r.MeanCoincidentWetBulb ?? double.NaN).ToArray(), ChartPalette.Orange, 2.5f, LinePattern.Solid, MarkerShape.FilledCircle, right);

        if (rows.Length == 0 || rows.All(r => r.OccupiedHours + r.UnoccupiedHours == 0))
        {
            canvas.NoData("No hours to show");
        }
        else
        {
            BinAxis.FitX(canvas.Plot, edges);
            canvas.Plot.Axes.SetLimitsY(0, rows.Max(r => r.OccupiedHours + r.UnoccupiedHours) * 1.08, canvas.Plot.Axes.Left);
            var wb = rows.Where(r => r.MeanCoincidentWetBulb is not null).Select(r => r.MeanCoincidentWetBulb!.Value).ToArray();
            if (wb.Length > 0)
            {
                double pad = Math.Max((wb.Max() - wb.Min()) * 0.1, 5);
                canvas.Plot.Axes.SetLimitsY(wb.Min() - pad, wb.Max() + pad, right);
            }
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Hours per year in each {BinAxis.WidthText(edges, unit)} dry-bulb bin, occupied and unoccupied, with the mean coincident wet-bulb of each bin.", size ?? ChartSize.Report);
    }
}
