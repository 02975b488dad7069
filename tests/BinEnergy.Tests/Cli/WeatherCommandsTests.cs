using System.Text.Json;
using BinEnergy.Cli;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Cli;

/// <summary>The inspect and convert commands, run in-process through <see cref="CliApp"/>.</summary>
public sealed class WeatherCommandsTests
{
    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private static readonly string[] ContractFields =
    [
        "hours", "period_start", "period_end", "calendar", "typical_year", "elevation_ft", "site_pressure_psia", "site_pressure_source",
        "hourly_pressure_source", "pressure_mean_psia", "climate", "degree_day_curve", "design", "repairs",
    ];

    [Fact]
    public void InspectJson_HasEveryContractField_InIpUnits()
    {
        var (code, output, _) = Run("inspect", TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        foreach (var field in ContractFields)
        {
            Assert.True(root.TryGetProperty(field, out _), "missing field " + field);
        }

        var climate = root.GetProperty("climate");
        foreach (var field in new[] { "drybulb_min_f", "drybulb_mean_f", "drybulb_max_f", "degree_day_base_f", "heating_degree_days_f_day", "cooling_degree_days_f_day" })
        {
            Assert.Equal(JsonValueKind.Number, climate.GetProperty(field).ValueKind);
        }

        Assert.Equal(8760, root.GetProperty("hours").GetInt32());
        Assert.Equal(201 / 0.3048, root.GetProperty("elevation_ft").GetDouble(), 6); // header elevation 201 m in ft
        Assert.InRange(climate.GetProperty("heating_degree_days_f_day").GetDouble(), 5_800, 7_200); // about 6,500 F-day (recalled from memory)
        var design = root.GetProperty("design");
        foreach (var key in new[] { "heating_99_6", "heating_99", "cooling_0_4", "cooling_1", "cooling_2", "dehumidification_0_4", "dehumidification_1", "enthalpy_0_4", "enthalpy_1" })
        {
            Assert.True(design.TryGetProperty(key, out _), key);
        }

        Assert.True(design.GetProperty("cooling_0_4").GetProperty("drybulb_f").GetDouble() > design.GetProperty("cooling_0_4").GetProperty("mean_coincident_wetbulb_f").GetDouble());
        Assert.Equal(JsonValueKind.Object, root.GetProperty("repairs").ValueKind);
        Assert.Equal(41, root.GetProperty("degree_day_curve").GetArrayLength());
    }

    [Fact]
    public void InspectJson_NamesTheDegreeDayMethod_AndEachMethodGivesItsOwnFigures()
    {
        // O'Hare's typical year, base 65 F: from daily means 6,325 / 842 F-day, degree-hours / 24 6,497 / 1,014,
        // daily (max + min) / 2 6,398 / 830 (the definitions, written out in Climate/RecordDesignConditionsTests).
        var expected = new Dictionary<string, (double Hdd, double Cdd)> { ["daily-mean"] = (6325, 842), ["hourly"] = (6497, 1014), ["max-min"] = (6398, 830) };
        foreach (var (method, (hdd, cdd)) in expected)
        {
            string[] args = method == "daily-mean"
                ? ["inspect", TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--json"]
                : ["inspect", TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--json", "--degree-days", method];
            var (code, output, _) = Run(args);
            Assert.Equal(0, code);
            using var doc = JsonDocument.Parse(output);
            var climate = doc.RootElement.GetProperty("climate");
            Assert.Equal(method, climate.GetProperty("degree_day_method").GetString());
            Assert.Equal(hdd, climate.GetProperty("heating_degree_days_f_day").GetDouble(), 0);
            Assert.Equal(cdd, climate.GetProperty("cooling_degree_days_f_day").GetDouble(), 0);
        }

        var (bad, _, error) = Run("inspect", TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--degree-days", "daily");
        Assert.Equal(2, bad);
        Assert.Contains("--degree-days", error, StringComparison.Ordinal);
        Assert.Contains("daily-mean", error, StringComparison.Ordinal);
    }

    [Fact]
    public void InspectText_NamesTheCoincidentHoursDefinition_AndShowsTheEnthalpyPoints()
    {
        var (code, output, _) = Run("inspect", TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--format", "tsv");
        Assert.Equal(0, code);
        Assert.Contains("data level nearest the design value", output, StringComparison.Ordinal);
        Assert.Contains("Enthalpy 0.4 % / MCDB", output, StringComparison.Ordinal);
        Assert.Contains("from daily mean temperatures", output, StringComparison.Ordinal);
    }

    [Fact]
    public void InspectJson_InSiUnits_UsesBase18Point3C()
    {
        var (code, output, _) = Run("inspect", TestData.Open("725945TYA.CSV"), "--map", "tmy3", "--units", "si", "--json");
        Assert.Equal(0, code);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal(18.3, root.GetProperty("climate").GetProperty("degree_day_base_c").GetDouble(), 9);
        Assert.Equal(62, root.GetProperty("elevation_m").GetDouble(), 9); // Arcata header: 62 m
        var repairs = root.GetProperty("repairs");
        Assert.Equal(29, repairs.GetProperty("dewpoint_above_drybulb_clamped").GetProperty("count").GetInt32()
            + repairs.GetProperty("dewpoint_above_drybulb_suspect").GetProperty("count").GetInt32()); // SOURCES.md: 29 hours
    }

    [Fact]
    public void Inspect_TableOutput_ShowsDesignConditionsRepairsAndCaution()
    {
        var (code, output, _) = Run("inspect", TestData.Open(TestData.PvgisFile), "--map", "pvgis");
        Assert.Equal(0, code);
        Assert.Contains("Heating 99.6 % dry-bulb", output, StringComparison.Ordinal);
        Assert.Contains("Hyndman and Fan", output, StringComparison.Ordinal);
        Assert.Contains("licensed engineer", output, StringComparison.Ordinal);
        Assert.Contains("UTC+1", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Inspect_BadData_ExitsThreeWithOneParagraphAndNoStackTrace()
    {
        string path = Path.Combine(TestData.Scratch("cli"), "backwards.csv");
        File.WriteAllText(path, OpenLayoutText.File(48, (i, r) => i == 10 ? OpenLayoutText.Row(4) : r));
        var (code, output, error) = Run("inspect", path);
        Assert.Equal(3, code);
        Assert.Equal("", output);
        Assert.StartsWith("binenergy: " + path + ", line 17", error, StringComparison.Ordinal);
        Assert.Single(error.TrimEnd().Split('\n'));
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Inspect_TmyFileWithoutMap_SuggestsTheMap()
    {
        var (code, _, error) = Run("inspect", TestData.Open("722040TYA.CSV"));
        Assert.Equal(3, code);
        Assert.Contains("--map tmy3", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Convert_WritesTheOpenLayout_WhichReadsBackToTheSameRecord()
    {
        string dir = TestData.Scratch("cli-convert");
        string output = Path.Combine(dir, "arcata.csv");
        var (code, _, error) = Run("convert", TestData.Open("725945TYA.CSV"), "--map", "tmy3", "--out", output);
        Assert.Equal(0, code);
        Assert.Equal("", error);
        var source = RealWeatherFileTests.Read("725945TYA.CSV");
        var again = BinEnergy.Core.Weather.WeatherReader.Read(output);
        Assert.Equal(8760, again.Count);
        Assert.True(again.Calendar.IsTypicalYear);
        Assert.Equal("ARCATA AIRPORT", again.Site.Name);
        for (int i = 0; i < again.Count; i += 97)
        {
            Assert.Equal(source.DryBulbC[i], again.DryBulbC[i], 3);
            Assert.Equal(source.DewPointC[i], again.DewPointC[i], 3);
            Assert.Equal(source.PressurePa[i], again.PressurePa[i], 0);
        }

        Assert.Equal(0, again.Quality.Counts.GetValueOrDefault("dewpoint_above_drybulb_suspect")); // repaired once, at the conversion
        Assert.Empty(Directory.GetFiles(dir, "*.tmp-*"));
    }

    [Fact]
    public void Convert_WithoutOut_IsAUsageError()
    {
        var (code, _, error) = Run("convert", TestData.Open("725945TYA.CSV"), "--map", "tmy3");
        Assert.Equal(2, code);
        Assert.Contains("--out", error, StringComparison.Ordinal);
    }
}
