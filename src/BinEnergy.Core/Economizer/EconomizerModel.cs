using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// The air-side economizer model of DESIGN 8 for one hour (or one bin state), in SI, with
/// everything that does not change from hour to hour computed once: the return-air state, the
/// coil-leaving humidity limit, the load line and the flow-basis density.
/// </summary>
/// <remarks>
/// <para>For an occupied hour with outdoor dry-bulb T_o, humidity ratio W_o, enthalpy h_o and
/// dew point T_dp,o:</para>
/// <list type="number">
/// <item>Building sensible load Q_b from the load line (<see cref="BuildingLoadLine"/>); Q_b = 0
/// (at or below the balance point) gives the mode "no cooling", but the system still conditions
/// its supply as a real air handler does: the steps below run with Q_b = 0, so a variable-volume
/// system at its minimum airflow and a constant-volume system at its fixed supply temperature
/// reheat the supply to room temperature, cold mixed air is preheated, an enabled economizer
/// mixes towards the coil-leaving temperature, and mixed air above it is cooled. The building's
/// own heating load (envelope, below the balance point) is outside this evaluation.</item>
/// <item>Supply mass flow and supply temperature by the system type (<see cref="AirSystemType"/>):
/// variable volume m_s = Q_b / (c_p (T_r - T_set)) bounded to [rho V_min, rho V_max] at T_set (the set
/// supply temperature, or its outdoor reset); single zone m_s = rho V_s at
/// T_sup = max(T_s, T_r - Q_b / (m_s c_p)) (the supply temperature follows the load line); constant
/// volume with reheat m_s = rho V_s at T_s. c_p = 1.006 + 1.86 W_r kJ/(kg K) of the room (return) air
/// (Handbook—Fundamentals 2017, ch. 1, eq. 32 differentiated). rho is the dry-air density of the flow
/// basis; with <c>actual</c> it is that of the mixed (coil-entering) state at the site pressure
/// (eq. 26), found by fixed-point iteration because the mixed state depends on the outdoor fraction,
/// which depends on m_s.</item>
/// <item>Reheat = m_s c_p (T_r - T_sup) - Q_b when positive (the supply cools more than the load
/// needs: variable volume at minimum airflow, constant volume with reheat); when negative, that
/// much load is unmet (the supply at its largest and coolest).</item>
/// <item>Minimum outdoor fraction x_min = rho V_oa / m_s (mass of outdoor air over mass of supply air).</item>
/// <item>The economizer is enabled when the control's high limit allows it and T_o &lt; T_r; then
/// x = (T_r - T_sup) / (T_r - T_o) clamped to [x_min, 1] (the fraction whose mix is exactly at T_sup),
/// else x = x_min.</item>
/// <item>Mixing linear in dry-bulb and humidity ratio (the usual approximation; ASHRAE
/// Handbook—Fundamentals 2017, ch. 1, "adiabatic mixing", exact in W and in h, nearly so in t):
/// T_mix = x T_o + (1 - x) T_r, W_mix = x W_o + (1 - x) W_r, h_mix = h(T_mix, W_mix) by eq. 32.</item>
/// <item>Coil: to T_sup, leaving W_l = min(W_mix, W_lim) with W_lim the humidity ratio at T_sup and the
/// coil-leaving RH (eq. 22/20 with Hyland-Wexler saturation). Sensible part
/// m_s (1.006 + 1.86 W_mix)(T_mix - T_sup), latent part m_s (W_mix - W_l)(2501 + 1.86 T_sup - 4.186 T_sup) kJ/kg,
/// each when positive; together exactly the coil load of Handbook—Fundamentals 2017 ch. 1 ("cooling and
/// dehumidifying of moist air"), m_s (h_mix - h_l) - m_s (W_mix - W_l) h_w, with the condensate leaving
/// at T_sup, h_w = 4.186 T_sup kJ/kg, whenever T_mix &gt;= T_sup. Mixed air
/// below T_sup is preheated: m_s (1.006 + 1.86 W_mix)(T_sup - T_mix), counted as heating.</item>
/// <item>Fans: supply and return fan power P = P_design g(f), with P_design = V_max dp / eta
/// (<see cref="AirSystemFan"/>) and, for variable volume, g the part-load curve at the flow fraction
/// f = m_s / (rho V_max) (<see cref="FanPartLoadCurve"/>; g = 1 for constant volume). All fan power
/// is heat in the air (common practice): the supply fan after the coil, so the coil cools to
/// T_c = T_sup - P_sf / (m_s c_p) and the economizer mixes to T_c; the return fan before the mixing box,
/// so the return air enters it at T_r + P_rf / (m_s c_p). Fans run in every occupied hour, also
/// without cooling.</item>
/// <item>Integrated: when x = 1 cannot reach T_sup (or the mix is too humid) the economizer stays on
/// and the coil trims (mode "integrated"). Non-integrated: it locks out to x_min whenever the coil
/// must run (mode "minimum outdoor air"). Enabled with no coil load: "free cooling".</item>
/// </list>
/// <para>Indoor states (return air, mixed air, coil-leaving limit) use the site pressure
/// (DESIGN 5.1); the outdoor enthalpy and dew point are the hour's own.</para>
/// </remarks>
public sealed class EconomizerModel
{
    /// <summary>Tolerance under which a mixed-air temperature counts as at the supply temperature, K.</summary>
    public const double TemperatureToleranceK = 1e-9;

