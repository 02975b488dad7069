using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// Every chart renders (PNG and SVG) for empty data, one bin, one climate and ten climates, and
/// draws exactly the input: the plotted series' sums equal the input table's sums. Each image
/// is saved under tests/BinEnergy.Tests/artifacts/charts/ for review.
/// </summary>
public class ChartRenderingTests
{
    private static readonly Lazy<InventedClimate[]> Climates = new(() => Enumerable.Range(0, 10).Select(i => InventedClimate.Make(i)).ToArray());

    public static TheoryData<string> Cases => new() { "empty", "one-bin", "one-climate", "ten-climates" };

    private static IEnumerable<InventedClimate> ClimatesFor(string @case) => @case == "ten-climates" ? Climates.Value : Climates.Value.Take(1);

    private static IReadOnlyList<T> Cut<T>(IReadOnlyList<T> rows, string @case) => @case switch
    {
        "empty" => [],
        "one-bin" => [rows[rows.Count / 2]],
        _ => rows,
    };

    private static void AssertImages(RenderedChart chart, string @case, string? name = null)
    {
        Assert.True(chart.Png.Length > 1000);
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, chart.Png[..4]); // PNG signature (PNG specification, section 5.2)
        Assert.Contains("<svg", chart.Svg, StringComparison.Ordinal);
        Assert.Equal(@case == "empty", chart.IsEmpty);
        ChartReview.Save(chart, name ?? @case);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void BinHours_DrawsTheHoursAndWetBulbsOfTheTable(string @case)
    {
        foreach (var climate in ClimatesFor(@case))
        {
            var full = ReportingSamples.Bins(climate);
            var data = full with { Bins = Cut(full.Bins, @case) };
            var chart = BinHoursChart.Render(data);

            Assert.Equal(data.Bins.Sum(b => b.OccupiedHours), chart.SeriesLabelled(BinHoursChart.OccupiedLabel).Total, 9);
            Assert.Equal(data.Bins.Sum(b => b.UnoccupiedHours), chart.SeriesLabelled(BinHoursChart.UnoccupiedLabel).Total, 9);
            var wetBulb = chart.SeriesLabelled(BinHoursChart.WetBulbLabel);
            Assert.Equal(data.Bins.Select(b => b.MeanCoincidentWetBulb!.Value), wetBulb.Y);
            Assert.Equal(data.Bins.Select(b => (b.LowEdge + b.HighEdge) / 2), wetBulb.X);
            if (@case != "empty" && @case != "one-bin")
            {
                Assert.Equal(climate.Hours, chart.Series.Where(s => s.Kind == PlottedSeriesKind.Bars).Sum(s => s.Total), 9); // hours sum to the record
            }

            AssertImages(chart, @case, @case == "ten-climates" ? climate.Name.Replace(' ', '-') : null);
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void LoadByBin_DrawsEachComponentOfTheTable(string @case)
    {
        foreach (var climate in ClimatesFor(@case))
        {
            var full = ReportingSamples.Loads(climate);
            var data = full with { Bins = Cut(full.Bins, @case) };
            var chart = LoadByBinChart.Render(data);
            Assert.Equal(data.Bins.Sum(b => b.Heating), chart.SeriesLabelled(LoadByBinChart.HeatingLabel).Total, 6);
            Assert.Equal(data.Bins.Sum(b => b.SensibleCooling), chart.SeriesLabelled(LoadByBinChart.SensibleCoolingLabel).Total, 6);
            Assert.Equal(data.Bins.Sum(b => b.LatentCooling), chart.SeriesLabelled(LoadByBinChart.LatentCoolingLabel).Total, 6);
            bool empty = data.Bins.All(b => b.Heating + b.SensibleCooling + b.LatentCooling == 0);
            AssertImages(chart, empty ? "empty" : @case, @case == "ten-climates" ? climate.Name.Replace(' ', '-') : (empty && @case != "empty" ? @case : null));
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void EconomizerModes_DrawsTheHoursOfEachMode(string @case)
    {
        foreach (var climate in ClimatesFor(@case))
        {
            var full = ReportingSamples.Modes(climate);
            var data = full with { Bins = Cut(full.Bins, @case) };
            var chart = EconomizerModesChart.Render(data);
            Assert.Equal(data.Bins.Sum(b => b.NoCoolingHours), chart.SeriesLabelled(EconomizerModesChart.NoCoolingLabel).Total, 9);
            Assert.Equal(data.Bins.Sum(b => b.FreeCoolingHours), chart.SeriesLabelled(EconomizerModesChart.FreeCoolingLabel).Total, 9);
            Assert.Equal(data.Bins.Sum(b => b.IntegratedHours), chart.SeriesLabelled(EconomizerModesChart.IntegratedLabel).Total, 9);
            Assert.Equal(data.Bins.Sum(b => b.MinimumOutdoorAirHours), chart.SeriesLabelled(EconomizerModesChart.MinimumOutdoorAirLabel).Total, 9);
            if (@case is "one-climate" or "ten-climates")
            {
                Assert.Equal(climate.Occupied.Count(o => o), chart.Series.Sum(s => s.Total), 9); // modes cover every occupied hour
            }

            AssertImages(chart, @case, @case == "ten-climates" ? climate.Name.Replace(' ', '-') : null);
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void EconomizerSavings_DrawsEveryControlsEnergyAndCost(string @case)
    {
        var full = ReportingSamples.Savings(@case == "ten-climates" ? "ten invented climates" : InventedClimate.Names[0]);
        var data = full with { Controls = Cut(full.Controls, @case) };
        var chart = EconomizerSavingsChart.Render(data);
        Assert.Equal(data.Controls.Select(c => c.EnergySavings), chart.SeriesLabelled(EconomizerSavingsChart.EnergyLabel).Y);
        if (data.Controls.Count > 0)
        {
            Assert.Equal(data.Controls.Sum(c => c.CostSavings!.Value), chart.SeriesLabelled(EconomizerSavingsChart.CostLabel).Total, 9);
        }

        AssertImages(chart, @case);
    }

    [Fact]
    public void EconomizerSavings_WithoutCosts_DrawsEnergyOnly()
    {
        var data = ReportingSamples.Savings("no prices") with { CostUnit = null };
        var chart = EconomizerSavingsChart.Render(data);
        Assert.Single(chart.Series);
        Assert.Equal(data.Controls.Sum(c => c.EnergySavings), chart.Series[0].Total, 9);
        ChartReview.Save(chart, "energy-only");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Comparison_DrawsEveryClimateAndVariant(string @case)
    {
        int climates = @case switch { "empty" => 0, "ten-climates" => 10, _ => 1 };
        var data = ReportingSamples.Comparison(climates);
        var energy = ComparisonChart.RenderEnergy(data);
        var cost = ComparisonChart.RenderCost(data);
        foreach (var variant in data.Cells.Select(c => c.Variant).Distinct())
        {
            var cells = data.Cells.Where(c => c.Variant == variant).ToArray();
            Assert.Equal(cells.Sum(c => c.AnnualEnergy), energy.SeriesLabelled(variant).Total, 6);
            Assert.Equal(cells.Sum(c => c.AnnualCost), cost.SeriesLabelled(variant).Total, 6);
            Assert.Equal(climates, energy.SeriesLabelled(variant).Count);
        }

        Assert.Equal(climates == 0 ? 0 : 4, energy.Series.Count);
        AssertImages(energy, @case);
        AssertImages(cost, @case);
    }

    [Fact]
    public void Comparison_MissingCaseLeavesAGapAndDuplicatesAreRefused()
    {
        var data = ReportingSamples.Comparison(3);
        var gap = data with { Cells = data.Cells.Skip(1).ToArray() };
        var chart = ComparisonChart.RenderEnergy(gap);
        Assert.Equal(2, chart.SeriesLabelled(data.Cells[0].Variant).Count);
        var twice = data with { Cells = data.Cells.Append(data.Cells[0]).ToArray() };
        var error = Assert.Throws<ArgumentException>(() => ComparisonChart.RenderEnergy(twice));
        Assert.Contains(data.Cells[0].Climate, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Comparison_EightVariants_RepeatColoursWithAHatch()
    {
        var cells = Enumerable.Range(0, 8).SelectMany(v => InventedClimate.Names.Take(3).Select((c, i) => new ComparisonCell(c, $"Variant {v + 1}", 100 + 10 * v + i, 1000 + v))).ToArray();
        var chart = ComparisonChart.RenderEnergy(new ComparisonData { EnergyUnit = "MBtu", CostUnit = "USD", Cells = cells });
        Assert.Equal(8, chart.Series.Count);
        Assert.Equal(cells.Sum(c => c.AnnualEnergy), chart.Series.Sum(s => s.Total), 6);
        ChartReview.Save(chart, "eight-variants");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void MonthlyEnergy_DrawsTwelveMonthsOfEachComponent(string @case)
    {
        foreach (var climate in ClimatesFor(@case))
        {
            var full = ReportingSamples.Monthly(climate);
            var data = @case switch
            {
                "empty" => full with { Series = [] },
                "one-bin" => full with { Series = [full.Series[0]] },
                _ => full,
            };
            var chart = MonthlyEnergyChart.Render(data);
            foreach (var s in data.Series)
            {
                Assert.Equal(s.Values.Sum(), chart.SeriesLabelled(s.Name).Total, 6);
                Assert.All(chart.SeriesLabelled(s.Name).X, x => Assert.InRange(x, 0, 11));
            }

            AssertImages(chart, @case, @case == "ten-climates" ? climate.Name.Replace(' ', '-') : null);
        }
    }

    [Fact]
    public void MonthlyEnergy_RefusesASeriesWithoutTwelveMonths()
    {
        var data = new MonthlyEnergyData { EnergyUnit = "kBtu", Series = [new MonthlyEnergySeries("Heating", new double[11])] };
        var error = Assert.Throws<ArgumentException>(() => MonthlyEnergyChart.Render(data));
        Assert.Contains("Heating", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void MethodCheck_DrawsThreeMethodsOfEveryQuantity(string @case)
    {
        var full = ReportingSamples.MethodCheck(@case == "ten-climates" ? "ten invented climates" : InventedClimate.Names[0]);
        var data = full with { Rows = Cut(full.Rows, @case) };
        var chart = MethodCheckChart.Render(data);
        Assert.Equal(data.Rows.Sum(r => r.BinMethod), chart.SeriesLabelled(MethodCheckChart.BinLabel).Total, 9);
        Assert.Equal(data.Rows.Sum(r => r.JointBin), chart.SeriesLabelled(MethodCheckChart.JointLabel).Total, 9);
        Assert.Equal(data.Rows.Sum(r => r.Hourly), chart.SeriesLabelled(MethodCheckChart.HourlyLabel).Total, 9);
        AssertImages(chart, @case);
    }

    [Fact]
    public void MethodCheck_DifferenceIsPerCentOfHourly()
    {
        Assert.Equal("+1.0 %", MethodCheckChart.Difference(101, 100));
        Assert.Equal("-2.5 %", MethodCheckChart.Difference(39, 40));
        Assert.Equal("both 0", MethodCheckChart.Difference(0, 0));
        Assert.Equal("hourly 0", MethodCheckChart.Difference(3, 0));
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Psychrometric_DrawsEveryHourInTheDensity(string @case)
    {
        foreach (var climate in ClimatesFor(@case))
        {
            var full = ReportingSamples.Psychro(climate);
            var data = @case switch
            {
                "empty" => full with { HourDryBulb = [], HourHumidityRatio = [] },
                "one-bin" => full with { HourDryBulb = [full.HourDryBulb[4000]], HourHumidityRatio = [full.HourHumidityRatio[4000]] },
                _ => full,
            };
            var chart = PsychrometricChart.Render(data);
            var density = chart.SeriesLabelled(PsychrometricChart.HoursLabel);
            Assert.Equal(data.HourDryBulb.Count, density.Total, 9);
            Assert.Equal(data.SaturationCurve.Y, chart.SeriesLabelled(data.SaturationCurve.Label).Y);
            Assert.Equal(4, data.RelativeHumidityLines.Count); // 20, 40, 60, 80 %
            foreach (var line in data.RelativeHumidityLines)
            {
                Assert.Equal(line.Y, chart.SeriesLabelled(line.Label).Y);
            }

            Assert.Equal(PlottedSeriesKind.Area, chart.SeriesLabelled(data.EconomizerRegion!.Label).Kind);
            AssertImages(chart, @case, @case == "ten-climates" ? climate.Name.Replace(' ', '-') : null);
        }
    }

    [Fact]
    public void Psychrometric_SiUnits_Render()
    {
        var climate = Climates.Value[6];
        var data = PsychroChartData.FromSi(climate.Name, climate.DryBulbC, climate.HumidityRatio, climate.PressurePa, Core.Units.UnitSystem.SI,
            new EconomizerRegionLimits("Economizer enabled (fixed enthalpy 47 kJ/kg, dry-bulb 24 C)", 24, 47_000));
        var chart = PsychrometricChart.Render(data);
        Assert.Equal("g/kg", data.HumidityRatioUnit);
        Assert.Equal(climate.Hours, chart.SeriesLabelled(PsychrometricChart.HoursLabel).Total, 9);
        Assert.Contains("image-rendering:pixelated", chart.Svg, StringComparison.Ordinal); // density cells stay sharp in SVG viewers
        ChartReview.Save(chart, "si-enthalpy");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Distribution_DrawsEveryClimateOfEveryVariant(string @case)
    {
        int climates = @case switch { "empty" => 0, "ten-climates" => 10, _ => 1 };
        var values = ReportingSamples.Comparison(climates).Cells.GroupBy(c => c.Variant)
            .Select(g => (g.Key, (IReadOnlyList<double>)g.Select(c => c.AnnualEnergy).ToList())).ToList();
        var data = new DistributionData { Subject = "invented climates", Figure = "Heating", Unit = "MBtu", Variants = values };
        var chart = DistributionChart.Render(data, "distribution-heating");
        foreach (var (variant, v) in values)
        {
            Assert.Equal(v.Sum(), chart.SeriesLabelled(variant).Total, 9); // one dot per climate
            var box = chart.SeriesLabelled(variant + " box").Y;
            Assert.Equal(v.Min(), box[0], 9);
            Assert.Equal(v.Max(), box[4], 9);
        }

        Assert.All(chart.LegendLabels, l => Assert.True(char.IsUpper(l[0]), l));
        AssertImages(chart, @case);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void DegreeDayScatter_DrawsAPointPerClimateAndVariant(string @case)
    {
        int climates = @case switch { "empty" => 0, "ten-climates" => 10, _ => 1 };
        var cells = ReportingSamples.Comparison(climates).Cells;
        var points = cells.GroupBy(c => c.Variant)
            .Select(g => (g.Key, (IReadOnlyList<(double, double)>)g.Select((c, i) => (2000.0 + 450 * i, c.AnnualEnergy)).ToList())).ToList();
        var data = new DegreeDayScatterData { Subject = "invented climates", Figure = "Heating", Unit = "MBtu", DegreeDays = "Heating degree-days, base 65 F (F-day)", Variants = points };
        var chart = DegreeDayScatterChart.Render(data, "heating-against-heating-degree-days");
        foreach (var (variant, p) in points)
        {
            Assert.Equal(p.Count, chart.SeriesLabelled(variant).Count);
            Assert.Equal(p.Sum(x => x.Item2), chart.SeriesLabelled(variant).Total, 9);
        }

        AssertImages(chart, @case);
    }

    [Fact]
    public void BinCharts_TwoDegreeSiBins_CaptionStatesTheWidthAndTicksSitOnTheEdges()
    {
        var climate = Climates.Value[3];
        var rows = Enumerable.Range(0, climate.Hours)
            .GroupBy(h => (int)Math.Floor(Math.Round(climate.DryBulbC[h], 6) / 2.0)) // 2 C bins (DESIGN 6: the SI default)
            .OrderBy(g => g.Key)
            .Select(g => new BinHoursRow(g.Key * 2.0, g.Key * 2.0 + 2.0, g.Count(h => climate.Occupied[h]), g.Count(h => !climate.Occupied[h]),
                g.Average(h => Core.Psychrometrics.MoistAir.WetBulb(climate.DryBulbC[h], climate.HumidityRatio[h], climate.PressurePa))))
            .ToList();
        var chart = BinHoursChart.Render(new BinChartData { Subject = climate.Name, TemperatureUnit = "C", Bins = rows });
        Assert.Contains("each 2 C dry-bulb bin", chart.Description, StringComparison.Ordinal);
        Assert.Equal(climate.Hours, chart.Series.Where(s => s.Kind == PlottedSeriesKind.Bars).Sum(s => s.Total), 9);

        var positions = BinAxis.EdgeTickPositions(rows.Select(r => (r.LowEdge, r.HighEdge)).ToList(), rows[0].LowEdge - 1, rows[^1].HighEdge + 1);
        Assert.InRange(positions.Count, 5, 21);
        Assert.All(positions, p => Assert.Equal(0, Math.IEEERemainder(p, 2.0), 9)); // every tick on a bin edge
        ChartReview.Save(chart, "si-2c-bins");
    }

    [Fact]
    public void Psychrometric_WithoutAnEconomizer_DrawsNoRegionAndSaysSoInTheTitle()
    {
        var data = ReportingSamples.Psychro(Climates.Value[2]) with { EconomizerRegion = null, ControlName = "" };
        var chart = PsychrometricChart.Render(data);
        Assert.DoesNotContain(chart.Series, s => s.Kind == PlottedSeriesKind.Area);
        Assert.DoesNotContain("economizer", chart.Title, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("economizer", chart.Description, StringComparison.OrdinalIgnoreCase);
        Assert.Equal(data.HourDryBulb.Count, chart.SeriesLabelled(PsychrometricChart.HoursLabel).Total, 9);
        ChartReview.Save(chart, "no-economizer");
    }

    [Fact]
    public void Charts_RefuseBadInputWithAClearMessage()
    {
        var bins = new BinChartData { TemperatureUnit = "F", Bins = [new BinHoursRow(50, 55, double.NaN, 0, null)] };
        var error = Assert.Throws<ArgumentException>(() => BinHoursChart.Render(bins));
        Assert.Contains(BinHoursChart.OccupiedLabel, error.Message, StringComparison.Ordinal);
        var reversed = new BinChartData { TemperatureUnit = "F", Bins = [new BinHoursRow(55, 50, 1, 0, null)] };
        Assert.Contains("high above low", Assert.Throws<ArgumentException>(() => BinHoursChart.Render(reversed)).Message, StringComparison.Ordinal);
    }
}
