using System.Globalization;
using System.Text.Json;
using BinEnergy.Cli;
using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Tables;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

/// <summary>
/// Runs the example study end to end through the command line on an invented climate, and
/// checks the outputs against the outdoor-air engine called directly (one engine, not two)
/// and against an outside reader (DuckDB through its npm package).
/// </summary>
public sealed class StudyRunTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-study-run-").FullName;

    public StudyRunTests()
    {
        ExampleStudy.WriteWeather(folder);
    }

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private string StudyPath(string text, string name = "harbor-study.toml")
    {
        string path = Path.Combine(folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    private static (int Code, string Out, string Err) Cli(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private static List<Dictionary<string, string>> ReadCsv(string path)
    {
        var lines = File.ReadAllLines(path);
        var header = lines[0].Split(',');
        return lines.Skip(1).Select(l => header.Zip(l.Split(',')).ToDictionary(p => p.First, p => p.Second)).ToList();
    }

    private static double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);

    [Fact]
    public void ExampleStudy_ReproducesTheOutdoorAirEngineExactly()
    {
        string out1 = Path.Combine(folder, "out");
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1);
        Assert.True(code == 0, err);
        var annual = ParquetRows.Read(out1, "annual");
        Assert.Equal(9, annual.Count); // 1 climate x 3 variants x 3 methods

        // The same settings written out by hand from the example study, given to the engine directly.
        var weather = WeatherReader.Read(Path.Combine(folder, "harbor.csv"));
        var recovery = new EnergyRecoverySettings
        {
            SensibleEffectiveness = 0.70,
            LatentEffectiveness = 0.55,
            FrostLimit = Temperature.FromFahrenheit(10),
            FrostEffectiveness = 0.35,
            PressureDropPa = 0.8 * Conversions.PascalsPerInchOfWater,
            FanEfficiency = 0.6,
        };
        var baseSettings = new OutdoorAirSettings
        {
            Airflow = VolumeFlow.FromCfm(2000),
            FlowBasis = FlowBasis.Site,
            Operation = VentilationOperation.Occupied,
            Schedule = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00"),
            HeatTo = Temperature.FromFahrenheit(70),
            CoolTo = Temperature.FromFahrenheit(75),
            MaxRelativeHumidity = 0.50,
            Recovery = recovery,
            VentilationFanWattsPerCubicMetrePerSecond = 1.0 * Conversions.PascalsPerInchOfWater / 0.6, // dp / eta (FanPower)
        };
        var variants = new Dictionary<string, OutdoorAirSettings>
        {
            ["minimum"] = baseSettings,
            ["plus-30"] = baseSettings with { Airflow = VolumeFlow.FromCfm(2600) },
            ["no-recovery"] = baseSettings with { Recovery = null },
        };
        foreach (var (variant, settings) in variants)
        {
            var engine = OutdoorAirCalculator.Compute(weather, settings, new DryBulbBinScale(5, UnitSystem.IP));
            foreach (var (method, totals) in new[] { ("bin", engine.Annual.Bin.Loads), ("joint-bin", engine.Annual.JointBin.Loads), ("hourly", engine.Annual.Hourly.Loads) })
            {
                var row = annual.Single(r => r["variant"] == variant && r["method"] == method);
                Assert.Equal((int)totals.HoursVentilated, int.Parse(row["hours_ventilated"], CultureInfo.InvariantCulture));
                Assert.Equal(totals.Heating.Kbtu, D(row["heating_kbtu"]));
                Assert.Equal(totals.CoolingSensible.Kbtu, D(row["cooling_sensible_kbtu"]));
                Assert.Equal(totals.CoolingLatent.Kbtu, D(row["cooling_latent_kbtu"]));
                Assert.Equal(totals.RecoveredHeating.Kbtu, D(row["recovered_heating_kbtu"]));
                Assert.Equal(totals.RecoveredCooling.Kbtu, D(row["recovered_cooling_kbtu"]));
                Assert.Equal(totals.FanEnergy.KilowattHours, D(row["fan_kwh"]), 9);
            }
        }

        // Loads scale linearly with airflow: plus-30 carries 1.3 times the heating of minimum (exact up to rounding).
        double h0 = D(annual.Single(r => r["variant"] == "minimum" && r["method"] == "bin")["heating_kbtu"]);
        double h1 = D(annual.Single(r => r["variant"] == "plus-30" && r["method"] == "bin")["heating_kbtu"]);
        Assert.Equal(1.3, h1 / h0, 9);

        // Gas bought by the bin method: heating / 0.85 in therms, priced at $1.10 (hand check, 1 therm = 100 kBtu).
        var minBin = annual.Single(r => r["variant"] == "minimum" && r["method"] == "bin");
        Assert.Equal(h0 / 0.85 / 100.0, D(minBin["gas_therm"]), 6);
        Assert.Equal(h0 / 0.85 / 100.0 * 1.10, D(minBin["heating_cost_usd"]), 6);
    }

    [Fact]
    public void ExampleStudy_ReproducesTheOutdoorAirCommandExactly()
    {
        string out1 = Path.Combine(folder, "out");
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1);
        Assert.True(code == 0, err);
        var annual = ParquetRows.Read(out1, "annual");
        string[] common = ["outdoor-air", Path.Combine(folder, "harbor.csv"), "--heat-to", "70", "--cool-to", "75", "--max-rh", "50",
            "--occupied", "Mon-Fri 07:00-19:00; Sat 08:00-13:00", "--flow-basis", "site", "--json"];
        string[] recovery = ["--recovery-sensible", "0.70", "--recovery-latent", "0.55", "--frost-limit", "10", "--frost-effectiveness", "0.35",
            "--recovery-pressure", "0.8", "--fan-efficiency", "0.6"];
        var variants = new Dictionary<string, string[]>
        {
            ["minimum"] = [.. common, "--airflow", "2000", .. recovery],
            ["plus-30"] = [.. common, "--airflow", "2600", .. recovery],
            ["no-recovery"] = [.. common, "--airflow", "2000"],
        };
        foreach (var (variant, args) in variants)
        {
            var (c, json, e) = Cli(args);
            Assert.True(c == 0, e);
            using var doc = JsonDocument.Parse(json);
            foreach (var method in new[] { "hourly", "joint-bin", "bin" })
            {
                var expected = doc.RootElement.GetProperty("annual").GetProperty(method.Replace('-', '_'));
                var row = annual.Single(r => r["variant"] == variant && r["method"] == method);
                Assert.Equal(expected.GetProperty("hours_ventilated").GetInt32(), int.Parse(row["hours_ventilated"], CultureInfo.InvariantCulture));
                foreach (var figure in new[] { "heating_kbtu", "cooling_sensible_kbtu", "cooling_latent_kbtu", "humidification_kbtu", "recovered_heating_kbtu", "recovered_cooling_kbtu", "fan_kwh" })
                {
                    Assert.Equal(expected.GetProperty(figure).GetDouble(), D(row[figure]));
                }
            }
        }
    }

    [Fact]
    public void ExampleStudy_ReproducesTheEconomizerCommandExactly()
    {
        string out1 = Path.Combine(folder, "out");
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1);
        Assert.True(code == 0, err);
        var rows = ParquetRows.Read(out1, "economizer");

        // The [economizer] table of the example, given to the economizer command.
        var (code2, json, err2) = Cli("economizer", Path.Combine(folder, "harbor.csv"), "--supply-airflow", "10000", "--min-outdoor-airflow", "2000",
            "--supply-temp", "55", "--return-temp", "75", "--return-rh", "50", "--design-load", "300000", "--design-outdoor", "95",
            "--balance-point", "55", "--occupied", "Mon-Fri 07:00-19:00; Sat 08:00-13:00", "--high-limit-drybulb", "75",
            "--high-limit-enthalpy", "28", "--high-limit-dewpoint", "55", "--json");
        Assert.True(code2 == 0, err2);
        using var doc = JsonDocument.Parse(json);
        var command = doc.RootElement.GetProperty("by_method").EnumerateArray().ToList();
        string[] names = ["none", "fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"];
        Assert.Equal(names.Length * 3 * 3, rows.Count); // controls x methods x variants (the economizer does not depend on the ventilation variants here)
        foreach (var variant in new[] { "minimum", "plus-30", "no-recovery" })
        {
            foreach (var name in names)
            {
                foreach (var method in new[] { "hourly", "joint-bin", "bin" })
                {
                    var expected = command.Single(r => r.GetProperty("control").GetString() == name && r.GetProperty("method").GetString() == method);
                    var row = rows.Single(r => r["variant"] == variant && r["control"] == name && r["method"] == method);
                    Assert.Equal(expected.GetProperty("hours_free").GetDouble(), D(row["hours_free"]));
                    Assert.Equal(expected.GetProperty("hours_integrated").GetDouble(), D(row["hours_integrated"]));
                    Assert.Equal(expected.GetProperty("hours_minimum").GetDouble(), D(row["hours_minimum"]));
                    Assert.Equal(expected.GetProperty("coil_total_kbtu").GetDouble(), D(row["coil_total_kbtu"]));
                    Assert.Equal(expected.GetProperty("savings_kbtu").GetDouble(), D(row["savings_kbtu"]));
                }
            }
        }

        // Compressor energy is the coil energy through the cooling COP (between 2.6 and 4.2 in the example): a bracket check.
        var baseline = rows.Single(r => r["variant"] == "minimum" && r["control"] == "none" && r["method"] == "bin");
        double coilKwh = D(baseline["coil_total_kbtu"]) * 1000 / 3412.14; // 1 kWh = 3412.14 Btu (DESIGN 3)
        Assert.InRange(D(baseline["compressor_kwh"]), coilKwh / 4.2, coilKwh / 2.6);
        Assert.Equal(D(baseline["compressor_kwh"]) * 0.14, D(baseline["compressor_cost_usd"]), 6);
    }

    [Fact]
    public void HeatPumpWithSmallCapacity_ReportsBackupHeatSeparately()
    {
        // A heat pump of 20,000 Btu/h (invented) for 2,000 cfm of outdoor air cannot carry the cold hours: the backup does.
        string text = ExampleStudy.Text
            .Replace("heating_fuel = \"gas\"", "heating_fuel = \"heat-pump\"\nheating_cop = 3.0\nheating_capacity_btuh = 20000\nheat_pump_lockout_f = 0", StringComparison.Ordinal)
            .Replace("\nheating_efficiency = 0.85", "\n", StringComparison.Ordinal);
        string out1 = Path.Combine(folder, "out-hp");
        var (code, _, err) = Cli("run", StudyPath(text), "--out", out1);
        Assert.True(code == 0, err);
        var annual = ParquetRows.Read(out1, "annual");
        var row = annual.First(r => r["variant"] == "no-recovery" && r["method"] == "hourly");
        double backup = D(row["backup_heating_electricity_kwh"]);
        Assert.True(backup > 0, "the backup carries what the heat pump cannot");
        Assert.True(D(row["electricity_kwh"]) > backup);
    }

    [Fact]
    public void ParquetTables_ReadByDuckDb_MatchCsvAndSummary()
    {
        string out1 = Path.Combine(folder, "out");
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1, "--hourly");
        Assert.True(code == 0, err);
        var sums = new Dictionary<string, string[]>
        {
            ["annual"] = ["hours_ventilated", "heating_kbtu", "cooling_latent_kbtu", "cost_usd", "carbon_kg"],
            ["bins"] = ["hours", "hours_occupied", "heating_kbtu"],
            ["monthly"] = ["month", "heating_kbtu", "electricity_kwh"],
            ["economizer"] = ["hours_free", "coil_total_kbtu", "savings_cost_usd"],
            ["peaks"] = ["drybulb_f", "total_btuh"],
            ["hourly"] = ["occupied", "heating_kbtu"],
        };
        var duck = NodeReference.Run<Dictionary<string, DuckTable>>("duckdb-tables.mjs", new { folder = out1, sums });
        foreach (var (table, columns) in sums)
        {
            string csvPath = Path.Combine(out1, "tables", table + ".csv");
            var header = File.ReadLines(csvPath).First().Split(',');
            var rows = ReadCsv(csvPath);
            var seen = duck[table];
            Assert.Equal(rows.Count, seen.rows);
            Assert.Equal(header, seen.columns.Select(c => c.name));
            foreach (var c in seen.columns)
            {
                // Proper types: names are strings, quantities doubles, hours and months 32-bit integers.
                string expected = c.name is "climate" or "variant" or "method" or "control" or "integration" or "condition" or "time" or "year" or "system" ? "VARCHAR"
                    : c.name is "hours_ventilated" or "hours" or "hours_occupied" or "month" or "hour" or "occupied" or "complete_year" ? "INTEGER" : "DOUBLE";
                Assert.True(expected == c.type, $"{table}.{c.name} is {c.type}, expected {expected}");
            }

            foreach (var col in columns)
            {
                // The CSV keeps six significant digits of each value (FileDigits), Parquet every bit: the sums agree to that rounding.
                double csvSum = rows.Sum(r => D(r[col]));
                double rounding = rows.Sum(r => Math.Max(1e-3, Math.Abs(D(r[col])) * 5e-6));
                Assert.Equal(csvSum, seen.sums[col]!.Value, rounding);
            }

            // No float noise in the CSV (-5.980000000000004): every value is rounded to its unit's digits.
            Assert.All(File.ReadLines(csvPath).Skip(1).SelectMany(l => l.Split(',')), field => Assert.DoesNotMatch(Output.CsvDigitsTests.Noise(), field));

            Assert.Equal("Harbor office ventilation options", seen.metadata["binenergy.study"]);
            Assert.Equal("ip", seen.metadata["binenergy.units"]);
            Assert.False(string.IsNullOrEmpty(seen.metadata["binenergy.engine_version"]));
        }

        // 8,760 hours x 3 variants in the hourly table; bins hold every hour of the record once per variant.
        Assert.Equal(8760 * 3, duck["hourly"].rows);
        Assert.Equal(8760.0 * 3 * 3, duck["bins"].sums["hours"]); // once per variant and method

        // summary.json's headline carries the same numbers as the annual table's rows of the headline method (hourly by default).
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        Assert.Equal("hourly", summary.RootElement.GetProperty("headline_method").GetString());
        double summaryHeating = summary.RootElement.GetProperty("headline").EnumerateArray().Sum(c => c.GetProperty("heating_kbtu").GetDouble());
        double annualHourlyHeating = ParquetRows.Read(out1, "annual").Where(r => r["method"] == "hourly").Sum(r => D(r["heating_kbtu"]));
        Assert.Equal(annualHourlyHeating, summaryHeating, 6);
        Assert.Equal(64, summary.RootElement.GetProperty("study_sha256").GetString()!.Length);

        // The monthly table's hourly heating adds up to the hourly method's annual heating.
        double monthly = ParquetRows.Read(out1, "monthly").Where(r => r["method"] == "hourly").Sum(r => D(r["heating_kbtu"]));
        Assert.Equal(annualHourlyHeating, monthly, 6);
    }

    [Fact]
    public void NonEmptyOutputFolder_IsRefusedWithoutForce_AndAFailedRunLeavesItAsItWas()
    {
        string out1 = Path.Combine(folder, "out");
        Directory.CreateDirectory(out1);
        File.WriteAllText(Path.Combine(out1, "keep.txt"), "earlier results");

        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("already exists and is not empty: add --force", err, StringComparison.Ordinal);

        // --force does not replace a folder that no earlier run made (no marker file): nothing is deleted.
        var (codeUnmarked, _, errUnmarked) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1, "--force");
        Assert.Equal(ExitCodes.BadInput, codeUnmarked);
        Assert.Contains("replaces only an output folder of an earlier run", errUnmarked, StringComparison.Ordinal);
        Assert.Equal(["keep.txt"], Directory.GetFileSystemEntries(out1).Select(Path.GetFileName));
        File.WriteAllText(Path.Combine(out1, OutputFolder.MarkerName), "binenergy output folder\n");

        // A study that fails while running (a schedule the engine rejects) leaves the folder untouched, even with --force.
        var (bad, _) = ExampleStudy.ReplaceLine("occupied = \"Mon-Fri", "occupied = \"Mon-Fry 07:00-19:00\"");
        var (code2, _, err2) = Cli("run", StudyPath(bad, "bad.toml"), "--out", out1, "--force");
        Assert.Equal(ExitCodes.BadInput, code2);
        Assert.Contains("key schedule.occupied", err2, StringComparison.Ordinal);
        Assert.Equal([OutputFolder.MarkerName, "keep.txt"], Directory.GetFileSystemEntries(out1).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Empty(Directory.GetDirectories(folder, ".out.partial-*"));

        // With --force a good run replaces it as a whole.
        var (code3, _, err3) = Cli("run", StudyPath(ExampleStudy.Text), "--out", out1, "--force");
        Assert.True(code3 == 0, err3);
        Assert.False(File.Exists(Path.Combine(out1, "keep.txt")));
        Assert.True(File.Exists(Path.Combine(out1, "tables", "annual.parquet")));
    }

    [Fact]
    public void VariantBelowPeopleAndAreaMinimum_WarnsAboutOccupantsAndTheCode()
    {
        // 50 people x 5 cfm + 10,000 ft2 x 0.06 cfm/ft2 = 850 cfm (rates invented for the test); the "tight" variant gives 600 cfm.
        string text = ExampleStudy.Text.Replace("\nairflow_cfm = 2000", "\nairflow_cfm = 2000\npeople = 50\nper_person_cfm = 5\narea_ft2 = 10000\nper_area_cfm = 0.06", StringComparison.Ordinal)
            + "\n[[variant]]\nname = \"tight\"\nventilation.airflow_cfm = 600\n";
        string out1 = Path.Combine(folder, "out");
        var (code, stdout, err) = Cli("run", StudyPath(text), "--out", out1);
        Assert.True(code == 0, err);
        Assert.Contains("harbor / tight: The airflow 600 cfm", err, StringComparison.Ordinal);
        Assert.Contains("below the people-and-area minimum you entered, 850 cfm", err, StringComparison.Ordinal);
        Assert.Contains("harms occupants", err, StringComparison.Ordinal);
        Assert.Contains("licensed engineer", stdout, StringComparison.Ordinal);
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        var warnings = summary.RootElement.GetProperty("warnings").EnumerateArray().Select(w => w.GetString()!).ToList();
        Assert.Contains(warnings, w => w.StartsWith("harbor / tight: ", StringComparison.Ordinal) && w.Contains("locally adopted code", StringComparison.Ordinal));
        Assert.DoesNotContain(warnings, w => w.Contains("/ minimum: ", StringComparison.Ordinal) && w.Contains("people-and-area", StringComparison.Ordinal));
    }

    [Fact]
    public void OccupancyProfile_AtFullOccupancyChangesNothing_AndAtHalfHalvesThePeoplePart()
    {
        // Invented zone: 40 people x 5 cfm = 200 cfm, 10,000 ft2 x 0.06 cfm/ft2 = 600 cfm; no fixed airflow.
        string rates = ExampleStudy.Text
            .Replace("\nairflow_cfm = 2000", "\npeople = 40\nper_person_cfm = 5\narea_ft2 = 10000\nper_area_cfm = 0.06", StringComparison.Ordinal)
            .Replace("ventilation.airflow_cfm = 2600", "ventilation.people = 52", StringComparison.Ordinal);
        string Profile(double f) => rates.Replace("\nper_area_cfm = 0.06", "\nper_area_cfm = 0.06\noccupancy_profile = ["
            + string.Join(", ", Enumerable.Repeat(f.ToString(CultureInfo.InvariantCulture), 24)) + "]", StringComparison.Ordinal);
        var annual = new Dictionary<string, List<Dictionary<string, string>>>();
        foreach (var (name, text) in new[] { ("none", rates), ("full", Profile(1.0)), ("half", Profile(0.5)) })
        {
            string out1 = Path.Combine(folder, "out-dcv-" + name);
            var (code, _, err) = Cli("run", StudyPath(text, "dcv-" + name + ".toml"), "--out", out1);
            Assert.True(code == 0, err);
            annual[name] = ParquetRows.Read(out1, "annual");
        }

        // Invariant: a profile of 1.0 in every hour is the design airflow, so every table value is the same as without one.
        Assert.Equal(annual["none"], annual["full"]);

        // Half occupancy halves the people part only (ASHRAE Standard 62.1 ventilation rate procedure, people
        // component reset by occupancy, recalled from memory): minimum (200 x 0.5 + 600) / 800 = 0.875;
        // the variant with 52 people: (260 x 0.5 + 600) / 860 = 0.8488. Loads are linear in the airflow.
        foreach (var (variant, ratio) in new[] { ("minimum", 0.875), ("plus-30", 730.0 / 860.0), ("no-recovery", 0.875) })
        {
            foreach (string method in new[] { "bin", "hourly" })
            {
                var none = annual["none"].Single(r => r["variant"] == variant && r["method"] == method);
                var half = annual["half"].Single(r => r["variant"] == variant && r["method"] == method);
                foreach (string column in new[] { "heating_kbtu", "cooling_sensible_kbtu", "cooling_latent_kbtu", "recovered_heating_kbtu", "fan_kwh" })
                {
                    if (D(none[column]) > 0)
                    {
                        Assert.Equal(ratio, D(half[column]) / D(none[column]), 9);
                    }
                }
            }
        }
    }

    [Fact]
    public void BinPoint_MeanByDefault_MidpointOnRequest()
    {
        string outMean = Path.Combine(folder, "out-mean");
        string outMid = Path.Combine(folder, "out-mid");
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", outMean);
        Assert.True(code == 0, err);
        string midpoint = ExampleStudy.Text.Replace("bin_width_f = 5", "bin_width_f = 5\nbin_point = \"midpoint\"", StringComparison.Ordinal);
        (code, _, err) = Cli("run", StudyPath(midpoint, "midpoint.toml"), "--out", outMid);
        Assert.True(code == 0, err);

        // Default: each bin's loads at the mean dry-bulb of its ventilated hours, inside the bin's edges.
        var mean = ParquetRows.Read(outMean, "bins").Where(b => D(b["hours_ventilated"]) > 0).ToList();
        Assert.NotEmpty(mean);
        Assert.All(mean, b => Assert.InRange(D(b["evaluated_drybulb_f"]), D(b["bin_low_f"]), D(b["bin_high_f"])));
        Assert.Contains(mean, b => Math.Abs(D(b["evaluated_drybulb_f"]) - D(b["bin_mid_f"])) > 0.1);
        var mid = ParquetRows.Read(outMid, "bins");
        Assert.All(mid, b => Assert.Equal(D(b["bin_mid_f"]), D(b["evaluated_drybulb_f"]), 9));

        // The hourly rows do not depend on the evaluation point; the report states which one was used.
        static IEnumerable<string> Hourly(string dir) => File.ReadLines(Path.Combine(dir, "tables", "annual.csv")).Where(l => l.Contains(",hourly,", StringComparison.Ordinal));
        Assert.Equal(Hourly(outMean), Hourly(outMid));
        Assert.Contains("dry-bulb bin at the mean dry-bulb of its hours", File.ReadAllText(Path.Combine(outMean, "report.html")), StringComparison.Ordinal);
        Assert.Contains("dry-bulb bin at its midpoint (the classic method)", File.ReadAllText(Path.Combine(outMid, "report.html")), StringComparison.Ordinal);
    }

    [Fact]
    public void WeatherRepairs_AreWarnedOncePerClimate_NotOncePerVariant()
    {
        // Two dry-bulb values blanked: two hours filled by interpolation (a repair, counted).
        var lines = File.ReadAllLines(Path.Combine(folder, "harbor.csv"));
        int first = Array.FindIndex(lines, l => l.StartsWith("2018-03-01T10", StringComparison.Ordinal));
        foreach (int i in new[] { first, first + 1 })
        {
            var fields = lines[i].Split(',');
            fields[1] = "";
            lines[i] = string.Join(',', fields);
        }

        File.WriteAllLines(Path.Combine(folder, "harbor.csv"), lines);
        var (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", Path.Combine(folder, "out-repairs"));
        Assert.True(code == 0, err);
        var repairLines = err.Split('\n').Where(l => l.Contains("repaired values", StringComparison.Ordinal)).ToList();
        Assert.Equal(["warning: harbor: The weather file of harbor had 2 repaired values: 2 dry-bulb hours filled by linear interpolation (gap_filled_drybulb); see binenergy inspect."], repairLines);

        // With --json the summary goes to standard output and its warnings once to standard error, not twice.
        (code, _, err) = Cli("run", StudyPath(ExampleStudy.Text), "--out", Path.Combine(folder, "out-repairs-json"), "--json");
        Assert.True(code == 0, err);
        Assert.Equal(["binenergy: warning: harbor: The weather file of harbor had 2 repaired values: 2 dry-bulb hours filled by linear interpolation (gap_filled_drybulb); see binenergy inspect."],
            err.Split('\n').Where(l => l.Contains("repaired values", StringComparison.Ordinal)).Select(l => l.TrimEnd()).ToList());
    }

    [Fact]
    public void SiStudy_UsesSiColumnNames()
    {
        string text = ExampleStudy.Text.Replace("units = \"ip\"", "units = \"si\"", StringComparison.Ordinal)
            .Replace("bin_width_f = 5", "bin_width_c = 2", StringComparison.Ordinal)

            // A rating key without a temperature suffix reads its temperatures in the study's units: say F explicitly.
            .Replace("cooling_cop = ", "cooling_cop_f = ", StringComparison.Ordinal);
        string out1 = Path.Combine(folder, "out-si");
        var (code, _, err) = Cli("run", StudyPath(text), "--out", out1);
        Assert.True(code == 0, err);
        var header = File.ReadLines(Path.Combine(out1, "tables", "bins.csv")).First().Split(',');
        Assert.Contains("bin_low_c", header);
        Assert.Contains("heating_kwh", header);
        Assert.Contains("mean_humidity_ratio_g_kg", header);
        Assert.Contains("gas_kwh", header);
        var bins = ParquetRows.Read(out1, "bins");
        Assert.All(bins, b => Assert.Equal(2.0, D(b["bin_high_c"]) - D(b["bin_low_c"]), 9));
    }

    [Fact]
    public void EveryTableHasTheThreeMethods_AndTheHeadlineFollowsTheStudy()
    {
        string out1 = Path.Combine(folder, "out-methods");
        string text = ExampleStudy.Text.Replace("bin_width_f = 5", "bin_width_f = 5\nheadline_method = \"bin\"", StringComparison.Ordinal);
        var (code, stdout, err) = Cli("run", StudyPath(text), "--out", out1);
        Assert.True(code == 0, err);
        foreach (var table in new[] { "annual", "bins", "monthly", "economizer" })
        {
            var methods = ParquetRows.Read(out1, table).Select(r => r["method"]).Distinct().Order().ToList();
            Assert.Equal(["bin", "hourly", "joint-bin"], methods);
        }

        // Each bin row carries the exact figures of its own hours beside the method's estimate; they add up to the hourly year.
        var bins = ParquetRows.Read(out1, "bins").Where(r => r["variant"] == "minimum" && r["method"] == "bin").ToList();
        var annual = ParquetRows.Read(out1, "annual").Where(r => r["variant"] == "minimum").ToDictionary(r => r["method"]);
        Assert.Equal(D(annual["hourly"]["cooling_latent_kbtu"]), bins.Sum(b => D(b["hourly_cooling_latent_kbtu"])), 6);
        Assert.Equal(D(annual["bin"]["cooling_latent_kbtu"]), bins.Sum(b => D(b["cooling_latent_kbtu"])), 6);

        // The headline is the bin method's, said so, and its distance from hourly is warned about.
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        Assert.Equal("bin", summary.RootElement.GetProperty("headline_method").GetString());
        var headline = summary.RootElement.GetProperty("headline").EnumerateArray().Single(c => c.GetProperty("variant").GetString() == "minimum");
        Assert.Equal(D(annual["bin"]["cost_usd"]), headline.GetProperty("cost_usd").GetDouble(), 6);
        Assert.Contains("bin method", stdout, StringComparison.Ordinal);
        Assert.Contains(summary.RootElement.GetProperty("method_check").EnumerateArray(), r => r.GetProperty("figure").GetString() == "Cooling, latent");
        string report = File.ReadAllText(Path.Combine(out1, "report.html"));
        Assert.Contains("Method check", report, StringComparison.Ordinal);
        Assert.Contains("Joint bins vs hourly", report, StringComparison.Ordinal);
    }

    [Fact]
    public void HumidityOver_FromTheStudyFile_ReadsFrostPoints_AndIsNamedInTheSummary()
    {
        // A real station whose file reports frost points below 0 C (its RH column fits that reading: 0.00 points mean
        // difference against 2.37 over water, RealWeatherFileTests), read both ways as two climates of one study.
        File.Copy(Weather.TestData.Open("703165TY.csv"), Path.Combine(folder, "sand-point.csv.gz"), overwrite: true);
        string text = ExampleStudy.Text
            .Replace("name = \"harbor\"\n", "name = \"frost-points\"\n", StringComparison.Ordinal)
            .Replace("weather = \"harbor.csv\"", "weather = \"sand-point.csv.gz\"\nmap = \"tmy3\"\nhumidity_over = \"ice\"\n\n[[climate]]\nname = \"default\"\nweather = \"sand-point.csv.gz\"\nmap = \"tmy3\"", StringComparison.Ordinal)
            .Replace("# min_rh_pct = 30", "min_rh_pct = 30", StringComparison.Ordinal);
        string path = StudyPath(text, "sand-point.toml");
        var study = Core.Study.StudyFileReader.Read(path);
        Assert.Equal([HumidityOver.Ice, (HumidityOver?)null], study.Climates.Select(c => c.HumidityOver));
        var ice = Core.Study.StudyRunner.ReadWeather(study.Climates[0]);
        var water = Core.Study.StudyRunner.ReadWeather(study.Climates[1]);
        Assert.Equal(HumidityOver.Ice, ice.HumidityOver);
        Assert.Equal(HumidityOver.Water, water.HumidityOver);
        int hour = Array.FindIndex(ice.DewPointC, d => d < -5);
        Assert.Equal(MoistAir.HumidityRatioFromDewPoint(ice.DewPointC[hour], ice.PressurePa[hour], HumidityOver.Ice), ice.HumidityRatio[hour], 1e-12);
        Assert.True(water.HumidityRatio[hour] > ice.HumidityRatio[hour]); // the same dew point over water: more water in the air
        Assert.Contains(water.Quality.Warnings, x => x.Contains("humidity_over = \"ice\"", StringComparison.Ordinal));
        Assert.DoesNotContain(ice.Quality.Warnings, x => x.Contains("humidity_over", StringComparison.Ordinal));

        string out1 = Path.Combine(folder, "out-humidity-over");
        var (code, _, err) = Cli("run", path, "--out", out1);
        Assert.True(code == 0, err);
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        var byClimate = summary.RootElement.GetProperty("climates").EnumerateArray()
            .GroupBy(c => c.GetProperty("climate").GetString()!).ToDictionary(g => g.Key, g => g.First().GetProperty("humidity_over").GetString());
        Assert.Equal("ice", byClimate["frost-points"]);
        Assert.Equal("water", byClimate["default"]);
        var annual = ParquetRows.Read(out1, "annual").Where(r => r["method"] == "hourly" && r["variant"] == "minimum")
            .ToDictionary(r => r["climate"], r => D(r["humidification_kbtu"]));
        // Frost points mean drier air, so more humidification to 30 % RH.
        Assert.True(annual["frost-points"] > annual["default"], $"humidification {annual["frost-points"]} (frost points) vs {annual["default"]} (over water)");
    }

    [Fact]
    public void DegreeDayMethod_FromTheStudyFile_IsUsedAndNamedInSummaryAndReport()
    {
        string out1 = Path.Combine(folder, "out-degree-days");
        string text = ExampleStudy.Text.Replace("bin_width_f = 5", "bin_width_f = 5\ndegree_days = \"max-min\"", StringComparison.Ordinal);
        string study = StudyPath(text);
        var (code, _, err) = Cli("run", study, "--out", out1);
        Assert.True(code == 0, err);
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        var climates = summary.RootElement.GetProperty("climates").EnumerateArray().ToList();
        Assert.NotEmpty(climates);
        foreach (var c in climates)
        {
            Assert.Equal("max-min", c.GetProperty("degree_day_method").GetString());
            Assert.Equal("harbor", c.GetProperty("climate").GetString());
            var weather = WeatherReader.Read(Path.Combine(folder, "harbor.csv"));

            // The definition: sum over days of max(0, 65 F - (max + min) / 2), written out here.
            double hdd = weather.Times.Select((t, i) => (t.Date, T: weather.DryBulbC[i] * 1.8 + 32)).GroupBy(x => x.Date)
                .Sum(g => Math.Max(0, 65 - ((g.Max(x => x.T) + g.Min(x => x.T)) / 2)) * g.Count() / 24.0);
            Assert.Equal(hdd, c.GetProperty("heating_degree_days_f_day").GetDouble(), 6);
        }

        string report = File.ReadAllText(Path.Combine(out1, "report.html"));
        Assert.Contains("Climates", report, StringComparison.Ordinal);
        Assert.Contains("from daily (max + min) / 2 temperatures", report, StringComparison.Ordinal);
    }

    [Fact]
    public void MultiYearRecord_GivesEachYear_TheMeanOfTheCompleteYearsAsHeadline_AndTheSpread()
    {
        // Three invented calendar years 2017-2019 and 500 hours of 2020 (a partial last year), a warmer trend year to year.
        int hours = 3 * 8760 + 500;
        var t = new double[hours];
        var w = new double[hours];
        for (int i = 0; i < hours; i++)
        {
            t[i] = 11 + (i / 8760) - 13 * Math.Cos(2 * Math.PI * i / 8760.0) - 5 * Math.Cos(2 * Math.PI * ((i % 24) - 3) / 24);
            w[i] = MoistAir.HumidityRatioFromDewPoint(t[i] - 3, Atmosphere.SeaLevelPressurePa);
        }

        var record = SyntheticWeather.FromColumns(t, w, name: "Harbor years (invented)", start: new DateTime(2017, 1, 1));
        using (var writer = new StreamWriter(Path.Combine(folder, "harbor-years.csv")))
        {
            OpenLayoutWriter.Write(record, writer);
        }

        string text = ExampleStudy.Text.Replace("weather = \"harbor.csv\"", "weather = \"harbor-years.csv\"", StringComparison.Ordinal);
        Assert.NotEqual(ExampleStudy.Text, text);
        string out1 = Path.Combine(folder, "out-years");
        var (code, _, err) = Cli("run", StudyPath(text), "--out", out1);
        Assert.True(code == 0, err);
        Assert.Contains("2020 has 500 hours, not a whole year: it is reported on its own and left out of the mean year", err, StringComparison.Ordinal);

        var annual = ParquetRows.Read(out1, "annual").Where(r => r["variant"] == "minimum" && r["method"] == "hourly").ToDictionary(r => r["year"]);
        Assert.Equal(["2017", "2018", "2019", "2020", "mean"], annual.Keys.Order());
        Assert.Equal("0", annual["2020"]["complete_year"]);
        double mean = (D(annual["2017"]["heating_kbtu"]) + D(annual["2018"]["heating_kbtu"]) + D(annual["2019"]["heating_kbtu"])) / 3;
        Assert.Equal(mean, D(annual["mean"]["heating_kbtu"]), 6); // the hourly mean year is the mean of the complete years, exactly
        Assert.True(D(annual["2017"]["heating_kbtu"]) > D(annual["2019"]["heating_kbtu"])); // the warmer years need less heating

        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(out1, "summary.json")));
        var headline = summary.RootElement.GetProperty("headline").EnumerateArray().Single(c => c.GetProperty("variant").GetString() == "minimum");
        Assert.Equal(mean, headline.GetProperty("heating_kbtu").GetDouble(), 6);

        // Degree-days per complete year (from daily means, the definition): the 3 x 365 whole days of 2017-2019, / 3.
        double hddPerYear = Enumerable.Range(0, 3 * 365).Sum(d => Math.Max(0, 65 - (t.Skip(24 * d).Take(24).Average() * 1.8 + 32))) / 3;
        var climate = summary.RootElement.GetProperty("climates").EnumerateArray().Single();
        Assert.Equal(hddPerYear, climate.GetProperty("heating_degree_days_f_day").GetDouble(), 0);
        var spread = summary.RootElement.GetProperty("spread").EnumerateArray()
            .Single(r => r.GetProperty("variant").GetString() == "minimum" && r.GetProperty("figure").GetString() == "Heating");
        Assert.Equal(3, spread.GetProperty("years").GetInt32());
        Assert.Equal(D(annual["2019"]["heating_kbtu"]), spread.GetProperty("min").GetDouble(), 6);
        Assert.Equal(D(annual["2017"]["heating_kbtu"]), spread.GetProperty("max").GetDouble(), 6);
        var economizerYears = ParquetRows.Read(out1, "economizer").Select(r => r["year"]).Distinct().Order();
        Assert.Equal(["2017", "2018", "2019", "2020", "mean"], economizerYears);
        Assert.Contains("Year-to-year spread", File.ReadAllText(Path.Combine(out1, "report.html")), StringComparison.Ordinal);
    }

    private sealed record DuckTable(int rows, List<DuckColumn> columns, Dictionary<string, double?> sums, Dictionary<string, string> metadata);

    private sealed record DuckColumn(string name, string type, string nullable);
}
