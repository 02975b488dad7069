using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Workbook;

/// <summary>
/// One sheet of a workbook: a name, a heading row (units in the headings, e.g. <c>Heating, kBtu</c>) and rows of cells.
/// A cell is text (<see cref="string"/>), a number (<see cref="double"/> or <see cref="int"/>, shown in its column's
/// number format), a <see cref="WorkbookNumber"/> (a number with its own format) or null (empty; also a number that is not finite).
/// </summary>
public sealed class WorkbookSheet
{
    /// <summary>A sheet of these columns and rows.</summary>
    /// <param name="name">The sheet's name (at most 31 characters, none of <c>[]:*?/\</c>).</param>
    /// <param name="headings">The heading of each column.</param>
    /// <param name="formats">The Excel number format of each column (<see cref="ExcelNumberFormat"/>), or null for text.</param>
    /// <param name="rows">The rows, one cell per column.</param>
    public WorkbookSheet(string name, IReadOnlyList<string> headings, IReadOnlyList<string?> formats, IReadOnlyList<IReadOnlyList<object?>> rows)
    {
        if (name.Length is 0 or > 31 || name.IndexOfAny(['[', ']', ':', '*', '?', '/', '\\']) >= 0)
        {
            throw new ArgumentException($"'{name}' is not a sheet name (1 to 31 characters, none of []:*?/\\)", nameof(name));
        }

        if (formats.Count != headings.Count || rows.Any(r => r.Count != headings.Count))
        {
            throw new ArgumentException($"sheet '{name}' has {headings.Count} headings; every row and the formats must have as many cells");
        }

        Name = name;
        Headings = headings;
        Formats = formats;
        Rows = rows;
    }

    /// <summary>The sheet's name.</summary>
    public string Name { get; }

    /// <summary>The heading row.</summary>
    public IReadOnlyList<string> Headings { get; }

    /// <summary>The number format of each column (null for text).</summary>
    public IReadOnlyList<string?> Formats { get; }

    /// <summary>The rows below the heading.</summary>
    public IReadOnlyList<IReadOnlyList<object?>> Rows { get; }

    /// <summary>
    /// A result table as a sheet: every column (those kept out of the terminal too), in order, headed by its label and unit;
    /// numbers at full precision in the unit's number format, whole numbers (hours, months) with thousands separators; text made printable.
    /// </summary>
    public static WorkbookSheet From(ResultTable table)
    {
        var headings = table.Columns.Select(c => PrintableText.Of(c.Heading)).ToList();
        var formats = table.Columns.Select(c => c.Kind switch
        {
            ColumnKind.Text => null,
            ColumnKind.Number => ExcelNumberFormat.From(c.Unit?.Format),
            _ => c.IsCount ? ExcelNumberFormat.WholeNumber : ExcelNumberFormat.PlainWholeNumber,
        }).ToList();
        var rows = Enumerable.Range(0, table.RowCount)
            .Select(r => (IReadOnlyList<object?>)table.Columns.Select(c => Cell(c, r)).ToList())
            .ToList();
        return new WorkbookSheet(table.Name, headings, formats, rows);
    }

    private static object? Cell(ResultColumn column, int row) => column.Kind switch
    {
        ColumnKind.Text => PrintableText.Of(column.Texts[row]),
        ColumnKind.Number => double.IsFinite(column.Numbers[row]) ? column.Numbers[row] : null,
        _ => column.Integers[row],
    };
}
