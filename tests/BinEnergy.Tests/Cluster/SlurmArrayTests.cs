using System.Globalization;
using BinEnergy.Tests.Batch;
using BinEnergy.Tests.Support;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Cluster;

/// <summary>
/// Against a real one-node Slurm cluster started for the test (<see cref="SlurmCluster"/>): an array
/// job of four tasks runs each task once with its own <c>SLURM_ARRAY_TASK_ID</c>, and the documented
/// array script (docs/cluster/batch-array.sh) hands each task's share to <c>binenergy batch</c>, with
/// the report after the whole array; and the real binenergy, run by that script as four array tasks over 40 weather
/// files, gives exactly the rows of one single-process batch. Without Slurm, <c>./test.sh</c> says so and these tests do not run.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")]
public sealed class SlurmArrayTests(ITestOutputHelper log) : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-slurm-jobs-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static readonly TimeSpan Timeout = TimeSpan.FromMinutes(2);

    /// <summary>False (after noting why) when Slurm is absent and ./test.sh has already said so; fails when it is absent and nobody said so.</summary>
    private bool SlurmPresent()
    {
        if (SlurmCluster.Installed)
        {
            return true;
        }

        Assert.True(Environment.GetEnvironmentVariable(SlurmCluster.AbsentNotedVariable) == "1",
            "Slurm is not installed (apt-get install slurm-wlm munge), so the Slurm array tests cannot run; ./test.sh reports this and leaves them out");
        log.WriteLine("Slurm is not installed: this test did not run (./test.sh said so).");
        return false;
    }

    private static void Chmod(string path) => File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute | UnixFileMode.GroupRead | UnixFileMode.OtherRead);

    [Fact]
    public void ArrayOfFour_RunsEachTaskOnce_WithItsTaskId()
    {
        if (!SlurmPresent())
        {
            return;
        }

        using var cluster = SlurmCluster.Start();
        string script = Path.Combine(folder, "array.sh");
        File.WriteAllText(script, $"""
            #!/bin/bash
            #SBATCH --array=0-3
            #SBATCH --output={folder}/task-%a.out
            echo "$SLURM_ARRAY_TASK_ID $SLURM_ARRAY_TASK_COUNT $SLURM_ARRAY_TASK_MIN $SLURM_ARRAY_TASK_MAX"
            """);
        string job = cluster.Submit(["--chdir", folder, script]);
        Assert.True(cluster.WaitUntilDone([job], Timeout), "the array did not finish in time\n" + cluster.Logs());

        for (int task = 0; task < 4; task++)
        {
            string file = Path.Combine(folder, $"task-{task}.out");
            Assert.True(File.Exists(file), $"task {task} wrote no output\n" + cluster.Logs());

            // Slurm's array variables (Slurm sbatch manual, OUTPUT ENVIRONMENT VARIABLES): the task's index, the array's size, its lowest and highest index.
            Assert.Equal($"{task} 4 0 3", File.ReadAllText(file).Trim());
        }

        Assert.Equal(4, Directory.GetFiles(folder, "task-*.out").Length);
    }

    [Fact]
    public void DocumentedArrayScript_GivesEachTaskItsShare_AndTheReportRunsAfterTheArray()
    {
        if (!SlurmPresent())
        {
            return;
        }

        using var cluster = SlurmCluster.Start();

        // A stand-in for the binenergy program that records the command and the array variables it was started with,
        // so the test checks the documented script's wiring; the real batch is run on these variables by its own tests.
        string record = Path.Combine(folder, "calls");
        Directory.CreateDirectory(record);
        string stub = Path.Combine(folder, "binenergy-stub");
        File.WriteAllText(stub, $$"""
            #!/bin/bash
            if [ "$1" = batch-report ]; then
              echo "$* after $(ls {{record}} | grep -c '^batch-')" > {{record}}/report
            else
              echo "$* task=$SLURM_ARRAY_TASK_ID count=$SLURM_ARRAY_TASK_COUNT" > {{record}}/batch-$SLURM_ARRAY_TASK_ID
              sleep 1
            fi
            """);
        Chmod(stub);

        string docs = Path.Combine(RepoPaths.Root, "docs", "cluster", "batch-array.sh");
        string outDir = Path.Combine(folder, "national");
        var env = new Dictionary<string, string> { ["BINENERGY"] = stub };
        string array = cluster.Submit(["--chdir", folder, $"--export=ALL,STUDY=study.toml,STATIONS=stations.csv,OUT={outDir}", docs], env);
        string report = cluster.Submit(["--chdir", folder, $"--dependency=afterok:{array}", "--wrap", $"{stub} batch-report {outDir}"], env);
        Assert.True(cluster.WaitUntilDone([array, report], Timeout), "the jobs did not finish in time\n" + cluster.Logs());

        for (int task = 0; task < 4; task++)
        {
            string call = Path.Combine(record, $"batch-{task}");
            Assert.True(File.Exists(call), $"task {task} did not run batch\n" + string.Join("\n", Directory.GetFiles(folder, "*.out").Select(File.ReadAllText)));
            Assert.Equal($"batch study.toml --weather stations.csv --out {outDir} task={task} count=4", File.ReadAllText(call).Trim());
        }

        // afterok: the report started only when all four tasks had ended.
        Assert.Equal($"batch-report {outDir} after 4", File.ReadAllText(Path.Combine(record, "report")).Trim());
        foreach (string line in Directory.GetFiles(folder, "binenergy-batch-*.out").Select(File.ReadAllText))
        {
            log.WriteLine(line.Trim());
        }
    }

    /// <summary>A small study for the cluster test: the cross-climate check's two variants (recovery or not) and plant, no economizer (the point is the sharding).</summary>
    private const string SmallStudy = "[study]\nname = \"Cluster check\"\nunits = \"ip\"\n\n" + Reporting.Batch.CrossClimateStudy.Settings;

    private static readonly Dictionary<string, string[]> Order = new()
    {
        ["annual"] = ["climate", "variant", "year", "method"],
        ["bins"] = ["climate", "variant", "method", "bin_low_f"],
        ["monthly"] = ["climate", "variant", "method", "month"],
        ["peaks"] = ["climate", "variant", "condition"],
        ["climates"] = ["climate"],
    };

    /// <summary>
    /// 40 inputs: the six real check files (five TMY3, one PVGIS) four times each under distinct names, and 16 invented
    /// climates made by <c>binenergy synth</c> from the four invented monthly samples with four seeds; a station list names them.
    /// </summary>
    private string FortyInputs()
    {
        string weather = Path.Combine(folder, "weather");
        Directory.CreateDirectory(weather);
        var lines = new List<string> { "weather,name,map,source" };
        var real = Directory.GetFiles(Path.Combine(RepoPaths.Root, "tests", "data", "weather-open"), "*.gz").Order(StringComparer.Ordinal).ToList();
        Assert.Equal(6, real.Count);
        foreach (string file in real)
        {
            string id = Path.GetFileName(file).Split('.')[0];
            string map = id.StartsWith("tmy_", StringComparison.Ordinal) ? "pvgis" : "tmy3";
            for (int copy = 1; copy <= 4; copy++)
            {
                string name = FormattableString.Invariant($"{id}-copy{copy}.csv.gz");
                File.Copy(file, Path.Combine(weather, name));
                lines.Add(FormattableString.Invariant($"weather/{name},real {id} {copy},{map},real"));
            }
        }

        foreach (string monthly in Directory.GetFiles(Path.Combine(RepoPaths.Root, "weather-samples"), "*-monthly.csv").Order(StringComparer.Ordinal))
        {
            string place = Path.GetFileName(monthly).Replace("-monthly.csv", string.Empty, StringComparison.Ordinal);
            for (int seed = 1; seed <= 4; seed++)
            {
                string name = FormattableString.Invariant($"{place}-seed{seed}.csv");
                var (code, _, err) = BatchFolder.Cli("synth", "--monthly", monthly, "--seed", seed.ToString(CultureInfo.InvariantCulture), "--out", Path.Combine(weather, name));
                Assert.True(code == 0, err);
                lines.Add(FormattableString.Invariant($"weather/{name},invented {place} {seed},,invented"));
            }
        }

        Assert.Equal(41, lines.Count);
        File.WriteAllText(Path.Combine(folder, "study.toml"), SmallStudy);
        File.WriteAllLines(Path.Combine(folder, "stations.csv"), lines);
        return Path.Combine(folder, "stations.csv");
    }

    [Fact]
    public void DocumentedArrayScript_WithTheRealBinenergy_FourTasksGiveTheRowsOfOneBatch()
    {
        if (!SlurmPresent())
        {
            return;
        }

        string stations = FortyInputs();
        using var cluster = SlurmCluster.Start();

        // The documented script as it stands, the real program (the built binenergy.dll under dotnet) through BINENERGY, and the report after the array.
        string docs = Path.Combine(RepoPaths.Root, "docs", "cluster", "batch-array.sh");
        string outDir = Path.Combine(folder, "national");
        string binenergy = "dotnet " + typeof(BinEnergy.Cli.CliApp).Assembly.Location;
        var env = new Dictionary<string, string> { ["BINENERGY"] = binenergy };
        string array = cluster.Submit(["--chdir", folder, $"--export=ALL,STUDY=study.toml,STATIONS=stations.csv,OUT={outDir}", docs], env);
        string report = cluster.Submit(["--chdir", folder, $"--dependency=afterok:{array}", "--output", Path.Combine(folder, "report.out"), "--wrap", $"{binenergy} batch-report {outDir}"], env);

        // Meanwhile, the same batch in one process.
        string single = Path.Combine(folder, "single");
        var (code, _, err) = BatchFolder.Cli("batch", Path.Combine(folder, "study.toml"), "--weather", stations, "--out", single);
        Assert.True(code == 0, err);

        string Logs() => string.Join("\n", Directory.GetFiles(folder, "*.out").Select(f => f + ":\n" + File.ReadAllText(f))) + "\n" + cluster.Logs();
        Assert.True(cluster.WaitUntilDone([array, report], TimeSpan.FromMinutes(5)), "the jobs did not finish in time\n" + Logs());
        for (int task = 0; task < 4; task++)
        {
            Assert.True(File.Exists(Path.Combine(outDir, $"manifest-shard-{task}-of-4.json")), $"task {task} wrote no manifest\n" + Logs());
        }

        // The union of the four shards' rows, read by DuckDB with hive partitioning, is exactly the single batch's rows.
        var one = BatchFolder.Read(single, hive: true, Order);
        var four = BatchFolder.Read(outDir, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            var expected = BatchFolder.Rows(one[table], "shard");
            Assert.True(expected.Count > 0, table);
            Assert.Equal(expected, BatchFolder.Rows(four[table], "shard"));
        }

        // 40 climates x 2 variants x 3 methods of one typical year each, spread 10 to a shard (every fourth of the sorted list).
        Assert.Equal(240, four["annual"].rows);
        var perShard = four["climates"].all!.GroupBy(r => r["shard"].GetInt32()).ToDictionary(g => g.Key, g => g.Count());
        Assert.Equal(new Dictionary<int, int> { [0] = 10, [1] = 10, [2] = 10, [3] = 10 }, perShard);

        // The report job ran after the array: the shards' counts added up, and the national table of the single batch.
        var summary = BatchFolder.Summary(Path.Combine(outDir, "summary.json"));
        var counts = summary.GetProperty("batch");
        Assert.Equal((40, 40, 0, 4), (counts.GetProperty("files").GetInt32(), counts.GetProperty("done").GetInt32(), counts.GetProperty("failed").GetInt32(), counts.GetProperty("shards_finished").GetInt32()));
        Assert.Equal(BatchFolder.Summary(Path.Combine(single, "summary.json")).GetProperty("national").GetRawText(), summary.GetProperty("national").GetRawText());
        foreach (string line in Directory.GetFiles(folder, "binenergy-batch-*.out").Select(File.ReadAllText))
        {
            log.WriteLine(line.Trim());
        }
    }
}
