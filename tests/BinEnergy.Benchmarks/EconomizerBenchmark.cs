using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Benchmarks;

/// <summary>
/// The economizer evaluation of one station-year (Chicago TMY3, office hours): the dry-bulb bin
/// table plus all six controls (the baseline and the five economizer controls, each integrated
/// and non-integrated), by the bin method and the hourly sum, against the full read of the same
/// station-year in the same run (the baseline). Target: the evaluation under 2 ms beyond the read.
/// </summary>
[MemoryDiagnoser]
public class EconomizerBenchmark
{
    private byte[] file = [];
    private ColumnMap map = null!;
    private HourlyWeather weather = null!;
    private bool[] occupied = [];
    private EconomizerSettings settings = null!;

    [GlobalSetup]
    public void Setup()
    {
        string root = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(root, "BinEnergy.sln")))
        {
            root = Path.GetDirectoryName(root) ?? throw new InvalidOperationException("BinEnergy.sln not found");
        }

        string source = Path.Combine(root, "tests", "data", "weather-open", "725300TYA.CSV.gz");
        using (var gz = new System.IO.Compression.GZipStream(File.OpenRead(source), System.IO.Compression.CompressionMode.Decompress))
        using (var ms = new MemoryStream())
        {
            gz.CopyTo(ms);
            file = ms.ToArray();
        }

        map = ColumnMap.Load("tmy3");
        weather = ReadStationYear();
        occupied = OccupancySchedule.Parse("Mon-Fri 07:00-19:00").Flags(weather);
        settings = new EconomizerSettings
        {
            SupplyAirflow = VolumeFlow.FromCfm(10_000),
            SupplyAirflowMin = VolumeFlow.FromCfm(3_000),
            MinOutdoorAirflow = VolumeFlow.FromCfm(2_000),
            SupplyTemperature = Temperature.FromFahrenheit(55),
            ReturnTemperature = Temperature.FromFahrenheit(75),
            ReturnRelativeHumidity = 0.50,
            LoadLine = new BuildingLoadLine(Power.FromBtuPerHour(216_000), Temperature.FromFahrenheit(95), Temperature.FromFahrenheit(50)),
            Controls =
            [
                .. EconomizerControl.EconomizerKinds.Select(k => new EconomizerControl(k, Integrated: true)),
                .. EconomizerControl.EconomizerKinds.Select(k => new EconomizerControl(k, Integrated: false)),
            ],
        };
    }

    /// <summary>The read of the station-year through the tmy3 map, from memory (the baseline).</summary>
    [Benchmark(Baseline = true)]
    public HourlyWeather ReadStationYear() => WeatherReader.Read(file, "725300TYA.CSV", new WeatherReadOptions { Map = map });

    /// <summary>Bin table plus every control, all three methods, on the record already read.</summary>
    [Benchmark]
    public EconomizerEvaluation BinsAndAllControls()
    {
        var bins = BinTable.Build(weather, DryBulbBinScale.Default(UnitSystem.IP), occupied);
        return EconomizerEvaluation.Evaluate(weather, occupied, bins, settings);
    }
}
