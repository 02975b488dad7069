using System.Text.Json;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Cli;

/// <summary>The <c>outdoor-air</c> command end to end.</summary>
public class OutdoorAirCommandTests
{
    private static readonly string[] Totals = ["heating_kbtu", "cooling_sensible_kbtu", "cooling_latent_kbtu", "humidification_kbtu", "recovered_heating_kbtu", "recovered_cooling_kbtu", "fan_kwh", "hours_ventilated"];

    private static JsonElement Json(params string[] args)
    {
        var (code, output, err) = AirCommandTests.Run(["outdoor-air", .. args, "--json"]);
        Assert.True(code == 0, err);
        return JsonDocument.Parse(output).RootElement.Clone();
    }

    [Fact]
    public void Json_HoldsTheContractFields()
    {
        var root = Json(BinsCommandTests.InventedFile(), "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60",
            "--occupied", "Mon-Fri 07:00-19:00", "--recovery-sensible", "0.7", "--recovery-pressure", "0.5");
        foreach (var method in new[] { "hourly", "joint_bin", "bin" })
        {
            foreach (var f in Totals)
            {
                Assert.Equal(JsonValueKind.Number, root.GetProperty("annual").GetProperty(method).GetProperty(f).ValueKind);
            }
        }

        var hourly = root.GetProperty("annual").GetProperty("hourly");
        Assert.Equal(52 * 60 + 12, hourly.GetProperty("hours_ventilated").GetInt32());
        Assert.Equal("hourly", root.GetProperty("headline_method").GetString());
        var check = root.GetProperty("method_check").EnumerateArray().ToList();
        Assert.Contains(check, r => r.GetProperty("figure").GetString() == "Cooling, latent" && r.GetProperty("unit").GetString() == "kBtu");
        foreach (var row in check)
        {
            foreach (var column in new[] { "hourly", "joint_bin", "bin" })
            {
                Assert.Equal(JsonValueKind.Number, row.GetProperty(column).ValueKind);
            }
        }

        var assumptions = root.GetProperty("assumptions_values");
        Assert.Equal("site", assumptions.GetProperty("flow_basis").GetString());
        Assert.Equal("Mon-Fri 07:00-19:00", assumptions.GetProperty("schedule").GetString());
        Assert.True(assumptions.GetProperty("sensible_factor_btuh_cfm_f").GetDouble() is > 1.0 and < 1.08); // 300 m site
        foreach (var p in new[] { "heating_99_6", "cooling_0_4", "dehumidification_0_4" })
        {
            Assert.Equal(JsonValueKind.Number, root.GetProperty("peaks").GetProperty(p).GetProperty("drybulb_f").ValueKind);
        }

        var bins = root.GetProperty("bins").EnumerateArray().ToList();
        Assert.Equal(root.GetProperty("annual").GetProperty("bin").GetProperty("heating_kbtu").GetDouble(), bins.Sum(b => b.GetProperty("bin_heating_kbtu").GetDouble()), 1e-6);
        Assert.Equal(hourly.GetProperty("heating_kbtu").GetDouble(), bins.Sum(b => b.GetProperty("hourly_heating_kbtu").GetDouble()), 1e-6);
        Assert.Equal(root.GetProperty("annual").GetProperty("joint_bin").GetProperty("cooling_latent_kbtu").GetDouble(), bins.Sum(b => b.GetProperty("joint_bin_cooling_latent_kbtu").GetDouble()), 1e-6);
        Assert.Equal(12, root.GetProperty("months").GetArrayLength());
        Assert.Contains("licensed engineer", root.GetProperty("cautions").EnumerateArray().Select(c => c.GetString()).Aggregate((a, b) => a + b));

        // The fans run in every ventilated hour (3,132 h): recovery 2 x 0.471947 m3/s x 124.42 Pa / 0.6 = 195.73 W, and the
        // ventilation fan at its default 1 in. w.g. (248.84 Pa, recalled from memory) 0.471947 x 248.84 / 0.6 = 195.73 W
        // (worked by hand): 391.46 W.
        Assert.Equal(391.46 / 1000 * 3132, hourly.GetProperty("fan_kwh").GetDouble(), 0.3);
    }

    [Fact]
    public void Si_GivesTheSameEnergyInKilowattHours()
    {
        string[] common = [BinsCommandTests.InventedFile(), "--ventilate", "always"];
        var ip = Json([.. common, "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60"]);
        // 1,000 cfm = 471.947 L/s; 70 F = 21.1111 C; 75 F = 23.8889 C (exact conversions, NIST SP 811).
        var si = Json([.. common, "--units", "si", "--width", "2.7777777778", "--airflow", "471.947443", "--heat-to", "21.1111111", "--cool-to", "23.8888889", "--max-rh", "60"]);
        double kbtuPerKwh = 3.41214163; // 1 kWh = 3412.14 Btu (DESIGN section 3)
        foreach (var f in new[] { "heating", "cooling_sensible", "cooling_latent" })
        {
            double a = ip.GetProperty("annual").GetProperty("hourly").GetProperty(f + "_kbtu").GetDouble();
            Assert.Equal(a, si.GetProperty("annual").GetProperty("hourly").GetProperty(f + "_kwh").GetDouble() * kbtuPerKwh, 1e-5 * a + 1e-6);
        }
    }

