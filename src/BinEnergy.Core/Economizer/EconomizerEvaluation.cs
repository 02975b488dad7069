using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// Every chosen economizer control side by side with the baseline over one weather record
/// (DESIGN 8), by the three integration methods (DESIGN 15): the hourly sum over the occupied
/// hours, joint dry-bulb x humidity-ratio bins and the classic dry-bulb bins, each bin or cell at
/// its evaluation point (<see cref="EconomizerSettings.BinPoint"/>) and the mean coincident
/// humidity ratio of its occupied hours. Per control: hours per mode, coil sensible, latent and
/// total energy, compressor energy through the plant's cooling COP (when a plant is given),
/// savings against the baseline by the same method (negative savings are kept), per-bin and
/// per-month breakdowns.
/// </summary>
/// <remarks>
/// The system runs in occupied hours only; unoccupied hours are not counted in any mode.
/// The hourly loop reads the record's column arrays and allocates nothing per hour.
/// </remarks>
public sealed class EconomizerEvaluation
{
    private EconomizerEvaluation(
        EconomizerModel model,
        HourlyWeather weather,
        int occupiedHours,
        IReadOnlyList<EconomizerBinRow> bins,
        EconomizerControlResult baseline,
        IReadOnlyList<EconomizerControlResult> controls,
        bool hasPlant)
    {
        Model = model;
        Weather = weather;
        OccupiedHours = occupiedHours;
        Bins = bins;
        Baseline = baseline;
        Controls = controls;
        HasPlant = hasPlant;
    }

    /// <summary>The model (settings and the derived indoor states).</summary>
    public EconomizerModel Model { get; }

    public EconomizerSettings Settings => Model.Settings;

    /// <summary>The weather record evaluated.</summary>
    public HourlyWeather Weather { get; }

    /// <summary>Occupied hours of the record (the hours of the four modes sum to this for every control).</summary>
    public int OccupiedHours { get; }

    /// <summary>The dry-bulb bins, ascending.</summary>
    public IReadOnlyList<EconomizerBinRow> Bins { get; }

    /// <summary>The baseline: the same system without an economizer.</summary>
    public EconomizerControlResult Baseline { get; }

    /// <summary>The controls, in the order of <see cref="EconomizerSettings.Controls"/>.</summary>
    public IReadOnlyList<EconomizerControlResult> Controls { get; }

    /// <summary>The baseline, then the controls.</summary>
    public IEnumerable<EconomizerControlResult> BaselineAndControls => Controls.Prepend(Baseline);

    /// <summary>True when compressor energy was bought through a plant.</summary>
    public bool HasPlant { get; }

    /// <summary>
    /// Occupied hours (hourly sum, baseline) in which the plant's cooling COP, outdoor curve or wet-bulb
    /// table, was held at its end value outside the points given.
    /// </summary>
    public double CoolingClampHours { get; private init; }

    /// <summary>How many complete years the figures are the mean of (1 for a single or typical year).</summary>
    public int YearsAveraged { get; private init; } = 1;

    /// <summary>The mean year of an evaluation over <paramref name="years"/> complete years: hours and energies divided by it.</summary>
    public EconomizerEvaluation PerYear(int years)
    {
        if (years <= 1)
        {
            return this;
        }

        double f = 1.0 / years;
        var bins = Bins.Select(b => b with { OccupiedHours = (int)Math.Round(b.OccupiedHours * f) }).ToList();
        return new EconomizerEvaluation(Model, Weather, (int)Math.Round(OccupiedHours * f), bins, Baseline.Scaled(f), [.. Controls.Select(c => c.Scaled(f))], HasPlant)
        {
            YearsAveraged = years,
            CoolingClampHours = CoolingClampHours * f,
        };
    }

    /// <summary>The control with the largest savings by <paramref name="method"/> (ties: the first listed).</summary>
    public EconomizerControlResult Best(IntegrationMethod method = IntegrationMethod.Hourly) =>
        Controls.Aggregate((a, b) => b.Savings(method).Joules > a.Savings(method).Joules ? b : a);

