using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// Occupied hours in each economizer mode by dry-bulb bin, stacked from lightest to darkest:
/// no cooling, free cooling, integrated, minimum outdoor air.
/// </summary>
public static class EconomizerModesChart
{
    public const string FileStem = "economizer-modes";
    public const string NoCoolingLabel = "No cooling";
    public const string FreeCoolingLabel = "Free cooling";
    public const string IntegratedLabel = "Integrated (economizer + coil)";
    public const string MinimumOutdoorAirLabel = "Minimum outdoor air";

    public static RenderedChart Render(EconomizerModesData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        string what = string.IsNullOrWhiteSpace(data.ControlName) ? "Economizer modes by bin" : $"Economizer modes by bin, {data.ControlName.Trim()}";
        var canvas = new ChartCanvas(ChartCanvas.TitleFor(what, data.Subject), $"Dry-bulb bin ({data.TemperatureUnit})", "Occupied hours per year");
        var rows = data.Bins.OrderBy(b => b.LowEdge).ToArray();
        var edges = rows.Select(r => (r.LowEdge, r.HighEdge)).ToArray();
        var (mid, width) = BinAxis.Layout(edges);
        canvas.StackedBars(mid, width,
        [
            new BarLayer(NoCoolingLabel, rows.Select(r => r.NoCoolingHours).ToArray(), ChartPalette.NoCooling),
            new BarLayer(FreeCoolingLabel, rows.Select(r => r.FreeCoolingHours).ToArray(), ChartPalette.FreeCooling),
            new BarLayer(IntegratedLabel, rows.Select(r => r.IntegratedHours).ToArray(), ChartPalette.Integrated),
            new BarLayer(MinimumOutdoorAirLabel, rows.Select(r => r.MinimumOutdoorAirHours).ToArray(), ChartPalette.MinimumOutdoorAir),
        ]);
        double top = rows.Length == 0 ? 0 : rows.Max(r => r.NoCoolingHours + r.FreeCoolingHours + r.IntegratedHours + r.MinimumOutdoorAirHours);
        if (!(top > 0))
        {
            canvas.NoData("No occupied hours to show");
        }
        else
        {
            BinAxis.FitX(canvas.Plot, edges);
            canvas.Plot.Axes.SetLimitsY(0, top * 1.08);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Occupied hours per year in each economizer mode under the {data.ControlName} control, stacked in each {BinAxis.WidthText(edges, data.TemperatureUnit)} dry-bulb bin.", size ?? ChartSize.Report);
    }
}
