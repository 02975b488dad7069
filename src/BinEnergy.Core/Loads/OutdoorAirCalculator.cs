using System.Runtime.InteropServices;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Loads;

/// <summary>
/// Annual outdoor-air loads of a record by two integrations, always both (DESIGN 7): the bin
/// method, which evaluates <see cref="OutdoorAirLoad"/> at each dry-bulb bin's evaluation point
/// (<see cref="OutdoorAirSettings.BinPoint"/>: the mean dry-bulb of its ventilated hours by
/// default, or its midpoint) and mean coincident humidity ratio and multiplies by the bin's
/// ventilated hours, and the hourly sum over the same hours. Optionally a third: joint
/// dry-bulb x humidity-ratio bins, evaluated the same way per cell.
/// </summary>
/// <remarks>
/// Mass flow of dry air m = rho_da V, rho_da from the flow basis (<see cref="FlowBasisDensity"/>):
/// constant for <c>standard</c> and <c>site</c>; for <c>actual</c>, the dry-air density of each
/// hour's outdoor state at that hour's pressure (hourly) or of the bin's evaluation point and
/// mean humidity ratio at the site pressure (bins). The recovery device's fan penalty is
/// P = 2 V dp / eta (both air streams), charged in every ventilated hour unless the air
/// bypasses an idle device. The per-hour loop reads the record's columns and allocates nothing.
/// <para>With <see cref="OutdoorAirSettings.AirflowMultipliers"/> (e.g. demand-controlled
/// ventilation) each hour's volume flow, and with it the fan penalty, is the airflow times
/// the multiplier of the hour's clock hour. The loads are linear in the airflow, so the hourly
/// method scales each hour's loads; the bin method uses, per bin (and per joint cell) and
/// occupancy class, the mean multiplier over the bin's ventilated hours, which is exact for
/// the flow-weighted hours and keeps the bin's state at its evaluation point and mean humidity ratio.
/// The design-day peaks stay at the full airflow (what the equipment must handle).</para>
/// </remarks>
public static class OutdoorAirCalculator
{
    /// <summary>
    /// Bins the record with the settings' schedule and computes the loads by both methods (and
    /// by joint bins when <paramref name="jointScale"/> is given), with the peaks at the record's
    /// own design conditions.
    /// </summary>
    /// <exception cref="ArgumentException">The settings have problems (<see cref="OutdoorAirSettings.Problems"/>).</exception>
    public static OutdoorAirResult Compute(HourlyWeather weather, OutdoorAirSettings settings, DryBulbBinScale binScale,
        HumidityBinScale? jointScale = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(settings);
        var flags = settings.Schedule.Flags(weather);
        var table = BinTable.Build(weather, binScale, flags);
        var design = weather.Count > 0 ? DesignConditions.FromRecord(weather) : null;
        return Compute(weather, settings, table, flags, jointScale, design);
    }

    /// <summary>
    /// Computes the loads on an existing bin table built with the same occupancy flags
    /// (<paramref name="occupied"/>, one per hour); peaks only when <paramref name="design"/> is given; each hour's
    /// loads in <see cref="OutdoorAirResult.Hours"/> when <paramref name="keepHours"/> is set (for energy bought at
    /// each hour's outdoor temperature).
    /// </summary>
    /// <exception cref="ArgumentException">The settings have problems, or the flags do not match the record.</exception>
    public static OutdoorAirResult Compute(HourlyWeather weather, OutdoorAirSettings settings, BinTable table, bool[] occupied,
        HumidityBinScale? jointScale = null, DesignConditions? design = null, bool keepHours = false)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(table);
        var problems = settings.Problems();
        if (problems.Count > 0)
        {
            throw new ArgumentException("outdoor-air settings: " + string.Join("; ", problems), nameof(settings));
        }

        BinTable.CheckFlags(weather, occupied);
        double sitePressure = weather.Site.SitePressurePa;
        var load = new OutdoorAirLoad(settings, sitePressure);
        var flow = new FlowModel(settings, sitePressure);
        bool always = settings.Operation == VentilationOperation.Always;

        var profile = settings.AirflowMultipliers;
        var byHour = new double[24];
        for (int h = 0; h < 24; h++)
        {
            byHour[h] = settings.AirflowMultiplier(h);
        }

        var hours = keepHours ? new OutdoorAirTotals?[weather.Count] : null;
        var binSums = new LoadSums[table.Rows.Count];
        var binMultiplierSums = new double[table.Rows.Count];
        var monthSums = new LoadSums[12];
        var hourly = default(LoadSums);
        double densitySum = 0;
        var t = weather.DryBulbC;
        var w = weather.HumidityRatio;
        var p = weather.PressurePa;
        var times = weather.Times;
        var scale = table.Scale;
        int first = table.FirstIndex;
        for (int i = 0; i < t.Length; i++)
        {
            if (!always && !occupied[i])
            {
                continue;
            }

            double rho = flow.Density(t[i], w[i], p[i]);
            densitySum += rho;
            load.Evaluate(t[i], w[i], out var s);
            double f = byHour[times[i].Hour];
            double m = rho * flow.VolumeM3PerS * f;
            double fan = flow.FanPower(s.Recovering) * f;
            hourly.Add(s, m, fan, 1);
            if (hours is not null)
            {
                var one = default(LoadSums);
                one.Add(s, m, fan, 1);
                hours[i] = one.ToTotals();
            }

            int bin = scale.IndexOf(t[i]) - first;
            binSums[bin].Add(s, m, fan, 1);
            binMultiplierSums[bin] += f;
            monthSums[times[i].Month - 1].Add(s, m, fan, 1);
        }

