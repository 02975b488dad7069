using Parquet;
using Parquet.Schema;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// Writes a <see cref="ResultTable"/> as one Apache Parquet file (Parquet.Net 6): required
/// (non-nullable) columns typed as UTF-8 strings, doubles and 32-bit integers, one row
/// group, and the given key-value metadata in the file footer (study name, units, engine
/// version, ...), which DuckDB shows through <c>parquet_kv_metadata</c>.
/// </summary>
public static class ParquetTableWriter
{
    /// <summary>Writes <paramref name="table"/> to <paramref name="path"/>, replacing any file there.</summary>
    public static async Task WriteAsync(ResultTable table, string path, IReadOnlyDictionary<string, string> metadata, CancellationToken ct = default)
    {
        var fields = table.Columns.Select(c => (DataField)(c.Kind switch
        {
            ColumnKind.Text => new DataField<string>(c.Name, false),
            ColumnKind.Number => new DataField<double>(c.Name, false),
            _ => new DataField<int>(c.Name, false),
        })).ToArray();
        var schema = new ParquetSchema(fields);

        await using var stream = File.Create(path);
        await using var writer = await ParquetWriter.CreateAsync(schema, stream, cancellationToken: ct);
        writer.CustomMetadata = metadata.ToDictionary(kv => kv.Key, kv => kv.Value);
        using var group = writer.CreateRowGroup();
        for (int i = 0; i < fields.Length; i++)
        {
            var column = table.Columns[i];
            switch (column.Kind)
            {
                case ColumnKind.Text:
                    await group.WriteAsync(fields[i], column.Texts.ToArray());
                    break;
                case ColumnKind.Number:
                    await group.WriteAsync<double>(fields[i], column.Numbers.ToArray(), cancellationToken: ct);
                    break;
                default:
                    await group.WriteAsync<int>(fields[i], column.Integers.ToArray(), cancellationToken: ct);
                    break;
            }
        }
    }
}
