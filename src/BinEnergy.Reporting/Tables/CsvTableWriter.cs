using System.Globalization;
using BinEnergy.Reporting.Units;
using CsvHelper;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// Writes a <see cref="ResultTable"/> as CSV (CsvHelper, invariant culture): a header of the
/// column names, then one record per row; numbers rounded to the digits their quantity warrants
/// (<see cref="DisplayUnit.FileDigits"/>: <c>-5.98</c>, not the <c>-5.980000000000004</c> of a sum),
/// written in the shortest form that reads back to the rounded value. The Parquet tables keep full precision.
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
                    ColumnKind.Number => (column.Unit?.FileDigits ?? FileDigits.Default).Text(column.Numbers[row]),
                    _ => column.Integers[row].ToString(CultureInfo.InvariantCulture),
                };
            }

            csv.WriteRecord(fields);
        }
    }
}
