using System.Globalization;
using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// The bin method beside the hourly check: for each annual quantity a pair of bars, with the
/// bin method's difference from the hourly result (per cent of hourly) under the quantity's
/// name. Series: "Bin method" and "Hourly check" (X is the quantity's index).
/// </summary>
public static class BinVsHourlyChart
{
    public const string FileStem = "bin-vs-hourly";
    public const string BinLabel = "Bin method";
    public const string HourlyLabel = "Hourly check";

    public static RenderedChart Render(BinVsHourlyData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var rows = data.Rows;
        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Bin method against the hourly check", data.Subject), "Annual quantity, with the bin method's difference from hourly", $"Annual energy ({data.EnergyUnit})");
        var bars = canvas.GroupedBars(rows.Count,
        [
            new BarLayer(BinLabel, rows.Select(r => r.BinMethod).ToArray(), ChartPalette.Navy),
            new BarLayer(HourlyLabel, rows.Select(r => r.Hourly).ToArray(), ChartPalette.PaleBlue),
        ], 0.6);
        foreach (var bar in bars)
        {
            bar.Label = (bar.Value - bar.ValueBase).ToString("#,0", CultureInfo.InvariantCulture);
        }

        canvas.CategoryTicks(rows.Select(r => $"{r.Quantity}\n{Difference(r)}").ToArray());
        if (rows.Count == 0)
        {
            canvas.NoData("No bin-vs-hourly comparison to show");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, rows.Count - 0.4);
            EconomizerSavingsChart.FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, rows.SelectMany(r => new[] { r.BinMethod, r.Hourly }));
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Annual results by the bin method and by the hourly check ({data.EnergyUnit}), with their difference.", size ?? ChartSize.Report);
    }

    /// <summary>"+1.2 %" (bin method relative to hourly), or "both 0" / "hourly 0".</summary>
    public static string Difference(BinVsHourlyRow row)
    {
        ArgumentNullException.ThrowIfNull(row);
        if (row.Hourly == 0)
        {
            return row.BinMethod == 0 ? "both 0" : "hourly 0";
        }

        double pct = (row.BinMethod - row.Hourly) / Math.Abs(row.Hourly) * 100.0;
        return pct.ToString("+0.0' %';-0.0' %';'0.0 %'", CultureInfo.InvariantCulture);
    }
}
