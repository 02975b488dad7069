using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// Every chosen economizer control side by side with the baseline over one weather record
/// (DESIGN 8): per control, the bin method (each bin at its evaluation point, see
/// <see cref="EconomizerSettings.BinPoint"/>, with the mean coincident humidity ratio of
/// the occupied hours) and the hourly sum, hours per mode, coil sensible, latent and total
/// energy, savings against the baseline by the same method (negative savings are kept), per-bin
/// and per-month breakdowns, and optionally joint dry-bulb x humidity-ratio bins.
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
        bool joint)
    {
        Model = model;
        Weather = weather;
        OccupiedHours = occupiedHours;
        Bins = bins;
        Baseline = baseline;
        Controls = controls;
        HasJointBins = joint;
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

    /// <summary>True when the results carry joint-bin totals.</summary>
    public bool HasJointBins { get; }

    /// <summary>The control with the largest hourly savings (ties: the first listed).</summary>
    public EconomizerControlResult Best => Controls.Aggregate((a, b) => b.HourlySavings.Joules > a.HourlySavings.Joules ? b : a);

    /// <summary>
    /// Evaluates every control of <paramref name="settings"/> and the baseline over a record.
    /// </summary>
    /// <param name="weather">The hourly record.</param>
    /// <param name="occupied">Per-hour occupancy (the system runs in occupied hours).</param>
    /// <param name="bins">The record's dry-bulb bin table, built with the same <paramref name="occupied"/> flags.</param>
    /// <param name="settings">The air system and the controls.</param>
    /// <param name="joint">Optional joint dry-bulb x humidity-ratio bins (built with the same flags) for a third method.</param>
    /// <exception cref="EconomizerSettingsException">The settings describe no workable system.</exception>
    public static EconomizerEvaluation Evaluate(
        HourlyWeather weather,
        bool[] occupied,
        BinTable bins,
        EconomizerSettings settings,
        JointBinTable? joint = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        ArgumentNullException.ThrowIfNull(occupied);
        ArgumentNullException.ThrowIfNull(bins);
        if (occupied.Length != weather.Count)
        {
            throw new ArgumentException(FormattableString.Invariant($"occupancy flags have {occupied.Length} entries but the record has {weather.Count} hours"), nameof(occupied));
        }

        if (bins.Hours != weather.Count || bins.OccupiedHours != occupied.Count(o => o))
        {
            throw new ArgumentException("the bin table was not built from this record with these occupancy flags", nameof(bins));
        }

        var model = new EconomizerModel(settings, weather.Site.SitePressurePa);
        var controls = new EconomizerControl[settings.Controls.Count + 1];
        controls[0] = EconomizerControl.None;
        for (int c = 0; c < settings.Controls.Count; c++)
        {
            controls[c + 1] = settings.Controls[c];
        }

        int nc = controls.Length;
        int nb = bins.Rows.Count;
        var monthly = new ModeEnergySums[nc * 12];
        var byBinHourly = new ModeEnergySums[nc * nb];
        int occupiedHours = SumHourly(model, weather, occupied, bins.Scale, bins.FirstIndex, controls, monthly, byBinHourly);

        var rows = new EconomizerBinRow[nb];
        var byBin = new ModeEnergySums[nc * nb];
        double p = model.SitePressurePa;
        for (int b = 0; b < nb; b++)
        {
            var row = bins.Rows[b];
            var occ = row.Occupied;
            double w = occ.MeanHumidityRatio.KilogramsPerKilogram;
            double t = BinEvaluation.DryBulbC(settings.BinPoint, row.Mid, occ);
            double h = occ.Hours > 0 ? MoistAir.Enthalpy(t, w) : double.NaN;
            double dp = occ.Hours > 0 && w > 0 ? MoistAir.DewPoint(w, p) : double.NaN;
            rows[b] = new EconomizerBinRow(row.Index, row.Low, row.High, row.Mid, occ.Hours, occ.MeanHumidityRatio,
                SpecificEnthalpy.FromJoulesPerKilogram(h), Temperature.FromCelsius(dp))
            { EvaluatedAt = Temperature.FromCelsius(t) };
            if (occ.Hours > 0)
            {
                AddState(model, controls, t, w, h, dp, occ.Hours, byBin, b * nc);
            }
        }

        ModeEnergySums[]? jointSums = null;
        if (joint is not null)
        {
            jointSums = new ModeEnergySums[nc];
            foreach (var cell in joint.Cells)
            {
                var occ = cell.Occupied;
                if (occ.Hours == 0)
                {
                    continue;
                }

                double t = BinEvaluation.DryBulbC(settings.BinPoint, cell.DryBulbMid, occ);
                double w = occ.MeanHumidityRatio.KilogramsPerKilogram;
                double dp = w > 0 ? MoistAir.DewPoint(w, p) : Saturation.MinTemperatureC;
                AddState(model, controls, t, w, MoistAir.Enthalpy(t, w), dp, occ.Hours, jointSums, 0);
            }
        }

        var results = new EconomizerControlResult[nc];
        EconomizerTotals? baseBin = null, baseHourly = null, baseJoint = null;
        for (int c = 0; c < nc; c++)
        {
            var annualBin = new ModeEnergySums();
            var perBin = new EconomizerTotals[nb];
            var perBinHourly = new EconomizerTotals[nb];
            for (int b = 0; b < nb; b++)
            {
                annualBin.Add(in byBin[b * nc + c]);
                perBin[b] = byBin[b * nc + c].ToTotals();
                perBinHourly[b] = byBinHourly[c * nb + b].ToTotals();
            }

            var annualHourly = new ModeEnergySums();
            var perMonth = new EconomizerTotals[12];
            for (int m = 0; m < 12; m++)
            {
                annualHourly.Add(in monthly[c * 12 + m]);
                perMonth[m] = monthly[c * 12 + m].ToTotals();
            }

            var binTotals = annualBin.ToTotals();
            var hourlyTotals = annualHourly.ToTotals();
            var jointTotals = jointSums?[c].ToTotals();
            baseBin ??= binTotals;
            baseHourly ??= hourlyTotals;
            baseJoint ??= jointTotals;
            results[c] = new EconomizerControlResult
            {
                Control = controls[c],
                Bin = binTotals,
                Hourly = hourlyTotals,
                JointBin = jointTotals,
                ByBin = perBin,
                ByBinHourly = perBinHourly,
                ByMonth = perMonth,
                BinSavings = binTotals.SavingsAgainst(baseBin),
                BinSavingsPercent = binTotals.SavingsPercentAgainst(baseBin),
                HourlySavings = hourlyTotals.SavingsAgainst(baseHourly),
                HourlySavingsPercent = hourlyTotals.SavingsPercentAgainst(baseHourly),
                JointBinSavings = jointTotals is null || baseJoint is null ? null : jointTotals.SavingsAgainst(baseJoint),
            };
        }

        return new EconomizerEvaluation(model, weather, occupiedHours, rows, results[0], results[1..], joint is not null);
    }

    /// <summary>
    /// The hourly sum: every occupied hour under every control, into per-month and per-bin sums.
    /// Allocation-free: reads the column arrays, writes the preallocated sums.
    /// </summary>
    private static int SumHourly(
        EconomizerModel model,
        HourlyWeather weather,
        bool[] occupied,
        DryBulbBinScale scale,
        int firstBin,
        EconomizerControl[] controls,
        ModeEnergySums[] monthly,
        ModeEnergySums[] byBin)
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
            int bin = scale.IndexOf(t[i]) - firstBin;
            double qb = model.BuildingLoadW(t[i]);
            if (qb <= 0)
            {
                var none = new EconomizerHour(EconomizerMode.NoCooling, 0, 0, 0, 0, 0, 0, 0, 0);
                for (int c = 0; c < nc; c++)
                {
                    monthly[c * 12 + month].Add(in none, 1.0);
                    byBin[c * nb + bin].Add(in none, 1.0);
                }

                continue;
            }

            var baseline = model.AtMinimum(qb, t[i], w[i]);
            for (int c = 0; c < nc; c++)
            {
                var r = c == 0 ? baseline : model.Resolve(controls[c], qb, in baseline, t[i], w[i], h[i], dp[i]);
                monthly[c * 12 + month].Add(in r, 1.0);
                byBin[c * nb + bin].Add(in r, 1.0);
            }
        }

        return count;
    }

    /// <summary>One bin state (dry-bulb, humidity ratio, enthalpy, dew point) for every control, times its hours.</summary>
    private static void AddState(EconomizerModel model, EconomizerControl[] controls, double t, double w, double h, double dp,
        double hours, ModeEnergySums[] sums, int offset)
    {
        for (int c = 0; c < controls.Length; c++)
        {
            var r = model.Evaluate(controls[c], t, w, h, dp);
            sums[offset + c].Add(in r, hours);
        }
    }

    /// <summary>
    /// The assumptions behind the numbers, in the display unit of <paramref name="units"/>, for
    /// the terminal, the JSON and the report.
    /// </summary>
    public IReadOnlyList<string> Assumptions(UnitSystem units)
    {
        var s = Settings;
        bool ip = units == UnitSystem.IP;
        string tu = ip ? "F" : "C";
        string T(Temperature x) => F(x.In(units), 1) + " " + tu;
        string Flow(VolumeFlow v) => F(v.In(units), 0) + (ip ? " cfm" : " L/s");
        string W(double kgkg) => ip ? F(kgkg * Conversions.GrainsPerPound, 1) + " gr/lb" : F(kgkg * 1000, 2) + " g/kg";
        string H(double jkg) => F(SpecificEnthalpy.FromJoulesPerKilogram(jkg).In(units), 2) + (ip ? " Btu/lb" : " kJ/kg");
        string Point(string whose) => s.BinPoint == BinEvaluationPoint.Midpoint ? $"{whose} dry-bulb midpoint" : $"the mean dry-bulb of {whose} occupied hours";
        double xMin = s.MinOutdoorAirflow.CubicMetresPerSecond / s.SupplyAirflow.CubicMetresPerSecond;
        var list = new List<string>
        {
            s.IsVariableVolume
                ? $"variable supply airflow {Flow(s.SupplyAirflowMin!.Value)} to {Flow(s.SupplyAirflow)}, following the building load m_s = Q_b / (c_p (T_r - T_s)) between those bounds"
                : $"constant supply airflow {Flow(s.SupplyAirflow)}",
            $"minimum outdoor airflow {Flow(s.MinOutdoorAirflow)} (outdoor fraction at least {F(xMin * 100, 1)} % at full supply airflow{(s.IsVariableVolume ? ", more at reduced airflow" : "")})",
            FlowBasisText(s.FlowBasis, units),
            $"supply (coil-leaving) temperature {T(s.SupplyTemperature)}; coil-leaving humidity at most {F(s.CoilLeavingRelativeHumidity * 100, 0)} % RH at the supply temperature ({W(Model.CoilLeavingHumidityLimit)})",
            $"return air {T(s.ReturnTemperature)} at {F(s.ReturnRelativeHumidity * 100, 0)} % RH: humidity ratio {W(Model.ReturnHumidityRatio)}, enthalpy {H(Model.ReturnEnthalpyJPerKg)}",
            $"building sensible cooling load {(ip ? F(s.LoadLine.DesignLoad.BtuPerHour, 0) + " Btu/h" : F(s.LoadLine.DesignLoad.Kilowatts, 1) + " kW")} at {T(s.LoadLine.DesignOutdoor)} outdoors, falling linearly to zero at the {T(s.LoadLine.BalancePoint)} balance point (no cooling below it)",
            $"site pressure {F(Model.SitePressurePa / 1000, 2)} kPa for the indoor states; each hour's outdoor enthalpy and dew point from the record",
            "mixing linear in dry-bulb and humidity ratio; the coil cools the mixed air to the supply temperature; coil energy is that of the coil only (no fan, no reheat, no plant efficiency)",
            "the economizer runs only when the outdoor air is cooler than the return air and the control's high limit allows it; integrated controls keep 100 % outdoor air while the coil trims, non-integrated ones lock out to minimum outdoor air whenever the coil must run",
            $"{OccupiedHours} occupied hours of {Weather.Count}; the system runs in occupied hours only",
            $"bin method: each dry-bulb bin at {Point("its")} and the mean coincident humidity ratio of its occupied hours, times those hours; hourly: the same model summed over every occupied hour" +
                (HasJointBins ? $"; joint bins: each dry-bulb x humidity-ratio cell at {Point("the cell's")} and the cell's mean humidity ratio" : ""),
            s.LimitsAreSuggested
                ? "high limits: " + HighLimits.SuggestedNote
                : $"high limits set by the user: dry-bulb {T(s.Limits.DryBulb)}, enthalpy {F(s.Limits.Enthalpy.In(units), 1)} {(ip ? "Btu/lb" : "kJ/kg")}, dew point {T(s.Limits.DewPoint)}; the energy code adopted locally governs the choice of control and limit",
            "caution: the minimum outdoor airflow must meet the ventilation code adopted locally and the judgement of the responsible licensed engineer; reducing outdoor air below the required minimum harms occupants",
        };
        if (s.MinOutdoorAirflow.CubicMetresPerSecond == 0)
        {
            list.Add("caution: the minimum outdoor airflow is zero, so outside economizer hours the building gets no ventilation air; occupied buildings need the minimum their ventilation code requires");
        }

        return list;
    }

    private static string FlowBasisText(FlowBasis basis, UnitSystem units) => basis switch
    {
        FlowBasis.Standard => "flow basis standard: airflows are standard air, 0.075 lb/ft3 (1.2014 kg/m3) of dry air",
        FlowBasis.Site => "flow basis site: airflows are dry air at 70 F (21.1 C) at the site pressure",
        _ => "flow basis actual: airflows are at the coil-entering (mixed-air) state, so its density sets both mass flows",
    };

    private static string F(double v, int digits) => v.ToString("N" + digits, CultureInfo.InvariantCulture);
}
