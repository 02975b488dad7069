using BinEnergy.Core.Errors;
using BinEnergy.Core.Study;

namespace BinEnergy.Tests.Study;

/// <summary>
/// The corpus of malformed studies: each one is the example study with one mistake, and the
/// test asserts the error names the file, the line and the key, and says how to fix it.
/// </summary>
public sealed class StudyFileErrorTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-study-errors-").FullName;

    public StudyFileErrorTests()
    {
        // Only the existence of the weather file matters when the study file is read.
        File.WriteAllText(Path.Combine(folder, "harbor.csv"), "time,drybulb_c,dewpoint_c\n");
    }

    public void Dispose() => Directory.Delete(folder, recursive: true);

    public static TheoryData<string, string, string, string, string> Corpus()
    {
        var data = new TheoryData<string, string, string, string, string>();
        void Replace(string name, string find, string replacement, string key, string message) =>
            Add(name, ExampleStudy.ReplaceLine(find, replacement), key, message);
        void Add(string name, (string Text, int Line) study, string key, string message) =>
            data.Add(name, study.Text, $"line {study.Line}", key, message);

        Replace("syntax error (unclosed table header)", "[ventilation]", "[ventilation", "harbor-study.toml", "this is not valid TOML");
        Replace("unknown key with a near match", "airflow_cfm = 2000", "airflw_cfm = 2000", "key ventilation.airflw_cfm", "did you mean airflow_cfm?");
        Replace("wrong unit suffix", "airflow_cfm = 2000", "airflow_cmh = 2000", "key ventilation.airflow_cmh",
            "'cmh' is not a unit this key accepts: write one of airflow_cfm (cfm), airflow_ls (L/s), airflow_m3h (m3/h)");
        Replace("unit missing from the name", "heat_to_f = 70", "heat_to = 70", "key ventilation.heat_to", "'heat_to' needs its unit in its name: write one of heat_to_f (F), heat_to_c (C)");
        Replace("missing weather file", "weather = \"harbor.csv\"", "weather = \"harbour.csv\"", "key climate.weather", "weather file not found");
        Replace("negative airflow", "airflow_cfm = 2000", "airflow_cfm = -2000", "key ventilation.airflow_cfm", "-2000 cfm is out of range (negative values have no physical meaning here)");
        Replace("variant overriding an unknown key", "ventilation.airflow_cfm = 2600", "ventilation.airflow_cfn = 2600", "key variant.ventilation.airflow_cfn",
            "this variant overrides an unknown key: unknown key 'airflow_cfn' in [ventilation]; did you mean airflow_cfm?");
        Replace("duplicate variant names", "name = \"plus-30\"", "name = \"minimum\"", "key variant.name", $"variant \"minimum\" is already defined on line {ExampleStudy.LineOf(ExampleStudy.Text, "name = \"minimum\"")}; variant names must be unique");
        Replace("ventilation fan given twice", "fan_pressure_inwc = 1.0", "fan_pressure_inwc = 1.0\nfan_power_w_per_cfm = 0.3", "key ventilation.fan_pressure_inwc",
            "give the ventilation fan either as fan_power or as fan_pressure");
        Replace("air-system type unknown", "system = \"variable-volume\"", "system = \"dual-duct\"", "key economizer.system", "single-zone");
        var singleZone = ExampleStudy.ReplaceLine("system = \"variable-volume\"", "system = \"single-zone\"");
        Add("minimum airflow on a single-zone system", (singleZone.Text, ExampleStudy.LineOf(singleZone.Text, "supply_airflow_min_cfm")), "key economizer.supply_airflow_min_cfm",
            "a minimum supply airflow belongs to a variable-volume system");
        var reset = ExampleStudy.ReplaceLine("supply_airflow_cfm = 10000", "supply_airflow_cfm = 10000\nsupply_temp_reset_max_f = 62");
        Add("partial supply-temperature reset", (reset.Text, ExampleStudy.LineOf(reset.Text, "supply_temp_reset_max_f")), "key economizer.supply_temp_reset_max_f",
            "supply_temp_reset_outdoor_low is missing");
        var adiabatic = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\nhumidifier = \"adiabatic\"\nhumidifier_efficiency = 0.9");
        Add("adiabatic humidifier with an efficiency", (adiabatic.Text, ExampleStudy.LineOf(adiabatic.Text, "humidifier_efficiency")), "key plant.humidifier_efficiency",
            "an adiabatic humidifier has no efficiency here");
        var detail = ExampleStudy.ReplaceLine("[plant]", "[report]\ndetail_variants = [\"minimun\"]\n\n[plant]");
        Add("report detailing a variant the study does not have", (detail.Text, ExampleStudy.LineOf(detail.Text, "detail_variants")), "key report.detail_variants",
            "no variant is named \"minimun\"; did you mean \"minimum\"? (the variants: minimum, plus-30");
        var capacity = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\nheating_capacity_btuh = 120000");
        Add("heat-pump capacity on a gas plant", (capacity.Text, ExampleStudy.LineOf(capacity.Text, "heating_capacity_btuh")), "key plant.heating_capacity_btuh",
            "heating_capacity_btuh applies to heating_fuel = \"heat-pump\" only");
        var perCfmOnGas = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\nheating_capacity_w_per_ls = 10");
        Add("heat-pump capacity per airflow on a gas plant", (perCfmOnGas.Text, ExampleStudy.LineOf(perCfmOnGas.Text, "heating_capacity_w_per_ls")), "key plant.heating_capacity_w_per_ls",
            "heating_capacity_w_per_ls applies to heating_fuel = \"heat-pump\" only");
        var bothCapacities = ExampleStudy.ReplaceLine("heating_fuel = \"gas\"", "heating_fuel = \"heat-pump\"\nheating_cop = 3.0\nheating_capacity_btuh = 120000\nheating_capacity_btuh_per_cfm = 12");
        Add("heat-pump capacity given absolute and per airflow", (bothCapacities.Text, ExampleStudy.LineOf(bothCapacities.Text, "heating_capacity_btuh_per_cfm")), "key plant.heating_capacity_btuh_per_cfm",
            "either as heating_capacity (absolute) or per unit of airflow (heating_capacity_btuh_per_cfm), not both");
        var partTable = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\ncooling_cop_table_outdoor_f = [75, 95]\ncooling_cop_table = [4.0, 3.6, 3.2, 2.9]");
        Add("cooling COP table without its wet-bulbs", (partTable.Text, ExampleStudy.LineOf(partTable.Text, "cooling_cop_table_outdoor_f")), "key plant.cooling_cop_table_outdoor_f",
            "cooling_cop_table_wetbulb_f (or _c) is missing");
        var shortTable = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\ncooling_cop_table_outdoor_f = [75, 95]\ncooling_cop_table_wetbulb_f = [62, 72]\ncooling_cop_table = [4.0, 3.6, 3.2]");
        Add("cooling COP table one value short", (shortTable.Text, ExampleStudy.LineOf(shortTable.Text, "cooling_cop_table =")), "key plant.cooling_cop_table",
            "the table needs 2 x 2 = 4 COPs (one row per outdoor temperature, one value per wet-bulb), not 3");
        var fallingTable = ExampleStudy.ReplaceLine("fan_efficiency = 0.6", "fan_efficiency = 0.6\ncooling_cop_table_outdoor_f = [75, 95]\ncooling_cop_table_wetbulb_f = [72, 62]\ncooling_cop_table = [4.0, 3.6, 3.2, 2.9]");
        Add("cooling COP table with falling wet-bulbs", (fallingTable.Text, ExampleStudy.LineOf(fallingTable.Text, "cooling_cop_table_wetbulb_f")), "key plant.cooling_cop_table_wetbulb_f",
            "the wet-bulb temperatures must rise strictly");
        Replace("misspelled table", "[plant]", "[plnat]", "key plnat", "unknown table [plnat]; did you mean [plant]?");
        Replace("number written as text", "airflow_cfm = 2000", "airflow_cfm = \"2000\"", "key ventilation.airflow_cfm", "write the number without quotes: airflow_cfm = 2000");
        Replace("misspelled choice", "flow_basis = \"site\"", "flow_basis = \"sight\"", "key ventilation.flow_basis", "\"sight\" is not one of \"site\", \"standard\", \"actual\"; did you mean \"site\"?");
        Replace("effectiveness above one", "sensible_effectiveness = 0.70", "sensible_effectiveness = 1.7", "key recovery.sensible_effectiveness", "1.7 is out of range: expected a value between 0 and 1");
        Replace("relative humidity above 100", "max_rh_pct = 50", "max_rh_pct = 150", "key ventilation.max_rh_pct", "150 is out of range: expected a percentage from 1 to 100");
        Replace("relative humidity as a fraction", "max_rh_pct = 50", "max_rh_pct = 0.5", "key ventilation.max_rh_pct", "0.5 is out of range: expected a percentage from 1 to 100 (RH is in percent: 50 for 50 %, not 0.5)");
        Replace("setpoint in the other unit", "heat_to_f = 70", "heat_to_f = 21", "key ventilation.heat_to_f", "21 F is out of range: expected 0 to 40 C (32 to 104 F); 21 would be in range in C: if that is what you meant, write heat_to_c");
        Replace("variant overriding a climate", "recovery.enabled = false", "climate.weather = \"other.csv\"", "key variant.climate.weather", "climates are the other axis of the run");
        Replace("a rating point that is not a pair", "cooling_cop = [[65, 4.2]", "cooling_cop = [[65, 4.2, 1], [95, 3.2]]", "key plant.cooling_cop", "each point must be a pair [outdoor temperature, value]");
        Replace("unknown economizer control", "controls = [", "controls = [\"fixed-drybulbs\"]", "key economizer.controls", "\"fixed-drybulbs\" is not one of none, fixed-drybulb, differential-drybulb, fixed-enthalpy, differential-enthalpy, fixed-dewpoint; did you mean \"fixed-drybulb\"?");
        Replace("misspelled fuel", "heating_fuel = \"gas\"", "heating_fuel = \"gaz\"", "key plant.heating_fuel", "did you mean \"gas\"?");
        Replace("variant key without its table", "ventilation.airflow_cfm = 2600", "airflow_cfm = 2600", "key variant.airflow_cfm", "did you mean ventilation.airflow_cfm?");
        Replace("the same key twice", "cool_to_f = 75", "heat_to_f = 75", "ventilation", "is already defined");
        Replace("the same value in two units", "cool_to_f = 75", "heat_to_c = 21", "key ventilation.heat_to_c", "heat_to_f (line 19) already sets this value; give it once, in one unit");
        Replace("balance point below absolute plausibility", "balance_point_f = 55", "balance_point_f = -400", "key economizer.balance_point_f", "-400 F is out of range");
        Replace("price that is negative", "price_gas_per_therm = 1.10", "price_gas_per_therm = -1.10", "key plant.price_gas_per_therm", "out of range (negative values have no physical meaning here): expected zero or more");
        Replace("misspelled humidity convention", "# elevation_ft = 40", "humidity_over = \"frost\"", "key climate.humidity_over", "\"frost\" is not one of \"water\", \"ice\"");
        Replace("a price so large the cost would be infinite", "price_gas_per_therm = 1.10", "price_gas_per_therm = 1e308", "key plant.price_gas_per_therm", "1E+308 per therm is out of range: expected a value between 0 per therm and 2.931E+07 per therm");
        Replace("misspelled shipped map", "# elevation_ft = 40", "map = \"tmy33\"", "key climate.map", "\"tmy33\" is not a shipped column map (shipped: pvgis, tmy3); did you mean \"tmy3\"?");
        Replace("map file that does not exist", "# elevation_ft = 40", "map = \"maps/missing.toml\"", "key climate.map", "column map file not found");
        Replace("a text value left open", "name = \"Harbor office ventilation options\"", "name = \"Harbor office ventilation options", "harbor-study.toml",
            "a text value is not closed on this line: add the closing quote");
        Replace("a rating point's temperature out of range, in the study's F", "cooling_cop = [[65, 4.2]", "cooling_cop = [[0, 4.2], [95, 3.2]]", "key plant.cooling_cop",
            "outdoor temperature 0 F is outside");
        Replace("a key above every table", "[study]", "name = \"x\"\n[study]", "key name", "keys must be inside a table");

        // Demand-controlled ventilation: the profile resets the people part of the people-and-area rates.
        void Profile(string name, string ventilation, string message)
        {
            string text = ExampleStudy.ReplaceLine("airflow_cfm = 2000", ventilation).Text;
            Add(name, (text, ExampleStudy.LineOf(text, "occupancy_profile")), "key ventilation.occupancy_profile", message);
        }

        static string Fractions(int count, double value = 0.5) => "[" + string.Join(", ", Enumerable.Repeat(value.ToString(System.Globalization.CultureInfo.InvariantCulture), count)) + "]";
        const string Rates = "people = 40\nper_person_cfm = 5\narea_ft2 = 10000\nper_area_cfm = 0.06\n";
        Profile("occupancy profile with a fixed airflow", "airflow_cfm = 2000\noccupancy_profile = " + Fractions(24),
            "an occupancy profile resets the people part of the people-and-area rates, so it needs people, per_person_cfm (and area_ft2, per_area_cfm) without airflow_cfm");
        Profile("occupancy profile of 23 hours", Rates + "occupancy_profile = " + Fractions(23), "give 24 fractions, one per hour of the day");
        Profile("occupancy fraction above one", Rates + "occupancy_profile = " + Fractions(24, 1.5), "out of range");
        Profile("occupancy profile without people", "people = 0\nper_person_cfm = 5\narea_ft2 = 10000\nper_area_cfm = 0.06\noccupancy_profile = " + Fractions(24),
            "people x per_person_cfm is zero");
        return data;
    }

    [Theory]
    [MemberData(nameof(Corpus))]
    public void MalformedStudy_GivesFileLineKeyAndFix(string name, string text, string line, string key, string message)
    {
        string path = Path.Combine(folder, "harbor-study.toml");
        File.WriteAllText(path, text);
        // Read, then resolved into the engines' settings, as `run` does before it reads any weather.
        var e = Assert.Throws<StudyFileException>(() => StudyCaseBuilder.Build(StudyFileReader.Read(path)));
        Assert.IsAssignableFrom<InputDataException>(e);
        Assert.True(e.Message.StartsWith(path + ", " + line, StringComparison.Ordinal), $"{name}: '{e.Message}' should start with the file and {line}");
        Assert.True(e.Message.Contains(key, StringComparison.Ordinal), $"{name}: '{e.Message}' should name {key}");
        Assert.True(e.Message.Contains(message, StringComparison.Ordinal), $"{name}: '{e.Message}' should say '{message}'");
    }

    [Fact]
    public void ExampleStudy_ReadsAsWritten()
    {
        string path = Path.Combine(folder, "harbor-study.toml");
        File.WriteAllText(path, ExampleStudy.Text);
        var study = StudyFileReader.Read(path);
        Assert.Equal("Harbor office ventilation options", study.Name);
        Assert.Equal(["harbor"], study.Climates.Select(c => c.Name));
        Assert.Equal(["minimum", "plus-30", "no-recovery"], study.Variants.Select(v => v.Name));
        Assert.Equal(["ventilation.airflow_cfm"], study.Variants[1].Overrides);
        Assert.Equal(64, study.Hash.Length);
    }

    [Fact]
    public void MissingStudyFile_NamesThePath()
    {
        string path = Path.Combine(folder, "nowhere.toml");
        var e = Assert.Throws<StudyFileException>(() => StudyFileReader.Read(path));
        Assert.Contains("nowhere.toml: the study file does not exist", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void StudyWithoutClimate_SaysHowToAddOne()
    {
        string text = ExampleStudy.Text.Replace("[[climate]]\nname = \"harbor\"\nweather = \"harbor.csv\"", string.Empty, StringComparison.Ordinal);
        text = string.Join('\n', text.Split('\n').Where(l => !l.StartsWith("name = \"harbor\"", StringComparison.Ordinal) && !l.StartsWith("weather =", StringComparison.Ordinal) && l != "[[climate]]"));
        string path = Path.Combine(folder, "no-climate.toml");
        File.WriteAllText(path, text);
        var e = Assert.Throws<StudyFileException>(() => StudyFileReader.Read(path));
        Assert.Contains("the study has no climate; add a [[climate]] table", e.Message, StringComparison.Ordinal);
    }
}
