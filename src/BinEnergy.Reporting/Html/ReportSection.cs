namespace BinEnergy.Reporting.Html;

/// <summary>A headed part of the results, with blocks and optional subsections (one level per nesting, down to h6).</summary>
public sealed record ReportSection(string Heading, IReadOnlyList<ReportBlock> Blocks)
{
    public IReadOnlyList<ReportSection> Subsections { get; init; } = [];
}
