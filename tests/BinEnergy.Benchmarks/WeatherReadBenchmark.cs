using System.Globalization;
using System.IO.Compression;
using System.Text;
using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Weather;
using CsvHelper;

namespace BinEnergy.Benchmarks;

/// <summary>
/// Reading one station-year (8,760 hours) in the open layout: the full read (parse, calendar,
/// quality checks, humidity ratio, dew point, wet-bulb and enthalpy of every hour) against a
/// baseline that only parses the same CSV's numbers with CsvHelper. Both read the same bytes
/// from memory. Target: the full read within 2.5 times the baseline.
/// </summary>
[MemoryDiagnoser]
public class WeatherReadBenchmark
{
    private byte[] openLayout = [];

    [GlobalSetup]
    public void Setup()
    {
        // The Chicago TMY3 check file, converted once to the open layout (time, drybulb_c, dewpoint_c, rh_pct, pressure_kpa).
        string root = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(root, "BinEnergy.sln")))
        {
            root = Path.GetDirectoryName(root) ?? throw new InvalidOperationException("BinEnergy.sln not found");
        }

        string source = Path.Combine(root, "tests", "data", "weather-open", "725300TYA.CSV.gz");
        var weather = WeatherReader.Read(source, new WeatherReadOptions { Map = ColumnMap.Load("tmy3") });
        var text = new StringWriter(CultureInfo.InvariantCulture) { NewLine = "\n" };
        OpenLayoutWriter.Write(weather, text);
        openLayout = Encoding.UTF8.GetBytes(text.ToString());
    }

    /// <summary>Parses every number of the file with CsvHelper and sums them (so nothing is optimised away).</summary>
    [Benchmark(Baseline = true)]
    public double ParseNumbersOnly()
    {
        var options = new CsvReaderOptions { Separator = ',', HasHeader = true, CommentPrefix = '#', FormatProvider = CultureInfo.InvariantCulture };
        using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(openLayout), options);
        double sum = 0;
        while (reader.Read())
        {
            for (int i = 1; i < reader.FieldCount; i++)
            {
                if (reader.TryParse<double>(i, out double v))
                {
                    sum += v;
                }
            }
        }

        return sum;
    }

    /// <summary>The reader's parse alone (fields, times, units, range checks), without calendar, gaps or psychrometrics.</summary>
    [Benchmark]
    public int ParseIntoTable() => WeatherFileParser.Parse(openLayout, "chicago-open-layout.csv", null).Count;

    /// <summary>The full read into an hourly record.</summary>
    [Benchmark]
    public HourlyWeather FullRead() => WeatherReader.Read(openLayout, "chicago-open-layout.csv");
}
