using System.Globalization;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Study;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;
using BinEnergy.Reporting.Html;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Maps a finished study run onto the chart inputs and the HTML report model, and writes
/// <c>charts/*.png|svg</c> and <c>report.html</c> into the run's output folder. It only
/// reformats and converts results the engine computed; no physics here (the psychrometric
/// chart's curves come from Core's <see cref="ChartCurves"/>).
/// </summary>
public static class StudyReport
{
    /// <summary>Renders every chart of the run (per climate: for the first variant; across climates: all cases).</summary>
    public static IReadOnlyList<(string Name, RenderedChart Chart)> Charts(StudyRunResult run)
    {
        var units = run.Study.Units;
        bool ip = units == UnitSystem.IP;
        string tUnit = ip ? "F" : "C";
        string eUnit = ip ? "kBtu" : "kWh";
        double T(double c) => Temperature.FromCelsius(c).In(units);
        double E(double j) => Energy.FromJoules(j).In(units);
        var charts = new List<(string, RenderedChart)>();

        foreach (var climateCases in run.Cases.GroupBy(c => c.Case.Climate.Name))
        {
            var first = climateCases.First();
            string climate = climateCases.Key;
            string slug = Slug(climate);
            string subject = $"{climate}, {first.Case.Variant.Name}";

            charts.Add(($"bin-hours-{slug}", BinHoursChart.Render(new BinChartData
            {
                Subject = climate,
                TemperatureUnit = tUnit,
                Bins = first.Bins.Select(b => new BinHoursRow(T(b.LowC), T(b.HighC), b.HoursOccupied, b.Hours - b.HoursOccupied,
                    b.Hours > 0 ? T(b.MeanCoincidentWetBulbC) : null)).ToList(),
            })));

            charts.Add(($"load-by-bin-{slug}", LoadByBinChart.Render(new LoadByBinData
            {
                Subject = subject,
                TemperatureUnit = tUnit,
                EnergyUnit = eUnit,
                Bins = first.Bins.Select(b => new LoadByBinRow(T(b.LowC), T(b.HighC), E(b.Loads.HeatingJ), E(b.Loads.CoolingSensibleJ),
                    E(b.Loads.CoolingLatentJ), E(b.Loads.HumidificationJ))).ToList(),
            })));

            var eco = first.EconomizerEvaluation;
            EconomizerRegionLimits? region = eco is null ? null : new EconomizerRegionLimits(
                "differential enthalpy region (return air)",
                Math.Min(eco.Settings.ReturnTemperature.Celsius, eco.Settings.Limits.DryBulb.Celsius),
                MoistAir.Enthalpy(eco.Settings.ReturnTemperature.Celsius,
                    MoistAir.HumidityRatioFromRelativeHumidity(eco.Settings.ReturnTemperature.Celsius, eco.Settings.ReturnRelativeHumidity, first.Weather.Site.SitePressurePa)));
            charts.Add(($"psychrometric-{slug}", PsychrometricChart.Render(PsychroChartData.FromSi(
                climate, first.Weather.DryBulbC, first.Weather.HumidityRatio, first.Weather.Site.SitePressurePa, units, region))));

            if (eco is not null)
            {
                var best = eco.Best;
                charts.Add(($"economizer-modes-{slug}", EconomizerModesChart.Render(new EconomizerModesData
                {
                    Subject = subject,
                    ControlName = best.Control.Describe(),
                    TemperatureUnit = tUnit,
                    Bins = eco.Bins.Select((b, i) => new EconomizerModesRow(b.Low.In(units), b.High.In(units),
                        best.ByBin[i].HoursNoCooling, best.ByBin[i].HoursFree, best.ByBin[i].HoursIntegrated, best.ByBin[i].HoursMinimum)).ToList(),
                })));
                charts.Add(($"economizer-savings-{slug}", EconomizerSavingsChart.Render(new SavingsByControlData
                {
                    Subject = subject + " (hourly method)",
                    EnergyUnit = eUnit + " coil",
                    Controls = eco.Controls.Select(c => new ControlSavingsRow(c.Control.Describe(), c.HourlySavings.In(units))).ToList(),
                })));
            }

            charts.Add(($"monthly-{slug}", MonthlyEnergyChart.Render(new MonthlyEnergyData
            {
                Subject = subject,
                EnergyUnit = eUnit,
                Series =
                [
                    new MonthlyEnergySeries("heating", Months(first, f => E(f.HeatingJ)), ChartPalette.Heating),
                    new MonthlyEnergySeries("sensible cooling", Months(first, f => E(f.CoolingSensibleJ)), ChartPalette.SensibleCooling),
                    new MonthlyEnergySeries("latent cooling", Months(first, f => E(f.CoolingLatentJ)), ChartPalette.LatentCooling),
                ],
            })));

            charts.Add(($"bin-vs-hourly-{slug}", BinVsHourlyChart.Render(new BinVsHourlyData
            {
                Subject = subject,
                EnergyUnit = eUnit,
                Rows =
                [
                    new BinVsHourlyRow("heating", E(first.AnnualBin.HeatingJ), E(first.AnnualHourly.HeatingJ)),
                    new BinVsHourlyRow("sensible cooling", E(first.AnnualBin.CoolingSensibleJ), E(first.AnnualHourly.CoolingSensibleJ)),
                    new BinVsHourlyRow("latent cooling", E(first.AnnualBin.CoolingLatentJ), E(first.AnnualHourly.CoolingLatentJ)),
                    new BinVsHourlyRow("humidification", E(first.AnnualBin.HumidificationJ), E(first.AnnualHourly.HumidificationJ)),
                ],
            })));
        }

        var comparison = new ComparisonData
        {
            Subject = run.Study.Name,
            EnergyUnit = eUnit + " outdoor-air load",
            CostUnit = run.Study.Currency.ToUpperInvariant(),
            Cells = run.Cases.Select(c => new ComparisonCell(c.Case.Climate.Name, c.Case.Variant.Name,
                E(c.AnnualBin.HeatingJ + c.AnnualBin.CoolingSensibleJ + c.AnnualBin.CoolingLatentJ + c.AnnualBin.HumidificationJ),
                c.AnnualBin.Total.Cost)).ToList(),
        };
        charts.Add(("comparison-energy", ComparisonChart.RenderEnergy(comparison)));
        charts.Add(("comparison-cost", ComparisonChart.RenderCost(comparison)));
        return charts;
    }

