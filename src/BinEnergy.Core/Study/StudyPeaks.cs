using BinEnergy.Core.Climate;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Study.Results;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// Peak outdoor-air loads of a case (DESIGN 7.4) at the record's design conditions from the
/// weather engine (<see cref="DesignConditions"/>): heating 99.6 % and 99 % dry-bulb (with the
/// mean humidity ratio of the hours within 0.5 K of it), cooling 0.4/1/2 % dry-bulb with the
/// mean coincident wet-bulb, dehumidification 0.4/1 % dew point with the mean coincident
/// dry-bulb; load rates from the outdoor-air engine's <see cref="OutdoorAirLoad"/> at the
/// design airflow, with the recovery device if any.
/// </summary>
internal static class StudyPeaks
{
    public static List<PeakFigures> Compute(OutdoorAirSettings settings, HourlyWeather weather)
    {
        var design = DesignConditions.FromRecord(weather);
        double p = weather.Site.SitePressurePa;
        var load = new OutdoorAirLoad(settings, p);
        var peaks = new List<PeakFigures>();
        void Add(string name, double t, double coincident, double w, bool heating)
        {
            double rho = FlowBasisDensity.For(settings.FlowBasis, p, t, w, p);
            var r = load.At(Temperature.FromCelsius(t), HumidityRatio.FromKilogramsPerKilogram(w), rho * settings.EffectiveAirflow.CubicMetresPerSecond);
            double sensible = heating ? r.Heating.Watts : r.CoolingSensible.Watts;
            double latent = heating ? r.Humidification.Watts : r.CoolingLatent.Watts;
            peaks.Add(new PeakFigures(name, t, coincident, w, sensible, latent, sensible + latent));
        }

        foreach (var (name, t) in new[] { ("heating_99_6", design.Heating996DryBulbC), ("heating_99", design.Heating990DryBulbC) })
        {
            Add(name, t, double.NaN, CoincidentHumidityRatio(weather, t), heating: true);
        }

        foreach (var c in design.Cooling)
        {
            Add("cooling_" + Name(c.AnnualPercent), c.DryBulbC, c.MeanCoincidentWetBulbC, MoistAir.HumidityRatioFromWetBulb(c.DryBulbC, c.MeanCoincidentWetBulbC, p), heating: false);
        }

        foreach (var d in design.Dehumidification)
        {
            Add("dehumidification_" + Name(d.AnnualPercent), d.MeanCoincidentDryBulbC, d.DewPointC, d.HumidityRatio, heating: false);
        }

        return peaks;
    }

    private static string Name(double percent) => percent.ToString("0.0##", System.Globalization.CultureInfo.InvariantCulture).TrimEnd('0').TrimEnd('.').Replace('.', '_');

    private static double CoincidentHumidityRatio(HourlyWeather weather, double t)
    {
        double sum = 0;
        int n = 0;
        for (int i = 0; i < weather.Count; i++)
        {
            if (Math.Abs(weather.DryBulbC[i] - t) <= DesignConditions.CoincidenceWindowK)
            {
                sum += weather.HumidityRatio[i];
                n++;
            }
        }

        return n > 0 ? sum / n : 0.0;
    }
}
