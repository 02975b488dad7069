using System.Text;

namespace BinEnergy.Reporting.Charts;

/// <summary>
/// A finished chart: its PNG and SVG images, the series it drew, and what a report needs to
/// embed it (title, description).
/// </summary>
public sealed class RenderedChart
{
    internal RenderedChart(string fileStem, string title, string description, ChartSize size, byte[] png, string svg, IReadOnlyList<PlottedSeries> series, bool isEmpty)
    {
        FileStem = fileStem;
        Title = title;
        Description = description;
        Size = size;
        Png = png;
        Svg = svg;
        Series = series;
        IsEmpty = isEmpty;
    }

    /// <summary>File name without extension, e.g. <c>bin-hours</c>.</summary>
    public string FileStem { get; }

    /// <summary>The chart's title as drawn.</summary>
    public string Title { get; }

    /// <summary>One sentence saying what the chart shows (alternative text in the report).</summary>
    public string Description { get; }

    public ChartSize Size { get; }

    /// <summary>PNG image bytes.</summary>
    public byte[] Png { get; }

    /// <summary>SVG document text.</summary>
    public string Svg { get; }

    /// <summary>The series as drawn, in drawing order.</summary>
    public IReadOnlyList<PlottedSeries> Series { get; }

    /// <summary>The legend's entries, in order, as shown (all charts put the legend in one framed
    /// band below the data; the chart's own words are in sentence case, names from the study as
    /// written).</summary>
    public IReadOnlyList<string> LegendLabels { get; internal init; } = [];

    /// <summary>True when there was nothing to draw and the chart says "no data".</summary>
    public bool IsEmpty { get; }

    /// <summary>The PNG as a data URI for an HTML <c>img</c> element.</summary>
    public string PngDataUri => "data:image/png;base64," + Convert.ToBase64String(Png);

    /// <summary>The series with this legend text.</summary>
    /// <exception cref="KeyNotFoundException">No series has that label.</exception>
    public PlottedSeries SeriesLabelled(string label) =>
        Series.FirstOrDefault(s => s.Label == label)
        ?? throw new KeyNotFoundException($"chart '{FileStem}' has no series '{label}' (it has: {string.Join(", ", Series.Select(s => s.Label))})");

    /// <summary>
    /// Writes <c>{FileStem}.png</c> and <c>{FileStem}.svg</c> into the folder (created if
    /// missing). Each file is written under a temporary name and then moved into place, so a
    /// failure never leaves a half-written image. Returns the two paths.
    /// </summary>
    public IReadOnlyList<string> WriteTo(string directory)
    {
        Directory.CreateDirectory(directory);
        string png = Path.Combine(directory, FileStem + ".png");
        string svg = Path.Combine(directory, FileStem + ".svg");
        AtomicFile.Write(png, Png);
        AtomicFile.Write(svg, Encoding.UTF8.GetBytes(Svg));
        return [png, svg];
    }
}
