using System.Text;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// Hive-style partition folders (<c>climate=harbor/</c>) for batch runs, so DuckDB, Spark or
/// pandas read a whole set of runs as one table with a <c>climate</c> column. Values are
/// percent-encoded where they could break a path or the <c>key=value</c> form, the way Hive
/// escapes them (DuckDB's <c>hive_partitioning</c> decodes them).
/// </summary>
public static class HivePartition
{
    /// <summary>The folder name of one partition, e.g. <c>climate=harbor</c>.</summary>
    public static string FolderName(string key, string value)
    {
        if (string.IsNullOrWhiteSpace(key) || key.Any(c => !(char.IsAsciiLetterOrDigit(c) || c == '_')))
        {
            throw new ArgumentException($"partition key '{key}' must be letters, digits and underscores");
        }

        return key + "=" + Escape(value);
    }

    /// <summary>The path of <paramref name="fileName"/> inside the partition folder under <paramref name="root"/>.</summary>
    public static string PathFor(string root, string key, string value, string fileName) =>
        Path.Combine(root, FolderName(key, value), fileName);

    private static string Escape(string value)
    {
        var sb = new StringBuilder(value.Length);
        foreach (byte b in Encoding.UTF8.GetBytes(value))
        {
            char c = (char)b;
            bool plain = b < 0x80 && (char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or ' ');
            if (plain)
            {
                sb.Append(c);
            }
            else
            {
                sb.Append('%').Append(b.ToString("X2", System.Globalization.CultureInfo.InvariantCulture));
            }
        }

        return sb.Length == 0 ? "__HIVE_DEFAULT_PARTITION__" : sb.ToString();
    }
}
