using System.Reflection;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// Runs a study: reads each climate's weather once, then for every variant calls the engines the
/// single commands use (<see cref="OutdoorAirCalculator"/> for the loads and the energy the plant
/// buys, <see cref="EconomizerEvaluation"/> for the air system), all by the three methods.
/// </summary>
public static class StudyRunner
{
    /// <summary>The engine version written into every output.</summary>
    public static string EngineVersion { get; } =
        typeof(StudyRunner).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0.0.0";

    /// <summary>Runs every climate x variant of <paramref name="study"/>.</summary>
    /// <param name="study">The study.</param>
    /// <param name="keepHours">Keep per-hour figures (for the <c>hourly</c> table).</param>
    /// <param name="progress">Told the name of each step as it starts (climate, then climate / variant).</param>
    /// <param name="ct">Cancels between cases.</param>
    public static StudyRunResult Run(StudyDefinition study, bool keepHours = false, IProgress<string>? progress = null, CancellationToken ct = default)
    {
        var cases = StudyCaseBuilder.Build(study);
        var results = new List<StudyCaseResult>();
        foreach (var climateCases in cases.GroupBy(c => c.Climate.Name, StringComparer.Ordinal))
        {
            ct.ThrowIfCancellationRequested();
            var climate = climateCases.First().Climate;
            progress?.Report($"reading {climate.Name}");
            var weather = ReadWeather(climate);
            foreach (var c in climateCases)
            {
                ct.ThrowIfCancellationRequested();
                progress?.Report($"{c.Climate.Name} / {c.Variant.Name}");
                results.Add(RunCase(c, weather, study.HeadlineMethod, keepHours));
            }
        }

        return new StudyRunResult(study, results, EngineVersion);
    }

    /// <summary>Reads a climate's weather with its map, elevation override, gap policy and calendar year.</summary>
    public static HourlyWeather ReadWeather(StudyClimate climate)
    {
        var options = new WeatherReadOptions
        {
            Map = climate.Map is null ? null : ColumnMap.Load(climate.Map),
            ElevationM = climate.ElevationM,
            AllowDroppingLongGaps = climate.DropLongGaps,
            CalendarYear = climate.CalendarYear ?? CalendarInfo.DefaultTypicalYear,
        };
        return WeatherReader.Read(climate.WeatherPath, options);
    }

    /// <summary>Runs one case on its weather.</summary>
    public static StudyCaseResult RunCase(StudyCase c, HourlyWeather weather, IntegrationMethod headline = IntegrationMethod.Hourly, bool keepHours = false)
    {
        var settings = c.OutdoorAir;
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, c.BinScale, flags);
        var cells = HourCells.Build(weather, c.BinScale, HumidityBinScale.Default(c.BinScale.Units));
        var plant = c.Plant is null ? null : new PlantModel(c.Plant);
        var result = OutdoorAirCalculator.Compute(weather, settings, table, cells, flags, plant, DesignConditions.FromRecord(weather), keepHours);

        EconomizerEvaluation? economizer = null;
        if (c.Economizer is not null)
        {
            try
            {
                economizer = EconomizerEvaluation.Evaluate(weather, flags, table, cells, c.Economizer, plant);
            }
            catch (EconomizerSettingsException e)
            {
                var p = e.Problems[0];
                throw new StudyFileException(c.Climate.Name, null, "economizer." + p.Key, p.Message);
            }
        }

        var warnings = new List<string>(result.Warnings);
        if (c.Plant is PlantSettings ps && result.Clamps.CoolingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The cooling COP was held at its end value for {result.Clamps.CoolingHours:0} cooling hours outside the points given ({Show(ps.CoolingCop.MinOutdoorC, c)} to {Show(ps.CoolingCop.MaxOutdoorC, c)}): add points to cover them."));
        }

        if (result.Clamps.HeatingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The heat-pump COP was held at its end value for {result.Clamps.HeatingHours:0} heating hours outside the points given: add points to cover them."));
        }

        if (weather.Quality.TotalRepairs > 0)
        {
            warnings.Add($"The weather file of {c.Climate.Name} had {weather.Quality.TotalRepairs} repaired values ({string.Join(", ", weather.Quality.Repairs.Select(kv => $"{kv.Key} {kv.Value}"))}); see binenergy inspect.");
        }

        warnings.AddRange(HeadlineCheck.Warnings(result, economizer, headline));
        return new StudyCaseResult
        {
            Case = c,
            Weather = weather,
            OutdoorAir = result,
            Economizer = economizer,
            Occupied = flags,
            Warnings = warnings,
        };
    }

    private static string Show(double c, StudyCase sc) =>
        FormattableString.Invariant($"{Temperature.FromCelsius(c).In(sc.BinScale.Units):0.#} {(sc.BinScale.Units == UnitSystem.IP ? "F" : "C")}");
}