    /// <summary>The report model of a run, with its charts.</summary>
    public static ReportModel Model(StudyRunResult run, IReadOnlyList<(string Name, RenderedChart Chart)> charts, DateTimeOffset runAt)
    {
        var units = run.Study.Units;
        bool ip = units == UnitSystem.IP;
        string eUnit = ip ? "kBtu" : "kWh";
        double E(double j) => Energy.FromJoules(j).In(units);
        var first = run.Cases[0];
        var a = first.OutdoorAir.Assumptions;
        string densityText = ip
            ? F(a.DryAirDensity / Conversions.KilogramsPerPound * Conversions.CubicMetresPerCubicFoot, 4) + " lb/ft3 of dry air"
            : F(a.DryAirDensity, 4) + " kg/m3 of dry air";
        var repairs = run.Cases.GroupBy(c => c.Case.Climate.Name).Select(g =>
        {
            var q = g.First().Weather.Quality;
            string counts = q.TotalRepairs == 0 ? "no repairs" : string.Join(", ", q.Repairs.Select(kv => $"{kv.Key}: {kv.Value}"));
            if (q.Disagreements.Any())
            {
                counts += "; checked, not changed: " + string.Join(", ", q.Disagreements.Select(kv => $"{kv.Key}: {kv.Value} hours where the file's own value disagrees with the humidity used"));
            }

            return $"{g.Key} ({g.First().Weather.Count} hours): {counts}";
        }).ToList();

        var annualRows = run.Cases.Select(c => (IReadOnlyList<string>)
        [
            c.Case.Climate.Name, c.Case.Variant.Name,
            F(c.Case.OutdoorAir.EffectiveAirflow.In(units), 0),
            F(E(c.AnnualBin.HeatingJ), 0), F(E(c.AnnualBin.CoolingSensibleJ), 0), F(E(c.AnnualBin.CoolingLatentJ), 0),
            F(E(c.AnnualBin.RecoveredHeatingJ + c.AnnualBin.RecoveredCoolingJ), 0),
            Pct(c.AnnualBin.HeatingJ, c.AnnualHourly.HeatingJ), Pct(c.AnnualBin.CoolingLatentJ, c.AnnualHourly.CoolingLatentJ),
            F(c.AnnualBin.Total.Cost, 0), F(c.AnnualBin.Total.CarbonKg, 0),
        ]).ToList();
        var sections = new List<ReportSection>
        {
            new("Annual outdoor-air loads, cost and carbon",
            [
                new ReportTable($"Bin method per climate and variant ({eUnit}); the difference columns compare it with the hourly check",
                    ["climate", "variant", ip ? "airflow cfm" : "airflow L/s", "heating", "sensible cooling", "latent cooling", "recovered",
                        "heating bin vs hourly", "latent bin vs hourly", "cost " + run.Study.Currency.ToUpperInvariant(), "carbon kg"],
                    annualRows),
                new ReportParagraph("Latent loads are where one-dimensional dry-bulb bins err most: the loads are evaluated at each bin's mean coincident humidity ratio, and a latent load is not linear in humidity. The tables in tables/ hold the hourly method beside the bin method for every figure."),
            ]),
        };
        foreach (var (name, chart) in charts)
        {
            sections.Add(new ReportSection(chart.Title, [new ReportChart(chart, chart.Description)]));
        }

        return new ReportModel
        {
            StudyName = run.Study.Name,
            Run = new ReportRunInfo
            {
                Inputs =
                [
                    new ReportKeyValue("study file", Path.GetFileName(run.Study.File)),
                    new ReportKeyValue("climates", string.Join(", ", run.Study.Climates.Select(c => c.Name))),
                    new ReportKeyValue("variants", string.Join(", ", run.Study.Variants.Select(v => v.Name))),
                    new ReportKeyValue("units", ip ? "IP (F, kBtu, cfm)" : "SI (C, kWh, L/s)"),
                ],
                StudyHash = run.Study.Hash,
                EngineVersion = run.EngineVersion,
                RunAt = runAt,
            },
            Assumptions = new ReportAssumptions
            {
                FlowBasis = a.FlowBasis.ToString().ToLowerInvariant(),
                AirDensity = densityText + " (first climate)",
                SiteSensibleFactor = F(a.Factors.SensibleIp, 3) + " Btu/(h cfm F) = " + F(a.Factors.SensibleSi, 3) + " W/(L/s K) at the first climate",
                BinWidth = F(a.BinScale.Width, 1) + (ip ? " F" : " C") + ", aligned to multiples of the width, lower edge inclusive; loads evaluated at "
                    + (a.BinPoint == BinEvaluationPoint.Midpoint ? "each bin's midpoint (the classic method)" : "the mean dry-bulb of each bin's ventilated hours")
                    + " with its mean coincident humidity ratio",
                Calendar = a.Calendar,
                Schedule = a.Schedule,
                DataRepairs = repairs,
            },
            Results = sections,
            Warnings = run.Warnings,
        };
    }