    /// <summary>
    /// Evaluates every control of <paramref name="settings"/> and the baseline over a record, with
    /// joint bins of the default humidity width (10 gr/lb or 1 g/kg).
    /// </summary>
    /// <exception cref="EconomizerSettingsException">The settings describe no workable system.</exception>
    public static EconomizerEvaluation Evaluate(HourlyWeather weather, bool[] occupied, BinTable bins, EconomizerSettings settings, PlantModel? plant = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(bins);
        return Evaluate(weather, occupied, bins, HourCells.Build(weather, bins.Scale, HumidityBinScale.Default(bins.Scale.Units)), settings, plant);
    }

    /// <summary>
    /// Evaluates every control of <paramref name="settings"/> and the baseline over a record.
    /// </summary>
    /// <param name="weather">The hourly record.</param>
    /// <param name="occupied">Per-hour occupancy (the system runs in occupied hours).</param>
    /// <param name="bins">The record's dry-bulb bin table, built with the same <paramref name="occupied"/> flags.</param>
    /// <param name="cells">The record's hour cells with the bin table's dry-bulb scale (for joint bins).</param>
    /// <param name="settings">The air system and the controls.</param>
    /// <param name="plant">The plant whose cooling COP buys the compressor energy; null for coil energy only.</param>
    /// <exception cref="EconomizerSettingsException">The settings describe no workable system.</exception>
    public static EconomizerEvaluation Evaluate(
        HourlyWeather weather,
        bool[] occupied,
        BinTable bins,
        HourCells cells,
        EconomizerSettings settings,
        PlantModel? plant = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(occupied);
        ArgumentNullException.ThrowIfNull(bins);
        ArgumentNullException.ThrowIfNull(cells);
        if (occupied.Length != weather.Count)
        {
            throw new ArgumentException(FormattableString.Invariant($"occupancy flags have {occupied.Length} entries but the record has {weather.Count} hours"), nameof(occupied));
        }

        if (bins.Hours != weather.Count || bins.OccupiedHours != occupied.Count(o => o))
        {
            throw new ArgumentException("the bin table was not built from this record with these occupancy flags", nameof(bins));
        }

        if (cells.CellOfHour.Length != weather.Count || cells.DryBulbBins != bins.Rows.Count || cells.FirstDryBulbIndex != bins.FirstIndex)
        {
            throw new ArgumentException("the hour cells were not built from this record with the bin table's scale", nameof(cells));
        }

        var model = new EconomizerModel(settings, weather.Site.SitePressurePa);
        var controls = new EconomizerControl[settings.Controls.Count + 1];
        controls[0] = EconomizerControl.None;
        for (int c = 0; c < settings.Controls.Count; c++)
        {
            controls[c + 1] = settings.Controls[c];
        }

        var run = new Run(model, controls, plant, weather.HumidityOver);
        int nc = controls.Length;
        int nb = bins.Rows.Count;
        var monthly = new ModeEnergySums[nc * 12];
        var byBinHourly = new ModeEnergySums[nc * nb];
        var cellStats = new CellStatistics[cells.Count];
        int occupiedHours = run.SumHourly(weather, occupied, cells, monthly, byBinHourly, cellStats);

        // Cells merged over month and humidity (the bin method) and over month (joint bins).
        int nj = cells.HumidityBins;
        var (binStats, jointStats) = cells.Merge(cellStats);

        var rows = new EconomizerBinRow[nb];
        var byBin = new ModeEnergySums[nc * nb];
        var byBinJoint = new ModeEnergySums[nc * nb];
        double p = model.SitePressurePa;
        for (int b = 0; b < nb; b++)
        {
            var row = bins.Rows[b];
            var stats = binStats[b];
            double w = stats.MeanHumidityRatio;
            double t = BinEvaluation.DryBulbC(settings.BinPoint, row.Mid, stats);
            double h = stats.Hours > 0 ? MoistAir.Enthalpy(t, w) : double.NaN;
            double dp = stats.Hours > 0 ? DewPointOf(w, p, weather.HumidityOver) : double.NaN;
            rows[b] = new EconomizerBinRow(row.Index, row.Low, row.High, row.Mid, (int)stats.Hours, HumidityRatio.FromKilogramsPerKilogram(w),
                SpecificEnthalpy.FromJoulesPerKilogram(h), Temperature.FromCelsius(dp))
            { EvaluatedAt = Temperature.FromCelsius(t) };
            run.AddState(stats, t, byBin, b * nc);
            for (int j = 0; j < nj; j++)
            {
                var cell = jointStats[b * nj + j];
                run.AddState(cell, BinEvaluation.DryBulbC(settings.BinPoint, row.Mid, cell), byBinJoint, b * nc);
            }
        }

        var baseline = Totals(0, nc, nb, byBin, byBinJoint, byBinHourly, monthly, plant, out var baseByBin, out var baseByMonth);
        var results = new EconomizerControlResult[nc];
        for (int c = 0; c < nc; c++)
        {
            var totals = c == 0 ? baseline : Totals(c, nc, nb, byBin, byBinJoint, byBinHourly, monthly, plant, out baseByBin, out baseByMonth);
            results[c] = new EconomizerControlResult
            {
                Control = controls[c],
                Totals = totals,
                Baseline = baseline,
                ByBin = baseByBin,
                ByMonth = baseByMonth,
            };
        }

        return new EconomizerEvaluation(model, weather, occupiedHours, rows, results[0], results[1..], plant is not null) { CoolingClampHours = run.Clamps.CoolingHours };
    }

