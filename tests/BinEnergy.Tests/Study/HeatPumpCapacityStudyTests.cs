using BinEnergy.Core.Study;

namespace BinEnergy.Tests.Study;

/// <summary>
/// A heat pump's heating capacity per unit of design airflow (<c>heating_capacity_btuh_per_cfm</c>,
/// <c>heating_capacity_w_per_ls</c>): the study multiplies it by the economizer's supply airflow
/// (10,000 cfm in the example study), else by the ventilation airflow (2,000 cfm), and gives the
/// same plant as the absolute capacity it stands for.
/// </summary>
public sealed class HeatPumpCapacityStudyTests : IDisposable
{
    private const double WattsPerBtuh = 0.29307107; // 1 Btu/h = 0.29307107 W (NIST SP 811, IT Btu)
    private const double LitresPerSecondPerCfm = 0.47194745; // 1 cfm = 0.47194745 L/s (NIST SP 811)

    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-hp-capacity-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private Core.Plant.PlantSettings Plant(string capacityLines, bool economizer = true)
    {
        string text = ExampleStudy.Text
            .Replace("heating_fuel = \"gas\"", "heating_fuel = \"heat-pump\"\nheating_cop = 3.0\n" + capacityLines, StringComparison.Ordinal)
            .Replace("\nheating_efficiency = 0.85", "\n", StringComparison.Ordinal);
        if (!economizer)
        {
            text = text.Replace("[economizer]", "[economizer]\nenabled = false", StringComparison.Ordinal);
        }

        File.WriteAllText(Path.Combine(folder, "harbor.csv"), "time,drybulb_c,dewpoint_c\n");
        string path = Path.Combine(folder, "study.toml");
        File.WriteAllText(path, text);
        return StudyCaseBuilder.Build(StudyFileReader.Read(path))[0].Plant!;
    }

    [Fact]
    public void PerCfm_TimesTheSupplyAirflow_IsTheAbsoluteCapacity()
    {
        // Invented heat pump (the constants above are rounded: to 0.01 W): 12 Btu/h per cfm at 17 F and 20 at 47 F; x 10,000 cfm = 120,000 and 200,000 Btu/h
        // = 35,168.5 and 58,614.2 W (x 0.29307107).
        var perCfm = Plant("heating_capacity_btuh_per_cfm = [[17, 12], [47, 20]]").HeatPumpCapacity!;
        var absolute = Plant("heating_capacity_btuh = [[17, 120000], [47, 200000]]").HeatPumpCapacity!;
        Assert.Equal(120_000 * WattsPerBtuh, perCfm.Evaluate((17 - 32) / 1.8), 1e-2);
        Assert.Equal(200_000 * WattsPerBtuh, perCfm.Evaluate((47 - 32) / 1.8), 1e-2);
        foreach (double t in new[] { -30.0, -8.3, 0.0, 5.0, 20.0 })
        {
            Assert.Equal(absolute.Evaluate(t), perCfm.Evaluate(t), 1e-6);
        }
    }

    [Fact]
    public void PerLitrePerSecond_WithoutAnEconomizer_MultipliesTheVentilationAirflow()
    {
        // 10 W per L/s (invented, one number) x 2,000 cfm x 0.47194745 L/s per cfm = 10 x 943.8949 = 9,438.95 W.
        var capacity = Plant("heating_capacity_w_per_ls = 10", economizer: false).HeatPumpCapacity!;
        Assert.Equal(10 * 2_000 * LitresPerSecondPerCfm, capacity.Evaluate(0), 1e-2);
        Assert.InRange(capacity.Evaluate(-20), 9_438.9, 9_439.0);
    }

    [Fact]
    public void PerAirflow_OutOfRange_NamesTheKeyAndItsBound()
    {
        var e = Assert.Throws<StudyFileException>(() => Plant("heating_capacity_btuh_per_cfm = [[17, -12], [47, 20]]"));
        Assert.Contains("plant.heating_capacity_btuh_per_cfm", e.Message, StringComparison.Ordinal);
        Assert.Contains("out of range", e.Message, StringComparison.Ordinal);
    }
}
