using BinEnergy.Reporting.Charts;

namespace BinEnergy.Reporting.Study;

/// <summary>One chart of a run: its file stem (<c>load-by-bin-frostmere-minimum</c>), the chart, and what it belongs to.</summary>
/// <param name="Name">The file stem under <c>charts/</c>.</param>
/// <param name="Chart">The rendered chart.</param>
/// <param name="Climate">The climate it shows, or null for a chart across climates.</param>
/// <param name="Variant">The variant it shows, or null for a chart of the climate's weather (every variant) or across climates.</param>
public sealed record StudyChart(string Name, RenderedChart Chart, string? Climate, string? Variant)
{
    /// <summary>The file stem and the chart.</summary>
    public void Deconstruct(out string name, out RenderedChart chart)
    {
        name = Name;
        chart = Chart;
    }
}
