using System.Text.Json;
using BinEnergy.Cli;

namespace BinEnergy.Tests.Cli;

/// <summary>The <c>air</c> command end to end, through the same entry point as the executable.</summary>
public class AirCommandTests
{
    internal static (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    [Fact]
    public void Table_ShowsPropertiesAndTheDepartureFrom108()
    {
        var (code, output, err) = Run("air", "--drybulb", "95", "--wetbulb", "75", "--elevation", "5000");
        Assert.Equal(0, code);
        Assert.Equal("", err);
        Assert.Contains("Humidity ratio", output);
        Assert.Contains("12.228", output); // psia at 5,000 ft, Handbook ch. 1 Table 1 (recalled from memory)
        Assert.Contains("below the trade's 1.08", output);
        Assert.Contains("pressure -16.8 %", output);
    }

    [Fact]
    public void Json_HasEveryFieldWithTheUnitInItsName()
    {
        var (code, output, _) = Run("air", "--drybulb", "95", "--wetbulb", "75", "--elevation", "5000", "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        string[] fields = ["drybulb_f", "wetbulb_f", "dewpoint_f", "rh_pct", "humidity_ratio_lb_lb", "humidity_ratio_gr_lb", "enthalpy_btu_lb", "specific_volume_ft3_lb", "density_lb_ft3", "pressure_psia"];
        foreach (var f in fields)
        {
            Assert.Equal(JsonValueKind.Number, root.GetProperty(f).ValueKind);
        }

        Assert.Equal(95.0, root.GetProperty("drybulb_f").GetDouble(), 9);
        Assert.Equal(75.0, root.GetProperty("wetbulb_f").GetDouble(), 4);
        Assert.Contains("over ice below 0 C", root.GetProperty("humidity_definition").GetString());

        // The factor uses this state's dry-air density: 60 / v x (0.240 + 0.444 W) in IP terms.
        var factors = root.GetProperty("factors").GetProperty("this_state");
        double v = root.GetProperty("specific_volume_ft3_lb").GetDouble();
        double w = root.GetProperty("humidity_ratio_lb_lb").GetDouble();
        double expected = 60.0 / v * (1.006 + 1.86 * w) / 2.326 / 1.8;
        Assert.Equal(expected, factors.GetProperty("sensible_factor_btuh_cfm_f").GetDouble(), 3);
        Assert.Equal(60.0 / v, factors.GetProperty("total_factor_btuh_cfm_per_btu_lb").GetDouble(), 2);

        // Standard air: the trade's 1.08, 4,840 and 4.5 (common practice), 0.69 per grain.
        var standard = root.GetProperty("factors").GetProperty("standard_air");
        Assert.Equal(1.08, standard.GetProperty("sensible_factor_btuh_cfm_f").GetDouble(), 2);
        Assert.Equal(4840, standard.GetProperty("latent_factor_btuh_cfm").GetDouble(), 5.0);
        Assert.Equal(0.69, standard.GetProperty("latent_factor_btuh_cfm_per_gr_lb").GetDouble(), 2);
        Assert.Equal(4.5, standard.GetProperty("total_factor_btuh_cfm_per_btu_lb").GetDouble(), 2);
    }

    [Fact]
    public void Json_Si_UsesSiUnits()
    {
        var (code, output, _) = Run("air", "--drybulb", "30", "--rh", "40", "--units", "si", "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.True(root.TryGetProperty("enthalpy_kj_kg", out _));
        Assert.Equal(101.325, root.GetProperty("pressure_kpa").GetDouble(), 3);
        Assert.InRange(root.GetProperty("factors").GetProperty("this_state").GetProperty("sensible_factor_w_ls_k").GetDouble(), 1.15, 1.2); // W/(L/s K) at 30 C: below 1.21 of 20 C air
        Assert.InRange(root.GetProperty("humidity_ratio_kg_kg").GetDouble(), 0.0105, 0.0107); // psychrometric chart, 30 C 40 % (recalled from memory)
    }

    [Theory]
    [InlineData("air", "--drybulb", "95", "--dewpoint", "97")]
    [InlineData("air", "--drybulb", "95", "--wetbulb", "96")]
    [InlineData("air", "--drybulb", "95", "--rh", "101")]
    [InlineData("air", "--drybulb", "95", "--rh", "-1")]
    [InlineData("air", "--drybulb", "95")]
    [InlineData("air", "--drybulb", "95", "--rh", "50", "--dewpoint", "60")]
    [InlineData("air", "--drybulb", "95", "--rh", "50", "--elevation", "40000")]
    [InlineData("air", "--drybulb", "95", "--rh", "50", "--elevation", "-1500")]
    [InlineData("air", "--rh", "50")]
    [InlineData("air", "--drybulb", "abc", "--rh", "50")]
    [InlineData("air", "--drybulb", "95", "--rh", "50", "--units", "metric")]
    [InlineData("air", "--drybulb", "95", "--rh", "50", "--no-such-option")]
    public void ImpossibleInput_ExitsWithCode2AndOneLine(params string[] args)
    {
        var (code, output, err) = Run(args);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        var lines = err.Trim().Split('\n');
        Assert.Single(lines);
        Assert.StartsWith("binenergy: ", lines[0]);
        Assert.DoesNotContain("   at ", err); // no stack trace
    }
}
