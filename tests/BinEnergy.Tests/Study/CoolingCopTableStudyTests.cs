using BinEnergy.Core.Study;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Study;

/// <summary>
/// The wet-bulb cooling COP table read from a study file and run on the Chicago check file (NREL
/// TMY3, tmy3 map): the run warns about the coil hours outside the table, in the study's unit, and
/// a flat table gives the compressor energy of the same constant COP.
/// </summary>
public sealed class CoolingCopTableStudyTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-cop-table-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private StudyCaseResult Run(string plantLines)
    {
        string path = Path.Combine(folder, "study.toml");
        File.WriteAllText(path, ReferenceOfficeStudy.Text(TestData.Open("725300TYA.CSV"), string.Empty, "heating_fuel = \"electric\"\ncooling_cop = 3.0\n" + plantLines));
        return StudyRunner.Run(StudyFileReader.Read(path)).Cases[0];
    }

    [Fact]
    public void NarrowTable_WarnsAboutTheHoursOutside_AndAFlatTableIsTheConstantCop()
    {
        // Invented table from 75 to 95 F outdoors and 60 to 70 F entering wet-bulb: Chicago's coil runs outside it.
        var narrow = Run("cooling_cop_table_outdoor_f = [75, 95]\ncooling_cop_table_wetbulb_f = [60, 70]\ncooling_cop_table = [4.0, 3.6, 3.2, 2.9]");
        Assert.Contains(narrow.Warnings, w => w.Contains("cooling COP table was held at its edges", StringComparison.Ordinal)
            && w.Contains("outdoor 75 F to 95 F, entering wet-bulb 60 F to 70 F", StringComparison.Ordinal));
        Assert.Contains(narrow.Case.Assumptions, a => a.Contains("wet-bulb table", StringComparison.Ordinal));

        // A one-point table of 3.0 is the constant COP 3.0 of cooling_cop.
        var flat = Run("cooling_cop_table_outdoor_f = [80]\ncooling_cop_table_wetbulb_f = [65]\ncooling_cop_table = [3.0]");
        var constant = Run(string.Empty);
        double expected = constant.Economizer!.Baseline.Totals.Hourly.Compressor.ElectricityJ;
        Assert.Equal(expected, flat.Economizer!.Baseline.Totals.Hourly.Compressor.ElectricityJ, 1e-9 * expected);
        Assert.DoesNotContain(flat.Warnings, w => w.Contains("cooling COP table", StringComparison.Ordinal));
    }
}
