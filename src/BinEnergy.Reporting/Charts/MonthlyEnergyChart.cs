using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>Energy components by calendar month, stacked, January to December. Series are the
/// components (X is the month index 0..11).</summary>
public static class MonthlyEnergyChart
{
    public const string FileStem = "monthly";

    /// <summary>Month labels (English abbreviations, fixed so output does not depend on the machine's culture).</summary>
    public static IReadOnlyList<string> MonthLabels { get; } = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

    public static RenderedChart Render(MonthlyEnergyData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        foreach (var s in data.Series)
        {
            if (s.Values.Count != 12)
            {
                throw new ArgumentException($"monthly series '{s.Name}' has {s.Values.Count} values; it needs 12, January to December");
            }
        }

        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Energy by month", data.Subject), "Month", $"Energy ({data.EnergyUnit})");
        var positions = Enumerable.Range(0, 12).Select(i => (double)i).ToArray();
        var layers = data.Series.Select((s, i) => new BarLayer(s.Name, s.Values, s.Color ?? ChartPalette.SeriesColor(i))).ToArray();
        canvas.StackedBars(positions, 0.72, layers);
        canvas.CategoryTicks(MonthLabels);
        double top = Enumerable.Range(0, 12).Select(m => data.Series.Sum(s => Math.Max(0, s.Values[m]))).DefaultIfEmpty(0).Max();
        if (!(top > 0))
        {
            canvas.NoData("No monthly energy to show");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, 11.6);
            canvas.Plot.Axes.SetLimitsY(0, top * 1.08);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Energy ({data.EnergyUnit}) by calendar month, by component.", size ?? ChartSize.Report);
    }
}
