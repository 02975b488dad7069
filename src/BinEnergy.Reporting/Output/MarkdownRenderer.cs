namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as Markdown, for notes and issue trackers: the title as a level-2 heading,
/// each table's title as a level-3 heading over a pipe table (numbers right-aligned, units in the
/// headings, a record's units after its values), then the notes.
/// </summary>
public static class MarkdownRenderer
{
    /// <summary>Writes <paramref name="document"/> to <paramref name="writer"/>.</summary>
    public static void Render(ResultDocument document, TextWriter writer)
    {
        writer.WriteLine("## " + PrintableText.Of(document.Title));
        foreach (var table in document.Tables.Where(t => t.ShowInTerminal))
        {
            var (headings, rows, numeric) = TextRenderer.Grid(table);
            writer.WriteLine();
            if (table.Title is string title)
            {
                writer.WriteLine("### " + PrintableText.Of(title) + "\n");
            }

            writer.WriteLine("| " + string.Join(" | ", headings.Select(Escape)) + " |");
            writer.WriteLine("|" + string.Join("|", numeric.Select(n => n ? "---:" : ":---")) + "|");
            foreach (var row in rows)
            {
                writer.WriteLine("| " + string.Join(" | ", row.Select(Escape)) + " |");
            }

            foreach (var note in table.Notes)
            {
                writer.WriteLine("\n" + PrintableText.Of(note));
            }
        }

        writer.WriteLine();
        TextRenderer.WriteNotes(document, writer.WriteLine, warning => writer.WriteLine("**Warning:** " + warning));
    }

    /// <summary>A cell's text: a pipe would end the cell and a line break the row.</summary>
    private static string Escape(string text) => text.Replace("|", "\\|", StringComparison.Ordinal).Replace('\n', ' ');
}
