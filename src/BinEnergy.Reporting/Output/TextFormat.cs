namespace BinEnergy.Reporting.Output;

/// <summary>How a result document is written as text (<c>--format</c>).</summary>
public enum TextFormat
{
    /// <summary>Tables with borders for reading in a terminal.</summary>
    Table,

    /// <summary>Tab-separated values, one block per table, that paste into a spreadsheet.</summary>
    Tsv,

    /// <summary>Markdown tables, for notes and issue trackers.</summary>
    Markdown,
}
