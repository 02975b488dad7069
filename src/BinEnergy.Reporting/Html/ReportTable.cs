namespace BinEnergy.Reporting.Html;

/// <summary>
/// A table of already formatted strings: a caption, column headers (with units, e.g.
/// "Heating (kBtu)"), and rows of the same width. Cells that read as numbers are right-aligned.
/// </summary>
public sealed record ReportTable(string Caption, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows) : ReportBlock;