    private readonly double _tS;
    private readonly double _tR;
    private readonly double _tBal;
    private readonly double _loadSlope;
    private readonly double _cpReturn;
    private readonly double _vs;
    private readonly double _vsMin;
    private readonly double _voa;
    private readonly double _fixedDensity;
    private readonly bool _actual;
    private readonly AirSystemType _system;
    private readonly double _supplyFanDesignW;
    private readonly double _returnFanDesignW;
    private readonly FanPartLoadCurve _fanCurve;
    private readonly SupplyTemperatureReset? _reset;
    private readonly double _latentAtSupply;

    /// <summary>Builds the model; validates the settings first.</summary>
    /// <param name="settings">The air system.</param>
    /// <param name="sitePressurePa">Site pressure for the indoor states and the site flow basis, Pa.</param>
    /// <exception cref="EconomizerSettingsException">The settings describe no workable system.</exception>
    public EconomizerModel(EconomizerSettings settings, double sitePressurePa)
    {
        Settings = settings.Validate();
        if (!(sitePressurePa >= 30_000 && sitePressurePa <= 120_000))
        {
            throw new EconomizerSettingsException([new("site_pressure", FormattableString.Invariant($"site pressure {sitePressurePa:0} Pa is outside 30 to 120 kPa"))]);
        }

        SitePressurePa = sitePressurePa;
        _tS = settings.SupplyTemperature.Celsius;
        _tR = settings.ReturnTemperature.Celsius;
        _tBal = settings.LoadLine.BalancePoint.Celsius;
        _loadSlope = settings.LoadLine.SlopeWPerK;
        ReturnHumidityRatio = MoistAir.HumidityRatioFromRelativeHumidity(_tR, settings.ReturnRelativeHumidity, sitePressurePa);
        ReturnEnthalpyJPerKg = MoistAir.Enthalpy(_tR, ReturnHumidityRatio);
        CoilLeavingHumidityLimit = MoistAir.HumidityRatioFromRelativeHumidity(_tS, settings.CoilLeavingRelativeHumidity, sitePressurePa);
        _cpReturn = MoistAir.HumidSpecificHeat(ReturnHumidityRatio);
        _latentAtSupply = MoistAir.CondensingHeat(_tS);
        _vs = settings.SupplyAirflow.CubicMetresPerSecond;
        _vsMin = settings.MinimumSupplyAirflow.CubicMetresPerSecond;
        _voa = settings.MinOutdoorAirflow.CubicMetresPerSecond;
        _system = settings.System;
        _supplyFanDesignW = settings.SupplyFan?.DesignPowerW(settings.SupplyAirflow) ?? 0.0;
        _returnFanDesignW = settings.ReturnFan?.DesignPowerW(settings.SupplyAirflow) ?? 0.0;
        _fanCurve = settings.FanCurve;
        _reset = settings.IsVariableVolume ? settings.Reset : null;
        _actual = settings.FlowBasis == FlowBasis.Actual;
        _fixedDensity = _actual ? double.NaN : FlowBasisDensity.For(settings.FlowBasis, sitePressurePa, _tR, 0.0, sitePressurePa);
    }

