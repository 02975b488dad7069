using BinEnergy.Core.Economizer;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;
using BinEnergy.Reporting.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// The charts of a real run (the demo study): the economizer charts show one control throughout,
/// the savings chart carries the cost the economizer table gives, every legend has one style,
/// and the psychrometric chart's region is exactly where the economizer model enables the
/// economizer.
/// </summary>
public class ChartStudyTests
{
    private static readonly Lazy<StudyRunResult> Demo = new(() =>
        StudyRunner.Run(StudyFileReader.Read(Path.Combine(RepoPaths.Root, "weather-samples", "demo", "demo-study.toml")), false, null, CancellationToken.None));

    private static readonly Lazy<IReadOnlyList<StudyChart>> Charts = new(() => StudyReport.Charts(Demo.Value));

    [Fact]
    public void EconomizerCharts_ShowTheSameControl_AndTheRegionOverTheHours()
    {
        var run = Demo.Value;
        var slugs = StudyReport.UniqueSlugs(run.Study.Climates.Select(c => c.Name).ToList());
        foreach (var group in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            var eco = group.First().Economizer!;
            string control = eco.Best(run.Study.HeadlineMethod).Control.Describe();
            // The psychrometric chart of a climate shows the control of its first detailed variant's modes chart.
            var modes = Charts.Value.Single(c => c.Name == $"{EconomizerModesChart.FileStem}-{slugs[group.Key]}-minimum").Chart;
            var psychro = Charts.Value.Single(c => c.Name == $"{PsychrometricChart.FileStem}-{slugs[group.Key]}").Chart;
            Assert.Contains(control, modes.Title, StringComparison.Ordinal);
            Assert.Contains(control, psychro.Title, StringComparison.Ordinal);

            // Drawing order: the density first, then the region over it.
            var kinds = psychro.Series.Select(s => s.Kind).ToList();
            Assert.True(kinds.IndexOf(PlottedSeriesKind.Density) < kinds.IndexOf(PlottedSeriesKind.Area));
            Assert.Equal(group.First().Weather.Count, psychro.SeriesLabelled(PsychrometricChart.HoursLabel).Total, 9);

            // Stacked modes: the bins whose hours are mixed draw more than one segment at one position.
            var byBin = eco.Best(run.Study.HeadlineMethod).ByBin;
            int mixed = byBin.Count(b => new[] { b.Hourly.HoursNoCooling, b.Hourly.HoursFree, b.Hourly.HoursIntegrated, b.Hourly.HoursMinimum }.Count(h => h > 0) > 1);
            int stacked = modes.Series.SelectMany(s => s.X).GroupBy(x => x).Count(g => g.Count() > 1);
            Assert.True(mixed > 0, "the demo has bins with hours in more than one mode");
            Assert.Equal(mixed, stacked);
        }
    }

    [Fact]
    public void SavingsChart_DrawsTheEnergyAndCostOfTheEconomizerTable()
    {
        var run = Demo.Value;
        var slugs = StudyReport.UniqueSlugs(run.Study.Climates.Select(c => c.Name).ToList());
        var first = run.Cases.First();
        var eco = first.Economizer!;
        Assert.True(eco.HasPlant); // the demo gives prices
        var chart = Charts.Value.Single(c => c.Name == $"{EconomizerSavingsChart.FileStem}-{slugs[first.Case.Climate.Name]}-{first.Case.Variant.Name}").Chart;
        var cost = chart.SeriesLabelled(EconomizerSavingsChart.CostLabel);
        Assert.Equal(eco.Controls.Select(c => c.PurchasedSavings(run.Study.HeadlineMethod).Cost), cost.Y.ToArray(), new Tolerance(1e-9));
        var energy = chart.SeriesLabelled(EconomizerSavingsChart.EnergyLabel);
        Assert.Equal(eco.Controls.Select(c => c.Savings(run.Study.HeadlineMethod).Kbtu), energy.Y.ToArray(), new Tolerance(1e-6));
        Assert.Contains(EconomizerSavingsChart.CostLabel + " (right axis)", chart.LegendLabels);
        Assert.Contains("right axis", chart.Description, StringComparison.Ordinal);
    }

