using System.Globalization;
using BinEnergy.Reporting.Tables;
using Parquet;
using Parquet.Schema;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// One table of a batch output folder read whole: every <c>part-NNNN.parquet</c> under
/// <c>tables/NAME/</c>, in any Hive-style partition folder (<c>shard=0/</c>, <c>state=IL/</c>),
/// read with Parquet.Net and appended in path order. A partition key the part file does not hold
/// as a column is added as a text column (as DuckDB's <c>hive_partitioning</c> does).
/// </summary>
/// <param name="Table">The rows of every part.</param>
/// <param name="Parts">The part files read, relative to the output folder.</param>
/// <param name="Metadata">The key-value metadata of the first part (<c>binenergy.study_sha256</c>, ...).</param>
public sealed record PartitionedTable(ResultTable Table, IReadOnlyList<string> Parts, IReadOnlyDictionary<string, string> Metadata)
{
    /// <summary>The metadata key that names the study a part was computed from.</summary>
    public const string StudyHashKey = "binenergy.study_sha256";

    /// <summary>The part files of table <paramref name="name"/> under <paramref name="folder"/>/tables, in ordinal path order (empty when there are none).</summary>
    public static IReadOnlyList<string> PartFiles(string folder, string name)
    {
        string root = Path.Combine(folder, "tables", name);
        return Directory.Exists(root)
            ? Directory.EnumerateFiles(root, "part-*.parquet", SearchOption.AllDirectories).Order(StringComparer.Ordinal).ToList()
            : [];
    }

    /// <summary>Reads table <paramref name="name"/> of the batch output folder <paramref name="folder"/>.</summary>
    /// <exception cref="BatchReportException">No part file, a part that is not Parquet, parts with different columns or of different studies.</exception>
    /// <param name="folder">The batch output folder.</param>
    /// <param name="name">The table.</param>
    /// <param name="keep">The columns to read (partition columns are always read); null: every column.</param>
    /// <param name="ct">Cancels between parts.</param>
    public static async Task<PartitionedTable> ReadAsync(string folder, string name, IReadOnlySet<string>? keep = null, CancellationToken ct = default)
    {
        var files = PartFiles(folder, name);
        if (files.Count == 0)
        {
            throw new BatchReportException($"{Path.Combine(folder, "tables", name)}: no part files (tables/{name}/<key>=<value>/part-NNNN.parquet); run `binenergy batch` into this folder first");
        }

        ResultTable? table = null;
        IReadOnlyDictionary<string, string>? metadata = null;
        string? firstPart = null;
        var parts = new List<string>();
        foreach (string file in files)
        {
            string rel = Path.GetRelativePath(folder, file);
            var (part, meta) = await ReadPartAsync(folder, file, rel, name, keep, ct);
            metadata ??= meta;
            firstPart ??= rel;
            string hash = meta.GetValueOrDefault(StudyHashKey, string.Empty);
            string firstHash = metadata.GetValueOrDefault(StudyHashKey, string.Empty);
            if (hash != firstHash)
            {
                throw new BatchReportException($"{rel}: computed from another study ({StudyHashKey} {Short(hash)}) than {firstPart} ({Short(firstHash)}); "
                    + "a report covers one study: remove the other study's parts, or run each study into its own --out folder");
            }

            if (table is null)
            {
                table = part;
            }
            else if (!part.Columns.Select(c => (c.Name, c.Kind)).SequenceEqual(table.Columns.Select(c => (c.Name, c.Kind))))
            {
                throw new BatchReportException($"{rel}: its columns ({string.Join(", ", part.Columns.Select(c => c.Name))}) differ from those of {firstPart}; every part of tables/{name} must come from the same batch");
            }
            else
            {
                table.Append(part);
            }

            parts.Add(rel);
        }

        return new PartitionedTable(table!, parts, metadata!);
    }

    private static string Short(string hash) => hash.Length == 0 ? "none" : hash[..Math.Min(12, hash.Length)];

    /// <summary>
    /// The first part of table <paramref name="name"/> (its path below <paramref name="folder"/>) and its metadata: the units
    /// and study a reader needs before choosing columns; null when there is no part.
    /// </summary>
    public static async Task<(string Part, IReadOnlyDictionary<string, string> Metadata)?> FirstMetadataAsync(string folder, string name, CancellationToken ct = default)
    {
        var files = PartFiles(folder, name);
        if (files.Count == 0)
        {
            return null;
        }

        string rel = Path.GetRelativePath(folder, files[0]);
        try
        {
            await using var stream = File.OpenRead(files[0]);
            await using var reader = await ParquetReader.CreateAsync(stream, cancellationToken: ct);
            return (rel, reader.CustomMetadata ?? new Dictionary<string, string>());
        }
        catch (Exception e) when (IsUnreadable(e))
        {
            throw Unreadable(rel, e);
        }
    }

