namespace BinEnergy.Reporting.Html;

/// <summary>One labelled value of a report list (both plain text; the report escapes them).</summary>
public sealed record ReportKeyValue(string Key, string Value);