        var occupancy = always ? OccupancyClass.All : OccupancyClass.Occupied;
        var binMethod = default(LoadSums);
        var rows = new OutdoorAirBinRow[table.Rows.Count];
        for (int b = 0; b < rows.Length; b++)
        {
            var row = table.Rows[b];
            var stats = row.For(occupancy);
            var own = default(LoadSums);
            var at = stats.IsEmpty ? row.Mid : Temperature.FromCelsius(BinEvaluation.DryBulbC(settings.BinPoint, row.Mid, stats));
            if (!stats.IsEmpty)
            {
                double f = binSums[b].Hours > 0 ? binMultiplierSums[b] / binSums[b].Hours : 1.0;
                AddBin(ref own, load, flow, at.Celsius, stats.MeanHumidityRatio.KilogramsPerKilogram, stats.Hours, sitePressure, f);
                binMethod.Add(own);
            }

            rows[b] = new OutdoorAirBinRow(row, stats.Hours, stats.MeanHumidityRatio, own.ToTotals(), binSums[b].ToTotals()) { EvaluatedAt = at };
        }

        OutdoorAirTotals? joint = null;
        if (jointScale is HumidityBinScale js)
        {
            var cells = JointBinTable.Build(weather, scale, js, occupied);
            var cellMultipliers = profile is null ? null : JointCellMultipliers(weather, scale, js, byHour, occupied, always);
            var sums = default(LoadSums);
            foreach (var cell in cells.Cells)
            {
                var stats = cell.For(occupancy);
                if (!stats.IsEmpty)
                {
                    double f = cellMultipliers is not null && cellMultipliers.TryGetValue((cell.DryBulbIndex, cell.HumidityIndex), out var c) && c.Hours > 0
                        ? c.Sum / c.Hours
                        : 1.0;
                    AddBin(ref sums, load, flow, BinEvaluation.DryBulbC(settings.BinPoint, cell.DryBulbMid, stats), stats.MeanHumidityRatio.KilogramsPerKilogram, stats.Hours, sitePressure, f);
                }
            }

            joint = sums.ToTotals();
        }

        var months = new List<OutdoorAirMonth>();
        for (int m = 0; m < 12; m++)
        {
            if (monthSums[m].Hours > 0)
            {
                months.Add(new OutdoorAirMonth(m + 1, monthSums[m].ToTotals()));
            }
        }

        double density = flow.Basis == FlowBasis.Actual
            ? (hourly.Hours > 0 ? densitySum / hourly.Hours : FlowBasisDensity.Site(sitePressure))
            : flow.ConstantDensity;
        var assumptions = new OutdoorAirAssumptions(
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
            FanPenalty: Power.FromWatts(flow.FanPowerW),
            Calendar: weather.Calendar.Note);

        return new OutdoorAirResult
        {
            Bin = binMethod.ToTotals(),
            Hourly = hourly.ToTotals(),
            Hours = hours,
            JointBin = joint,
            Bins = rows,
            Months = months,
            Peaks = design is null ? null : DesignPeakLoads.Compute(weather, settings, design),
            Assumptions = assumptions,
            Warnings = Warnings(weather, settings, hourly.Hours),
        };
    }

    private static void AddBin(ref LoadSums sums, OutdoorAirLoad load, FlowModel flow, double t, double w, int hours, double sitePressure, double multiplier)
    {
        load.Evaluate(t, w, out var s);
        double m = flow.Density(t, w, sitePressure) * flow.VolumeM3PerS * multiplier;
        sums.Add(s, m, flow.FanPower(s.Recovering) * multiplier, hours);
    }

    /// <summary>Mean airflow multiplier over the ventilated hours of each joint cell, by (dry-bulb index, humidity index).</summary>
    private static Dictionary<(int K, int J), (double Sum, int Hours)> JointCellMultipliers(HourlyWeather weather, DryBulbBinScale scale,
        HumidityBinScale js, double[] byHour, bool[] occupied, bool always)
    {
        var t = weather.DryBulbC;
        var w = weather.HumidityRatio;
        var times = weather.Times;
        var result = new Dictionary<(int K, int J), (double Sum, int Hours)>();
        for (int i = 0; i < t.Length; i++)
        {
            if (always || occupied[i])
            {
                ref var entry = ref CollectionsMarshal.GetValueRefOrAddDefault(result, (scale.IndexOf(t[i]), js.IndexOf(w[i])), out _);
                entry = (entry.Sum + byHour[times[i].Hour], entry.Hours + 1);
            }
        }

        return result;
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

    /// <summary>How volume becomes mass, and the recovery fan's power; fixed for one run.</summary>
    private readonly struct FlowModel
    {
        private readonly bool bypassWhenIdle;

        public FlowModel(OutdoorAirSettings settings, double sitePressurePa)
        {
            Basis = settings.FlowBasis;
            VolumeM3PerS = settings.EffectiveAirflow.CubicMetresPerSecond;
            ConstantDensity = Basis == FlowBasis.Actual ? double.NaN : FlowBasisDensity.For(Basis, sitePressurePa, 0, 0, sitePressurePa);
            var r = settings.Recovery;
            FanPowerW = r is null ? 0.0 : 2.0 * VolumeM3PerS * r.PressureDropPa / r.FanEfficiency;
            bypassWhenIdle = r?.BypassWhenIdle ?? false;
        }

        public FlowBasis Basis { get; }

        public double VolumeM3PerS { get; }

        public double ConstantDensity { get; }

        public double FanPowerW { get; }

        public double Density(double t, double w, double p) =>
            Basis == FlowBasis.Actual ? MoistAir.DryAirDensity(t, w, p) : ConstantDensity;

        public double FanPower(bool recovering) => bypassWhenIdle && !recovering ? 0.0 : FanPowerW;
    }
}
