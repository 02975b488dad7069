using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Study.Results;

namespace BinEnergy.Core.Study;

/// <summary>
/// The economizer part of a study case: the economizer engine's evaluation (the same call the
/// <c>economizer</c> command makes) and the compressor electricity of each control's coil
/// energy through the cooling COP at each bin's evaluation point, for both methods (the hourly
/// method's coil energy is taken per bin, so its COP is also the bin's evaluation point's).
/// </summary>
internal static class StudyEconomizer
{
    public static (EconomizerEvaluation? Evaluation, List<EconomizerFigures> Figures) Evaluate(
        StudyCase c, Weather.HourlyWeather weather, bool[] occupied, BinTable table, PlantModel plant, CurveClampCounter clamps)
    {
        if (c.Economizer is null)
        {
            return (null, []);
        }

        var evaluation = EconomizerEvaluation.Evaluate(weather, occupied, table, c.Economizer);
        var figures = new List<EconomizerFigures>();
        foreach (var method in new[] { "bin", "hourly" })
        {
            var baselineCompressor = Compressor(evaluation, evaluation.Baseline, method, plant, clamps);
            foreach (var r in new[] { evaluation.Baseline }.Concat(evaluation.Controls))
            {
                var totals = method == "bin" ? r.Bin : r.Hourly;
                var baseline = method == "bin" ? evaluation.Baseline.Bin : evaluation.Baseline.Hourly;
                var compressor = ReferenceEquals(r, evaluation.Baseline) ? baselineCompressor : Compressor(evaluation, r, method, plant, new CurveClampCounter());
                figures.Add(new EconomizerFigures(method, r.Control.Name, r.Control.Integrated,
                    totals.HoursNoCooling, totals.HoursFree, totals.HoursIntegrated, totals.HoursMinimum,
                    totals.CoilSensible.Joules, totals.CoilLatent.Joules, totals.CoilTotal.Joules,
                    totals.SavingsAgainst(baseline).Joules, compressor, baselineCompressor - compressor));
            }
        }

        return (evaluation, figures);
    }

    private static SiteEnergy Compressor(EconomizerEvaluation e, EconomizerControlResult r, string method, PlantModel plant, CurveClampCounter clamps)
    {
        var byBin = method == "bin" ? r.ByBin : r.ByBinHourly;
        var total = SiteEnergy.Zero;
        for (int b = 0; b < byBin.Count; b++)
        {
            var t = byBin[b];
            total += plant.Cooling(t.CoilTotal.Joules, e.Bins[b].EvaluatedAt.Celsius, t.HoursFree + t.HoursIntegrated + t.HoursMinimum, clamps);
        }

        return total;
    }
}
