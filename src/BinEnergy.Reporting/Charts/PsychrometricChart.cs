using BinEnergy.Reporting.Charts.Data;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// The hourly weather on a psychrometric chart (dry-bulb across, humidity ratio up): hours as a
/// density (hours per cell, a 2-D histogram) cut off at the saturation curve, RH lines with their
/// labels inside the plot, and the economizer's enabled region drawn over the hours (translucent
/// fill and solid outline), its control named in the title.
/// Series: "Hours" (density), the saturation curve, each RH line, and the region (area).
/// </summary>
public static class PsychrometricChart
{
    public const string FileStem = "psychrometric";
    public const string HoursLabel = "Hours";

    /// <summary>Legend text of the hours (the colour bar gives the scale).</summary>
    public const string HoursLegend = "Hours per cell (scale at right)";

    /// <summary>Opacity of the economizer region's fill over the hour cells.</summary>
    internal const double RegionFillAlpha = 0.3;

    public static RenderedChart Render(PsychroChartData data, ChartSize? size = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        if (data.HourDryBulb.Count != data.HourHumidityRatio.Count)
        {
            throw new ArgumentException($"the chart has {data.HourDryBulb.Count} dry-bulb values but {data.HourHumidityRatio.Count} humidity ratios; they must match");
        }

        string what = data.EconomizerRegion is null
            ? "Hourly weather on the psychrometric chart"
            : string.IsNullOrWhiteSpace(data.ControlName)
                ? "Hourly weather and the economizer region"
                : "Hourly weather and the economizer region, " + data.ControlName.Trim();
        string title = ChartCanvas.TitleFor(what, data.Subject);
        string yLabel = $"Humidity ratio ({data.HumidityRatioUnit} dry air)";
        var canvas = new ChartCanvas(title, $"Dry-bulb ({data.TemperatureUnit})", yLabel);
        var plot = canvas.Plot;
        var hours = Enumerable.Range(0, data.HourDryBulb.Count)
            .Where(i => double.IsFinite(data.HourDryBulb[i]) && double.IsFinite(data.HourHumidityRatio[i]))
            .Select(i => (X: data.HourDryBulb[i], Y: data.HourHumidityRatio[i]))
            .ToArray();

        var curveX = data.SaturationCurve.X.Where(double.IsFinite).ToArray();
        double xMin = Min(hours.Select(h => h.X).Concat(curveX), 0);
        double xMax = Max(hours.Select(h => h.X).Concat(curveX), xMin + 1);
        double yTop = hours.Length > 0
            ? hours.Max(h => h.Y) * 1.15
            : Max(data.SaturationCurve.Y.Where(double.IsFinite), 1);
        if (data.EconomizerRegion is { } region && region.Y.Count > 0)
        {
            yTop = Math.Max(yTop, Math.Min(region.Y.Max() * 1.05, yTop * 1.6));
        }

        yTop = Math.Max(yTop, 1e-6);

        // Hours as a 2-D histogram.
        double dx = data.DryBulbCell ?? NiceStep((xMax - xMin) / 55.0);
        double dy = data.HumidityRatioCell ?? NiceStep(yTop / 60.0);
        double left = Math.Floor(xMin / dx) * dx;
        int cols = Math.Max(1, (int)Math.Ceiling((xMax - left) / dx + 1e-9));
        int rows = Math.Max(1, (int)Math.Ceiling(yTop / dy + 1e-9));
        if (hours.Length > 0)
        {
            cols = Math.Max(cols, (int)Math.Floor((hours.Max(h => h.X) - left) / dx) + 1);
            rows = Math.Max(rows, (int)Math.Floor(hours.Max(h => h.Y) / dy) + 1);
        }

        var counts = new double[rows, cols];
        foreach (var (x, y) in hours)
        {
            int c = Math.Clamp((int)Math.Floor((x - left) / dx), 0, cols - 1);
            int r = Math.Clamp((int)Math.Floor(Math.Max(y, 0) / dy), 0, rows - 1);
            counts[rows - 1 - r, c] += 1; // heatmap row 0 is the top
        }

        var cx = new List<double>();
        var cy = new List<double>();
        var cw = new List<double>();
        for (int r = 0; r < rows; r++)
        {
            for (int c = 0; c < cols; c++)
            {
                double n = counts[rows - 1 - r, c];
                if (n > 0)
                {
                    cx.Add(left + (c + 0.5) * dx);
                    cy.Add((r + 0.5) * dy);
                    cw.Add(n);
                }
                else
                {
                    counts[rows - 1 - r, c] = double.NaN;
                }
            }
        }

        canvas.Record(new PlottedSeries(HoursLabel, PlottedSeriesKind.Density, cx, cy, cw));
        if (hours.Length > 0)
        {
            var heatmap = plot.Add.Heatmap(counts);
            heatmap.Rectangle = new CoordinateRect(left, left + cols * dx, 0, rows * dy);
            heatmap.Colormap = new ScottPlot.Colormaps.CustomInterpolated(ChartPalette.DensityRamp.Select(c => c.ToScottPlot()).ToArray());
            heatmap.NaNCellColor = Colors.Transparent;
            heatmap.ManualRange = new ScottPlot.Range(1, Math.Max(2, cw.Max()));
            var bar = plot.Add.ColorBar(heatmap, Edge.Right);
            bar.Label = $"Hours per cell ({Format(dx)} {data.TemperatureUnit} x {Format(dy)} {data.HumidityRatioUnit})";
            bar.LabelStyle.FontSize = ChartCanvas.TickSize;
            bar.LabelStyle.FontName = ChartFonts.FamilyName;
            bar.Axis.TickLabelStyle.FontSize = ChartCanvas.TickSize;
            bar.Axis.TickLabelStyle.FontName = ChartFonts.FamilyName;
            bar.Axis.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { IntegerTicksOnly = true, LabelFormatter = ChartCanvas.FormatTick }; // whole hours
        }

        // Above the saturation curve no state exists: cover the parts of cells that straddle it.
        MaskAboveSaturation(plot, data.SaturationCurve, yTop);

        // The region over the hours: a translucent fill, so the cells show through, and a solid outline.
        if (data.EconomizerRegion is { } economizer)
        {
            var edge = Polygon(plot, economizer, ChartPalette.PaleBlue.ToScottPlot().WithAlpha(RegionFillAlpha), ChartPalette.Navy.ToScottPlot(), 2);
            edge.LinePattern = LinePattern.Solid;
            canvas.Record(new PlottedSeries(economizer.Label, PlottedSeriesKind.Area, economizer.X, economizer.Y));
            canvas.LegendFill(economizer.Label, ChartPalette.PaleBlue, alpha: RegionFillAlpha, outline: ChartPalette.Navy);
        }

        foreach (var line in data.RelativeHumidityLines)
        {
            AddCurve(canvas, line, ChartPalette.Rule, 1, LinePattern.Dotted, legend: false);
            LabelRhLine(plot, line, xMin, xMax, yTop);
        }

        AddCurve(canvas, data.SaturationCurve, ChartPalette.Ink, 2.5f, LinePattern.Solid, legend: true);
        if (data.RelativeHumidityLines.Count > 0)
        {
            canvas.LegendLine("Relative humidity (20 % steps)", ChartPalette.Rule, 1.5f, LinePattern.Dotted);
        }

        if (hours.Length > 0)
        {
            canvas.LegendFill(HoursLegend, ChartPalette.Orange);
        }
        if (!string.IsNullOrWhiteSpace(data.PressureNote))
        {
            var note = plot.Add.Annotation(data.PressureNote.Trim(), Alignment.UpperLeft);
            note.LabelFontSize = ChartCanvas.TickSize;
            note.LabelFontName = ChartFonts.FamilyName;
            note.LabelBackgroundColor = Colors.White.WithAlpha(0.85);
            note.LabelBorderColor = Colors.Transparent;
            note.LabelShadowColor = Colors.Transparent;
        }

        if (hours.Length == 0)
        {
            canvas.NoData("No hourly weather to show");
            plot.Axes.SetLimits(xMin, xMax, 0, yTop);
        }
        else
        {
            plot.Axes.SetLimits(xMin, xMax, 0, yTop);
        }

        canvas.ShowLegendBelow();
        return canvas.Render(FileStem, $"Every hour of the weather record on a psychrometric chart (dry-bulb {data.TemperatureUnit}, humidity ratio {data.HumidityRatioUnit}) as hours per cell, with the saturation curve and RH lines{RegionText(data)}.", size ?? ChartSize.Report);
    }