    public EconomizerSettings Settings { get; }

    /// <summary>Site pressure used for the indoor states, Pa.</summary>
    public double SitePressurePa { get; }

    /// <summary>Return-air humidity ratio W_r, kg/kg (from T_r and the return RH, eqs. 12, 20 and 22).</summary>
    public double ReturnHumidityRatio { get; }

    /// <summary>Return-air enthalpy h_r, J/kg dry air (eq. 32): the limit of the differential-enthalpy control.</summary>
    public double ReturnEnthalpyJPerKg { get; }

    /// <summary>Humidity ratio at T_s and the coil-leaving RH, kg/kg: the wettest air the coil lets through.</summary>
    public double CoilLeavingHumidityLimit { get; }

    /// <summary>Dry-air density of the flow basis, kg/m3; NaN for <c>actual</c> (then it varies with the mixed state).</summary>
    public double FlowBasisDensityKgPerM3 => _fixedDensity;

    /// <summary>The building sensible load Q_b at an outdoor dry-bulb, W.</summary>
    public double BuildingLoadW(double outdoorDryBulbC) =>
        outdoorDryBulbC > _tBal ? _loadSlope * (outdoorDryBulbC - _tBal) : 0.0;

    /// <summary>
    /// The system in one occupied hour under <paramref name="control"/>. For
    /// <see cref="EconomizerControl.None"/> this is the baseline.
    /// </summary>
    /// <param name="control">The control.</param>
    /// <param name="outdoorDryBulbC">T_o, C.</param>
    /// <param name="outdoorHumidityRatio">W_o, kg/kg.</param>
    /// <param name="outdoorEnthalpyJPerKg">h_o, J/kg dry air (0 C datum).</param>
    /// <param name="outdoorDewPointC">T_dp,o, C.</param>
    public EconomizerHour Evaluate(
        EconomizerControl control,
        double outdoorDryBulbC,
        double outdoorHumidityRatio,
        double outdoorEnthalpyJPerKg,
        double outdoorDewPointC)
    {
        double qb = BuildingLoadW(outdoorDryBulbC);
        var baseline = AtMinimum(qb, outdoorDryBulbC, outdoorHumidityRatio);
        return Resolve(control, qb, in baseline, outdoorDryBulbC, outdoorHumidityRatio, outdoorEnthalpyJPerKg, outdoorDewPointC);
    }

    /// <summary>The system in one occupied hour, from an outdoor state.</summary>
    public EconomizerHour Evaluate(EconomizerControl control, AirState outdoor) =>
        Evaluate(control, outdoor.DryBulb.Celsius, outdoor.HumidityRatio.KilogramsPerKilogram,
            outdoor.Enthalpy.JoulesPerKilogram, outdoor.DewPoint.Celsius);

    /// <summary>True when <paramref name="control"/> enables the economizer at this outdoor state (high limit and T_o &lt; T_r).</summary>
    public bool IsEnabled(EconomizerControl control, double outdoorDryBulbC, double outdoorEnthalpyJPerKg, double outdoorDewPointC) =>
        outdoorDryBulbC < _tR
        && control.HighLimitAllows(outdoorDryBulbC, outdoorEnthalpyJPerKg, outdoorDewPointC, _tR, ReturnEnthalpyJPerKg, Settings.Limits);

