using System.Globalization;
using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// The bin method beside the hourly check: for each annual quantity a pair of bars, with the
/// bin method's difference from the hourly result (per cent of hourly) under the quantity's
/// name. Series: "Bin method" and "Hourly check" (X is the quantity's index).
/// </summary>
public static class MethodCheckChart
{
    public const string FileStem = "method-check";
    public const string BinLabel = "Bin method";
    public const string HourlyLabel = "Hourly sum";

    /// <summary>Legend text of the joint-bin bars.</summary>
    public const string JointLabel = "Joint bins";

    public static RenderedChart Render(MethodCheckData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var rows = data.Rows;
        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Three methods against the hourly sum", data.Subject), "Annual quantity, with the joint-bin and bin-method differences from hourly", $"Annual energy ({data.EnergyUnit})");
        var bars = canvas.GroupedBars(rows.Count,
        [
            new BarLayer(HourlyLabel, rows.Select(r => r.Hourly).ToArray(), ChartPalette.Navy),
            new BarLayer(JointLabel, rows.Select(r => r.JointBin).ToArray(), ChartPalette.Steel),
            new BarLayer(BinLabel, rows.Select(r => r.BinMethod).ToArray(), ChartPalette.PaleBlue),
        ], 0.9);
        foreach (var bar in bars)
        {
            bar.Label = (bar.Value - bar.ValueBase).ToString("#,0", CultureInfo.InvariantCulture);
        }

        canvas.CategoryTicks(rows.Select(r => $"{r.Quantity}\njoint {Difference(r.JointBin, r.Hourly)}\nbin {Difference(r.BinMethod, r.Hourly)}").ToArray());
        if (rows.Count == 0)
        {
            canvas.NoData("No method comparison to show");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, rows.Count - 0.4);
            EconomizerSavingsChart.FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, rows.SelectMany(r => new[] { r.BinMethod, r.JointBin, r.Hourly }));
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Annual results by the hourly sum, joint dry-bulb x humidity bins and the bin method ({data.EnergyUnit}), with each bin method's difference from hourly.", size ?? ChartSize.Report);
    }

    /// <summary>An estimate's difference from the hourly sum as text: "+2.1 %", "both 0" or "hourly 0".</summary>
    public static string Difference(double estimate, double hourly)
    {
        if (hourly == 0)
        {
            return estimate == 0 ? "both 0" : "hourly 0";
        }

        double pct = (estimate - hourly) / Math.Abs(hourly) * 100.0;
        return pct.ToString("+0.0' %';-0.0' %';'0.0 %'", CultureInfo.InvariantCulture);
    }
}
