using System.Text.Json;
using BinEnergy.Cli;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Tests.Reporting.Batch;

/// <summary>The <c>climates</c> table: one row per climate with the figures <c>inspect</c> gives for the same file.</summary>
public sealed class ClimatesTableTests
{
    private static ResultTable Table() => StudyTables.Climates(CrossClimateStudy.Run.Cases, StudyTables.Units(CrossClimateStudy.Run), CrossClimateStudy.Run.Study.DegreeDayMethod);

    private static JsonElement Inspect(string weather, string? map)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        string[] args = map is null ? ["inspect", weather, "--json"] : ["inspect", weather, "--map", map, "--json"];
        int code = CliApp.Run(args, stdout, stderr);
        Assert.True(code == 0, stderr.ToString());
        return JsonDocument.Parse(stdout.ToString()).RootElement;
    }

    [Fact]
    public void EveryClimate_HasOneRow_WithTheColumnsAndUnitSuffixes()
    {
        var t = Table();
        Assert.Equal(CrossClimateStudy.Climates.Select(c => c.Name), t["climate"].Texts);
        string[] expected =
        [
            "climate", "weather", "site", "station_id", "latitude_deg", "longitude_deg", "elevation_ft", "site_pressure_psia", "hours_in_record",
            "period", "humidity_over", "mean_drybulb_f", "degree_day_method", "heating_degree_days_f_day", "cooling_degree_days_f_day",
            "heating_99_6_drybulb_f", "cooling_0_4_drybulb_f",
        ];
        Assert.Equal(expected, t.Columns.Select(c => c.Name));
    }

    [Fact]
    public void EachRow_MatchesInspect_ForTheSameFile()
    {
        var t = Table();
        for (int i = 0; i < t.RowCount; i++)
        {
            var (name, weather, map) = CrossClimateStudy.Climates[i];
            var doc = Inspect(weather, map);
            var climate = doc.GetProperty("climate");
            var design = doc.GetProperty("design");
            Assert.Equal(doc.GetProperty("site").GetString(), t["site"].Texts[i]);
            Assert.Equal(doc.GetProperty("hours").GetInt32(), t["hours_in_record"].Integers[i]);
            Assert.Equal(doc.GetProperty("elevation_ft").GetDouble(), t["elevation_ft"].Numbers[i], 6);
            Assert.Equal(doc.GetProperty("site_pressure_psia").GetDouble(), t["site_pressure_psia"].Numbers[i], 9);
            Assert.Equal(climate.GetProperty("drybulb_mean_f").GetDouble(), t["mean_drybulb_f"].Numbers[i], 9);
            Assert.Equal(climate.GetProperty("degree_day_method").GetString(), t["degree_day_method"].Texts[i]);
            Assert.Equal(climate.GetProperty("heating_degree_days_f_day").GetDouble(), t["heating_degree_days_f_day"].Numbers[i], 6);
            Assert.Equal(climate.GetProperty("cooling_degree_days_f_day").GetDouble(), t["cooling_degree_days_f_day"].Numbers[i], 6);
            Assert.Equal(design.GetProperty("heating_99_6").GetProperty("drybulb_f").GetDouble(), t["heating_99_6_drybulb_f"].Numbers[i], 9);
            Assert.Equal(design.GetProperty("cooling_0_4").GetProperty("drybulb_f").GetDouble(), t["cooling_0_4_drybulb_f"].Numbers[i], 9);
            Assert.True(doc.GetProperty("latitude").ValueKind != JsonValueKind.Number || Math.Abs(doc.GetProperty("latitude").GetDouble() - t["latitude_deg"].Numbers[i]) < 1e-9, name);
        }
    }

    [Fact]
    public void Chicago_AgainstPublishedFigures()
    {
        var t = Table();
        int i = t["climate"].Texts.ToList().IndexOf("tmy3-725300");

        // The TMY3 header line: USAF 725300, "CHICAGO OHARE INTL AP", 41.983 N, -87.917 E, 201 m (the file itself).
        Assert.Equal("725300", t["station_id"].Texts[i]);
        Assert.Equal("CHICAGO OHARE INTL AP", t["site"].Texts[i]);
        Assert.Equal(41.983, t["latitude_deg"].Numbers[i], 9);
        Assert.Equal(-87.917, t["longitude_deg"].Numbers[i], 9);
        Assert.Equal(201 / 0.3048, t["elevation_ft"].Numbers[i], 6);
        Assert.Equal("typical year", t["period"].Texts[i]);

        // O'Hare normals: about 6,500 HDD65 and 830 CDD65 (NOAA 1981-2010 normals; recalled from memory); the
        // typical year's daily means give 6,325 and 842 F-day.
        Assert.InRange(t["heating_degree_days_f_day"].Numbers[i], 6500 * 0.95, 6500 * 1.05);
        Assert.InRange(t["cooling_degree_days_f_day"].Numbers[i], 830 * 0.85, 830 * 1.15);

        // O'Hare 0.4 % cooling about 91 F (ASHRAE Fundamentals climatic design conditions; recalled from memory);
        // 99.6 % heating a few degrees below 0 F (same source; recalled from memory, about -6 F). One typical year is milder.
        Assert.InRange(t["cooling_0_4_drybulb_f"].Numbers[i], 91 - 3, 91 + 3);
        Assert.InRange(t["heating_99_6_drybulb_f"].Numbers[i], -6 - 4, -6 + 4);
    }

    [Fact]
    public void InventedClimates_HaveNoStationId_AndTheOpenLayoutsMetadata()
    {
        var t = Table();
        int i = t["climate"].Texts.ToList().IndexOf("kelpwick");
        Assert.Equal(string.Empty, t["station_id"].Texts[i]);
        Assert.Equal(44.3, t["latitude_deg"].Numbers[i], 9); // weather-samples/kelpwick-hourly.csv header (invented)
        Assert.Equal("water", t["humidity_over"].Texts[i]);
    }

    [Fact]
    public void Run_WritesTheClimatesTable()
    {
        var tables = StudyTables.Build(CrossClimateStudy.Run, hourly: false);
        Assert.Equal("climates", tables[0].Name);
        Assert.Equal(CrossClimateStudy.Climates.Count, tables[0].RowCount);
    }
}