    /// <summary>
    /// Fan power at a supply mass flow, W: design power times the part-load curve at the flow
    /// fraction m_s / (rho V_max) for variable volume; design power for constant volume.
    /// </summary>
    public (double SupplyW, double ReturnW) FanPowerW(double massFlowKgPerS, double densityKgPerM3)
    {
        double fraction = _system == AirSystemType.VariableVolume ? _fanCurve.Fraction(massFlowKgPerS / (densityKgPerM3 * _vs)) : 1.0;
        return (_supplyFanDesignW * fraction, _returnFanDesignW * fraction);
    }

    /// <summary>
    /// The control's hour given the hour's load and its baseline (minimum outdoor air) result,
    /// so that a loop over many controls computes the baseline once per hour.
    /// </summary>
    internal EconomizerHour Resolve(
        EconomizerControl control,
        double qb,
        in EconomizerHour baseline,
        double tO,
        double wO,
        double hO,
        double dpO)
    {
        if (!Enables(control, tO, hO, dpO))
        {
            return baseline;
        }

        var economizer = EnabledHour(qb, tO, wO);
        return Keeps(control, in economizer) ? economizer : baseline;
    }

    /// <summary>
    /// True when <paramref name="control"/> opens the dampers past the minimum at this outdoor state (it has a
    /// high limit that allows it and T_o &lt; T_r). Every control that does shares the hour's one
    /// <see cref="EnabledHour"/>, so a loop over controls solves the system at most twice an hour.
    /// </summary>
    internal bool Enables(EconomizerControl control, double tO, double hO, double dpO) =>
        control.Kind != HighLimitKind.None && IsEnabled(control, tO, hO, dpO);

    /// <summary>
    /// True when <paramref name="control"/>, enabled, keeps the economizer hour: always when integrated; a
    /// non-integrated economizer locks out to minimum outdoor air whenever the coil must run.
    /// </summary>
    internal static bool Keeps(EconomizerControl control, in EconomizerHour enabled) => control.Integrated || !enabled.CoilRuns;

    /// <summary>The economizer's hour with its mode: free cooling, or integrated when the coil trims; with no building load the mode stays "no cooling" (the supply is conditioned all the same).</summary>
    internal EconomizerHour EnabledHour(double qb, double tO, double wO)
    {
        var economizer = Enabled(qb, tO, wO);
        return qb <= 0 ? economizer
            : economizer with { Mode = economizer.CoilRuns ? EconomizerMode.Integrated : EconomizerMode.FreeCooling };
    }

    /// <summary>Minimum outdoor air (x = x_min): the baseline, or a disabled or locked-out economizer.</summary>
    internal EconomizerHour AtMinimum(double qb, double tO, double wO) => Solve(qb, tO, wO, economizer: false);

    /// <summary>The economizer enabled: x = (T_r - T_sup)/(T_r - T_o) clamped to [x_min, 1]; requires T_o &lt; T_r.</summary>
    internal EconomizerHour Enabled(double qb, double tO, double wO) => Solve(qb, tO, wO, economizer: true);

    /// <summary>The supply temperature the system aims at before the load is known, C: the reset's value for variable volume with a reset, else T_s.</summary>
    public double SupplySetpointC(double outdoorDryBulbC) =>
        _reset is not null ? _reset.SupplyC(outdoorDryBulbC, _tS) : _tS;

