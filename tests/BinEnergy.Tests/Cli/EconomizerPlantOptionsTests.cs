using System.Globalization;
using System.Text.Json;
using BinEnergy.Cli;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Cli;

/// <summary>
/// The plant options of <c>economizer</c> (cooling COP, heating fuel, heat pump with capacity,
/// lockout, backup and defrost, electricity and gas prices, the COP table) run the command as a one-case
/// study: the same figures as a study file with the same keys run by <c>run</c>, on the
/// Melbourne FL check file (NREL TMY3, through the tmy3 map).
/// </summary>
public sealed class EconomizerPlantOptionsTests : IDisposable
{
    private static readonly string Melbourne = TestData.Open("722040TYA.CSV");

    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-economizer-plant-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static readonly string[] System =
    [
        "--supply-airflow", "10000", "--supply-airflow-min", "3000", "--min-outdoor-airflow", "2000",
        "--supply-temp", "55", "--return-temp", "75", "--return-rh", "50",
        "--design-load", "216000", "--design-outdoor", "95", "--balance-point", "50", "--occupied", "Mon-Fri 07:00-19:00",
        "--controls", "differential-enthalpy",
    ];

    private static readonly string[] HeatPump =
    [
        "--cooling-cop", "3.2", "--heating-fuel", "heat-pump", "--heating-cop", "3", "--heating-capacity", "50000",
        "--heat-pump-lockout", "10", "--backup-fuel", "electric", "--backup-efficiency", "1", "--defrost-below", "35", "--defrost-penalty", "15",
        "--price-electricity", "0.2",
    ];

    private static (int Code, string Out, string Err) Cli(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private static JsonElement Baseline(string json) => JsonDocument.Parse(json).RootElement.GetProperty("controls").GetProperty("none").Clone();

    [Fact]
    public void HeatPumpOptions_GiveTheFiguresOfTheSameStudyFile()
    {
        var (code, output, err) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, .. HeatPump, "--json"]);
        Assert.True(code == 0, err);
        var command = JsonDocument.Parse(output).RootElement.GetProperty("controls");

        string study = Path.Combine(folder, "plant.toml");
        File.WriteAllText(study, Study.ReferenceOfficeStudy.Text(Melbourne, "supply_airflow_min_cfm = 3000", """
            cooling_cop = 3.2
            heating_fuel = "heat-pump"
            heating_cop = 3
            heating_capacity_btuh = 50000
            heat_pump_lockout_f = 10
            backup_fuel = "electric"
            backup_efficiency = 1
            defrost_below_f = 35
            defrost_penalty_pct = 15
            price_electricity_per_kwh = 0.2
            """));
        string outDir = Path.Combine(folder, "out");
        var (runCode, _, runErr) = Cli("run", study, "--out", outDir);
        Assert.True(runCode == 0, runErr);
        var rows = Support.ParquetRows.Read(outDir, "economizer").Where(r => r["method"] == "hourly").ToList(); // full precision (the CSV keeps six digits)
        foreach (var (control, json) in new[] { ("none", "none"), ("differential-enthalpy", "differential_enthalpy") })
        {
            var row = rows.Single(r => r["control"] == control);
            foreach (string column in new[] { "coil_total_kbtu", "reheat_kbtu", "preheat_kbtu", "compressor_kwh", "heating_cost_usd", "purchased_cost_usd", "savings_cost_usd" })
            {
                double fromStudy = double.Parse(row[column], CultureInfo.InvariantCulture);
                Assert.Equal(fromStudy, command.GetProperty(json).GetProperty(column).GetDouble(), 1e-9 * Math.Max(1, Math.Abs(fromStudy)));
            }
        }

