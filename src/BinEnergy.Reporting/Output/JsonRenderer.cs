using System.Text.Json;
using System.Text.Json.Nodes;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// A result document as one JSON object: a table named <c>facts</c> is merged into the top level;
/// other tables become arrays of row objects (<see cref="TableLayout.Rows"/>), one object
/// (<see cref="TableLayout.Record"/>) or an object keyed by the key column's values with dashes
/// as underscores (<see cref="TableLayout.Keyed"/>, e.g. <c>hourly</c>, <c>joint_bin</c>, <c>bin</c>).
/// Keys are the column names, unit suffix included; a number that is not finite is null.
/// Notes follow as <c>notes</c>, <c>assumptions</c>, <c>warnings</c> and <c>cautions</c>.
/// </summary>
public static class JsonRenderer
{
    /// <summary>The name of the table merged into the top level.</summary>
    public const string FactsTable = "facts";

    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>The document as a JSON object.</summary>
    public static JsonObject Build(ResultDocument document)
    {
        var root = new JsonObject();
        foreach (var table in document.Tables)
        {
            if (table.Name == FactsTable)
            {
                foreach (var (k, v) in RowObject(table, 0, null))
                {
                    root[k] = v?.DeepClone();
                }

                continue;
            }

            root[table.Name] = Table(table);
        }

        foreach (var (kind, key) in new[] { (NoteKind.Note, "notes"), (NoteKind.Assumption, "assumptions"), (NoteKind.Warning, "warnings"), (NoteKind.Caution, "cautions") })
        {
            var lines = document.NotesOf(kind).ToList();
            if (lines.Count > 0 || kind is NoteKind.Warning or NoteKind.Caution)
            {
                root[key] = new JsonArray([.. lines.Select(l => (JsonNode?)JsonValue.Create(l))]);
            }
        }

        return root;
    }

    /// <summary>The document as indented JSON text.</summary>
    public static string Render(ResultDocument document) => Build(document).ToJsonString(Indented);

    /// <summary>One table as JSON, by its layout.</summary>
    public static JsonNode Table(ResultTable table)
    {
        switch (table.Layout)
        {
            case TableLayout.Record:
                return table.RowCount == 0 ? new JsonObject() : RowObject(table, 0, null);
            case TableLayout.Keyed:
                var key = table.KeyColumn ?? throw new InvalidOperationException($"table '{table.Name}' is keyed but names no key column");
                var keyed = new JsonObject();
                for (int r = 0; r < table.RowCount; r++)
                {
                    keyed[KeyOf(table[key].Texts[r])] = RowObject(table, r, key);
                }

                return keyed;
            default:
                var rows = new JsonArray();
                for (int r = 0; r < table.RowCount; r++)
                {
                    rows.Add(RowObject(table, r, null));
                }

                return rows;
        }
    }

    /// <summary>A key column's value as a JSON key: lower case, dashes and spaces as underscores.</summary>
    public static string KeyOf(string value) => value.ToLowerInvariant().Replace('-', '_').Replace(' ', '_');

    private static JsonObject RowObject(ResultTable table, int row, string? skip)
    {
        var o = new JsonObject();
        foreach (var c in table.Columns)
        {
            if (c.Name == skip)
            {
                continue;
            }

            o[c.Name] = c.Kind switch
            {
                ColumnKind.Text => JsonValue.Create(c.Texts[row]),
                ColumnKind.Number => double.IsFinite(c.Numbers[row]) ? JsonValue.Create(c.Numbers[row]) : null,
                _ => JsonValue.Create(c.Integers[row]),
            };
        }

        return o;
    }
}
