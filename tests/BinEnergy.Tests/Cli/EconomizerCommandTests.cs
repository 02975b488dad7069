using System.Text.Json;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Cli;

/// <summary>The <c>economizer</c> command end to end on a real check file (Melbourne FL, NREL TMY3, through the tmy3 map).</summary>
public class EconomizerCommandTests
{
    private static readonly string Melbourne = TestData.Open("722040TYA.CSV");

    private static readonly string[] System =
    [
        "--supply-airflow", "10000", "--supply-airflow-min", "3000", "--min-outdoor-airflow", "2000",
        "--supply-temp", "55", "--return-temp", "75", "--return-rh", "50",
        "--design-load", "216000", "--design-outdoor", "95", "--balance-point", "50", "--occupied", "Mon-Fri 07:00-19:00",
    ];

    private static (int Code, string Out, string Err) Run(params string[] args) => AirCommandTests.Run(args);

    private static string[] Args(params string[] extra) => ["economizer", Melbourne, "--map", "tmy3", .. System, .. extra];

    [Fact]
    public void SystemOption_ChoosesTheType_AndConstantVolumeReheatCountsReheat()
    {
        var (code, output, err) = Run(["economizer", Melbourne, "--map", "tmy3", .. System.Skip(4), "--min-outdoor-airflow", "2000", "--supply-airflow", "10000",
            "--system", "constant-volume-reheat", "--json"]);
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(output);
        Assert.Equal("constant-volume-reheat", doc.RootElement.GetProperty("system").GetString());
        Assert.True(doc.RootElement.GetProperty("controls").GetProperty("none").GetProperty("reheat_kbtu").GetDouble() > 0);

        var (bad, _, message) = Run(Args("--system", "dual-duct"));
        Assert.Equal(2, bad);
        Assert.Contains("--system", message, StringComparison.Ordinal);
        Assert.Contains("single-zone", message, StringComparison.Ordinal);

        // A minimum airflow belongs to variable volume only: the error names the option.
        var (wrong, _, why) = Run(Args("--system", "single-zone"));
        Assert.NotEqual(0, wrong);
        Assert.Contains("supply-airflow-min", why, StringComparison.Ordinal);
    }

    [Fact]
    public void SupplyFan_DefaultsToThreeInchesAndRunsEveryOccupiedHour()
    {
        string[] cv = ["economizer", Melbourne, "--map", "tmy3", .. System.Skip(4), "--min-outdoor-airflow", "2000", "--supply-airflow", "10000",
            "--system", "constant-volume-reheat", "--json"];
        var (code, output, err) = Run(cv);
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(output);
        int hours = doc.RootElement.GetProperty("hours_occupied").GetInt32();

        // 10,000 cfm = 4.719474 m3/s x 3 in. w.g. (3 x 248.84 Pa, default recalled from memory) / 0.6 = 5,871.7 W (FanPower), every occupied hour.
        double kwh = 4.719474 * 3 * 248.84 / 0.6 * hours / 1000;
        Assert.Equal(kwh, doc.RootElement.GetProperty("controls").GetProperty("none").GetProperty("fans_kwh").GetDouble(), 0.001 * kwh);

        var (none, noFan, err2) = Run([.. cv, "--supply-fan-pressure", "0"]);
        Assert.True(none == 0, err2);
        using var doc2 = JsonDocument.Parse(noFan);
        Assert.Equal(0.0, doc2.RootElement.GetProperty("controls").GetProperty("none").GetProperty("fans_kwh").GetDouble());

        // Fan heat after the coil adds to the coil energy.
        Assert.True(doc.RootElement.GetProperty("controls").GetProperty("none").GetProperty("coil_total_kbtu").GetDouble()
            > doc2.RootElement.GetProperty("controls").GetProperty("none").GetProperty("coil_total_kbtu").GetDouble());

        var (bad, _, message) = Run(Args("--fan-curve", "0.1,x,0.9,0"));
        Assert.Equal(2, bad);
        Assert.Contains("--fan-curve", message, StringComparison.Ordinal);
        var (three, _, why) = Run(Args("--fan-curve", "0.1,0.2,0.7"));
        Assert.NotEqual(0, three);
        Assert.Contains("four coefficients", why, StringComparison.Ordinal);
    }

