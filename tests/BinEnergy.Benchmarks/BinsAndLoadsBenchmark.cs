using BenchmarkDotNet.Attributes;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Benchmarks;

/// <summary>
/// Bins plus outdoor-air loads for one station-year (8,760 hours), both methods (bin and
/// hourly), against the full read of the same station-year in the open layout measured in the
/// same run. Target: bins plus loads add no more than 1 ms to the read. The loads use an
/// office schedule, energy recovery with a frost limit and the site flow basis, so every
/// branch of the hourly loop runs; <see cref="BinsAndLoadsWithPeaks"/> adds the design
/// conditions (two sorts of the record) and the peak loads; <see cref="BinsAndLoadsWithDemandControl"/>
/// the same loads with demand-controlled ventilation (hourly airflow multipliers).
/// </summary>
[MemoryDiagnoser]
public class BinsAndLoadsBenchmark
{
    private byte[] openLayout = [];
    private HourlyWeather weather = null!;
    private OutdoorAirSettings settings = null!;
    private OutdoorAirSettings demandControlled = null!;
    private readonly DryBulbBinScale scale = DryBulbBinScale.Default(UnitSystem.IP);

    [GlobalSetup]
    public void Setup()
    {
        // The Chicago TMY3 check file, converted once to the open layout, as in WeatherReadBenchmark.
        openLayout = StationYear.ChicagoOpenLayout();
        weather = WeatherReader.Read(openLayout, "chicago-open-layout.csv");
        settings = new OutdoorAirSettings
        {
            Airflow = VolumeFlow.FromCfm(1000),
            HeatTo = Temperature.FromFahrenheit(70),
            CoolTo = Temperature.FromFahrenheit(75),
            MaxRelativeHumidity = 0.6,
            MinRelativeHumidity = 0.3,
            Schedule = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00"),
            Recovery = new EnergyRecoverySettings
            {
                SensibleEffectiveness = 0.75,
                LatentEffectiveness = 0.6,
                FrostLimit = Temperature.FromFahrenheit(10),
                FrostEffectiveness = 0.4,
                PressureDropPa = 200,
            },
        };

        // Invented office zone, 40 people x 5 cfm + 10,000 ft2 x 0.06 cfm/ft2, on an invented occupancy profile.
        var rate = VentilationRate.FromIp(40, 5, 10_000, 0.06);
        double[] occupancy = [0, 0, 0, 0, 0, 0, 0.1, 0.5, 1, 1, 1, 1, 0.5, 0.8, 1, 1, 1, 0.6, 0.2, 0, 0, 0, 0, 0];
        demandControlled = settings with { Airflow = null, Ventilation = rate, AirflowMultipliers = rate.DemandControlledMultipliers(occupancy) };
    }

    /// <summary>The full read into an hourly record (the baseline the target is stated against).</summary>
    [Benchmark(Baseline = true)]
    public HourlyWeather Read() => WeatherReader.Read(openLayout, "chicago-open-layout.csv");

    /// <summary>Occupancy flags, the bin table and the loads by both methods, on a record already read.</summary>
    [Benchmark]
    public OutdoorAirResult BinsAndLoads()
    {
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, scale, flags);
        return OutdoorAirCalculator.Compute(weather, settings, table, flags);
    }

    /// <summary>As <see cref="BinsAndLoads"/>, plus the record's design conditions and the peak loads at them.</summary>
    [Benchmark]
    public OutdoorAirResult BinsAndLoadsWithPeaks()
    {
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, scale, flags);
        return OutdoorAirCalculator.Compute(weather, settings, table, flags, null, DesignConditions.FromRecord(weather));
    }

    /// <summary>As <see cref="BinsAndLoads"/>, with demand-controlled ventilation (an airflow multiplier per hour of the day).</summary>
    [Benchmark]
    public OutdoorAirResult BinsAndLoadsWithDemandControl()
    {
        var flags = demandControlled.Schedule.Flags(weather);
        var table = BinTable.Build(weather, scale, flags);
        return OutdoorAirCalculator.Compute(weather, demandControlled, table, flags);
    }

    /// <summary>The read followed by bins and loads: what <c>binenergy outdoor-air</c> does before it prints.</summary>
    [Benchmark]
    public OutdoorAirResult ReadBinsAndLoads()
    {
        var record = WeatherReader.Read(openLayout, "chicago-open-layout.csv");
        var flags = settings.Schedule.Flags(record);
        var table = BinTable.Build(record, scale, flags);
        return OutdoorAirCalculator.Compute(record, settings, table, flags);
    }
}
