using Spectre.Console;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as bordered tables for reading in a terminal (Spectre.Console): the title in
/// bold, each table with its title and notes, numbers right-aligned with their units in the headings
/// (a record's units after its values), then the notes, with warnings in yellow.
/// </summary>
public static class TerminalRenderer
{
    /// <summary>Writes <paramref name="document"/> to <paramref name="console"/>.</summary>
    public static void Render(ResultDocument document, IAnsiConsole console)
    {
        console.MarkupLine("[bold]" + Markup.Escape(PrintableText.Of(document.Title)) + "[/]");
        foreach (var table in document.Tables.Where(t => t.ShowInTerminal))
        {
            var (headings, rows, numeric) = TextRenderer.Grid(table);
            var grid = new Table().Border(TableBorder.Rounded);
            if (table.Title is string title)
            {
                grid.Title(Markup.Escape(PrintableText.Of(title)));
            }

            for (int i = 0; i < headings.Count; i++)
            {
                var column = new TableColumn(Markup.Escape(headings[i]));
                // Names (a climate, a variant, a control) are copied into options: never broken inside; prose still wraps.
                int at = i;
                if (!numeric[i] && rows.Count > 0 && rows.Max(r => r[at].Length) <= 24)
                {
                    column.NoWrap();
                }

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

        TextRenderer.WriteNotes(document, line => console.WriteLine(line), warning => console.MarkupLine("[yellow]Warning:[/] " + Markup.Escape(warning)));
    }
}
