namespace BinEnergy.Reporting.Html;

/// <summary>A piece of a report section: <see cref="ReportParagraph"/>, <see cref="ReportKeyValueList"/>,
/// <see cref="ReportTable"/> or <see cref="ReportChart"/>.</summary>
public abstract record ReportBlock;
