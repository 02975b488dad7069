using System.Globalization;
using Parquet;
using Parquet.Schema;

namespace BinEnergy.Tests.Support;

/// <summary>
/// Reads one Parquet result table (Parquet.Net) into rows of column name to text, numbers in
/// round-trip form: the full-precision values, where the CSV beside it keeps each quantity's digits.
/// </summary>
public static class ParquetRows
{
    /// <summary>The rows of <c>tables/<paramref name="table"/>.parquet</c> in the output folder <paramref name="folder"/>.</summary>
    public static List<Dictionary<string, string>> Read(string folder, string table) => ReadFile(Path.Combine(folder, "tables", table + ".parquet"));

    /// <summary>The rows of the Parquet file <paramref name="path"/>.</summary>
    public static List<Dictionary<string, string>> ReadFile(string path) => ReadFileAsync(path).GetAwaiter().GetResult();

    private static async Task<List<Dictionary<string, string>>> ReadFileAsync(string path)
    {
        await using var stream = File.OpenRead(path);
        await using var reader = await ParquetReader.CreateAsync(stream);
        var rows = new List<Dictionary<string, string>>();
        for (int g = 0; g < reader.RowGroupCount; g++)
        {
            using var group = reader.OpenRowGroupReader(g);
            int n = checked((int)group.RowCount);
            var columns = new List<(string Name, string[] Texts)>();
            foreach (DataField field in reader.Schema.GetDataFields())
            {
                columns.Add((field.Name, await Texts(group, field, n)));
            }

            for (int r = 0; r < n; r++)
            {
                rows.Add(columns.ToDictionary(c => c.Name, c => c.Texts[r]));
            }
        }

        return rows;
    }

    private static async Task<string[]> Texts(ParquetRowGroupReader group, DataField field, int n)
    {
        if (field.ClrType == typeof(double))
        {
            var values = new double[n];
            await group.ReadAsync<double>(field, values.AsMemory());
            return [.. values.Select(v => v.ToString("R", CultureInfo.InvariantCulture))];
        }

        if (field.ClrType == typeof(int))
        {
            var values = new int[n];
            await group.ReadAsync<int>(field, values.AsMemory());
            return [.. values.Select(v => v.ToString(CultureInfo.InvariantCulture))];
        }

        var texts = new string?[n];
        await group.ReadAsync(field, texts.AsMemory());
        return [.. texts.Select(t => t ?? string.Empty)];
    }
}
