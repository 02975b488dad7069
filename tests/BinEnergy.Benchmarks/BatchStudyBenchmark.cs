using System.IO.Compression;
using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Study;

namespace BinEnergy.Benchmarks;

/// <summary>
/// A national study as <c>batch</c> runs it: the six real check files (gzipped TMY3 and PVGIS files) each twice, 12
/// station-years, x 12 variants (six airflows, with and without energy recovery) with a five-control variable-volume
/// economizer and the plant, one file per worker on every core. Measured in steps, so the ratios say where the time
/// goes: reading only; reading and running every case; and laying the rows out as tables; the whole batch into Parquet
/// parts with its manifest. The baseline parses every number of the same files with CsvHelper, side by side the same way.
/// </summary>
[MemoryDiagnoser]
public class BatchStudyBenchmark
{
    private const int Repeats = 2;
    private string folder = string.Empty;
    private StudyDefinition study = null!;
    private List<(BatchStation Station, int Position)> stations = [];
    private byte[][] decompressed = [];

    [GlobalSetup]
    public void Setup()
    {
        string root = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(root, "BinEnergy.sln")))
        {
            root = Path.GetDirectoryName(root) ?? throw new InvalidOperationException("BinEnergy.sln not found");
        }

        folder = Directory.CreateTempSubdirectory("binenergy-bench-batch-").FullName;
        string studyPath = Path.Combine(folder, "study.toml");
        File.WriteAllText(studyPath, StudyText + string.Concat(new[] { 1500, 2000, 2500, 3000, 3500, 4000 }.Select(cfm => FormattableString.Invariant(
            $"\n[[variant]]\nname = \"oa-{cfm}\"\nventilation.airflow_cfm = {cfm}\n\n[[variant]]\nname = \"oa-{cfm}-no-recovery\"\nventilation.airflow_cfm = {cfm}\nrecovery.enabled = false\n"))));
        study = StudyFileReader.Read(studyPath, climatesElsewhere: true);
        var files = Directory.GetFiles(Path.Combine(root, "tests", "data", "weather-open"), "*.gz").Order(StringComparer.Ordinal).ToArray();
        stations = [.. Enumerable.Range(0, Repeats).SelectMany(r => files.Select(f =>
        {
            string id = FormattableString.Invariant($"{r}-{Path.GetFileName(f)}");
            string map = Path.GetFileName(f).StartsWith("tmy_", StringComparison.Ordinal) ? "pvgis" : "tmy3";
            return new BatchStation(id, f, id, map, null, [], "benchmark", null) { Id = id };
        })).Select((s, i) => (s, i))];
        decompressed = [.. stations.Select(s =>
        {
            using var gz = new GZipStream(File.OpenRead(s.Station.WeatherPath), CompressionMode.Decompress);
            using var bytes = new MemoryStream();
            gz.CopyTo(bytes);
            return bytes.ToArray();
        })];
    }

    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(folder, recursive: true);

    /// <summary>Every number of every file parsed with CsvHelper, files side by side (the baseline).</summary>
    [Benchmark(Baseline = true)]
    public double ParseNumbersOnly() => CsvNumbers.SumSideBySide(decompressed);

    /// <summary>Each file read into its hourly record (gzip, parse, calendar, humidity, wet-bulb, enthalpy), side by side.</summary>
    [Benchmark]
    public int ReadOnly()
    {
        var hours = new int[stations.Count];
        Parallel.For(0, stations.Count, k =>
        {
            var s = stations[k].Station;
            hours[k] = StudyRunner.ReadWeather(new StudyClimate(s.Key, s.WeatherPath, s.Map, null, 0)).Count;
        });
        return hours.Sum();
    }

    /// <summary>The batch engine: each file read and its 12 cases run (loads by three methods, plant, economizer).</summary>
    [Benchmark]
    public int ReadAndRunCases()
    {
        int cases = 0;
        BatchRunner.Run(study, stations, r => cases += r.Cases.Count);
        return cases;
    }

    /// <summary>The engine and each file's rows laid out as the five result tables.</summary>
    [Benchmark]
    public int ReadRunAndTables()
    {
        int rows = 0;
        BatchRunner.Run(study, stations, r =>
        {
            var run = new StudyRunResult(study, r.Cases, StudyRunner.EngineVersion);
            rows += StudyTables.Build(r.Cases, StudyTables.Units(run), StudyTables.Show(run), run.Study.DegreeDayMethod).Sum(t => t.RowCount);
        });
        return rows;
    }

    /// <summary>The whole batch as the command runs it: engine, tables, Parquet parts and manifest.</summary>
    [Benchmark]
    public int WholeBatch()
    {
        var inputs = new BatchInputs([.. stations.Select(s => s.Station)], [], [], "benchmark");
        using var output = BatchOutput.Open(new BatchOutputSettings { Folder = Path.Combine(folder, "out"), Study = study, Inputs = inputs, Force = true });
        BatchRunner.Run(study, stations, r => output.Add(r));
        output.WriteAll();
        return output.Counts(stations.Count).Done;
    }

    /// <summary>The study but its variants (12 added in setup: six airflows, each with and without energy recovery); five economizer controls; gas heat, electric cooling.</summary>
    private static readonly string StudyText = """
        [study]
        name = "Benchmark national study"
        units = "ip"

        [schedule]
        occupied = "Mon-Fri 07:00-19:00; Sat 08:00-13:00"

        [ventilation]
        airflow_cfm = 2000
        heat_to_f = 70
        cool_to_f = 75
        max_rh_pct = 50
        fan_pressure_inwc = 1.0

        [recovery]
        sensible_effectiveness = 0.70
        latent_effectiveness = 0.55
        frost_limit_f = 10
        frost_effectiveness = 0.35
        pressure_drop_inwc = 0.8

        [economizer]
        system = "variable-volume"
        supply_airflow_cfm = 10000
        supply_airflow_min_cfm = 3000
        min_outdoor_airflow_cfm = 2000
        supply_temp_f = 55
        return_temp_f = 75
        return_rh_pct = 50
        design_load_btuh = 300000
        design_outdoor_f = 95
        balance_point_f = 55
        controls = ["fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"]
        integrated = true
        high_limit_drybulb_f = 75
        high_limit_enthalpy_btu_lb = 28
        high_limit_dewpoint_f = 55

        [plant]
        heating_fuel = "gas"
        heating_efficiency = 0.85
        cooling_cop = [[65, 4.2], [95, 3.2], [110, 2.6]]
        fan_efficiency = 0.6
        price_gas_per_therm = 1.10
        price_electricity_per_kwh = 0.14
        carbon_gas_kg_per_therm = 5.3
        carbon_electricity_kg_per_kwh = 0.40

        """;
}
