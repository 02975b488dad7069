using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// The loads one outdoor-air state puts on the building's targets (DESIGN 7.2), after an
/// optional energy recovery device (DESIGN 7.3). Per unit mass of dry air:
/// <list type="bullet">
/// <item>heating c_p (T_h - T_o) when T_o &lt; T_h;</item>
/// <item>sensible cooling c_p (T_o - T_c) when T_o &gt; T_c;</item>
/// <item>latent cooling h_fg (W_o - W_max) when W_o &gt; W_max;</item>
/// <item>humidification h_fg (W_min - W_o) when a minimum is set and W_o &lt; W_min;</item>
/// </list>
/// with c_p = 1.006 + 1.86 W_o kJ/(kg K) and h_fg = 2,501 kJ/kg, the coefficients of ASHRAE
/// Handbook—Fundamentals 2017, ch. 1, eq. 32 (the convention behind the trade's 1.08 and
/// 4,840). W_max is the humidity ratio at T_c and the maximum RH, W_min at T_h and the
/// minimum RH, both at the site pressure (eqs. 12 and 20).
/// </summary>
/// <remarks>
/// <para>Recovery: T' = T_o + e_s (T_x - T_o), W' = W_o + e_l (W_x - W_o), with the exhaust
/// at T_x = T_h when T_o &lt; T_h, T_x = T_c when T_o &gt; T_c, and the indoor humidity
/// W_x = W_o clamped to [W_min, W_max] (the humidity the building holds). Between the
/// setpoints T_x = T_o and inside the humidity band W_x = W_o, so the device is off
/// wherever it would add load. Below the frost limit e_s becomes the frost effectiveness
/// and e_l falls in the same proportion. The sensible loads keep c_p of the outdoor W_o
/// (the latent exchange's effect on c_p, under 0.2 %, is left out), so recovery never
/// raises a load. Recovered energy is the load without the device minus the load with it.</para>
/// </remarks>
public sealed class OutdoorAirLoad
{
    private readonly double th;
    private readonly double tc;
    private readonly double wMax;
    private readonly double wMin;
    private readonly bool hasMin;
    private readonly bool hasRecovery;
    private readonly double es;
    private readonly double el;
    private readonly double frostLimit;
    private readonly double esFrost;
    private readonly double elFrost;

    /// <summary>Sets up the targets at the site pressure (Pa).</summary>
    public OutdoorAirLoad(OutdoorAirSettings settings, double sitePressurePa)
    {
        ArgumentNullException.ThrowIfNull(settings);
        th = settings.HeatTo.Celsius;
        tc = settings.CoolTo.Celsius;
        wMax = MoistAir.HumidityRatioFromRelativeHumidity(tc, settings.MaxRelativeHumidity, sitePressurePa);
        hasMin = settings.MinRelativeHumidity.HasValue;
        wMin = hasMin ? MoistAir.HumidityRatioFromRelativeHumidity(th, settings.MinRelativeHumidity!.Value, sitePressurePa) : 0.0;
        var r = settings.Recovery;
        hasRecovery = r is not null && (r.SensibleEffectiveness > 0 || r.LatentEffectiveness > 0);
        if (r is not null)
        {
            es = r.SensibleEffectiveness;
            el = r.LatentEffectiveness;
            frostLimit = r.FrostLimit?.Celsius ?? double.NegativeInfinity;
            esFrost = r.FrostEffectiveness;
            elFrost = es > 0 ? el * r.FrostEffectiveness / es : 0.0;
        }
    }

    /// <summary>Maximum indoor humidity ratio W_max (at T_c and the maximum RH).</summary>
    public HumidityRatio MaxHumidityRatio => HumidityRatio.FromKilogramsPerKilogram(wMax);

    /// <summary>Minimum indoor humidity ratio W_min (at T_h and the minimum RH), when set.</summary>
    public HumidityRatio? MinHumidityRatio => hasMin ? HumidityRatio.FromKilogramsPerKilogram(wMin) : null;

    /// <summary>
    /// The loads of one hour of outdoor air at a state and a dry-air mass flow (kg/s); the fan
    /// figure is left at zero (the fan is the flow model's). Its energies over 3,600 s are the
    /// load rates: see <see cref="OutdoorAirPeak.Rate"/>.
    /// </summary>
    public LoadVector OneHourAt(Temperature dryBulb, HumidityRatio humidityRatio, double dryAirMassFlowKgPerS)
    {
        var perKg = Evaluate(dryBulb.Celsius, humidityRatio.KilogramsPerKilogram, out _);
        var hour = perKg.Scaled(dryAirMassFlowKgPerS * 3600.0);
        hour.AddHours(1.0);
        return hour;
    }

    /// <summary>
    /// Loads per unit mass of dry air (J/kg in each energy figure; no fan energy, no hours) of an
    /// outdoor state: dry-bulb in C, humidity ratio in kg/kg. <paramref name="recovering"/> says
    /// whether the recovery device changed the air's state.
    /// </summary>
    internal LoadVector Evaluate(double t, double w, out bool recovering)
    {
        double cp = MoistAir.DryAirSpecificHeat + MoistAir.VapourSpecificHeat * w;
        const double hfg = MoistAir.LatentHeat;
        double heat0 = t < th ? cp * (th - t) : 0.0;
        double coolS0 = t > tc ? cp * (t - tc) : 0.0;
        double lat0 = w > wMax ? hfg * (w - wMax) : 0.0;
        double hum0 = hasMin && w < wMin ? hfg * (wMin - w) : 0.0;
        var r = LoadVector.Zero;
        recovering = false;
        if (!hasRecovery)
        {
            r.Add(LoadFigure.Heating, heat0);
            r.Add(LoadFigure.CoolingSensible, coolS0);
            r.Add(LoadFigure.CoolingLatent, lat0);
            r.Add(LoadFigure.Humidification, hum0);
            return r;
        }

        bool frost = t < frostLimit;
        double eS = frost ? esFrost : es;
        double eL = frost ? elFrost : el;
        double tx = t < th ? th : t > tc ? tc : t;
        double wx = w > wMax ? wMax : hasMin && w < wMin ? wMin : w;
        double t1 = t + eS * (tx - t);
        double w1 = w + eL * (wx - w);
        double heat = t1 < th ? cp * (th - t1) : 0.0;
        double coolS = t1 > tc ? cp * (t1 - tc) : 0.0;
        double lat = w1 > wMax ? hfg * (w1 - wMax) : 0.0;
        double hum = hasMin && w1 < wMin ? hfg * (wMin - w1) : 0.0;
        r.Add(LoadFigure.Heating, heat);
        r.Add(LoadFigure.CoolingSensible, coolS);
        r.Add(LoadFigure.CoolingLatent, lat);
        r.Add(LoadFigure.Humidification, hum);
        r.Add(LoadFigure.RecoveredHeating, heat0 - heat + (hum0 - hum));
        r.Add(LoadFigure.RecoveredCooling, coolS0 - coolS + (lat0 - lat));
        recovering = (eS > 0 && tx != t) || (eL > 0 && wx != w);
        return r;
    }
}