    /// <summary>Writes the charts into <c>charts/</c> and the report into <c>report.html</c> of the folder being written.</summary>
    public static void WriteInto(OutputFolder output, StudyRunResult run, DateTimeOffset runAt)
    {
        var charts = Charts(run);
        foreach (var (name, chart) in charts)
        {
            File.WriteAllBytes(output.PathFor("charts", name + ".png"), chart.Png);
            File.WriteAllText(output.PathFor("charts", name + ".svg"), chart.Svg);
        }

        File.WriteAllText(output.PathFor("report.html"), HtmlReport.Build(Model(run, charts, runAt)));
    }

    private static IReadOnlyList<double> Months(StudyCaseResult c, Func<Core.Study.Results.LoadFigures, double> pick)
    {
        var values = new double[12];
        foreach (var (month, figures) in c.Months)
        {
            values[month - 1] += pick(figures);
        }

        return values;
    }

    /// <summary>A file-name-safe form of a name: lower case ASCII letters and digits, other runs to one dash.</summary>
    public static string Slug(string name, string fallback = "climate")
    {
        var chars = name.ToLowerInvariant().Select(ch => char.IsAsciiLetterOrDigit(ch) ? ch : '-').ToArray();
        string s = string.Join("-", new string(chars).Split('-', StringSplitOptions.RemoveEmptyEntries));
        return s.Length == 0 ? fallback : s;
    }

    private static string Pct(double bin, double hourly) =>
        hourly == 0 ? (bin == 0 ? "0 %" : "n/a") : ((bin - hourly) / Math.Abs(hourly) * 100).ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture) + " %";

    private static string F(double v, int digits) => v.ToString("N" + digits, CultureInfo.InvariantCulture);
}
