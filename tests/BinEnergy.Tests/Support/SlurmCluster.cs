using System.Diagnostics;

namespace BinEnergy.Tests.Support;

/// <summary>
/// A one-node Slurm cluster for a test, started and stopped by <c>tests/cluster/slurm-cluster.sh</c>
/// (munged, slurmctld and slurmd from Debian's packages, everything under a temporary folder);
/// <see cref="Run"/> runs Slurm commands against it. Disposing stops the daemons by their pid files.
/// </summary>
internal sealed class SlurmCluster : IDisposable
{
    /// <summary>The environment variable <c>./test.sh</c> sets after saying plainly that Slurm is not installed.</summary>
    public const string AbsentNotedVariable = "BINENERGY_SLURM_ABSENT_NOTED";

    private SlurmCluster(string folder, string conf)
    {
        Folder = folder;
        Conf = conf;
    }

    /// <summary>tests/cluster/slurm-cluster.sh.</summary>
    public static string Script => Path.Combine(RepoPaths.Root, "tests", "cluster", "slurm-cluster.sh");

    /// <summary>The cluster's folder (state, spool, logs, munge socket).</summary>
    public string Folder { get; }

    /// <summary>Its slurm.conf, for <c>SLURM_CONF</c>.</summary>
    public string Conf { get; }

    /// <summary>True when the Slurm and munge programs are installed.</summary>
    public static bool Installed => Bash([Script, "check"]).Code == 0;

    /// <summary>Starts a cluster in a new temporary folder.</summary>
    public static SlurmCluster Start()
    {
        string folder = Directory.CreateTempSubdirectory("binenergy-slurm-").FullName;
        var (code, stdout, stderr) = Bash([Script, "start", folder]);
        if (code != 0)
        {
            string logs = string.Join("\n", Directory.EnumerateFiles(Path.Combine(folder, "log")).Select(f => f + ":\n" + File.ReadAllText(f)));
            Bash([Script, "stop", folder]);
            throw new InvalidOperationException($"the test cluster did not start (exit {code}): {stderr}\n{logs}");
        }

        return new SlurmCluster(folder, stdout.Trim());
    }

    /// <summary>Runs a Slurm command (<c>sbatch</c>, <c>squeue</c>, ...) against this cluster.</summary>
    public (int Code, string Out, string Err) Run(string program, IEnumerable<string> args, IDictionary<string, string>? environment = null) =>
        Execute(program, args, new Dictionary<string, string>(environment ?? new Dictionary<string, string>()) { ["SLURM_CONF"] = Conf });

    /// <summary>Submits a batch script; returns the job id.</summary>
    public string Submit(IEnumerable<string> args, IDictionary<string, string>? environment = null)
    {
        var (code, stdout, stderr) = Run("sbatch", ["--parsable", .. args], environment);
        if (code != 0)
        {
            throw new InvalidOperationException($"sbatch failed (exit {code}): {stderr}");
        }

        return stdout.Trim().Split(';')[0];
    }

    /// <summary>Waits until none of <paramref name="jobs"/> is in the queue any more, polling squeue; false after <paramref name="timeout"/>.</summary>
    public bool WaitUntilDone(IReadOnlyList<string> jobs, TimeSpan timeout)
    {
        var clock = Stopwatch.StartNew();
        while (clock.Elapsed < timeout)
        {
            var (code, stdout, _) = Run("squeue", ["-h", "-o", "%i %T", "-j", string.Join(",", jobs)]);
            if (code == 0 && stdout.Trim().Length == 0)
            {
                return true;
            }

            Thread.Sleep(250);
        }

        return false;
    }

    /// <summary>The daemons' logs, for failure messages.</summary>
    public string Logs() => string.Join("\n", Directory.EnumerateFiles(Path.Combine(Folder, "log")).Select(f => f + ":\n" + File.ReadAllText(f)));

    public void Dispose()
    {
        Bash([Script, "stop", Folder]);
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // A daemon may still hold a file for a moment; the folder is under the temporary folder.
        }
    }

    private static (int Code, string Out, string Err) Bash(IEnumerable<string> args) => Execute("bash", args, null);

    private static (int Code, string Out, string Err) Execute(string program, IEnumerable<string> args, IDictionary<string, string>? environment)
    {
        var info = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            info.ArgumentList.Add(a);
        }

        foreach (var (key, value) in environment ?? new Dictionary<string, string>())
        {
            info.Environment[key] = value;
        }

        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        string stdout = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return (process.ExitCode, stdout, stderr.Result);
    }
}
