using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// Annual outdoor-air energy in each dry-bulb bin, stacked: heating, sensible cooling, latent
/// cooling, and humidification when any bin has some. Series carry those labels.
/// </summary>
public static class LoadByBinChart
{
    public const string FileStem = "load-by-bin";
    public const string HeatingLabel = "Heating";
    public const string SensibleCoolingLabel = "Sensible cooling";
    public const string LatentCoolingLabel = "Latent cooling";
    public const string HumidificationLabel = "Humidification";

    public static RenderedChart Render(LoadByBinData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Outdoor-air load by bin", data.Subject), $"Dry-bulb bin ({data.TemperatureUnit})", $"Annual energy ({data.EnergyUnit})");
        var rows = data.Bins.OrderBy(b => b.LowEdge).ToArray();
        var edges = rows.Select(r => (r.LowEdge, r.HighEdge)).ToArray();
        var (mid, width) = BinAxis.Layout(edges);
        var layers = new List<BarLayer>
        {
            new(HeatingLabel, rows.Select(r => r.Heating).ToArray(), ChartPalette.Heating),
            new(SensibleCoolingLabel, rows.Select(r => r.SensibleCooling).ToArray(), ChartPalette.SensibleCooling),
            new(LatentCoolingLabel, rows.Select(r => r.LatentCooling).ToArray(), ChartPalette.LatentCooling),
        };
        if (rows.Any(r => r.Humidification != 0))
        {
            layers.Add(new(HumidificationLabel, rows.Select(r => r.Humidification).ToArray(), ChartPalette.Sand));
        }

        canvas.StackedBars(mid, width, layers);
        double top = rows.Length == 0 ? 0 : rows.Max(r => r.Heating + r.SensibleCooling + r.LatentCooling + r.Humidification);
        if (!(top > 0))
        {
            canvas.NoData("No outdoor-air load to show");
        }
        else
        {
            BinAxis.FitX(canvas.Plot, edges);
            canvas.Plot.Axes.SetLimitsY(0, top * 1.08);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Annual outdoor-air energy ({data.EnergyUnit}) in each {BinAxis.WidthText(edges, data.TemperatureUnit)} dry-bulb bin: heating, sensible cooling and latent cooling stacked.", size ?? ChartSize.Report);
    }
}
