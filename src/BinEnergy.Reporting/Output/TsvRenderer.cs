namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as tab-separated values that paste into a spreadsheet: one block per table
/// (a heading row with the units, e.g. <c>Heating, kBtu</c>, then the rows), no box-drawing, numbers
/// without thousands separators and without a unit after them (a record's units go beside its item
/// names), titles and notes on lines that start with <c>#</c>.
/// </summary>
public static class TsvRenderer
{
    /// <summary>Writes <paramref name="document"/> to <paramref name="writer"/>.</summary>
    public static void Render(ResultDocument document, TextWriter writer)
    {
        writer.WriteLine("# " + PrintableText.Of(document.Title));
        foreach (var table in document.Tables.Where(t => t.ShowInTerminal))
        {
            var (headings, rows, numeric) = TextRenderer.Grid(table, unitsInHeadings: true);
            writer.WriteLine();
            if (table.Title is string title)
            {
                writer.WriteLine("# " + PrintableText.Of(title));
            }

            writer.WriteLine(string.Join('\t', headings.Select(Cell)));
            foreach (var row in rows)
            {
                // Spreadsheets read "1,234" as text or as two cells: TSV numbers carry no thousands separator.
                writer.WriteLine(string.Join('\t', row.Select((v, i) => numeric[i] ? v.Replace(",", string.Empty, StringComparison.Ordinal) : Cell(v))));
            }

            foreach (var note in table.Notes)
            {
                writer.WriteLine("# " + PrintableText.Of(note));
            }
        }

        writer.WriteLine();
        TextRenderer.WriteNotes(document, line => writer.WriteLine("# " + line), warning => writer.WriteLine("# Warning: " + warning));
    }

    /// <summary>A text cell: tabs and line breaks would split it, so they become spaces.</summary>
    private static string Cell(string text) => text.Replace('\t', ' ').Replace('\n', ' ');
}