    private static bool IsUnreadable(Exception e) => e is IOException or InvalidDataException or Parquet.ParquetException or NotSupportedException;

    private static BatchReportException Unreadable(string rel, Exception e) =>
        new($"{rel}: not a readable Parquet file ({e.Message}); delete it and rerun the batch for its climates (batch ... --resume)");

    private static async Task<(ResultTable Table, IReadOnlyDictionary<string, string> Metadata)> ReadPartAsync(string folder, string file, string rel, string name,
        IReadOnlySet<string>? keep, CancellationToken ct)
    {
        var partitions = PartitionKeys(Path.GetRelativePath(Path.Combine(folder, "tables", name), Path.GetDirectoryName(file)!));
        try
        {
            await using var stream = File.OpenRead(file);
            await using var reader = await ParquetReader.CreateAsync(stream, cancellationToken: ct);
            var fields = reader.Schema.GetDataFields().Where(f => keep is null || keep.Contains(f.Name)).ToArray();
            var table = new ResultTable(name);
            var columns = new List<(DataField Field, ColumnKind Kind)>();
            foreach (var f in fields)
            {
                var kind = f.ClrType == typeof(string) || f.ClrType == typeof(ReadOnlyMemory<char>) ? ColumnKind.Text
                    : f.ClrType == typeof(double) ? ColumnKind.Number
                    : f.ClrType == typeof(int) ? ColumnKind.Integer
                    : throw new BatchReportException($"{rel}: column '{f.Name}' is of type {f.ClrType.Name}; the tables hold text, double and 32-bit integer columns");
                columns.Add((f, kind));
                _ = kind switch
                {
                    ColumnKind.Text => table.Text(f.Name),
                    ColumnKind.Number => table.Number(f.Name),
                    _ => table.Integer(f.Name),
                };
            }

            var extra = partitions.Where(p => fields.All(f => f.Name != p.Key)).ToList();
            foreach (var (key, _) in extra)
            {
                table.Text(key);
            }

            for (int g = 0; g < reader.RowGroupCount; g++)
            {
                using var group = reader.OpenRowGroupReader(g);
                int n = checked((int)group.RowCount);
                var values = new List<Array>();
                foreach (var (field, kind) in columns)
                {
                    values.Add(kind switch
                    {
                        ColumnKind.Text => await ReadStrings(group, field, n, ct),
                        ColumnKind.Number => await ReadValues(group, field, n, _ => double.NaN, ct),
                        _ => await ReadValues<int>(group, field, n, i => throw new BatchReportException(string.Create(CultureInfo.InvariantCulture, $"{rel}: column '{field.Name}' has no value in row {i + 1}")), ct),
                    });
                }

                values.AddRange(extra.Select(p => (Array)Enumerable.Repeat(p.Value, n).ToArray()));
                table.AddColumns(values);
            }

            return (table, reader.CustomMetadata ?? new Dictionary<string, string>());
        }
        catch (Exception e) when (IsUnreadable(e))
        {
            throw Unreadable(rel, e);
        }
    }

    private static async Task<Array> ReadStrings(ParquetRowGroupReader group, DataField field, int n, CancellationToken ct)
    {
        var values = new string?[n];
        await group.ReadAsync(field, values.AsMemory(), cancellationToken: ct);
        return values.Select(v => v ?? string.Empty).ToArray();
    }

    /// <summary>A column of <typeparamref name="T"/> values; a nullable column's missing values become <paramref name="missing"/>'s.</summary>
    private static async Task<Array> ReadValues<T>(ParquetRowGroupReader group, DataField field, int n, Func<int, T> missing, CancellationToken ct)
        where T : struct
    {
        if (!field.IsNullable)
        {
            var values = new T[n];
            await group.ReadAsync<T>(field, values.AsMemory(), cancellationToken: ct);
            return values;
        }

        var nullable = new T?[n];
        await group.ReadAsync<T>(field, nullable.AsMemory(), cancellationToken: ct);
        return nullable.Select((v, i) => v ?? missing(i)).ToArray();
    }

    /// <summary>The <c>key=value</c> folder names of a path below the table folder, with Hive's percent-escapes decoded.</summary>
    internal static IReadOnlyList<(string Key, string Value)> PartitionKeys(string relativeFolder) =>
        relativeFolder == "." ? [] : relativeFolder.Split(Path.DirectorySeparatorChar)
            .Select(s => s.Split('=', 2))
            .Where(kv => kv.Length == 2)
            .Select(kv => (kv[0], kv[1] == "__HIVE_DEFAULT_PARTITION__" ? string.Empty : Uri.UnescapeDataString(kv[1])))
            .ToList();
}
