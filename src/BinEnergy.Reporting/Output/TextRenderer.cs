using System.Globalization;
using BinEnergy.Reporting.Tables;
using Spectre.Console;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as text: bordered tables in the terminal (Spectre.Console), tab-separated
/// values that paste into a spreadsheet, or Markdown. Every value is formatted in the invariant
/// culture with its column's number format; every text is made printable first.
/// </summary>
public static class TextRenderer
{
    /// <summary>Writes <paramref name="document"/> in <paramref name="format"/>: tables to the console, or plain text to <paramref name="writer"/>.</summary>
    public static void Render(ResultDocument document, TextFormat format, IAnsiConsole console, TextWriter writer)
    {
        if (format == TextFormat.Table)
        {
            RenderTables(document, console);
        }
        else
        {
            RenderPlain(document, format, writer);
        }
    }

    /// <summary>A cell's text: numbers in the column's format (empty when not finite), integers plain, text printable.</summary>
    public static string Cell(ResultColumn column, int row) => column.Kind switch
    {
        ColumnKind.Text => PrintableText.Of(column.Texts[row]),
        ColumnKind.Number => double.IsFinite(column.Numbers[row])
            ? column.Numbers[row].ToString(column.Unit?.Format ?? "0.###", CultureInfo.InvariantCulture)
            : string.Empty,
        _ => column.Integers[row].ToString(CultureInfo.InvariantCulture),
    };

    /// <summary>The grid a table shows as text: a heading row, then the body rows, with which columns are numeric.</summary>
    public static (IReadOnlyList<string> Headings, IReadOnlyList<IReadOnlyList<string>> Rows, IReadOnlyList<bool> Numeric) Grid(ResultTable table)
    {
        var visible = table.Columns.Where(c => !c.Detail).ToList();
        if (table.Layout == TableLayout.Record)
        {
            var rows = visible.Select(c => (IReadOnlyList<string>)[PrintableText.Of(c.Label),
                table.RowCount == 0 ? string.Empty : Cell(c, 0) + (c.Unit is { Symbol.Length: > 0 } u && Cell(c, 0).Length > 0 ? " " + u.Symbol : string.Empty)]).ToList();
            return (["Item", "Value"], rows, [false, false]);
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

    private static void RenderTables(ResultDocument document, IAnsiConsole console)
    {
        console.MarkupLine("[bold]" + Markup.Escape(PrintableText.Of(document.Title)) + "[/]");
        foreach (var table in document.Tables.Where(t => t.ShowInTerminal))
        {
            var (headings, rows, numeric) = Grid(table);
            var grid = new Table().Border(TableBorder.Rounded);
            if (table.Title is string title)
            {
                grid.Title(Markup.Escape(PrintableText.Of(title)));
            }

            for (int i = 0; i < headings.Count; i++)
            {
                var column = new TableColumn(Markup.Escape(headings[i]));
                grid.AddColumn(numeric[i] ? column.RightAligned() : column);
            }

            foreach (var row in rows)
            {
                grid.AddRow([.. row.Select(Markup.Escape)]);
            }

            console.Write(grid);
            foreach (var note in table.Notes)
            {
                console.WriteLine(PrintableText.Of(note));
            }
        }

        WriteNotes(document, line => console.WriteLine(line), warning => console.MarkupLine("[yellow]Warning:[/] " + Markup.Escape(warning)));
    }

    private static void RenderPlain(ResultDocument document, TextFormat format, TextWriter writer)
    {
        bool markdown = format == TextFormat.Markdown;
        writer.WriteLine(markdown ? "## " + PrintableText.Of(document.Title) : "# " + PrintableText.Of(document.Title));
        foreach (var table in document.Tables.Where(t => t.ShowInTerminal))
        {
            var (headings, rows, numeric) = Grid(table);
            writer.WriteLine();
            if (table.Title is string title)
            {
                writer.WriteLine(markdown ? "### " + PrintableText.Of(title) + "\n" : "# " + PrintableText.Of(title));
            }

            if (markdown)
            {
                writer.WriteLine("| " + string.Join(" | ", headings.Select(EscapeMarkdown)) + " |");
                writer.WriteLine("|" + string.Join("|", numeric.Select(n => n ? "---:" : ":---")) + "|");
                foreach (var row in rows)
                {
                    writer.WriteLine("| " + string.Join(" | ", row.Select(EscapeMarkdown)) + " |");
                }
            }
            else
            {
                writer.WriteLine(string.Join('\t', headings.Select(Tsv)));
                foreach (var row in rows)
                {
                    // Spreadsheets read "1,234" as text or as two cells: TSV numbers carry no thousands separator.
                    writer.WriteLine(string.Join('\t', row.Select((v, i) => numeric[i] ? v.Replace(",", string.Empty, StringComparison.Ordinal) : Tsv(v))));
                }
            }

            foreach (var note in table.Notes)
            {
                writer.WriteLine((markdown ? "\n" : "# ") + PrintableText.Of(note));
            }
        }

        writer.WriteLine();
        WriteNotes(document, line => writer.WriteLine(markdown ? line : "# " + line), warning => writer.WriteLine((markdown ? "**Warning:** " : "# Warning: ") + PrintableText.Of(warning)));
    }

    private static void WriteNotes(ResultDocument document, Action<string> line, Action<string> warning)
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

    private static string Tsv(string text) => text.Replace('\t', ' ').Replace('\n', ' ');

    private static string EscapeMarkdown(string text) => text.Replace("|", "\\|", StringComparison.Ordinal).Replace('\n', ' ');
}
