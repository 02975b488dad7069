using System.Globalization;
using ScottPlot;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// One chart being drawn: a ScottPlot <see cref="Plot"/> with the BinEnergy style (bundled
/// font, sizes readable at 900 x 500, light grid, legend below the data), helpers for stacked
/// and grouped bars and lines that record each series as drawn, and the final rendering.
/// </summary>
internal sealed class ChartCanvas
{
    public const float TitleSize = 18;
    public const float LabelSize = 15;
    public const float TickSize = 13;
    public const float LegendSize = 13;
    public const float ValueLabelSize = 11;

    private readonly List<PlottedSeries> series = [];
    private IReadOnlyList<string>? categories;
    private bool isEmpty;

    public ChartCanvas(string title, string xLabel, string yLabel)
    {
        ChartFonts.EnsureRegistered();
        Title = title;
        Plot = new Plot();
        Plot.Font.Set(ChartFonts.FamilyName);
        Plot.Title(title, TitleSize);
        Plot.XLabel(xLabel, LabelSize);
        Plot.YLabel(yLabel, LabelSize);
        foreach (var axis in Plot.Axes.GetAxes())
        {
            axis.TickLabelStyle.FontSize = TickSize;
            axis.Label.FontSize = LabelSize;
            axis.Label.ForeColor = ChartPalette.Ink.ToScottPlot();
            axis.TickLabelStyle.ForeColor = ChartPalette.Ink.ToScottPlot();
        }

        Plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = FormatTick };
        Plot.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = FormatTick };
        Plot.Grid.MajorLineColor = ChartPalette.Rule.ToScottPlot().WithAlpha(0.28);
        Plot.Legend.FontSize = LegendSize;
        Plot.Legend.FontName = ChartFonts.FamilyName;
        Plot.Legend.OutlineColor = ChartPalette.Rule.ToScottPlot();
        Plot.Legend.Orientation = Orientation.Horizontal;
        Plot.Legend.TightHorizontalWrapping = true;
        Plot.Legend.ShadowColor = Colors.Transparent;
    }

    public Plot Plot { get; }

    public string Title { get; }

    /// <summary>Axis tick text: thousands separated, at most three decimals, invariant culture.</summary>
    public static string FormatTick(double value) =>
        Math.Abs(value) < 1e-9 ? "0" : value.ToString("#,0.###", CultureInfo.InvariantCulture);

    /// <summary>
    /// The title as drawn at this width: on one line when it fits (about 10 px per character at
    /// the title size), else broken after "{what}" so the subject goes on a second line rather
    /// than off the edge.
    /// </summary>
    internal static string FitTitle(string title, int widthPx)
    {
        int fits = (int)(widthPx * 0.94 / (TitleSize * 0.56));
        int dash = title.IndexOf(" — ", StringComparison.Ordinal);
        return title.Length <= fits || dash < 0 ? title : title[..dash] + "\n" + title[(dash + 3)..];
    }

    /// <summary>A title "{what} — {subject}", or just what when there is no subject.</summary>
    public static string TitleFor(string what, string? subject) =>
        string.IsNullOrWhiteSpace(subject) ? what : what + " — " + subject.Trim();

    public void Record(PlottedSeries plotted) => series.Add(plotted);

    /// <summary>Adds a legend entry for a filled shape (optionally translucent, as drawn, and
    /// with the shape's own outline colour).</summary>
    public void LegendFill(string label, ChartColor color, IHatch? hatch = null, double alpha = 1, ChartColor? outline = null) =>
        Plot.Legend.ManualItems.Add(new LegendItem
        {
            LabelText = label,
            FillColor = color.ToScottPlot().WithAlpha(alpha),
            FillHatch = hatch,
            FillHatchColor = ChartPalette.Ink.ToScottPlot().WithAlpha(0.55),
            OutlineColor = (outline ?? ChartPalette.Ink).ToScottPlot(),
            OutlineWidth = outline is null ? 1 : 2,
        });

    /// <summary>Adds a legend entry for a line (with an optional marker).</summary>
    public void LegendLine(string label, ChartColor color, float width, LinePattern pattern, MarkerShape marker = MarkerShape.None) =>
        Plot.Legend.ManualItems.Add(new LegendItem
        {
            LabelText = label,
            LineColor = color.ToScottPlot(),
            LineWidth = width,
            LinePattern = pattern,
            MarkerShape = marker,
            MarkerSize = marker == MarkerShape.None ? 0 : 8,
            MarkerFillColor = color.ToScottPlot(),
            MarkerLineColor = ChartPalette.Ink.ToScottPlot(),
        });

    /// <summary>
    /// Stacked bars: layer after layer at the same positions, positive values stacking up and
    /// negative values down. Zero-height segments are not drawn. Every layer is recorded as a
    /// <see cref="PlottedSeriesKind.Bars"/> series of segment heights and gets a legend entry.
    /// </summary>
    public void StackedBars(IReadOnlyList<double> positions, double barWidth, IReadOnlyList<BarLayer> layers)
    {
        var up = new double[positions.Count];
        var down = new double[positions.Count];
        foreach (var layer in layers)
        {
            var bars = new List<Bar>();
            for (int j = 0; j < positions.Count; j++)
            {
                double v = RequireFinite(layer.Values[j], layer.Label, j);
                if (v == 0.0)
                {
                    continue;
                }

                double bottom = v > 0 ? up[j] : down[j];
                bars.Add(MakeBar(positions[j], bottom, bottom + v, barWidth, layer.Color, layer.Hatch));
                if (v > 0)
                {
                    up[j] += v;
                }
                else
                {
                    down[j] += v;
                }
            }

            AddBars(layer, bars);
        }
    }

    /// <summary>
    /// Grouped bars: group g at position g, the layers side by side within a group width of
    /// 0.8. Values that are NaN mean "no such case" and draw no bar. Returns the bars drawn
    /// (for value labels).
    /// </summary>
    public List<Bar> GroupedBars(int groups, IReadOnlyList<BarLayer> layers, double groupWidth = 0.8)
    {
        var all = new List<Bar>();
        double width = groupWidth / Math.Max(1, layers.Count);
        for (int k = 0; k < layers.Count; k++)
        {
            var layer = layers[k];
            var bars = new List<Bar>();
            for (int g = 0; g < groups; g++)
            {
                double v = layer.Values[g];
                if (double.IsNaN(v))
                {
                    continue;
                }

                RequireFinite(v, layer.Label, g);
                double x = g - groupWidth / 2 + width * (k + 0.5);
                bars.Add(MakeBar(x, 0, v, width * 0.92, layer.Color, layer.Hatch));
            }

            AddBars(layer, bars);
            all.AddRange(bars);
        }

        return all;
    }

    /// <summary>A line with markers; non-finite points are left out. Recorded as a
    /// <see cref="PlottedSeriesKind.Line"/> series of the points drawn.</summary>
    public ScottPlot.Plottables.Scatter? Line(string label, IReadOnlyList<double> xs, IReadOnlyList<double> ys, ChartColor color, float width, LinePattern pattern, MarkerShape marker, IYAxis? yAxis = null)
    {
        var px = new List<double>();
        var py = new List<double>();
        for (int i = 0; i < xs.Count; i++)
        {
            if (double.IsFinite(xs[i]) && double.IsFinite(ys[i]))
            {
                px.Add(xs[i]);
                py.Add(ys[i]);
            }
        }

        Record(new PlottedSeries(label, PlottedSeriesKind.Line, px, py));
        LegendLine(label, color, width, pattern, marker);
        if (px.Count == 0)
        {
            return null;
        }

        var scatter = Plot.Add.Scatter(px.ToArray(), py.ToArray(), color.ToScottPlot());
        scatter.LineWidth = width;
        scatter.LinePattern = pattern;
        scatter.MarkerShape = marker;
        scatter.MarkerSize = marker == MarkerShape.None ? 0 : 8;
        scatter.MarkerFillColor = color.ToScottPlot();
        scatter.MarkerLineColor = ChartPalette.Ink.ToScottPlot();
        scatter.MarkerLineWidth = 1;
        if (yAxis is not null)
        {
            scatter.Axes.YAxis = yAxis;
        }

        return scatter;
    }

    /// <summary>Category tick labels at positions 0 .. n-1 on the bottom axis, laid out when
    /// the chart is rendered (see <see cref="LayOutCategories"/>).</summary>
    public void CategoryTicks(IReadOnlyList<string> labels) => categories = labels;

    /// <summary>
    /// Wraps each category label at spaces to fit the width a category gets at this size (about
    /// 7.5 px per character at the tick font size); when a label would still need more than three
    /// lines, all labels are turned 30 degrees instead.
    /// </summary>
    internal static (string[] Labels, bool Rotate) LayOutCategories(IReadOnlyList<string> labels, int widthPx)
    {
        if (labels.Count == 0)
        {
            return ([], false);
        }

        int perLine = Math.Max(6, (int)(widthPx * 0.85 / labels.Count / 7.5));
        var wrapped = labels.Select(l => Wrap(l, perLine)).ToArray();
        bool rotate = wrapped.Any(w => w.Count > 3 || w.Any(line => line.Length > perLine * 1.25));
        return rotate ? (labels.ToArray(), true) : (wrapped.Select(w => string.Join("\n", w)).ToArray(), false);
    }

    private static List<string> Wrap(string text, int perLine)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.Split('\n'))
        {
            string current = "";
            foreach (var word in paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                if (current.Length == 0)
                {
                    current = word;
                }
                else if (current.Length + 1 + word.Length <= perLine)
                {
                    current += " " + word;
                }
                else
                {
                    lines.Add(current);
                    current = word;
                }
            }

            lines.Add(current);
        }

        return lines;
    }

    private void ApplyCategories(ChartSize size)
    {
        if (categories is null)
        {
            return;
        }

        var (labels, rotate) = LayOutCategories(categories, size.Width);
        var ticks = new ScottPlot.TickGenerators.NumericManual();
        for (int i = 0; i < labels.Length; i++)
        {
            ticks.AddMajor(i, labels[i]);
        }

        var axis = Plot.Axes.Bottom;
        axis.TickGenerator = ticks;
        axis.MajorTickStyle.Length = 0;
        axis.MinorTickStyle.Length = 0;
        if (rotate)
        {
            int longest = labels.Max(l => l.Length);
            axis.TickLabelStyle.Rotation = -30;
            axis.TickLabelStyle.Alignment = Alignment.UpperRight;
            axis.MinimumSize = Math.Min(size.Height / 3f, 30 + 3.8f * longest);
        }
    }

    /// <summary>Marks the chart as having nothing to draw: a centred note, axes without ticks.</summary>
    public void NoData(string message)
    {
        isEmpty = true;
        var note = Plot.Add.Annotation(message, Alignment.MiddleCenter);
        note.LabelFontSize = LabelSize;
        note.LabelFontName = ChartFonts.FamilyName;
        note.LabelBackgroundColor = Colors.White;
        note.LabelBorderColor = ChartPalette.Rule.ToScottPlot();
        note.LabelShadowColor = Colors.Transparent;
        Plot.Axes.SetLimits(0, 1, 0, 1);
        foreach (var axis in Plot.Axes.GetAxes())
        {
            axis.TickGenerator = new ScottPlot.TickGenerators.NumericManual();
            if (axis != Plot.Axes.Top)
            {
                axis.MinimumSize = Math.Max(axis.MinimumSize, 40);
            }
        }
    }

    /// <summary>Shows the legend below the data area when it has entries.</summary>
    public void ShowLegendBelow()
    {
        if (Plot.Legend.ManualItems.Count > 0)
        {
            Plot.ShowLegend(Edge.Bottom);
        }
    }

    public RenderedChart Render(string fileStem, string description, ChartSize size)
    {
        if (size.Width < 200 || size.Height < 150)
        {
            throw new ArgumentOutOfRangeException(nameof(size), size, "charts need at least 200 x 150 px to stay readable");
        }

        ApplyCategories(size);
        Plot.Title(FitTitle(Title, size.Width), TitleSize);
        byte[] png = Plot.GetImageBytes(size.Width, size.Height, ImageFormat.Png);
        // ScottPlot embeds heatmaps in SVG as small bitmaps; keep their cells sharp when a
        // viewer scales them up, as in the PNG.
        string svg = Plot.GetSvgXml(size.Width, size.Height)
            .Replace("<image ", "<image style=\"image-rendering:pixelated\" ", StringComparison.Ordinal);
        var legend = Plot.Legend.ManualItems.Select(i => i.LabelText).ToArray();
        return new RenderedChart(fileStem, Title, description, size, png, svg, series.ToArray(), isEmpty) { LegendLabels = legend };
    }

    private static double RequireFinite(double value, string label, int index)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException(FormattableString.Invariant($"series '{label}' has a non-finite value ({value}) at row {index + 1}; charts need finite numbers (use 0 for none)"));
        }

        return value;
    }

    private static Bar MakeBar(double position, double bottom, double top, double width, ChartColor color, IHatch? hatch) => new()
    {
        Position = position,
        ValueBase = bottom,
        Value = top,
        Size = width,
        FillColor = color.ToScottPlot(),
        FillHatch = hatch,
        FillHatchColor = ChartPalette.Ink.ToScottPlot().WithAlpha(0.55),
        LineColor = ChartPalette.Ink.ToScottPlot(),
        LineWidth = 0.8f,
    };

    private void AddBars(BarLayer layer, List<Bar> bars)
    {
        if (bars.Count > 0)
        {
            var plot = Plot.Add.Bars(bars);
            plot.ValueLabelStyle.FontSize = ValueLabelSize;
            plot.ValueLabelStyle.FontName = ChartFonts.FamilyName;
            plot.ValueLabelStyle.ForeColor = ChartPalette.Ink.ToScottPlot();
            if (layer.YAxis is not null)
            {
                plot.Axes.YAxis = layer.YAxis;
            }
        }

        Record(new PlottedSeries(layer.Label, PlottedSeriesKind.Bars, bars.Select(b => b.Position).ToArray(), bars.Select(b => b.Value - b.ValueBase).ToArray()));
        LegendFill(layer.LegendText ?? layer.Label, layer.Color, layer.Hatch);
    }
}
