using BinEnergy.Core.Climate;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Loads;

/// <summary>
/// Outdoor-air load rates at the record's design conditions (DESIGN 7.4), with the states at
/// the site pressure: heating at the 99.6 % dry-bulb with the mean coincident humidity ratio of
/// its coincident hours (<see cref="CoincidentHours"/>); cooling at the
/// 0.4 % dry-bulb with its mean coincident wet-bulb (W from eq. 33 or 35); dehumidification at
/// the 0.4 % dew point (W from the dew point, eq. 20) with its mean coincident dry-bulb.
/// </summary>
internal static class DesignPeakLoads
{
    public static OutdoorAirPeaks Compute(HourlyWeather weather, OutdoorAirSettings settings, DesignConditions design)
    {
        double p = weather.Site.SitePressurePa;
        var with = new OutdoorAirLoad(settings, p);
        var without = settings.Recovery is null ? with : new OutdoorAirLoad(settings with { Recovery = null }, p);
        double v = settings.EffectiveAirflow.CubicMetresPerSecond;

        OutdoorAirPeak Peak(string condition, string key, double t, double w)
        {
            double rho = FlowBasisDensity.For(settings.FlowBasis, p, t, w, p);
            var dryBulb = Temperature.FromCelsius(t);
            var ratio = HumidityRatio.FromKilogramsPerKilogram(w);
            return new OutdoorAirPeak(condition, key, dryBulb, ratio,
                Temperature.FromCelsius(HourlyStateSolver.WetBulb(t, w, p)),
                Temperature.FromCelsius(w > 0 ? Math.Min(MoistAir.DewPoint(w, p, weather.HumidityOver), t) : double.NegativeInfinity),
                with.OneHourAt(dryBulb, ratio, rho * v), without.OneHourAt(dryBulb, ratio, rho * v));
        }

        double th = design.Heating996DryBulbC;
        double heatingW = CoincidentHumidityRatio(weather, th, p);
        var cool = design.Cooling[0];
        double tc = cool.DryBulbC;
        double coolW = HumidityRatioFromWetBulb(tc, cool.MeanCoincidentWetBulbC, p);
        var dehum = design.Dehumidification[0];
        double dehumT = Math.Max(dehum.MeanCoincidentDryBulbC, dehum.DewPointC);
        double dehumW = dehum.HumidityRatio; // at the design dew point and site pressure, in the record's convention
        return new OutdoorAirPeaks(
            Peak("Heating 99.6 % dry-bulb", "heating_99_6", th, heatingW),
            Peak("Cooling 0.4 % dry-bulb, MCWB", "cooling_0_4", tc, coolW),
            Peak("Dehumidification 0.4 % dew point, MCDB", "dehumidification_0_4", dehumT, dehumW),
            DesignConditions.Basis);
    }

    /// <summary>
    /// W from a mean coincident wet-bulb: a mean over hours around the design dry-bulb can fall
    /// just outside the possible range at the design dry-bulb itself (drier than dry air, or
    /// above saturation), so it is held inside it.
    /// </summary>
    private static double HumidityRatioFromWetBulb(double dryBulbC, double wetBulbC, double pressurePa)
    {
        double dryAirWetBulb = MoistAir.WetBulb(dryBulbC, 0.0, pressurePa);
        return wetBulbC <= dryAirWetBulb ? 0.0 : MoistAir.HumidityRatioFromWetBulb(dryBulbC, Math.Min(wetBulbC, dryBulbC), pressurePa);
    }

    /// <summary>Mean humidity ratio of the coincident hours of a dry-bulb, capped at saturation at it.</summary>
    private static double CoincidentHumidityRatio(HourlyWeather weather, double dryBulbC, double pressurePa)
    {
        double w = CoincidentHours.AroundSorted(DesignConditions.SortedDryBulb(weather), dryBulbC).MeanOf(weather.DryBulbC, weather.HumidityRatio);
        return Math.Min(w, Saturation.HumidityRatio(dryBulbC, pressurePa));
    }
}
