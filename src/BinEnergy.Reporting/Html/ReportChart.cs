using BinEnergy.Reporting.Charts;

namespace BinEnergy.Reporting.Html;

/// <summary>A chart embedded in the page as a PNG data URI, with its description as alternative
/// text and an optional caption (defaults to the description).</summary>
public sealed record ReportChart(RenderedChart Chart, string? Caption = null) : ReportBlock;
