using BinEnergy.Tests.Support;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Cluster;

/// <summary>
/// Against a real one-node Slurm cluster started for the test (<see cref="SlurmCluster"/>): an array
/// job of four tasks runs each task once with its own <c>SLURM_ARRAY_TASK_ID</c>, and the documented
/// array script (docs/cluster/batch-array.sh) hands each task's share to <c>binenergy batch</c>, with
/// the report after the whole array. Without Slurm, <c>./test.sh</c> says so and these tests do not run.
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
}
