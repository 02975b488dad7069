using BinEnergy.Core.Economizer;
using BinEnergy.Core.Study;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Study;

/// <summary>
/// A study evaluates the economizer once per record for the variants whose air system, plant, hours and bins are the
/// same (Chicago O'Hare, NREL TMY3, through the tmy3 map, the reference office of docs/economizer.md): a variant that
/// changes only the ventilation airflow or the recovery gets the very evaluation of the base, a variant that changes a
/// supply temperature or the plant gets its own, and every one equals the same variant run on its own.
/// </summary>
public sealed class SharedEconomizerTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-shared-economizer-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private const string Plant = "heating_fuel = \"gas\"\nheating_efficiency = 0.85\ncooling_cop = [[65, 4.2], [95, 3.2]]\nprice_electricity_per_kwh = 0.14\nprice_gas_per_therm = 1.1";

    private IReadOnlyList<StudyCaseResult> Run(string name, string variants)
    {
        string path = Path.Combine(folder, name + ".toml");
        File.WriteAllText(path, ReferenceOfficeStudy.Text(TestData.Open("725300TYA.CSV"), string.Empty, Plant)
            + "\n[recovery]\nsensible_effectiveness = 0.7\n" + variants);
        return StudyRunner.Run(StudyFileReader.Read(path)).Cases;
    }

    [Fact]
    public void VariantsWithTheSameSystemShareOneEvaluation_OthersGetTheirOwn_AndEachEqualsItsOwnRun()
    {
        const string NoRecovery = "[[variant]]\nname = \"no-recovery\"\nrecovery.enabled = false\nventilation.airflow_cfm = 3000\n";
        const string Supply = "[[variant]]\nname = \"supply\"\neconomizer.supply_temp_f = 52\n";
        const string Cop = "[[variant]]\nname = \"cop\"\nplant.cooling_cop = [[65, 3.6], [95, 2.8]]\n";
        var cases = Run("all", "[[variant]]\nname = \"base\"\n" + NoRecovery + Supply + Cop);
        var (base_, noRecovery, supply, cop) = (cases[0].Economizer!, cases[1].Economizer!, cases[2].Economizer!, cases[3].Economizer!);

        Assert.Same(base_, noRecovery);
        Assert.NotSame(base_, supply);
        Assert.NotSame(base_, cop);

        // The shared evaluation is the one each variant gets on its own, to the joule and the cent.
        AssertSame(Run("alone-no-recovery", NoRecovery)[0].Economizer!, noRecovery);
        AssertSame(Run("alone-supply", Supply)[0].Economizer!, supply);
        AssertSame(Run("alone-cop", Cop)[0].Economizer!, cop);

        // And they differ where they should: a colder supply changes the coil energy; a lower COP buys more electricity.
        Assert.NotEqual(base_.Controls[0].Totals.Hourly.CoilTotal, supply.Controls[0].Totals.Hourly.CoilTotal);
        Assert.True(cop.Baseline.Totals.Hourly.Compressor.ElectricityJ > base_.Baseline.Totals.Hourly.Compressor.ElectricityJ);
    }

    [Fact]
    public void SameSystemAndSamePlant_CompareByValue()
    {
        var cases = Run("pair", "[[variant]]\nname = \"a\"\n[[variant]]\nname = \"b\"\n");
        var (a, b) = (cases[0].Case, cases[1].Case);
        Assert.NotSame(a.Economizer, b.Economizer);
        Assert.True(a.Economizer!.SameSystemAs(b.Economizer!));
        Assert.True(a.Plant!.SamePlantAs(b.Plant!));
        Assert.False(a.Economizer.SameSystemAs(a.Economizer with { Controls = [new EconomizerControl(HighLimitKind.FixedDryBulb)] }));
        Assert.False(a.Plant.SamePlantAs(a.Plant with { Tariffs = new Dictionary<BinEnergy.Core.Plant.Fuel, BinEnergy.Core.Plant.FuelTariff>() }));
        Assert.False(a.Plant.SamePlantAs(a.Plant with { CoolingCop = BinEnergy.Core.Plant.PerformanceCurve.Create([(18.0, 4.2), (35.0, 3.0)]) }));
    }

    private static void AssertSame(EconomizerEvaluation expected, EconomizerEvaluation actual)
    {
        Assert.Equal(expected.OccupiedHours, actual.OccupiedHours);
        foreach (var (e, a) in expected.BaselineAndControls.Zip(actual.BaselineAndControls))
        {
            Assert.Equal(e.Totals, a.Totals);
            Assert.Equal(e.ByMonth, a.ByMonth);
        }
    }
}
