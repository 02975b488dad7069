using System.Globalization;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace BinEnergy.Core.Study;

/// <summary>
/// Reads a TOML text (Tomlyn's syntax tree, so every key keeps its line) into a flat list of
/// <see cref="TomlEntry"/>: tables and arrays of tables give the table and index, dotted keys
/// and inline tables are flattened into dotted key names. Syntax errors and redefined keys
/// (Tomlyn's validation) become <see cref="StudyFileException"/>s with the line.
/// </summary>
internal static class TomlEntryReader
{
    /// <summary>
    /// The first line, up to <paramref name="lastLine"/>, where a one-line string ("..." or '...') is left open; null when
    /// there is none or the text has multi-line strings (the parser's own place is better then). A parser reading an open
    /// string runs on into the next lines and reports a later one.
    /// </summary>
    internal static int? UnclosedString(string text, int lastLine)
    {
        if (text.Contains("\"\"\"", StringComparison.Ordinal) || text.Contains("'''", StringComparison.Ordinal))
        {
            return null;
        }

        var lines = text.Split('\n');
        for (int n = 0; n < Math.Min(lastLine, lines.Length); n++)
        {
            char open = '\0';
            for (int i = 0; i < lines[n].Length; i++)
            {
                char c = lines[n][i];
                if (open == '\0' && c == '#')
                {
                    break;
                }

                if (open == '"' && c == '\\')
                {
                    i++;
                }
                else if (open == '\0' && c is '"' or '\'')
                {
                    open = c;
                }
                else if (c == open)
                {
                    open = '\0';
                }
            }

            if (open != '\0')
            {
                return n + 1;
            }
        }

        return null;
    }

    public static List<TomlEntry> Read(string text, string file)
    {
        var doc = SyntaxParser.Parse(text, file, true);
        var error = doc.Diagnostics.FirstOrDefault(d => d.Kind == DiagnosticMessageKind.Error);
        if (error is not null && UnclosedString(text, error.Span.Start.Line + 1) is int open)
        {
            throw new StudyFileException(file, open, null,
                "a text value is not closed on this line: add the closing quote (a TOML string ends on the line it starts)");
        }

        if (error is not null)
        {
            throw new StudyFileException(file, error.Span.Start.Line + 1, null,
                $"this is not valid TOML: {Reword(error.Message)} (check quotes around text, '=' between key and value, and [brackets] around table names)");
        }

        var entries = new List<TomlEntry>();
        var arrayCounts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var kv in doc.KeyValues)
        {
            var path = KeyPath(kv.Key!);
            if (path.Count < 2)
            {
                throw new StudyFileException(file, Line(kv), path[0],
                    "keys must be inside a table such as [study], [ventilation] or [plant]; move this key below its table header");
            }

            Add(entries, file, path[0], 0, path.Skip(1), kv.Value!, Line(kv));
        }

        foreach (var table in doc.Tables)
        {
            var name = KeyPath(table.Name!);
            string tableName = string.Join(".", name);
            int index = 0;
            if (table is TableArraySyntax)
            {
                index = arrayCounts.GetValueOrDefault(tableName);
                arrayCounts[tableName] = index + 1;
            }

            int headerLine = table.Span.Start.Line + 1;
            entries.Add(new TomlEntry(tableName, index, string.Empty, TableMarker.Instance, headerLine));
            foreach (var kv in table.Items)
            {
                Add(entries, file, tableName, index, KeyPath(kv.Key!), kv.Value!, Line(kv));
            }
        }

        return entries;
    }

    private static void Add(List<TomlEntry> entries, string file, string table, int index, IEnumerable<string> keyPath, ValueSyntax value, int line)
    {
        string key = string.Join(".", keyPath);
        if (value is InlineTableSyntax inline)
        {
            foreach (var item in inline.Items)
            {
                var kv = item.KeyValue!;
                Add(entries, file, table, index, keyPath.Concat(KeyPath(kv.Key!)), kv.Value!, Line(kv));
            }

            return;
        }

        entries.Add(new TomlEntry(table, index, key, Convert(value, file, line, table + "." + key), line));
    }

    private static object Convert(ValueSyntax value, string file, int line, string key) => value switch
    {
        StringValueSyntax s => s.Value ?? string.Empty,
        IntegerValueSyntax i => i.Value,
        FloatValueSyntax f => f.Value,
        BooleanValueSyntax b => b.Value,
        ArraySyntax a => a.Items.Select(item => Convert(item.Value!, file, line, key)).ToList(),
        DateTimeValueSyntax d => d.Value.ToString(),
        InlineTableSyntax => throw new StudyFileException(file, line, key, "a table inside a list is not used by study files; write the values as a list of numbers or text"),
        _ => throw new StudyFileException(file, line, key, "this value is not a number, text, true/false or a list"),
    };

    private static List<string> KeyPath(KeySyntax key)
    {
        var parts = new List<string> { KeyText(key.Key!) };
        foreach (var dot in key.DotKeys)
        {
            parts.Add(KeyText(dot.Key!));
        }

        return parts;
    }

    private static string KeyText(BareKeyOrStringValueSyntax key) => key switch
    {
        BareKeySyntax b => b.Key!.Text!,
        StringValueSyntax s => s.Value ?? string.Empty,
        _ => key.ToString()!.Trim(),
    };

    private static int Line(SyntaxNode node) => node.Span.Start.Line + 1;

    private static string Reword(string message) =>
        message.Replace("␤", "end of line", StringComparison.Ordinal).Replace(" (token: `newline`)", string.Empty, StringComparison.Ordinal)
            .TrimEnd('.').ToString(CultureInfo.InvariantCulture);
}
