using System.Globalization;
using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// Annual savings of each economizer control against the no-economizer baseline: energy on the
/// left axis and, when costs are given, cost beside it on the right axis. Each bar carries its
/// value. Series: "Energy saved" and, with costs, "Cost saved".
/// </summary>
public static class EconomizerSavingsChart
{
    public const string FileStem = "economizer-savings";
    public const string EnergyLabel = "Energy saved";
    public const string CostLabel = "Cost saved";

    public static RenderedChart Render(SavingsByControlData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        var canvas = new ChartCanvas(ChartCanvas.TitleFor("Annual economizer savings by control", data.Subject), "High-limit control", $"{data.Quantity} ({data.EnergyUnit})");
        var rows = data.Controls;
        bool withCost = data.CostUnit is not null && rows.Any(r => r.CostSavings is not null);
        var right = canvas.Plot.Axes.Right;
        var layers = new List<BarLayer> { new(EnergyLabel, rows.Select(r => r.EnergySavings).ToArray(), ChartPalette.Steel, LegendText: withCost ? EnergyLabel + " (left axis)" : null) };
        if (withCost)
        {
            right.Label.Text = $"Cost saved ({data.CostUnit})";
            right.Label.FontSize = ChartCanvas.LabelSize;
            right.TickLabelStyle.FontSize = ChartCanvas.TickSize;
            right.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = ChartCanvas.FormatTick };
            layers.Add(new(CostLabel, rows.Select(r => r.CostSavings ?? double.NaN).ToArray(), ChartPalette.Orange, YAxis: right, LegendText: CostLabel + " (right axis)"));
        }

        var bars = canvas.GroupedBars(rows.Count, layers, withCost ? 0.7 : 0.5);
        foreach (var bar in bars)
        {
            bar.Label = (bar.Value - bar.ValueBase).ToString("#,0", CultureInfo.InvariantCulture);
        }

        canvas.CategoryTicks(rows.Select(r => r.ControlName).ToArray());
        if (rows.Count == 0)
        {
            canvas.NoData("No economizer controls to compare");
        }
        else
        {
            canvas.Plot.Axes.SetLimitsX(-0.6, rows.Count - 0.4);
            FitFromZero(canvas.Plot, canvas.Plot.Axes.Left, rows.Select(r => r.EnergySavings));
            if (withCost)
            {
                FitFromZero(canvas.Plot, right, rows.Where(r => r.CostSavings is not null).Select(r => r.CostSavings!.Value));
            }
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, withCost
            ? $"Annual savings of each economizer high-limit control against no economizer: {data.Quantity.ToLowerInvariant()} ({data.EnergyUnit}, left axis) and the {data.CostQuantity} ({data.CostUnit}, right axis)."
            : $"Annual savings of each economizer high-limit control against no economizer: {data.Quantity.ToLowerInvariant()} ({data.EnergyUnit}).", size ?? ChartSize.Report);
    }

    /// <summary>Y limits from 0 (or the lowest negative value) to the highest value plus room for the labels.</summary>
    internal static void FitFromZero(ScottPlot.Plot plot, ScottPlot.IYAxis axis, IEnumerable<double> values)
    {
        var v = values.Where(double.IsFinite).ToArray();
        double low = v.Length == 0 ? 0 : Math.Min(0, v.Min());
        double high = v.Length == 0 ? 1 : Math.Max(0, v.Max());
        if (high - low <= 0)
        {
            high = low + 1;
        }

        double pad = (high - low) * 0.12;
        plot.Axes.SetLimitsY(low < 0 ? low - pad : 0, high + pad, axis);
    }
}
