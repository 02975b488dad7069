using System.Globalization;
using System.IO.Compression;
using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Psychrometrics;
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
    private HourlyWeather record = null!;
    private double[] wetBulbs = [];

    [GlobalSetup]
    public void Setup()
    {
        // The Chicago TMY3 check file, converted once to the open layout (time, drybulb_c, dewpoint_c, rh_pct, pressure_kpa).
        openLayout = StationYear.ChicagoOpenLayout();
        record = WeatherReader.Read(openLayout, "chicago-open-layout.csv");
        wetBulbs = new double[record.Count];
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

    /// <summary>The wet-bulb of every hour of the record (the costliest part of the full read), as the full read solves them (Newton).</summary>
    [Benchmark]
    public double WetBulbsOfRecord()
    {
        for (int i = 0; i < record.Count; i++)
        {
            wetBulbs[i] = HourlyStateSolver.WetBulb(record.DryBulbC[i], record.HumidityRatio[i], record.PressurePa[i], record.DewPointC[i]);
        }

        return wetBulbs[^1];
    }

    /// <summary>The same wet-bulbs one hour at a time by the reference solver (MathNet Brent).</summary>
    [Benchmark]
    public double WetBulbsScalarReference()
    {
        for (int i = 0; i < record.Count; i++)
        {
            double t = record.DryBulbC[i], w = record.HumidityRatio[i], p = record.PressurePa[i];
            wetBulbs[i] = w >= Saturation.HumidityRatio(t, p) ? t : MoistAir.WetBulb(t, w, p);
        }

        return wetBulbs[^1];
    }

    /// <summary>The full read into an hourly record.</summary>
    [Benchmark]
    public HourlyWeather FullRead() => WeatherReader.Read(openLayout, "chicago-open-layout.csv");
}
