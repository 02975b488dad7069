using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace BinEnergy.Core.Study;

/// <summary>
/// A study given as values rather than a file: what a single command's options say, keyed by
/// the study file's own tables and keys (<c>ventilation.airflow_cfm</c>), so a command runs
/// through the same validation, case builder and runner as a study file. Each value remembers
/// where it came from (an option such as <c>--airflow</c>) for error messages.
/// </summary>
public sealed class StudyInput
{
    private readonly List<(string Table, string Key, object Value, string Origin)> values = [];

    /// <summary>Sets a key of a table (<c>ventilation</c>, <c>climate</c>, ...; one climate, no variants).</summary>
    /// <param name="table">The table.</param>
    /// <param name="key">The key with its unit suffix, as a study file writes it.</param>
    /// <param name="value">A string, a number, a bool, or a list of strings or numbers.</param>
    /// <param name="origin">Where the value came from, e.g. <c>--airflow</c>.</param>
    public StudyInput Set(string table, string key, object value, string origin)
    {
        values.Add((table, key, value switch
        {
            int i => (long)i,
            IEnumerable<string> list => list.Cast<object>().ToList(),
            IEnumerable<double> list => list.Cast<object>().ToList(),
            _ => value,
        }, origin));
        return this;
    }

    /// <summary>True when the table has at least one value.</summary>
    public bool HasTable(string table) => values.Any(v => v.Table == table);

    /// <summary>
    /// The origin of the value at <paramref name="line"/> of an error (entries are numbered from 1
    /// in the order set), or of the first value of <paramref name="key"/> (<c>table.key</c>); null when neither matches.
    /// </summary>
    public string? OriginOf(int? line, string? key)
    {
        if (line is int l && l >= 1 && l <= values.Count)
        {
            return values[l - 1].Origin;
        }

        if (key is null)
        {
            return null;
        }

        foreach (var v in values)
        {
            if (key == v.Table + "." + v.Key || key.StartsWith(v.Table + "." + BaseName(v.Key), StringComparison.Ordinal))
            {
                return v.Origin;
            }
        }

        return null;
    }

    private static string BaseName(string key)
    {
        int cut = key.LastIndexOf('_');
        return cut > 0 ? key[..cut] : key;
    }

    /// <summary>The values as study-file entries, each table opened once, in the order set.</summary>
    internal List<TomlEntry> Entries()
    {
        var entries = new List<TomlEntry>();
        int line = 0;
        foreach (var (table, key, value, _) in values)
        {
            line++;
            if (!entries.Any(e => e.Table == table))
            {
                entries.Add(new TomlEntry(table, 0, string.Empty, TableMarker.Instance, line));
            }

            entries.Add(new TomlEntry(table, 0, key, value, line));
        }

        return entries;
    }

    /// <summary>SHA-256 of the values as written (table, key, value per line), hex.</summary>
    internal string Hash()
    {
        var text = new StringBuilder();
        foreach (var (table, key, value, _) in values)
        {
            text.Append(table).Append('.').Append(key).Append('=').Append(Show(value)).Append('\n');
        }

        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.ToString())));
    }

    private static string Show(object value) => value switch
    {
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        List<object> list => "[" + string.Join(",", list.Select(Show)) + "]",
        _ => value.ToString() ?? string.Empty,
    };
}
