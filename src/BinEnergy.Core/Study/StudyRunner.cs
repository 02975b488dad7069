using System.Reflection;
using System.Runtime.CompilerServices;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Schedules;
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
        var climates = cases.GroupBy(c => c.Climate.Name, StringComparer.Ordinal).Select((g, i) => (Index: i, Cases: g.ToList())).ToList();
        var results = new StudyCaseResult[climates.Count][];

        // The batch engine's pipeline: one climate per worker on every core; results put back in the study's order.
        Batch.BatchRunner.ForEachFile(climates, climate =>
        {
            var weather = ReadWeather(climate.Cases[0].Climate);
            return (climate.Index, Results: climate.Cases.Select(c =>
            {
                ct.ThrowIfCancellationRequested();
                return RunCase(c, weather, study.HeadlineMethod, keepHours);
            }).ToArray());
        }, done =>
        {
            results[done.Index] = done.Results;
            progress?.Report($"reading {climates[done.Index].Cases[0].Climate.Name}");
            foreach (var r in done.Results)
            {
                progress?.Report($"{r.Case.Climate.Name} / {r.Case.Variant.Name}");
            }
        }, ct: ct);

        return new StudyRunResult(study, [.. results.SelectMany(r => r)], EngineVersion);
    }

    /// <summary>Reads a climate's weather with its map, elevation override, gap policy and calendar year.</summary>
    /// <param name="climate">The climate.</param>
    /// <param name="maxBytes">The largest file, or decompressed gzip data, read (<see cref="Errors.InputFiles.DefaultMaxBytes"/> unless raised).</param>
    public static HourlyWeather ReadWeather(StudyClimate climate, long maxBytes = Errors.InputFiles.DefaultMaxBytes)
    {
        var options = new WeatherReadOptions
        {
            Map = climate.Map is null ? null : ColumnMap.Load(climate.Map),
            ElevationM = climate.ElevationM,
            AllowDroppingLongGaps = climate.DropLongGaps,
            CalendarYear = climate.CalendarYear ?? CalendarInfo.DefaultTypicalYear,
            HumidityOver = climate.HumidityOver,
            MaxBytes = maxBytes,
        };
        return WeatherReader.Read(climate.WeatherPath, options);
    }

    /// <summary>
    /// Runs one case on its weather: once for a typical year or a record within one calendar year; for a
    /// multi-year record, once per calendar year and once over the complete years, whose results divided by
    /// their number are the case's mean year (partial years are reported on their own, not mixed in).
    /// </summary>
    public static StudyCaseResult RunCase(StudyCase c, HourlyWeather weather, IntegrationMethod headline = IntegrationMethod.Hourly, bool keepHours = false)
    {
        var years = RecordYear.Of(weather);
        var warnings = new List<string>();
        OutdoorAirResult result;
        EconomizerEvaluation? economizer;
        List<CaseYear> perYear;
        IReadOnlyList<EnergyFigures>? hourly;
        if (years.Count == 1)
        {
            (result, economizer) = Evaluate(c, weather, keepHours);
            perYear = [new CaseYear(years[0], result, economizer)];
            hourly = result.Hours;
            if (!years[0].Complete)
            {
                warnings.Add(FormattableString.Invariant($"The record has {weather.Count:N0} hours, not a whole year: the annual figures are for these hours only."));
            }
        }
        else
        {
            perYear = [.. years.Select(y =>
            {
                var (r, e) = Evaluate(c, weather.Slice(y.Start, y.Hours), keepHours);
                return new CaseYear(y, r, e);
            })];
            hourly = keepHours ? [.. perYear.SelectMany(y => y.OutdoorAir.Hours!)] : null;
            var complete = years.Where(y => y.Complete).ToList();
            foreach (var y in years.Where(y => !y.Complete))
            {
                warnings.Add(FormattableString.Invariant($"{y.Label} has {y.Hours:N0} hours, not a whole year: it is reported on its own and left out of the mean year."));
            }

            if (complete.Count == 0)
            {
                (result, economizer) = Evaluate(c, weather, keepHours: false);
                warnings.Add("The record holds no complete calendar year: the case's figures are for all its hours, not a mean year.");
            }
            else
            {
                int from = complete[0].Start, to = complete[^1].Start + complete[^1].Hours;
                int span = years.Count(y => y.Start >= from && y.Start < to);
                var (all, e) = Evaluate(c, weather.Slice(from, to - from), keepHours: false);
                (result, economizer) = (all.PerYear(span), e?.PerYear(span));
            }
        }

        var flags = OfRecord(c, weather).Flags;
        warnings.InsertRange(0, result.Warnings);
        if (c.Plant is PlantSettings ps && result.Clamps.CoolingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The cooling COP was held at its end value for {result.Clamps.CoolingHours:0} cooling hours outside the points given ({Show(ps.CoolingCop.MinOutdoorC, c)} to {Show(ps.CoolingCop.MaxOutdoorC, c)}): add points to cover them."));
        }

        if (c.Plant?.CoolingCopByWetBulb is { } table && economizer?.CoolingClampHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The economizer's cooling COP table was held at its edges for {economizer.CoolingClampHours:0} coil hours outside it (outdoor {Show(table.OutdoorC[0], c)} to {Show(table.OutdoorC[^1], c)}, entering wet-bulb {Show(table.WetBulbC[0], c)} to {Show(table.WetBulbC[^1], c)}): add rows or columns to cover them."));
        }

        if (result.Clamps.HeatingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The heat-pump COP was held at its end value for {result.Clamps.HeatingHours:0} heating hours outside the points given: add points to cover them."));
        }

        if (weather.Quality.TotalRepairs > 0)
        {
            warnings.Add($"The weather file of {c.Climate.Name} had {weather.Quality.TotalRepairs} repaired values: {string.Join("; ", weather.Quality.Repairs.Select(kv => QualityKeys.Describe(kv.Key, kv.Value)))}; see binenergy inspect.");
        }

        warnings.AddRange(HeadlineCheck.Warnings(result, economizer, headline));
        return new StudyCaseResult
        {
            Case = c,
            Weather = weather,
            OutdoorAir = result,
            Economizer = economizer,
            Years = perYear,
            HourlyFigures = hourly,
            Occupied = flags,
            Warnings = warnings,
        };
    }

    /// <summary>The outdoor-air and economizer engines on one record.</summary>
    private static (OutdoorAirResult OutdoorAir, EconomizerEvaluation? Economizer) Evaluate(StudyCase c, HourlyWeather weather, bool keepHours)
    {
        var settings = c.OutdoorAir;
        var parts = OfRecord(c, weather);
        var (flags, table, cells) = (parts.Flags, parts.Table, parts.Cells);
        var plant = c.Plant is null ? null : new PlantModel(c.Plant);
        var result = OutdoorAirCalculator.Compute(weather, settings, table, cells, flags, plant, DesignConditions.FromRecord(weather), keepHours);
        if (c.Economizer is null)
        {
            return (result, null);
        }

        try
        {
            return (result, SharedEconomizer(c, parts, () => EconomizerEvaluation.Evaluate(weather, flags, table, cells, c.Economizer, plant)));
        }
        catch (EconomizerSettingsException e)
        {
            var p = e.Problems[0];
            throw new StudyFileException(c.Climate.Name, null, "economizer." + p.Key, p.Message);
        }
    }

    /// <summary>
    /// What a record gives every case with the same occupied hours and bin scale, built once per record: the flags, bin
    /// table and hour cells, and the economizer evaluations made on them so far (with the air system and plant of each).
    /// </summary>
    private sealed record RecordParts(OccupancySchedule Schedule, DryBulbBinScale Scale, bool[] Flags, BinTable Table, HourCells Cells)
    {
        public List<(EconomizerSettings System, PlantSettings? Plant, EconomizerEvaluation Evaluation)> Economizers { get; } = [];
    }

    /// <summary>The parts of each record already built, for the variants that share them (the record's columns do not change after it is built).</summary>
    private static readonly ConditionalWeakTable<HourlyWeather, List<RecordParts>> Parts = new();

    /// <summary>A case's occupancy flags, bin table and hour cells on a record: built once per record for every variant with the same hours and bins.</summary>
    private static RecordParts OfRecord(StudyCase c, HourlyWeather weather)
    {
        var schedule = c.OutdoorAir.Schedule;
        var list = Parts.GetValue(weather, _ => []);
        lock (list)
        {
            var parts = list.Find(p => p.Scale == c.BinScale && p.Schedule.SameHoursAs(schedule));
            if (parts is null)
            {
                var flags = schedule.Flags(weather);
                parts = new RecordParts(schedule, c.BinScale, flags, BinTable.Build(weather, c.BinScale, flags),
                    HourCells.Build(weather, c.BinScale, HumidityBinScale.Default(c.BinScale.Units)));
                list.Add(parts);
            }

            return parts;
        }
    }

    /// <summary>
    /// The economizer evaluation of a case on its record's parts: made once for all the variants with the same air system
    /// and plant on those parts (variants that change only the ventilation or the recovery, say), since it depends on
    /// nothing else.
    /// </summary>
    private static EconomizerEvaluation SharedEconomizer(StudyCase c, RecordParts parts, Func<EconomizerEvaluation> evaluate)
    {
        lock (parts.Economizers)
        {
            foreach (var (system, plant, evaluation) in parts.Economizers)
            {
                if (system.SameSystemAs(c.Economizer!) && (plant is null ? c.Plant is null : c.Plant is not null && plant.SamePlantAs(c.Plant)))
                {
                    return evaluation;
                }
            }

            var made = evaluate();
            parts.Economizers.Add((c.Economizer!, c.Plant, made));
            return made;
        }
    }

    private static string Show(double c, StudyCase sc) =>
        FormattableString.Invariant($"{Temperature.FromCelsius(c).In(sc.BinScale.Units):0.#} {(sc.BinScale.Units == UnitSystem.IP ? "F" : "C")}");
}
