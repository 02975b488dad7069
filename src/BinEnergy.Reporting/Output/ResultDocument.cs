using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// What a command shows, filled once and rendered by every format (terminal, TSV, Markdown, JSON,
/// CSV): a title, named result tables with typed, unit-carrying columns, and notes (how to read
/// them, assumptions, warnings, cautions).
/// </summary>
public sealed class ResultDocument(string title)
{
    private readonly List<ResultTable> tables = [];
    private readonly List<(NoteKind Kind, string Text)> notes = [];

    /// <summary>The title (the first line of the terminal output).</summary>
    public string Title { get; } = title;

    /// <summary>The tables, in the order they are shown.</summary>
    public IReadOnlyList<ResultTable> Tables => tables;

    /// <summary>The notes, in the order they were added.</summary>
    public IReadOnlyList<(NoteKind Kind, string Text)> Notes => notes;

    /// <summary>The table <c>--csv</c> writes (by name); null when the command has no CSV form.</summary>
    public string? CsvTable { get; init; }

    /// <summary>Adds a table.</summary>
    public ResultDocument Add(ResultTable table)
    {
        if (tables.Any(t => t.Name == table.Name))
        {
            throw new ArgumentException($"the document already has a table '{table.Name}'");
        }

        tables.Add(table);
        return this;
    }

    /// <summary>Adds a line of prose.</summary>
    public ResultDocument Note(NoteKind kind, string text)
    {
        notes.Add((kind, text));
        return this;
    }

    /// <summary>Adds lines of prose of one kind.</summary>
    public ResultDocument NoteAll(NoteKind kind, IEnumerable<string> texts)
    {
        foreach (var t in texts)
        {
            notes.Add((kind, t));
        }

        return this;
    }

    /// <summary>The table with this name.</summary>
    public ResultTable Table(string name) =>
        tables.FirstOrDefault(t => t.Name == name) ?? throw new KeyNotFoundException($"the document has no table '{name}'");

    /// <summary>The lines of one kind.</summary>
    public IEnumerable<string> NotesOf(NoteKind kind) => notes.Where(n => n.Kind == kind).Select(n => n.Text);
}
