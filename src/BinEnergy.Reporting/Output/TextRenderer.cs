using System.Globalization;
using BinEnergy.Reporting.Tables;
using Spectre.Console;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as text, one renderer per format over the same grid of cells: bordered tables
/// in the terminal (<see cref="TerminalRenderer"/>), tab-separated values that paste into a spreadsheet
/// (<see cref="TsvRenderer"/>), or Markdown (<see cref="MarkdownRenderer"/>). Every value is formatted in
/// the invariant culture with its column's number format; every text is made printable first.
/// </summary>
public static class TextRenderer
{
    /// <summary>Writes <paramref name="document"/> in <paramref name="format"/>: bordered tables to the console (<see cref="TerminalRenderer"/>), or plain text to <paramref name="writer"/> (<see cref="TsvRenderer"/>, <see cref="MarkdownRenderer"/>).</summary>
    public static void Render(ResultDocument document, TextFormat format, IAnsiConsole console, TextWriter writer)
    {
        switch (format)
        {
            case TextFormat.Tsv:
                TsvRenderer.Render(document, writer);
                break;
            case TextFormat.Markdown:
                MarkdownRenderer.Render(document, writer);
                break;
            default:
                TerminalRenderer.Render(document, console);
                break;
        }
    }

    /// <summary>A cell's text: numbers in the column's format (empty when not finite), counts with thousands separators (8,760 hours), text printable.</summary>
    public static string Cell(ResultColumn column, int row) => column.Kind switch
    {
        ColumnKind.Text => PrintableText.Of(column.Texts[row]),
        ColumnKind.Number => double.IsFinite(column.Numbers[row])
            ? column.Numbers[row].ToString(column.Unit?.Format ?? "0.###", CultureInfo.InvariantCulture)
            : string.Empty,
        _ => column.Integers[row].ToString(column.IsCount ? "#,##0" : "0", CultureInfo.InvariantCulture),
    };

    /// <summary>The grid a table shows as text: a heading row, then the body rows, with which columns are numeric.</summary>
    /// <param name="table">The table.</param>
    /// <param name="unitsInHeadings">
    /// For a record (items and values): put each item's unit beside its name ("Dry-bulb, F" and "95.0") rather than
    /// after its value ("95.0 F"), so that a spreadsheet reads the value as a number.
    /// </param>
    public static (IReadOnlyList<string> Headings, IReadOnlyList<IReadOnlyList<string>> Rows, IReadOnlyList<bool> Numeric) Grid(ResultTable table, bool unitsInHeadings = false)
    {
        var visible = table.Columns.Where(c => !c.Detail).ToList();
        if (table.Layout == TableLayout.Record)
        {
            var rows = visible.Select(c => (IReadOnlyList<string>)(unitsInHeadings
                ? [PrintableText.Of(c.Heading), table.RowCount == 0 ? string.Empty : Cell(c, 0)]
                : [PrintableText.Of(c.Label),
                    table.RowCount == 0 ? string.Empty : Cell(c, 0) + (c.Unit is { Symbol.Length: > 0 } u && Cell(c, 0).Length > 0 ? " " + u.Symbol : string.Empty)])).ToList();
            return (["Item", "Value"], rows, [false, unitsInHeadings]);
        }

        if (table.Transpose && table.KeyColumn is string key)
        {
            var keyColumn = table[key];
            var headings = new List<string> { "Figure" };
            headings.AddRange(Enumerable.Range(0, table.RowCount).Select(r => PrintableText.Of(keyColumn.Texts[r])));
            var rows = visible.Where(c => c.Name != key)
                .Select(c => (IReadOnlyList<string>)[PrintableText.Of(c.Heading), .. Enumerable.Range(0, table.RowCount).Select(r => Cell(c, r))]).ToList();
            return (headings, rows, [false, .. Enumerable.Repeat(true, table.RowCount)]);
        }

        var body = Enumerable.Range(0, table.RowCount).Where(r => r % Math.Max(1, table.TerminalEvery) == 0).Select(r => (IReadOnlyList<string>)visible.Select(c => Cell(c, r)).ToList()).ToList();
        return (visible.Select(c => PrintableText.Of(c.Heading)).ToList(), body, visible.Select(c => c.Kind != ColumnKind.Text).ToList());
    }

    /// <summary>The document's notes in the order every format gives them: notes, assumptions, warnings, cautions.</summary>
    internal static void WriteNotes(ResultDocument document, Action<string> line, Action<string> warning)
    {
        foreach (var note in document.NotesOf(NoteKind.Note))
        {
            line(PrintableText.Of(note));
        }

        var assumptions = document.NotesOf(NoteKind.Assumption).ToList();
        if (assumptions.Count > 0)
        {
            line("Assumptions:");
            foreach (var a in assumptions)
            {
                line("  - " + PrintableText.Of(a));
            }
        }

        foreach (var w in document.NotesOf(NoteKind.Warning))
        {
            warning(PrintableText.Of(w));
        }

        foreach (var c in document.NotesOf(NoteKind.Caution))
        {
            line("Caution: " + PrintableText.Of(c));
        }
    }
}
