using System.Globalization;
using CsvHelper;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// Writes a <see cref="ResultTable"/> as CSV (CsvHelper, invariant culture): a header of the
/// column names, then one record per row; numbers in round-trip form ("R"), so the CSV and
/// the Parquet file hold the same doubles.
/// </summary>
public static class CsvTableWriter
{
    /// <summary>Writes <paramref name="table"/> to <paramref name="path"/>, replacing any file there.</summary>
    public static void Write(ResultTable table, string path)
    {
        using var writer = new StreamWriter(path);
        Write(table, writer);
    }

    /// <summary>Writes <paramref name="table"/> as CSV to <paramref name="writer"/> (left open).</summary>
    public static void Write(ResultTable table, TextWriter writer)
    {
        var options = new CsvWriterOptions { FormatProvider = CultureInfo.InvariantCulture, NewLine = "\n" };
        using var csv = CsvWriter.Create(writer, options, leaveOpen: true);
        csv.WriteHeader(table.Columns.Select(c => c.Name).ToArray());
        var fields = new string[table.Columns.Count];
        for (int row = 0; row < table.RowCount; row++)
        {
            for (int i = 0; i < fields.Length; i++)
            {
                var column = table.Columns[i];
                fields[i] = column.Kind switch
                {
                    ColumnKind.Text => column.Texts[row],
                    ColumnKind.Number => double.IsFinite(column.Numbers[row]) ? column.Numbers[row].ToString("R", CultureInfo.InvariantCulture) : string.Empty,
                    _ => column.Integers[row].ToString(CultureInfo.InvariantCulture),
                };
            }

            csv.WriteRecord(fields);
        }
    }
}