    private static string RegionText(PsychroChartData data) =>
        data.EconomizerRegion is null ? ""
        : string.IsNullOrWhiteSpace(data.ControlName) ? ", and the economizer's enabled region drawn over the cells"
        : $", and the region where the {data.ControlName.Trim()} economizer is enabled drawn over the cells";

    private static ScottPlot.Plottables.Polygon Polygon(Plot plot, ChartLine line, Color fill, Color stroke, float width)
    {
        var coordinates = line.X.Zip(line.Y, (x, y) => new Coordinates(x, y)).ToArray();
        var polygon = plot.Add.Polygon(coordinates.Length >= 3 ? coordinates : [new(0, 0), new(0, 0), new(0, 0)]);
        polygon.FillColor = fill;
        polygon.LineColor = stroke;
        polygon.LineWidth = width;
        return polygon;
    }

    private static void AddCurve(ChartCanvas canvas, ChartLine line, ChartColor color, float width, LinePattern pattern, bool legend)
    {
        canvas.Record(new PlottedSeries(line.Label, PlottedSeriesKind.Line, line.X, line.Y));
        if (line.X.Count > 0)
        {
            var scatter = canvas.Plot.Add.ScatterLine(line.X.ToArray(), line.Y.ToArray(), color.ToScottPlot());
            scatter.LineWidth = width;
            scatter.LinePattern = pattern;
        }

        if (legend)
        {
            canvas.LegendLine(line.Label, color, width, pattern);
        }
    }