    [Fact]
    public void RealFile_TextShowsBothMethodsPeaksAndAssumptions()
    {
        var (code, output, err) = AirCommandTests.Run("outdoor-air", RawSiteColumns.PathOf("723650TYA.CSV.gz"), "--map", "tmy3",
            "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60");
        Assert.True(code == 0, err);
        foreach (var s in new[] { "Bin method", "Hourly", "Joint bins", "Peak outdoor-air loads", "Assumptions", "flow basis", "0.888", "Caution", "every hour counts as occupied" })
        {
            Assert.Contains(s, output);
        }
    }

    [Fact]
    public void DaylightSaving_ShiftsTheOccupiedHours_AndIsStated()
    {
        string[] common = [BinsCommandTests.InventedFile(), "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--occupied", "Mon-Fri 07:00-19:00"];
        var standard = Json(common);
        var clock = Json([.. common, "--daylight-saving", "north-america"]);
        double Heating(JsonElement r) => r.GetProperty("annual").GetProperty("hourly").GetProperty("heating_kbtu").GetDouble();

        // The same number of weekday hours, an hour earlier in standard time from March to November: in a climate that is
        // colder at 06:00 than at 18:00 the heating rises.
        Assert.Equal(standard.GetProperty("annual").GetProperty("hourly").GetProperty("hours_ventilated").GetInt32(),
            clock.GetProperty("annual").GetProperty("hourly").GetProperty("hours_ventilated").GetInt32());
        Assert.True(Heating(clock) > Heating(standard));
        Assert.Contains(clock.GetProperty("assumptions").EnumerateArray(), a => a.GetString()!.Contains("North American daylight saving", StringComparison.Ordinal));
        Assert.Contains(standard.GetProperty("assumptions").EnumerateArray(), a => a.GetString()!.Contains("no daylight saving", StringComparison.Ordinal));
    }

    [Fact]
    public void AirflowBelowThePeopleAndAreaMinimum_Warns()
    {
        var (code, output, err) = AirCommandTests.Run("outdoor-air", BinsCommandTests.InventedFile(), "--airflow", "300", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60",
            "--people", "50", "--per-person", "5", "--area", "5000", "--per-area", "0.06");
        Assert.Equal(0, code);
        Assert.Equal("", err);
        Assert.Contains("Warning", output);
        Assert.Contains("550 cfm", output); // 50 x 5 + 5,000 x 0.06 (62.1 ventilation rate procedure arithmetic)

        var (jsonCode, json, jsonErr) = AirCommandTests.Run("outdoor-air", BinsCommandTests.InventedFile(), "--airflow", "300", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60",
            "--people", "50", "--per-person", "5", "--area", "5000", "--per-area", "0.06", "--json");
        Assert.Equal(0, jsonCode);
        Assert.Contains("below the people-and-area minimum", jsonErr);
        using var doc = JsonDocument.Parse(json);
        Assert.Contains("licensed engineer", doc.RootElement.GetProperty("warnings")[0].GetString());
    }

    [Theory]
    [InlineData(new[] { "--airflow", "1000" }, "--heat-to is required: heating setpoint, to which the outdoor air is heated; --cool-to is required: cooling setpoint, to which the outdoor air is cooled; --max-rh is required")]
    [InlineData(new[] { "--heat-to", "70", "--cool-to", "75", "--max-rh", "60" }, "--airflow")]
    [InlineData(new[] { "--airflow", "1000", "--heat-to", "80", "--cool-to", "75", "--max-rh", "60" }, "above the cooling setpoint")]
    [InlineData(new[] { "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--flow-basis", "metric" }, "--flow-basis")]
    [InlineData(new[] { "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--recovery-latent", "0.5" }, "--recovery-sensible")]
    [InlineData(new[] { "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--recovery-sensible", "1.5" }, "--recovery-sensible: 1.5 is out of range")]
    [InlineData(new[] { "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--occupied", "Mon-Fri 7:30-19:00" }, "whole hours")]
    public void BadOptions_AreUsageErrorsNamingTheProblem(string[] extra, string message)
    {
        var (code, output, err) = AirCommandTests.Run(["outdoor-air", BinsCommandTests.InventedFile(), .. extra]);
        Assert.Equal(2, code);
        Assert.Contains(message, err);
        Assert.Equal("", output);
    }
}