    [Fact]
    public void EveryChart_HasOneLegendStyle_AndBinCaptionsStateTheWidth()
    {
        var run = Demo.Value;
        var names = run.Study.Variants.Select(v => v.Name).Concat(run.Study.Climates.Select(c => c.Name)).ToHashSet(StringComparer.Ordinal);
        foreach (var (name, chart) in Charts.Value)
        {
            Assert.NotEmpty(chart.LegendLabels);
            foreach (string label in chart.LegendLabels)
            {
                // Our own words in sentence case; names from the study as the user wrote them.
                Assert.True(names.Contains(label) || char.IsUpper(label[0]), $"{name}: legend entry '{label}' is not in sentence case");
            }

            if (name.StartsWith(BinHoursChart.FileStem + "-", StringComparison.Ordinal)
                || name.StartsWith(LoadByBinChart.FileStem + "-", StringComparison.Ordinal)
                || name.StartsWith(EconomizerModesChart.FileStem + "-", StringComparison.Ordinal))
            {
                Assert.Contains("each 5 F dry-bulb bin", chart.Description, StringComparison.Ordinal); // the demo's bins are 5 F wide
            }
        }
    }

    [Theory]
    [InlineData(HighLimitKind.FixedDryBulb)]
    [InlineData(HighLimitKind.DifferentialDryBulb)]
    [InlineData(HighLimitKind.FixedEnthalpy)]
    [InlineData(HighLimitKind.DifferentialEnthalpy)]
    [InlineData(HighLimitKind.FixedDewPoint)]
    public void EconomizerRegion_IsWhereTheModelEnablesTheEconomizer(HighLimitKind kind)
    {
        var model = Demo.Value.Cases.First().Economizer!.Model;
        double p = model.SitePressurePa;
        var control = new EconomizerControl(kind);
        var limits = EconomizerRegionLimits.For(control, model, Core.Units.UnitSystem.IP);
        var polygon = ChartCurves.EconomizerRegion(-20, p, limits.DryBulbLimitC, limits.EnthalpyLimitJPerKg, limits.DewPointLimitC);
        Assert.Equal(control.Describe(), limits.ControlName);

        bool Enabled(double t, double w) => model.IsEnabled(control, t, MoistAir.Enthalpy(t, w), MoistAir.DewPoint(w, p));
        int inside = 0, compared = 0;
        for (double t = -15; t <= 40; t += 0.7)
        {
            double saturation = Saturation.HumidityRatio(t, p);
            for (double f = 0.03; f < 1; f += 0.06)
            {
                double w = f * saturation;
                // Leave out states within the polygon's sampling of the boundary (0.5 K steps).
                bool near = new[] { (-0.4, 0.0), (0.4, 0.0), (0.0, -0.0004), (0.0, 0.0004) }
                    .Any(d => Enabled(t + d.Item1, Math.Max(1e-5, w + d.Item2)) != Enabled(t, w));
                if (near)
                {
                    continue;
                }

                compared++;
                bool drawn = Inside(polygon, t, w);
                Assert.True(drawn == Enabled(t, w), FormattableString.Invariant($"{kind}: at {t:0.0} C, W {w:0.0000} the chart shows {(drawn ? "enabled" : "disabled")}, the model {(Enabled(t, w) ? "enabled" : "disabled")}"));
                inside += drawn ? 1 : 0;
            }
        }

        Assert.True(inside > 20 && compared - inside > 20, $"{kind}: {inside} of {compared} states inside; the check needs both kinds");
    }

    [Fact]
    public void EconomizerRegion_OfTheBaseline_IsRefusedWithAClearMessage()
    {
        var model = Demo.Value.Cases.First().Economizer!.Model;
        var error = Assert.Throws<ArgumentException>(() => EconomizerRegionLimits.For(EconomizerControl.None, model, Core.Units.UnitSystem.IP));
        Assert.Contains("no economizer", error.Message, StringComparison.Ordinal);
    }

    /// <summary>Even-odd ray casting.</summary>
    private static bool Inside(IReadOnlyList<ChartPoint> polygon, double x, double y)
    {
        bool inside = false;
        for (int i = 0, j = polygon.Count - 1; i < polygon.Count; j = i++)
        {
            var (a, b) = (polygon[i], polygon[j]);
            if ((a.HumidityRatio > y) != (b.HumidityRatio > y)
                && x < (b.DryBulbC - a.DryBulbC) * (y - a.HumidityRatio) / (b.HumidityRatio - a.HumidityRatio) + a.DryBulbC)
            {
                inside = !inside;
            }
        }

        return inside;
    }

    private sealed class Tolerance(double absolute) : IEqualityComparer<double>
    {
        public bool Equals(double x, double y) => Math.Abs(x - y) <= absolute * Math.Max(1, Math.Abs(y));

        public int GetHashCode(double obj) => 0;
    }
}