    [Fact]
    public void Json_HasTheContractFields_AndReportsNegativeSavings()
    {
        var (code, output, err) = Run(Args("--json", "--controls", "none,fixed-drybulb,differential-drybulb,fixed-enthalpy,differential-enthalpy,fixed-dewpoint"));
        Assert.Equal(0, code);
        Assert.Equal("", err);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        string[] fields = ["hours_no_cooling", "hours_free", "hours_integrated", "hours_minimum", "coil_sensible_kbtu", "coil_latent_kbtu", "coil_total_kbtu", "savings_kbtu", "savings_pct"];
        var rows = root.GetProperty("by_method").EnumerateArray().ToList();
        string[] names = ["none", "fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"];
        foreach (var name in names)
        {
            foreach (var method in new[] { "hourly", "joint-bin", "bin" })
            {
                var m = rows.Single(r => r.GetProperty("control").GetString() == name && r.GetProperty("method").GetString() == method);
                foreach (var f in fields)
                {
                    Assert.True(m.GetProperty(f).ValueKind is JsonValueKind.Number || (f == "savings_pct" && name == "none"), f);
                }

                double hours = m.GetProperty("hours_no_cooling").GetDouble() + m.GetProperty("hours_free").GetDouble()
                    + m.GetProperty("hours_integrated").GetDouble() + m.GetProperty("hours_minimum").GetDouble();
                Assert.Equal(root.GetProperty("hours_occupied").GetInt32(), hours, 9);
            }
        }

        // The headline (hourly) table is keyed by control; the baseline is "none".
        var controls = root.GetProperty("controls");
        Assert.Equal(names.Length, controls.EnumerateObject().Count());
        foreach (var f in fields.SkipLast(1))
        {
            Assert.Equal(JsonValueKind.Number, controls.GetProperty("none").GetProperty(f).ValueKind);
        }

        // Hot-humid site: the dry-bulb control's savings are negative and stay negative in the output.
        Assert.True(controls.GetProperty("differential_drybulb").GetProperty("savings_kbtu").GetDouble() < 0);
        Assert.True(controls.GetProperty("differential_drybulb").GetProperty("savings_pct").GetDouble() < 0);
        Assert.Equal(0.0, controls.GetProperty("none").GetProperty("savings_kbtu").GetDouble());
        var check = root.GetProperty("savings_by_method").EnumerateArray().ToList();
        Assert.Equal(5, check.Count);
        foreach (var f in new[] { "hourly_savings_kbtu", "joint_bin_savings_kbtu", "bin_savings_kbtu" })
        {
            Assert.All(check, r => Assert.Equal(JsonValueKind.Number, r.GetProperty(f).ValueKind));
        }

        var bins = root.GetProperty("bins");
        Assert.True(bins.GetArrayLength() > 10);
        var bin = bins[bins.GetArrayLength() / 2];
        foreach (var f in new[] { "bin_low_f", "bin_high_f", "hours_occupied", "hourly_coil_total_kbtu", "joint_bin_coil_total_kbtu", "bin_coil_total_kbtu", "hours_free" })
        {
            Assert.Equal(JsonValueKind.Number, bin.GetProperty(f).ValueKind);
        }

        Assert.Equal(12, root.GetProperty("months").GetArrayLength());
        Assert.Contains(root.GetProperty("assumptions").EnumerateArray(), a => a.GetString()!.Contains("recalled from memory"));
    }

    [Fact]
    public void Table_ShowsControlsBinsAssumptionsAndTheCaution()
    {
        var (code, output, err) = Run(Args());
        Assert.Equal(0, code);
        Assert.Equal("", err);
        Assert.Contains("Controls against the baseline", output);
        Assert.Contains("Coil energy saved by each method", output);
        Assert.Contains("Modes by bin, best control: differential-enthalpy (integrated)", output);
        Assert.Contains("Negative savings", output);
        Assert.Contains("recalled from memory", output);
        Assert.Contains("energy code adopted locally governs", output);
        Assert.Contains("licensed engineer", output);
    }