    /// <summary>The dew point of a bin's mean humidity ratio, in the record's convention (so a dew-point high limit reads it as the hours do).</summary>
    private static double DewPointOf(double w, double p, HumidityOver over) => w > 0 ? MoistAir.DewPoint(w, p, over) : Saturation.MinTemperatureC;

    /// <summary>One control's annual totals by each method, with its per-bin and per-month breakdowns.</summary>
    private static ByMethod<EconomizerTotals> Totals(int c, int nc, int nb, ModeEnergySums[] byBin, ModeEnergySums[] byBinJoint,
        ModeEnergySums[] byBinHourly, ModeEnergySums[] monthly, PlantModel? plant, out ByMethod<EconomizerTotals>[] perBin, out EconomizerTotals[] perMonth)
    {
        ModeEnergySums bin = default, joint = default, hourly = default;
        perBin = new ByMethod<EconomizerTotals>[nb];
        for (int b = 0; b < nb; b++)
        {
            bin.Add(in byBin[b * nc + c]);
            joint.Add(in byBinJoint[b * nc + c]);
            perBin[b] = new ByMethod<EconomizerTotals>(byBinHourly[c * nb + b].ToTotals(plant), byBinJoint[b * nc + c].ToTotals(plant), byBin[b * nc + c].ToTotals(plant));
        }

        perMonth = new EconomizerTotals[12];
        for (int m = 0; m < 12; m++)
        {
            hourly.Add(in monthly[c * 12 + m]);
            perMonth[m] = monthly[c * 12 + m].ToTotals(plant);
        }

        return new ByMethod<EconomizerTotals>(hourly.ToTotals(plant), joint.ToTotals(plant), bin.ToTotals(plant));
    }

    /// <summary>The model, the controls and the plant of one evaluation.</summary>
    private sealed class Run(EconomizerModel model, EconomizerControl[] controls, PlantModel? plant, HumidityOver over)
    {
        // Clamped COPs of the controls and of the bin methods, not counted twice.
        private readonly CurveClampCounter ignored = new();

        /// <summary>Which outcome each control takes in the state at hand (true: the economizer's; false: minimum outdoor air).</summary>
        private readonly bool[] economizes = new bool[controls.Length];

        /// <summary>The hours in which a cooling COP was held at its end value (hourly method).</summary>
        public CurveClampCounter Clamps { get; } = new();

        private readonly bool byWetBulb = plant?.CoolingCopUsesWetBulb == true;

        private double Cop(double t, double hours, CurveClampCounter counter) => plant?.CoolingCop(t, hours, counter) ?? 1.0;

        /// <summary>The cooling COP of the plant's wet-bulb table at the outdoor dry-bulb and the coil-entering (mixed) wet-bulb (a fogged mix at its dry-bulb); 1 when the coil is off.</summary>
        private double EnteringCop(in EconomizerHour r, double t, double hours, CurveClampCounter counter) =>
            r.CoilRuns ? plant!.CoolingCop(t, HourlyStateSolver.WetBulb(r.MixedDryBulbC, r.MixedHumidityRatio, model.SitePressurePa), hours, counter) : 1.0;

