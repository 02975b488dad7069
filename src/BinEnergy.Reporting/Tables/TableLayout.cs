namespace BinEnergy.Reporting.Tables;

/// <summary>How a result table is laid out in the terminal, the report and JSON.</summary>
public enum TableLayout
{
    /// <summary>One line per row; JSON: an array of objects.</summary>
    Rows,

    /// <summary>One row shown as a list of items and values; JSON: one object.</summary>
    Record,

    /// <summary>
    /// Rows keyed by a text column (methods, controls, conditions); JSON: an object keyed by that
    /// column; terminal: one line per row, or transposed (<see cref="ResultTable.Transpose"/>).
    /// </summary>
    Keyed,
}