        Assert.True(command.GetProperty("none").GetProperty("heating_cost_usd").GetDouble() > 0, "the heat pump buys the reheat and preheat");
    }

    [Fact]
    public void ElectricHeating_CostsTheReheatAndPreheatAtOneKilowattHourPer3412Btu()
    {
        // Electric resistance (efficiency 1.0): cost = (reheat + preheat) kBtu x 1,000 / 3,412.14 Btu per kWh (DESIGN 3) x 0.2 per kWh;
        // compressor = coil kBtu x 1,000 / 3,412.14 / 3.2.
        var (code, output, err) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--cooling-cop", "3.2", "--heating-fuel", "electric", "--price-electricity", "0.2", "--json"]);
        Assert.True(code == 0, err);
        var b = Baseline(output);
        double heatKbtu = b.GetProperty("reheat_kbtu").GetDouble() + b.GetProperty("preheat_kbtu").GetDouble();
        Assert.Equal(heatKbtu * 1000 / 3412.14 * 0.2, b.GetProperty("heating_cost_usd").GetDouble(), 1e-4 * heatKbtu);
        Assert.Equal(b.GetProperty("coil_total_kbtu").GetDouble() * 1000 / 3412.14 / 3.2, b.GetProperty("compressor_kwh").GetDouble(), 1e-5 * b.GetProperty("compressor_kwh").GetDouble()); // 3,412.14 is rounded

        // The heat pump (COP 3, a 50,000 Btu/h capacity, locked out below 10 F) costs less than resistance heat.
        var (hpCode, hp, hpErr) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, .. HeatPump, "--json"]);
        Assert.True(hpCode == 0, hpErr);
        Assert.True(Baseline(hp).GetProperty("heating_cost_usd").GetDouble() < b.GetProperty("heating_cost_usd").GetDouble());
    }

    [Fact]
    public void PlantOptionMistakes_NameTheOption()
    {
        var (code, _, err) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--heating-fuel", "heat-pump", "--heating-cop", "3"]);
        Assert.Equal(2, code);
        Assert.Contains("--cooling-cop is required", err, StringComparison.Ordinal);

        var (gas, _, why) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--cooling-cop", "3.2"]);
        Assert.Equal(2, gas);
        Assert.Contains("--heating-efficiency is required for gas", why, StringComparison.Ordinal);

        var (typo, _, fuel) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--cooling-cop", "3.2", "--heating-fuel", "heatpump"]);
        Assert.Equal(2, typo);
        Assert.Contains("--heating-fuel", fuel, StringComparison.Ordinal);
        Assert.Contains("heat-pump", fuel, StringComparison.Ordinal);

        var (lockout, _, gasOnly) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--cooling-cop", "3.2", "--heating-efficiency", "0.9", "--heat-pump-lockout", "10"]);
        Assert.Equal(2, lockout);
        Assert.Contains("--heat-pump-lockout", gasOnly, StringComparison.Ordinal);
        Assert.Contains("applies to heating_fuel = \"heat-pump\" only", gasOnly, StringComparison.Ordinal);
    }

    [Fact]
    public void CapacityPerAirflow_CopTableAndGasPrice_WorkFromTheCommand()
    {
        // 5 Btu/h per cfm of the 10,000 cfm supply airflow is the 50,000 Btu/h capacity of the heat-pump case.
        string[] perAirflow = [.. HeatPump.Select(a => a == "--heating-capacity" ? "--heating-capacity-per-airflow" : a == "50000" ? "5" : a)];
        var (c1, absolute, e1) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, .. HeatPump, "--json"]);
        var (c2, scaled, e2) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, .. perAirflow, "--json"]);
        Assert.True(c1 == 0 && c2 == 0, e1 + e2);
        Assert.Equal(Baseline(absolute).GetProperty("heating_cost_usd").GetDouble(), Baseline(scaled).GetProperty("heating_cost_usd").GetDouble(), 1e-9);

        // A COP table that is 3.2 everywhere gives the compressor energy of a constant COP of 3.2.
        string[] table = ["--cooling-cop-table-outdoor", "60,100", "--cooling-cop-table-wetbulb", "50,80", "--cooling-cop-table", "3.2,3.2,3.2,3.2"];
        var (c3, flat, e3) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, .. HeatPump, .. table, "--json"]);
        Assert.True(c3 == 0, e3);
        Assert.Equal(Baseline(absolute).GetProperty("compressor_kwh").GetDouble(), Baseline(flat).GetProperty("compressor_kwh").GetDouble(), 1e-6);

        // Gas reheat at 85 % and 1.20 per therm: cost = (reheat + preheat) kBtu / 100 kBtu per therm / 0.85 x 1.20.
        var (c4, gas, e4) = Cli(["economizer", Melbourne, "--map", "tmy3", .. System, "--cooling-cop", "3.2", "--heating-efficiency", "0.85", "--price-gas", "1.2", "--json"]);
        Assert.True(c4 == 0, e4);
        var b = Baseline(gas);
        double heatKbtu = b.GetProperty("reheat_kbtu").GetDouble() + b.GetProperty("preheat_kbtu").GetDouble();
        Assert.Equal(heatKbtu / 100 / 0.85 * 1.2, b.GetProperty("heating_cost_usd").GetDouble(), 1e-6 * heatKbtu);
    }

    [Fact]
    public void MinimumRhAndASteamGasHumidifier_ShowTheHumidificationOfTheMinimumOutdoorAir()
    {
        // Steam from supply water at about 2,630 kJ/kg (saturated steam at 100 C less water at 10 C, ASHRAE Handbook—
        // Fundamentals 2017 ch. 1 table 3, recalled from memory) per 2,501 kJ/kg of load, over the 80 % efficiency, in gas;
        // 100,000 Btu per therm; cost at 1.20 per therm.
        var (code, output, err) = Cli(["economizer", TestData.Open("725300TYA.CSV"), "--map", "tmy3", .. System, "--cooling-cop", "3.2",
            "--heating-efficiency", "0.85", "--min-rh", "30", "--humidifier", "steam-gas", "--humidifier-efficiency", "0.8", "--price-gas", "1.2", "--json"]);
        Assert.True(code == 0, err);
        var h = JsonDocument.Parse(output).RootElement.GetProperty("humidification");
        double load = h.GetProperty("humidification_kbtu").GetDouble();
        Assert.True(load > 1000, $"a Chicago winter humidified to 30 % needs a load, not {load} kBtu");
        double therms = load * 2630 / 2501 / 0.8 / 100;
        Assert.Equal(therms, h.GetProperty("humidifier_gas_therm").GetDouble(), 1e-6 * therms);
        Assert.Equal(therms * 1.2, h.GetProperty("humidifier_cost_usd").GetDouble(), 1e-6 * therms);
        Assert.Equal(0, h.GetProperty("humidifier_electricity_kwh").GetDouble());
    }
}