    /// <summary>
    /// Covers everything above the saturation curve with the background colour, so density cells
    /// that straddle the curve end at it.
    /// </summary>
    private static void MaskAboveSaturation(Plot plot, ChartLine saturation, double yTop)
    {
        var points = saturation.X.Zip(saturation.Y, (x, y) => (X: x, Y: y)).Where(p => double.IsFinite(p.X) && double.IsFinite(p.Y)).ToArray();
        if (points.Length < 2)
        {
            return;
        }

        double roof = Math.Max(yTop, points.Max(p => p.Y)) * 2;
        var outline = points.Select(p => new Coordinates(p.X, p.Y))
            .Append(new Coordinates(points[^1].X, roof))
            .Append(new Coordinates(points[0].X, roof))
            .ToArray();
        var mask = plot.Add.Polygon(outline);
        mask.FillColor = Colors.White;
        mask.LineWidth = 0;
    }

    /// <summary>
    /// Puts the line's label, right-aligned, just left of the last point that lies inside the plot
    /// with room to spare (2 % of the width from the right edge, 10 % of the height from the top),
    /// so it is never cut off by the frame.
    /// </summary>
    private static void LabelRhLine(Plot plot, ChartLine line, double xMin, double xMax, double yTop)
    {
        double right = xMax - (xMax - xMin) * 0.02;
        double top = yTop * 0.90;
        int at = -1;
        for (int i = 0; i < line.X.Count; i++)
        {
            if (line.X[i] <= right && line.Y[i] <= top)
            {
                at = i;
            }
        }

        if (at < 0)
        {
            return;
        }

        var text = plot.Add.Text(line.Label, line.X[at], line.Y[at]);
        text.LabelFontSize = ChartCanvas.TickSize - 1;
        text.LabelFontName = ChartFonts.FamilyName;
        text.LabelFontColor = ChartPalette.Ink.ToScottPlot();
        text.LabelBackgroundColor = Colors.White.WithAlpha(0.85);
        text.LabelPadding = 2;
        text.LabelAlignment = Alignment.MiddleRight;
        text.OffsetX = -3;
    }

    private static double NiceStep(double raw)
    {
        if (!(raw > 0) || !double.IsFinite(raw))
        {
            return 1;
        }

        double magnitude = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double f = raw / magnitude;
        double nice = f <= 1.5 ? 1 : f <= 2.25 ? 2 : f <= 3.5 ? 2.5 : f <= 7 ? 5 : 10;
        return nice * magnitude;
    }

    private static string Format(double v) => ChartCanvas.FormatTick(v);

    private static double Min(IEnumerable<double> values, double fallback)
    {
        var v = values.ToArray();
        return v.Length == 0 ? fallback : v.Min();
    }

    private static double Max(IEnumerable<double> values, double fallback)
    {
        var v = values.ToArray();
        return v.Length == 0 ? fallback : v.Max();
    }
}
