using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Loads;

/// <summary>
/// Annual, monthly and per-bin outdoor-air loads of a record by the three integration methods
/// (DESIGN 15), with the energy the plant buys for them: the hourly sum (each hour at its own
/// state), joint dry-bulb x humidity-ratio bins and the classic dry-bulb bin method, each bin
/// or cell evaluated with <see cref="OutdoorAirLoad"/> at its evaluation dry-bulb
/// (<see cref="OutdoorAirSettings.BinPoint"/>: the mean dry-bulb of its ventilated hours by
/// default, or its midpoint) and mean coincident humidity ratio, times its ventilated hours.
/// </summary>
/// <remarks>
/// <para>Mass flow of dry air m = rho_da V, rho_da from the flow basis (<see cref="FlowBasisDensity"/>):
/// constant for <c>standard</c> and <c>site</c>; for <c>actual</c>, the dry-air density of each
/// hour's outdoor state at that hour's pressure (hourly) or of the bin's evaluation state at the
/// site pressure (bins). The recovery device's fan penalty is P = 2 V dp / eta (both air streams),
/// charged in every ventilated hour unless the air bypasses an idle device; the ventilation fan's
/// power V x (specific fan power) is charged in every ventilated hour (both as fan energy).</para>
/// <para>One pass over the hours sums each hour's loads by month and by dry-bulb bin and the
/// statistics of each month x dry-bulb x humidity cell (<see cref="HourCells"/>); the bin methods
/// then merge cells: the classic bin method over month and humidity (per month: over humidity),
/// joint bins over month (per month: each cell). Plant energy depends on the outdoor temperature
/// through the COP curves, so it is bought where the temperature is known: at each hour's
/// dry-bulb (hourly) or each bin's or cell's evaluation dry-bulb.</para>
/// <para>With <see cref="OutdoorAirSettings.AirflowMultipliers"/> (e.g. demand-controlled
/// ventilation) each hour's volume flow, and with it the fan penalty, is the airflow times the
/// multiplier of the hour's clock hour. The loads are linear in the airflow, so the hourly method
/// scales each hour's loads; the bin methods use the mean multiplier over a bin's (or cell's)
/// ventilated hours. The design-day peaks stay at the full airflow (what the equipment must handle).</para>
/// </remarks>
public static class OutdoorAirCalculator
{
    /// <summary>
    /// Bins the record with the settings' schedule and computes the loads by the three methods
    /// (joint bins of <paramref name="humidityScale"/>, by default 10 gr/lb or 1 g/kg), with the
    /// peaks at the record's own design conditions; no plant.
    /// </summary>
    /// <exception cref="ArgumentException">The settings have problems (<see cref="OutdoorAirSettings.Problems"/>).</exception>
    public static OutdoorAirResult Compute(HourlyWeather weather, OutdoorAirSettings settings, DryBulbBinScale binScale,
        HumidityBinScale? humidityScale = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(settings);
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, binScale, flags);
        var cells = HourCells.Build(weather, binScale, humidityScale ?? HumidityBinScale.Default(binScale.Units));
        var design = weather.Count > 0 ? DesignConditions.FromRecord(weather) : null;
        return Compute(weather, settings, table, cells, flags, null, design);
    }

    /// <summary>
    /// Computes the loads on a bin table of the record (built with the occupancy flags
    /// <paramref name="occupied"/>), with joint bins of the default humidity width (10 gr/lb or 1 g/kg).
    /// </summary>
    /// <exception cref="ArgumentException">The settings have problems, or the flags do not match the record.</exception>
    public static OutdoorAirResult Compute(HourlyWeather weather, OutdoorAirSettings settings, BinTable table, bool[] occupied,
        PlantModel? plant = null, DesignConditions? design = null, bool keepHours = false)
    {
        ArgumentNullException.ThrowIfNull(table);
        var cells = HourCells.Build(weather, table.Scale, HumidityBinScale.Default(table.Scale.Units));
        return Compute(weather, settings, table, cells, occupied, plant, design, keepHours);
    }

    /// <summary>
    /// Computes the loads on a bin table and hour cells of the record (built with the same
    /// occupancy flags <paramref name="occupied"/>, one per hour); energy bought through
    /// <paramref name="plant"/> when given; peaks only when <paramref name="design"/> is given;
    /// each hour's figures in <see cref="OutdoorAirResult.Hours"/> when <paramref name="keepHours"/> is set.
    /// </summary>
    /// <exception cref="ArgumentException">The settings have problems, or the flags or cells do not match the record.</exception>
    public static OutdoorAirResult Compute(HourlyWeather weather, OutdoorAirSettings settings, BinTable table, HourCells cells, bool[] occupied,
        PlantModel? plant = null, DesignConditions? design = null, bool keepHours = false)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(cells);
        var problems = settings.Problems();
        if (problems.Count > 0)
        {
            throw new ArgumentException("outdoor-air settings: " + string.Join("; ", problems), nameof(settings));
        }

        BinTable.CheckFlags(weather, occupied);
        if (cells.CellOfHour.Length != weather.Count || cells.DryBulbBins != table.Rows.Count || cells.FirstDryBulbIndex != table.FirstIndex)
        {
            throw new ArgumentException("the hour cells were not built from this record with the bin table's scale", nameof(cells));
        }

        var engine = new Engine(weather, settings, plant);
        var hourly = engine.SumHours(occupied, cells, keepHours);
        var bins = engine.BinRows(table, cells, hourly);
        var months = engine.Months(cells, hourly);
        var annual = new ByMethod<EnergyFigures>(Sum(bins, m => m.Hourly), Sum(bins, m => m.JointBin), Sum(bins, m => m.Bin));
        return new OutdoorAirResult
        {
            Annual = annual,
            Bins = bins,
            Months = months,
            Hours = hourly.Hours,
            HasPlant = plant is not null,
            Peaks = design is null ? null : DesignPeakLoads.Compute(weather, settings, design),
            Design = design,
            Assumptions = engine.Assumptions(table.Scale, cells.HumidityScale, hourly.DensitySum, annual.Hourly.Loads.HoursVentilated),
            Warnings = Warnings(weather, settings, (int)annual.Hourly.Loads.HoursVentilated),
            Clamps = hourly.Clamps,
        };
    }

    private static EnergyFigures Sum(IReadOnlyList<OutdoorAirBinRow> rows, Func<ByMethod<EnergyFigures>, EnergyFigures> pick)
    {
        var sum = EnergyFigures.Zero;
        foreach (var r in rows)
        {
            sum += pick(r.Figures);
        }

        return sum;
    }

    private static List<string> Warnings(HourlyWeather weather, OutdoorAirSettings settings, int hoursVentilated)
    {
        var warnings = new List<string>();
        if (settings.Airflow is VolumeFlow given && settings.Ventilation is VentilationRate rate
            && given.CubicMetresPerSecond < rate.OutdoorAirflow.CubicMetresPerSecond * (1 - 1e-9))
        {
            warnings.Add(FormattableString.Invariant(
                $"The airflow {given.Cfm:0} cfm ({given.LitresPerSecond:0} L/s) is below the people-and-area minimum you entered, {rate.OutdoorAirflow.Cfm:0} cfm ({rate.OutdoorAirflow.LitresPerSecond:0} L/s). Too little outdoor air harms occupants: the ventilation rate must meet the locally adopted code and the judgement of the responsible licensed engineer."));
        }

        if (settings.EffectiveAirflow.CubicMetresPerSecond == 0)
        {
            warnings.Add("The outdoor airflow is zero, so every load is zero. An occupied building needs the outdoor air its ventilation code requires; too little outdoor air harms occupants.");
        }

        if (hoursVentilated == 0)
        {
            warnings.Add("No hour is ventilated: the occupancy schedule has no occupied hour in this record, so every load is zero.");
        }

        if (weather.Site.PressureSource == SitePressureSource.SeaLevelAssumed)
        {
            warnings.Add("The site pressure is the sea-level standard (no elevation or pressure in the weather file): at altitude the site flow basis overstates the loads; give the elevation.");
        }

        return warnings;
    }

    /// <summary>What one pass over the hours summed.</summary>
    private sealed class HourlySums(int bins, int cells)
    {
        public EnergyFigures[] ByBin { get; } = new EnergyFigures[bins];

        public EnergyFigures[] ByMonth { get; } = new EnergyFigures[12];

        public CellStatistics[] Cells { get; } = new CellStatistics[cells];

        public EnergyFigures[]? Hours { get; set; }

        public double DensitySum { get; set; }

        public CurveClampCounter Clamps { get; } = new();
    }

    /// <summary>The hours' loads and the fuels bought for them, unpriced, of a bin or a month: priced once when the hours are in.</summary>
    private struct UnpricedSum
    {
        public LoadVector Loads;
        public PlantFuels Fuels;

        public readonly EnergyFigures Priced(PlantModel? plant) => new(Loads, plant?.Price(in Fuels) ?? PlantEnergy.Zero);
    }

    /// <summary>The settings resolved once for a run: the load model, the flow and fan model and the plant.</summary>
    private sealed class Engine
    {
        private readonly HourlyWeather weather;
        private readonly OutdoorAirSettings settings;
        private readonly OutdoorAirLoad load;
        private readonly PlantModel? plant;
        private readonly double sitePressure;
        private readonly double volume;
        private readonly double constantDensity;
        private readonly double fanPowerW;
        private readonly double ventilationFanW;
        private readonly bool bypassWhenIdle;
        private readonly bool always;
        private readonly double[] multiplierByHour = new double[24];
        private readonly CurveClampCounter binClamps = new();

        public Engine(HourlyWeather weather, OutdoorAirSettings settings, PlantModel? plant)
        {
            this.weather = weather;
            this.settings = settings;
            this.plant = plant;
            sitePressure = weather.Site.SitePressurePa;
            load = new OutdoorAirLoad(settings, sitePressure);
            volume = settings.EffectiveAirflow.CubicMetresPerSecond;
            constantDensity = settings.FlowBasis == FlowBasis.Actual ? double.NaN : FlowBasisDensity.For(settings.FlowBasis, sitePressure, 0, 0, sitePressure);
            var r = settings.Recovery;
            fanPowerW = r is null ? 0.0 : 2.0 * volume * r.PressureDropPa / r.FanEfficiency;
            ventilationFanW = volume * settings.VentilationFanWattsPerCubicMetrePerSecond;
            bypassWhenIdle = r?.BypassWhenIdle ?? false;
            always = settings.Operation == VentilationOperation.Always;
            for (int h = 0; h < 24; h++)
            {
                multiplierByHour[h] = settings.AirflowMultiplier(h);
            }
        }

        private double Density(double t, double w, double p) =>
            settings.FlowBasis == FlowBasis.Actual ? MoistAir.DryAirDensity(t, w, p) : constantDensity;

        /// <summary>The loads of <paramref name="hours"/> hours at one outdoor state, density and airflow multiplier.</summary>
        private LoadVector Loads(double t, double w, double rho, double multiplier, double hours)
        {
            var perKg = load.Evaluate(t, w, out bool recovering);
            double seconds = 3600.0 * hours;
            var loads = perKg.Scaled(rho * volume * multiplier * seconds);
            loads.Add(LoadFigure.FanEnergy, (ventilationFanW + (bypassWhenIdle && !recovering ? 0.0 : fanPowerW)) * multiplier * seconds);
            loads.AddHours(hours);
            return loads;
        }

        /// <summary>
        /// The hourly method: every ventilated hour into its month and bin, and the cells' statistics. Each hour's
        /// purchases are summed as joules per fuel and each bin's and month's sum priced once.
        /// </summary>
        public HourlySums SumHours(bool[] occupied, HourCells cells, bool keepHours)
        {
            var sums = new HourlySums(cells.DryBulbBins, cells.Count) { Hours = keepHours ? new EnergyFigures[weather.Count] : null };
            var byBin = new UnpricedSum[cells.DryBulbBins];
            var byMonth = new UnpricedSum[12];
            var t = weather.DryBulbC;
            var w = weather.HumidityRatio;
            var p = weather.PressurePa;
            var times = weather.Times;
            var clock = settings.AirflowMultipliers is null ? times : settings.Schedule.ClockTimes(weather); // occupancy follows the clock
            var cellOf = cells.CellOfHour;
            var binOf = cells.DryBulbBinOfCell;
            double densitySum = 0;
            for (int i = 0; i < t.Length; i++)
            {
                if (!always && !occupied[i])
                {
                    continue;
                }

                double rho = Density(t[i], w[i], p[i]);
                densitySum += rho;
                double f = multiplierByHour[clock[i].Hour];
                var loads = Loads(t[i], w[i], rho, f, 1.0);
                var fuels = default(PlantFuels);
                plant?.AddFuels(in loads, t[i], sums.Clamps, ref fuels);
                int c = cellOf[i];
                ref var bin = ref byBin[binOf[c]];
                ref var month = ref byMonth[times[i].Month - 1];
                bin.Loads.Add(in loads);
                bin.Fuels.Add(in fuels);
                month.Loads.Add(in loads);
                month.Fuels.Add(in fuels);
                sums.Cells[c].Add(t[i], w[i], f);
                if (sums.Hours is not null)
                {
                    sums.Hours[i] = new EnergyFigures(loads, plant?.Price(in fuels) ?? PlantEnergy.Zero);
                }
            }

            for (int b = 0; b < byBin.Length; b++)
            {
                sums.ByBin[b] = byBin[b].Priced(plant);
            }

            for (int m = 0; m < 12; m++)
            {
                sums.ByMonth[m] = byMonth[m].Priced(plant);
            }

            sums.DensitySum = densitySum;
            return sums;
        }

        /// <summary>A bin or cell by a bin method: at its evaluation dry-bulb and mean humidity ratio, times its hours.</summary>
        private EnergyFigures Evaluate(in CellStatistics stats, Temperature mid)
        {
            var sum = default(UnpricedSum);
            AddEvaluated(in stats, mid, ref sum);
            return sum.Priced(plant);
        }

        /// <summary>Adds a bin's or cell's figures by a bin method to <paramref name="sum"/>, unpriced (sums of cells are priced once).</summary>
        private void AddEvaluated(in CellStatistics stats, Temperature mid, ref UnpricedSum sum)
        {
            if (stats.Hours <= 0)
            {
                return;
            }

            double t = BinEvaluation.DryBulbC(settings.BinPoint, mid, stats);
            double w = stats.MeanHumidityRatio;
            var loads = Loads(t, w, Density(t, w, sitePressure), stats.MeanWeight, stats.Hours);
            sum.Loads.Add(in loads);
            plant?.AddFuels(in loads, t, binClamps, ref sum.Fuels);
        }

        /// <summary>Per dry-bulb bin: the hourly sum of its hours, joint bins (its cells merged over month) and the bin method.</summary>
        public List<OutdoorAirBinRow> BinRows(BinTable table, HourCells cells, HourlySums hourly)
        {
            int nb = cells.DryBulbBins;
            int nj = cells.HumidityBins;
            var (binStats, jointStats) = cells.Merge(hourly.Cells);

            var rows = new List<OutdoorAirBinRow>(nb);
            for (int b = 0; b < nb; b++)
            {
                var row = table.Rows[b];
                var joint = default(UnpricedSum);
                for (int j = 0; j < nj; j++)
                {
                    AddEvaluated(jointStats[b * nj + j], row.Mid, ref joint);
                }

                var stats = binStats[b];
                rows.Add(new OutdoorAirBinRow(row, (int)stats.Hours, HumidityRatio.FromKilogramsPerKilogram(stats.MeanHumidityRatio),
                    Temperature.FromCelsius(BinEvaluation.DryBulbC(settings.BinPoint, row.Mid, stats)),
                    new ByMethod<EnergyFigures>(hourly.ByBin[b], joint.Priced(plant), Evaluate(stats, row.Mid))));
            }

            return rows;
        }

        /// <summary>Per calendar month with ventilated hours: the hourly sum, joint bins (each cell) and the bin method (the month's bins).</summary>
        public List<OutdoorAirMonth> Months(HourCells cells, HourlySums hourly)
        {
            int nb = cells.DryBulbBins;
            var monthBins = new CellStatistics[12 * nb];
            var joint = new UnpricedSum[12];
            for (int c = 0; c < cells.Count; c++)
            {
                int m = cells.MonthOfCell[c];
                int b = cells.DryBulbBinOfCell[c];
                monthBins[m * nb + b].Add(hourly.Cells[c]);
                AddEvaluated(hourly.Cells[c], cells.DryBulbScale.Mid(cells.FirstDryBulbIndex + b), ref joint[m]);
            }

            var months = new List<OutdoorAirMonth>();
            for (int m = 0; m < 12; m++)
            {
                if (hourly.ByMonth[m].Loads.HoursVentilated <= 0)
                {
                    continue;
                }

                var bin = default(UnpricedSum);
                for (int b = 0; b < nb; b++)
                {
                    AddEvaluated(monthBins[m * nb + b], cells.DryBulbScale.Mid(cells.FirstDryBulbIndex + b), ref bin);
                }

                months.Add(new OutdoorAirMonth(m + 1, new ByMethod<EnergyFigures>(hourly.ByMonth[m], joint[m].Priced(plant), bin.Priced(plant))));
            }

            return months;
        }

        public OutdoorAirAssumptions Assumptions(DryBulbBinScale scale, HumidityBinScale humidity, double densitySum, double hoursVentilated)
        {
            double density = settings.FlowBasis == FlowBasis.Actual
                ? (hoursVentilated > 0 ? densitySum / hoursVentilated : FlowBasisDensity.Site(sitePressure))
                : constantDensity;
            return new OutdoorAirAssumptions(
                Airflow: settings.EffectiveAirflow,
                FlowBasis: settings.FlowBasis,
                DryAirDensity: density,
                Factors: AirflowFactors.For(density, 0.0),
                SitePressure: Pressure.FromPascals(sitePressure),
                HeatTo: settings.HeatTo,
                CoolTo: settings.CoolTo,
                MaxRelativeHumidity: settings.MaxRelativeHumidity,
                MinRelativeHumidity: settings.MinRelativeHumidity,
                MaxHumidityRatio: load.MaxHumidityRatio,
                MinHumidityRatio: load.MinHumidityRatio,
                Operation: settings.Operation,
                Schedule: always ? "always (ventilation runs every hour)" : settings.Schedule.Text,
                BinScale: scale,
                BinPoint: settings.BinPoint,
                Recovery: settings.Recovery,
                FanPenalty: Power.FromWatts(fanPowerW),
                Calendar: weather.Calendar.Note)
            {
                VentilationFanPower = Power.FromWatts(ventilationFanW),
                HumidityScale = humidity,
                DaylightSaving = settings.Schedule.DaylightSaving,
            };
        }
    }
}
