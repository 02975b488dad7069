using System.Globalization;
using CsvHelper;

namespace BinEnergy.Benchmarks;

/// <summary>The baseline of the many-file benchmarks: every number of every file parsed with CsvHelper, one file per worker on every core.</summary>
internal static class CsvNumbers
{
    /// <summary>The sum of every number after the first field of every line of every file, files side by side.</summary>
    public static double SumSideBySide(byte[][] files)
    {
        var sums = new double[files.Length];
        Parallel.For(0, files.Length, k =>
        {
            var options = new CsvReaderOptions { Separator = ',', HasHeader = false, FormatProvider = CultureInfo.InvariantCulture };
            using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(files[k]), options);
            while (reader.Read())
            {
                for (int i = 1; i < reader.FieldCount; i++)
                {
                    if (reader.TryParse<double>(i, out double v))
                    {
                        sums[k] += v;
                    }
                }
            }
        });
        return sums.Sum();
    }
}
