namespace BinEnergy.Reporting.Html;

/// <summary>A list of labelled values, shown as a definition list.</summary>
public sealed record ReportKeyValueList(IReadOnlyList<ReportKeyValue> Items) : ReportBlock;