    [Fact]
    public void EnthalpyLimit_InSi_ConvertsThroughTheDatum()
    {
        // 28 Btu/lb (0 F datum) = 47.24 kJ/kg (0 C datum) (SpecificEnthalpy; eq. 32 coefficients): the same fixed-enthalpy
        // hours in IP and SI. With 65.1 kJ/kg (the bare 2.326 factor, a common error) the limit would never act.
        string[] si = ["economizer", Melbourne, "--map", "tmy3", "--units", "si", "--supply-airflow", "4719.47", "--supply-airflow-min", "1415.84",
            "--min-outdoor-airflow", "943.89", "--supply-temp", "12.7778", "--return-temp", "23.8889", "--return-rh", "50", "--design-load", "63.3035",
            "--design-outdoor", "35", "--balance-point", "10", "--occupied", "Mon-Fri 07:00-19:00", "--controls", "fixed-enthalpy", "--json"];
        double Hours(string[] args, string limit)
        {
            var (code, output, err) = Run([.. args, "--high-limit-enthalpy", limit]);
            Assert.True(code == 0, err);
            using var doc = JsonDocument.Parse(output);
            return doc.RootElement.GetProperty("controls").GetProperty("fixed_enthalpy").GetProperty("hours_integrated").GetDouble();
        }

        double ip = Hours(Args("--json", "--controls", "fixed-enthalpy"), "28");
        Assert.Equal(ip, Hours(si, "47.24"), 0);
        Assert.True(Hours(si, "65.1") > ip + 100, "a limit converted by the bare factor lets in far more hours");
    }

    [Theory]
    [InlineData("--supply-airflow", "--supply-airflow is required")]
    [InlineData("--return-rh", "--return-rh is required")]
    public void MissingOption_IsAUsageError(string option, string message)
    {
        var args = Args().ToList();
        int i = args.IndexOf(option);
        args.RemoveRange(i, 2);
        var (code, _, err) = Run([.. args]);
        Assert.Equal(2, code);
        Assert.Contains(message, err);
        Assert.DoesNotContain("   at ", err);
    }

    [Theory]
    [InlineData(new[] { "--controls", "enthalpy" }, "--controls: \"enthalpy\" is not one of")]
    [InlineData(new[] { "--min-outdoor-airflow", "5000" }, "--min-outdoor-airflow: the minimum outdoor airflow is above the minimum supply airflow")]
    [InlineData(new[] { "--supply-temp", "80" }, "--supply-temp: the supply temperature must be below the return temperature")]
    [InlineData(new[] { "--occupied", "Mon-Fri 07:00-25:00" }, "--occupied")]
    [InlineData(new[] { "--flow-basis", "metric" }, "--flow-basis: \"metric\" is not one of \"site\", \"standard\", \"actual\"")]
    [InlineData(new[] { "--balance-point", "99" }, "--design-outdoor: the design outdoor temperature must be above the balance point")]
    public void BadOption_IsAUsageErrorNamingTheOption(string[] replace, string message)
    {
        var args = Args().ToList();
        int i = args.IndexOf(replace[0]);
        if (i >= 0)
        {
            args[i + 1] = replace[1];
        }
        else
        {
            args.AddRange(replace);
        }

        var (code, output, err) = Run([.. args]);
        Assert.Equal(2, code);
        Assert.Contains(message, err);
        Assert.Equal("", output);
    }

    [Fact]
    public void ZeroMinimumOutdoorAir_RunsButCautions()
    {
        var args = Args("--json").ToList();
        args[args.IndexOf("--min-outdoor-airflow") + 1] = "0";
        var (code, output, err) = Run([.. args]);
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(output);
        Assert.Contains(doc.RootElement.GetProperty("assumptions").EnumerateArray(), a => a.GetString()!.Contains("minimum outdoor airflow is zero"));
    }

    [Fact]
    public void MissingWeatherFile_IsBadInput()
    {
        var (code, output, err) = Run(["economizer", "no-such-file.csv", .. System]);
        Assert.Equal(3, code);
        Assert.Contains("no-such-file.csv", err);
        Assert.Equal("", output);
    }
}
