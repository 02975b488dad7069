namespace BinEnergy.Reporting.Html;

/// <summary>A paragraph of plain text (escaped; line breaks kept).</summary>
public sealed record ReportParagraph(string Text) : ReportBlock;
