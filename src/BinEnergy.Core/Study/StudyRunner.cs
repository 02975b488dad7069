using System.Reflection;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Study.Results;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// Runs a study: reads each climate's weather once, then for every variant calls the same
/// engines the single commands use (<see cref="OutdoorAirCalculator"/> for the loads, the
/// economizer evaluation for the air system) and turns their loads into energy bought,
/// cost and carbon through the <see cref="PlantModel"/>.
/// </summary>
/// <remarks>
/// Plant energy depends on the outdoor temperature through the COP curves, so it is computed
/// where the temperature is known: for the bin method at each bin's evaluation point with the
/// bin's loads; for the hourly method hour by hour, with each hour's loads as the calculator
/// computed them (<see cref="OutdoorAirResult.Hours"/>): one engine for both.
/// </remarks>
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
        var weatherByClimate = new Dictionary<string, HourlyWeather>(StringComparer.Ordinal);
        var results = new List<StudyCaseResult>();
        foreach (var c in cases)
        {
            ct.ThrowIfCancellationRequested();
            if (!weatherByClimate.TryGetValue(c.Climate.Name, out var weather))
            {
                progress?.Report($"reading {c.Climate.Name}");
                weather = ReadWeather(c.Climate);
                weatherByClimate[c.Climate.Name] = weather;
            }

            progress?.Report($"{c.Climate.Name} / {c.Variant.Name}");
            results.Add(RunCase(c, weather, keepHours));
        }

        return new StudyRunResult(study, results, EngineVersion);
    }

    /// <summary>Reads a climate's weather with its map and elevation override.</summary>
    public static HourlyWeather ReadWeather(StudyClimate climate)
    {
        var options = new WeatherReadOptions
        {
            Map = climate.Map is null ? null : ColumnMap.Load(climate.Map),
            ElevationM = climate.ElevationM,
        };
        return WeatherReader.Read(climate.WeatherPath, options);
    }

    /// <summary>Runs one case on its weather.</summary>
    public static StudyCaseResult RunCase(StudyCase c, HourlyWeather weather, bool keepHours = false)
    {
        var settings = c.OutdoorAir;
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, c.BinScale, flags);
        var result = OutdoorAirCalculator.Compute(weather, settings, table, flags, design: DesignConditions.FromRecord(weather), keepHours: true);
        var plant = new PlantModel(c.Plant);
        var clamps = new CurveClampCounter();

        // Bin method: each bin's loads, and the plant's COP, at the bin's evaluation point.
        var bins = new List<BinFigures>();
        var annualBin = Zero;
        foreach (var row in result.Bins)
        {
            var figures = Figures(row.BinMethod, plant, row.EvaluatedAt.Celsius, clamps);
            annualBin = Add(annualBin, figures);
            var all = row.Bin.All;
            bins.Add(new BinFigures(row.Bin.Low.Celsius, row.Bin.High.Celsius, row.Bin.Mid.Celsius, row.EvaluatedAt.Celsius, all.Hours, row.Bin.Occupied.Hours,
                all.IsEmpty ? double.NaN : all.MeanHumidityRatio.KilogramsPerKilogram,
                all.IsEmpty ? double.NaN : all.MeanWetBulb.Celsius, figures));
        }

        // Hourly method: each hour's loads from the outdoor-air engine, bought at that hour's outdoor temperature.
        var hourlyClamps = new CurveClampCounter();
        var (hourlySums, monthSums, hours) = HourByHour(result.Hours!, weather, plant, hourlyClamps, keepHours);

        // The load columns are the engine's own totals (bit for bit what the outdoor-air command
        // reports); the energy bought is summed where the temperature was known.
        annualBin = WithLoads(annualBin, result.Bin);
        var annualHourly = WithLoads(hourlySums, result.Hourly);
        var months = monthSums.Select(m => (m.Month, WithLoads(m.Figures, result.Months.Single(x => x.Month == m.Month).Totals))).ToList();

        EconomizerEvaluation? evaluation;
        List<EconomizerFigures> economizer;
        try
        {
            (evaluation, economizer) = StudyEconomizer.Evaluate(c, weather, flags, table, plant, hourlyClamps);
        }
        catch (EconomizerSettingsException e)
        {
            var p = e.Problems[0];
            throw new StudyFileException(c.Climate.Name, null, "economizer." + p.Key, p.Message);
        }

        var warnings = new List<string>(result.Warnings);
        if (clamps.CoolingHours > 0 || hourlyClamps.CoolingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The cooling COP was held at its end value for {hourlyClamps.CoolingHours:0} cooling hours outside the points given ({Show(c.Plant.CoolingCop.MinOutdoorC, c)} to {Show(c.Plant.CoolingCop.MaxOutdoorC, c)}): add points to cover them."));
        }

        if (clamps.HeatingHours > 0 || hourlyClamps.HeatingHours > 0)
        {
            warnings.Add(FormattableString.Invariant(
                $"The heat-pump COP was held at its end value for {hourlyClamps.HeatingHours:0} heating hours outside the points given: add points to cover them."));
        }

        if (weather.Quality.TotalRepairs > 0)
        {
            warnings.Add($"The weather file of {c.Climate.Name} had {weather.Quality.TotalRepairs} repaired values ({string.Join(", ", weather.Quality.Repairs.Select(kv => $"{kv.Key} {kv.Value}"))}); see binenergy inspect.");
        }

        return new StudyCaseResult
        {
            Case = c,
            Weather = weather,
            OutdoorAir = result,
            AnnualBin = annualBin,
            AnnualHourly = annualHourly,
            Months = months,
            Bins = bins,
            Hours = hours,
            Occupied = flags,
            Economizer = economizer,
            EconomizerEvaluation = evaluation,
            Peaks = Peaks(result.Peaks),
            Clamps = hourlyClamps,
            Warnings = warnings,
        };
    }

    /// <summary>The outdoor-air engine's peaks at the design conditions, as table rows (heating: sensible = heating, latent = humidification).</summary>
    private static List<PeakFigures> Peaks(OutdoorAirPeaks? peaks)
    {
        if (peaks is null)
        {
            return [];
        }

        PeakFigures Row(string name, OutdoorAirPeak p, bool heating)
        {
            double sensible = heating ? p.Loads.Heating.Watts : p.Loads.CoolingSensible.Watts;
            double latent = heating ? p.Loads.Humidification.Watts : p.Loads.CoolingLatent.Watts;
            double without = heating ? p.WithoutRecovery.Heating.Watts + p.WithoutRecovery.Humidification.Watts : p.WithoutRecovery.Cooling.Watts;
            return new PeakFigures(name, p.DryBulb.Celsius, p.WetBulb.Celsius, p.DewPoint.Celsius, p.HumidityRatio.KilogramsPerKilogram,
                sensible, latent, sensible + latent, without);
        }

        return [Row("heating_99_6", peaks.Heating, true), Row("cooling_0_4", peaks.Cooling, false), Row("dehumidification_0_4", peaks.Dehumidification, false)];
    }

    private static string Show(double c, StudyCase sc) =>
        FormattableString.Invariant($"{Temperature.FromCelsius(c).In(sc.BinScale.Units):0.#} {(sc.BinScale.Units == UnitSystem.IP ? "F" : "C")}");

    private static LoadFigures Zero { get; } = new(0, 0, 0, 0, 0, 0, 0, 0, SiteEnergy.Zero, SiteEnergy.Zero, SiteEnergy.Zero);

    private static LoadFigures Figures(OutdoorAirTotals t, PlantModel plant, double outdoorC, CurveClampCounter clamps)
    {
        var heating = plant.Heating(t.Heating.Joules, outdoorC, t.HoursVentilated, clamps);
        var cooling = plant.Cooling(t.Cooling.Joules, outdoorC, t.HoursVentilated, clamps);
        var other = plant.Humidification(t.Humidification.Joules) + plant.Electricity(t.FanEnergy.Joules);
        return new LoadFigures(t.HoursVentilated, t.Heating.Joules, t.CoolingSensible.Joules, t.CoolingLatent.Joules, t.Humidification.Joules,
            t.RecoveredHeating.Joules, t.RecoveredCooling.Joules, t.FanEnergy.Joules, heating, cooling, other);
    }

    private static LoadFigures WithLoads(LoadFigures f, OutdoorAirTotals t) => f with
    {
        HoursVentilated = t.HoursVentilated,
        HeatingJ = t.Heating.Joules,
        CoolingSensibleJ = t.CoolingSensible.Joules,
        CoolingLatentJ = t.CoolingLatent.Joules,
        HumidificationJ = t.Humidification.Joules,
        RecoveredHeatingJ = t.RecoveredHeating.Joules,
        RecoveredCoolingJ = t.RecoveredCooling.Joules,
        FanJ = t.FanEnergy.Joules,
    };

    private static LoadFigures Add(LoadFigures a, LoadFigures b) => new(
        a.HoursVentilated + b.HoursVentilated, a.HeatingJ + b.HeatingJ, a.CoolingSensibleJ + b.CoolingSensibleJ, a.CoolingLatentJ + b.CoolingLatentJ,
        a.HumidificationJ + b.HumidificationJ, a.RecoveredHeatingJ + b.RecoveredHeatingJ, a.RecoveredCoolingJ + b.RecoveredCoolingJ, a.FanJ + b.FanJ,
        a.HeatingSite + b.HeatingSite, a.CoolingSite + b.CoolingSite, a.OtherSite + b.OtherSite);

    private static (LoadFigures Annual, List<(int Month, LoadFigures Figures)> Months, List<LoadFigures>? Hours) HourByHour(
        IReadOnlyList<OutdoorAirTotals?> loads, HourlyWeather weather, PlantModel plant, CurveClampCounter clamps, bool keepHours)
    {
        var monthSums = new LoadFigures[12];
        Array.Fill(monthSums, Zero);
        var hours = keepHours ? new List<LoadFigures>(weather.Count) : null;
        var annual = Zero;
        for (int i = 0; i < weather.Count; i++)
        {
            if (loads[i] is not OutdoorAirTotals hour)
            {
                hours?.Add(Zero);
                continue;
            }

            var figures = Figures(hour, plant, weather.DryBulbC[i], clamps);
            annual = Add(annual, figures);
            int m = weather.Times[i].Month - 1;
            monthSums[m] = Add(monthSums[m], figures);
            hours?.Add(figures);
        }

        var months = new List<(int Month, LoadFigures Figures)>();
        for (int m = 0; m < 12; m++)
        {
            if (monthSums[m].HoursVentilated > 0)
            {
                months.Add((m + 1, monthSums[m]));
            }
        }

        return (annual, months, hours);
    }
}
