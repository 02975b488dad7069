using System.IO.Compression;
using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Weather;

namespace BinEnergy.Benchmarks;

/// <summary>
/// Reading many station-years side by side, as a national study does: the six real check files, each eight times (48
/// station-years, already un-gzipped in memory), one file per worker on every core. The full read (parse, calendar,
/// gaps, humidity, wet-bulb and enthalpy of every hour) against a baseline that only parses every number of the same
/// files with CsvHelper, side by side in the same way.
/// </summary>
[MemoryDiagnoser]
public class BatchReadBenchmark
{
    private (byte[] Data, string Name, WeatherReadOptions Options)[] files = [];

    [GlobalSetup]
    public void Setup()
    {
        string root = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(root, "BinEnergy.sln")))
        {
            root = Path.GetDirectoryName(root) ?? throw new InvalidOperationException("BinEnergy.sln not found");
        }

        var folder = Path.Combine(root, "tests", "data", "weather-open");
        var one = Directory.GetFiles(folder, "*.gz").Order(StringComparer.Ordinal).Select(path =>
        {
            using var gz = new GZipStream(File.OpenRead(path), CompressionMode.Decompress);
            using var bytes = new MemoryStream();
            gz.CopyTo(bytes);
            string name = Path.GetFileNameWithoutExtension(path);
            var map = ColumnMap.Load(name.StartsWith("tmy_", StringComparison.Ordinal) ? "pvgis" : "tmy3");
            return (bytes.ToArray(), name, new WeatherReadOptions { Map = map });
        }).ToArray();
        files = Enumerable.Repeat(one, 8).SelectMany(f => f).ToArray();
    }

    /// <summary>Every number of every file parsed with CsvHelper, files side by side.</summary>
    [Benchmark(Baseline = true)]
    public double ParseNumbersOnly() => CsvNumbers.SumSideBySide([.. files.Select(f => f.Data)]);

    /// <summary>The full read of every file into an hourly record, files side by side.</summary>
    [Benchmark]
    public int FullRead()
    {
        var hours = new int[files.Length];
        Parallel.For(0, files.Length, k => hours[k] = WeatherReader.Read(files[k].Data, files[k].Name, files[k].Options).Count);
        return hours.Sum();
    }
}