        /// <summary>
        /// The hourly sum: every occupied hour under every control, into per-month and per-bin sums,
        /// and each hour's state into its cell's statistics. Allocation-free.
        /// </summary>
        public int SumHourly(HourlyWeather weather, bool[] occupied, HourCells cells, ModeEnergySums[] monthly, ModeEnergySums[] byBin,
            CellStatistics[] cellStats)
        {
            var t = weather.DryBulbC;
            var w = weather.HumidityRatio;
            var h = weather.EnthalpyJPerKg;
            var dp = weather.DewPointC;
            var times = weather.Times;
            int nc = controls.Length;
            int nb = byBin.Length / nc;
            int count = 0;
            for (int i = 0; i < t.Length; i++)
            {
                if (!occupied[i])
                {
                    continue;
                }

                count++;
                int month = times[i].Month - 1;
                int cell = cells.CellOfHour[i];
                int bin = cells.DryBulbBinOfCell[cell];
                cellStats[cell].Add(t[i], w[i], 1.0);
                Outcomes(t[i], w[i], h[i], dp[i], 1.0, Clamps, out var atMinimum, out var economizing);
                for (int c = 0; c < nc; c++)
                {
                    ref readonly var hour = ref economizes[c] ? ref economizing : ref atMinimum;
                    monthly[c * 12 + month].Add(in hour);
                    byBin[c * nb + bin].Add(in hour);
                }
            }

            return count;
        }

        /// <summary>A bin's or cell's state (evaluation dry-bulb, mean humidity ratio) for every control, times its hours.</summary>
        public void AddState(in CellStatistics stats, double t, ModeEnergySums[] sums, int offset)
        {
            if (stats.Hours <= 0)
            {
                return;
            }

            double w = stats.MeanHumidityRatio;
            Outcomes(t, w, MoistAir.Enthalpy(t, w), DewPointOf(w, model.SitePressurePa, over), stats.Hours, ignored, out var atMinimum, out var economizing);
            for (int c = 0; c < controls.Length; c++)
            {
                ref readonly var state = ref economizes[c] ? ref economizing : ref atMinimum;
                sums[offset + c].Add(in state);
            }
        }

        /// <summary>
        /// One outdoor state under every control, for <paramref name="hours"/> hours (an hour, or a bin's state times its
        /// hours). A state has two outcomes, minimum outdoor air or the economizer's one enabled state, which every enabling
        /// control shares: each is solved and bought once, and <see cref="economizes"/> says which one each control takes.
        /// Clamped COPs of the baseline count in <paramref name="counter"/>: cooling in the hours the building needs cooling
        /// or the baseline coil runs (with a wet-bulb table: in the hours the baseline coil runs, at its entering state).
        /// </summary>
        private void Outcomes(double t, double w, double h, double dp, double hours, CurveClampCounter counter, out ModeEnergySums atMinimum, out ModeEnergySums economizing)
        {
            double qb = model.BuildingLoadW(t);
            var baseline = model.AtMinimum(qb, t, w);
            double cop = byWetBulb ? 1.0 : Cop(t, hours, qb > 0 || baseline.CoilRuns ? counter : ignored);
            atMinimum = default;
            atMinimum.Add(in baseline, hours, plant, byWetBulb ? EnteringCop(in baseline, t, hours, counter) : cop, t, counter);
            economizing = default;
            var enabled = default(EconomizerHour);
            bool solved = false;
            for (int c = 0; c < controls.Length; c++)
            {
                economizes[c] = false;
                if (c == 0 || !model.Enables(controls[c], t, h, dp))
                {
                    continue;
                }

                if (!solved)
                {
                    enabled = model.EnabledHour(qb, t, w);
                    economizing.Add(in enabled, hours, plant, byWetBulb ? EnteringCop(in enabled, t, hours, ignored) : cop, t, ignored);
                    solved = true;
                }

                economizes[c] = EconomizerModel.Keeps(controls[c], in enabled);
            }
        }
    }
}