    private EconomizerHour Solve(double qb, double tO, double wO, bool economizer)
    {
        double wR = ReturnHumidityRatio;
        double tSet = SupplySetpointC(tO);

        // Fixed-point on the dry-air density: one pass for standard and site (constant
        // density); for actual, a few passes until the mixed state's density stops moving.
        double rho = _actual ? MoistAir.DryAirDensity(_tR, wR, SitePressurePa) : _fixedDensity;
        double ms = 0, x = 0, tMix = 0, wMix = 0, tSup = tSet, tCoil = tSet, fanW = 0;
        for (int pass = 0; pass < 8; pass++)
        {
            (ms, tSup) = SupplyFlowAndTemperature(qb, tSet, rho);

            // Fan heat: the supply fan after the coil (the coil cools below the supply temperature by
            // the fan's rise), the return fan before the mixing box (the return air arrives warmer).
            var (supplyFan, returnFan) = FanPowerW(ms, rho);
            fanW = supplyFan + returnFan;
            tCoil = tSup - supplyFan / (ms * _cpReturn);
            double tRa = _tR + returnFan / (ms * _cpReturn);
            double xMin = Math.Min(1.0, rho * _voa / ms);
            bool exact = false;
            x = xMin;
            if (economizer)
            {
                double ratio = (tRa - tCoil) / (tRa - tO);
                if (ratio >= 1.0)
                {
                    x = 1.0;
                }
                else if (ratio > xMin)
                {
                    x = ratio;
                    exact = true;
                }
            }

            // x at the unclamped ratio mixes to exactly the coil-leaving temperature by construction.
            tMix = exact ? tCoil : x * tO + (1.0 - x) * tRa;
            wMix = x * wO + (1.0 - x) * wR;
            if (!_actual)
            {
                break;
            }

            double rhoNew = MoistAir.DryAirDensity(tMix, wMix, SitePressurePa);
            if (Math.Abs(rhoNew - rho) <= 1e-12 * rho)
            {
                break;
            }

            rho = rhoNew;
        }

        double hMix = MoistAir.Enthalpy(tMix, wMix);
        double limit = tCoil == _tS ? CoilLeavingHumidityLimit : MoistAir.HumidityRatioFromRelativeHumidity(tCoil, Settings.CoilLeavingRelativeHumidity, SitePressurePa);
        double wLeave = Math.Min(wMix, limit);
        double dt = tMix - tCoil;
        double cpMix = MoistAir.HumidSpecificHeat(wMix);
        double sensible = dt > TemperatureToleranceK ? ms * cpMix * dt : 0.0;
        double preheat = dt < -TemperatureToleranceK ? -ms * cpMix * dt : 0.0;
        double latentHeat = tCoil == _tS ? _latentAtSupply : MoistAir.CondensingHeat(tCoil);
        double latent = wMix > wLeave ? ms * (wMix - wLeave) * latentHeat : 0.0;

        // What the supply delivers to the zones against what the load line asks.
        double delivered = ms * _cpReturn * (_tR - tSup);
        double excess = delivered - qb;
        double tolerance = 1e-9 * Math.Max(qb, 1.0);
        var mode = qb > 0 ? EconomizerMode.MinimumOutdoorAir : EconomizerMode.NoCooling;
        return new EconomizerHour(mode, x, tMix, wMix, hMix, wLeave, ms, sensible, latent)
        {
            SupplyDryBulbC = tSup,
            PreheatW = preheat,
            ReheatW = excess > tolerance ? excess : 0.0,
            UnmetW = excess < -tolerance ? -excess : 0.0,
            FanW = fanW,
        };
    }

    /// <summary>
    /// The supply mass flow, kg/s, and supply temperature, C, of the system type at a load, for a
    /// set supply temperature and a dry-air density: variable volume m_s = Q_b / (c_p (T_r - T_set))
    /// bounded to [rho V_min, rho V_max] at T_set; single zone rho V_s at
    /// T_s = max(T_set, T_r - Q_b / (m_s c_p)); constant volume with reheat rho V_s at T_set.
    /// </summary>
    private (double MassFlow, double SupplyC) SupplyFlowAndTemperature(double qb, double tSet, double rho)
    {
        switch (_system)
        {
            case AirSystemType.VariableVolume:
                double required = qb / (_cpReturn * (_tR - tSet));
                return (Math.Clamp(required, rho * _vsMin, rho * _vs), tSet);
            case AirSystemType.SingleZone:
                double m = rho * _vs;
                return (m, Math.Max(tSet, _tR - qb / (m * _cpReturn)));
            default:
                return (rho * _vs, tSet);
        }
    }
}
