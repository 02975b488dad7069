using System.Globalization;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Units;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// The three air-system types on the six real check files (the tables of docs/economizer.md, printed
/// to the test output): the reference system of <see cref="EconomizerRealFiles.Reference"/> as
/// single-zone, variable-volume (3,000 cfm minimum) and constant-volume-reheat, with a 3 in. w.g.
/// supply fan at 0.6 (the study default, recalled from memory).
/// </summary>
public class AirSystemRealFileTests(EconomizerRealFiles files, ITestOutputHelper output) : IClassFixture<EconomizerRealFiles>
{
    private static readonly string[] Names = ["Melbourne FL", "Chicago IL", "Albuquerque NM", "Arcata CA", "Sand Point AK", "Piedmont IT"];

    public static EconomizerSettings Typed(AirSystemType type) => EconomizerRealFiles.Reference(true) with
    {
        System = type,
        SupplyAirflowMin = type == AirSystemType.VariableVolume ? VolumeFlow.FromCfm(3_000) : null,
        SupplyFan = new AirSystemFan(3 * 248.84, 0.6), // 3 in. w.g. at 0.6 (recalled from memory)
    };

    [Fact]
    public void ThreeSystemTypes_OnTheSixRealFiles_RankAsThePhysicsSays()
    {
        output.WriteLine("| site | system | baseline coil | reheat | preheat | fans, kWh | differential-drybulb coil saved | differential-enthalpy coil saved | differential-enthalpy reheat saved |");
        output.WriteLine("|---|---|---|---|---|---|---|---|---|");
        for (int s = 0; s < EconomizerRealFiles.Sites.Length; s++)
        {
            string file = EconomizerRealFiles.Sites[s].File;
            var w = files.Weather[file];
            var occ = files.Occupied[file];
            var bins = BinTable.Build(w, DryBulbBinScale.Default(UnitSystem.IP), occ);
            var results = new Dictionary<AirSystemType, EconomizerEvaluation>();
            foreach (var type in AirSystemTypes.All)
            {
                var e = EconomizerEvaluation.Evaluate(w, occ, bins, Typed(type));
                results[type] = e;
                var b = e.Baseline.Totals.Hourly;
                var db = EconomizerRealFiles.Control(e, HighLimitKind.DifferentialDryBulb);
                var de = EconomizerRealFiles.Control(e, HighLimitKind.DifferentialEnthalpy);
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"| {Names[s]} | {AirSystemTypes.Name(type)} | {b.CoilTotal.Kbtu:N0} | {b.Reheat.Kbtu:N0} | {b.Preheat.Kbtu:N0} | {b.Fans.KilowattHours:N0} | {Saved(db)} | {Saved(de)} | {de.HeatingSavings(IntegrationMethod.Hourly).Kbtu:+#,0;-#,0;0} |"));

                // The fans run the same in every control: the damper does not change the airflow.
                Assert.Equal(b.Fans.Joules, de.Totals.Hourly.Fans.Joules, 1e-6 * b.Fans.Joules);
                Assert.True(b.Fans.Joules > 0);

                // Differential enthalpy never adds coil energy in any hour, so never in the year.
                Assert.True(de.Savings(IntegrationMethod.Hourly).Joules >= -1e-6, file);
            }

            // Cooling everything to 55 F and reheating costs the most coil energy; variable volume needs
            // less airflow, single zone a warmer supply.
            double cvr = results[AirSystemType.ConstantVolumeReheat].Baseline.Totals.Hourly.CoilTotal.Joules;
            Assert.True(results[AirSystemType.VariableVolume].Baseline.Totals.Hourly.CoilTotal.Joules < cvr, file);
            Assert.True(results[AirSystemType.SingleZone].Baseline.Totals.Hourly.CoilTotal.Joules < cvr, file);
            Assert.Equal(0.0, results[AirSystemType.SingleZone].Baseline.Totals.Hourly.Reheat.Joules);
            Assert.True(results[AirSystemType.ConstantVolumeReheat].Baseline.Totals.Hourly.Reheat.Joules
                > results[AirSystemType.VariableVolume].Baseline.Totals.Hourly.Reheat.Joules, file);

            // The constant-volume fan runs at design power; the variable-volume one on its curve, for less.
            Assert.True(results[AirSystemType.VariableVolume].Baseline.Totals.Hourly.Fans.Joules
                < results[AirSystemType.ConstantVolumeReheat].Baseline.Totals.Hourly.Fans.Joules, file);
        }
    }

    private static string Saved(EconomizerControlResult c) =>
        string.Create(CultureInfo.InvariantCulture, $"{c.Savings(IntegrationMethod.Hourly).Kbtu:+#,0;-#,0;0} ({c.SavingsPercent(IntegrationMethod.Hourly) ?? 0:+0.0;-0.0;0.0} %)");

    [Fact]
    public void ReferenceTable_PrintsTheControlsOfDocsEconomizer()
    {
        output.WriteLine("| site | baseline coil, kBtu | fixed-drybulb | differential-drybulb | fixed-enthalpy | differential-enthalpy | fixed-dewpoint |");
        for (int s = 0; s < EconomizerRealFiles.Sites.Length; s++)
        {
            var e = files.Integrated[EconomizerRealFiles.Sites[s].File];
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"| {Names[s]} | {e.Baseline.Totals.Hourly.CoilTotal.Kbtu:N0} | {string.Join(" | ", EconomizerControl.EconomizerKinds.Select(k => Saved(EconomizerRealFiles.Control(e, k))))} |"));
            Assert.True(e.Baseline.Totals.Hourly.CoilTotal.Joules > 0);
        }

        foreach (var (file, kind) in new[] { ("722040TYA.CSV", HighLimitKind.DifferentialDryBulb), ("722040TYA.CSV", HighLimitKind.DifferentialEnthalpy), ("725300TYA.CSV", HighLimitKind.DifferentialDryBulb), ("725300TYA.CSV", HighLimitKind.DifferentialEnthalpy), ("723650TYA.CSV", HighLimitKind.DifferentialEnthalpy), ("725945TYA.CSV", HighLimitKind.FixedDewPoint), (Weather.TestData.PvgisFile, HighLimitKind.DifferentialDryBulb) })
        {
            var c = EconomizerRealFiles.Control(files.Integrated[file], kind);
            var w = files.Weather[file];
            var occ = files.Occupied[file];
            var mid = EconomizerEvaluation.Evaluate(w, occ, BinTable.Build(w, DryBulbBinScale.Default(UnitSystem.IP), occ),
                EconomizerRealFiles.Reference(true) with { BinPoint = BinEvaluationPoint.Midpoint });
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{file} {EconomizerControl.NameOf(kind)}: | {c.Savings(IntegrationMethod.Hourly).Kbtu:+#,0;-#,0} | {c.Savings(IntegrationMethod.Bin).Kbtu:+#,0;-#,0} | {c.Savings(IntegrationMethod.JointBin).Kbtu:+#,0;-#,0} | {EconomizerRealFiles.Control(mid, kind).Savings(IntegrationMethod.Bin).Kbtu:+#,0;-#,0} |"));
        }
    }
}
