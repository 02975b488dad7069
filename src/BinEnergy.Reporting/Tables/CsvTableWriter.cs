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
        var options = new CsvWriterOptions { FormatProvider = CultureInfo.InvariantCulture };
        using var csv = CsvWriter.ToFile(path, options);
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
                    ColumnKind.Number => column.Numbers[row].ToString("R", CultureInfo.InvariantCulture),
                    _ => column.Integers[row].ToString(CultureInfo.InvariantCulture),
                };
            }

            csv.WriteRecord(fields);
        }
    }
}
