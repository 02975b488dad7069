using System.Diagnostics;

namespace BinEnergy.Tests.Support;

/// <summary>The command line as its own process (the built binenergy.dll under <c>dotnet</c>), for tests that kill it, set its environment or its working folder.</summary>
internal static class CliProcess
{
    /// <summary>Starts <c>binenergy ARGS</c>; its output is read and dropped as it comes, so it never blocks on a full pipe.</summary>
    public static Process Start(IEnumerable<string> args, string? workingFolder = null, IDictionary<string, string>? environment = null)
    {
        var info = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add(typeof(BinEnergy.Cli.CliApp).Assembly.Location);
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        if (workingFolder is not null)
        {
            info.WorkingDirectory = workingFolder;
        }

        foreach (var (key, value) in environment ?? new Dictionary<string, string>())
        {
            info.Environment[key] = value;
        }

        return Process.Start(info)!;
    }

    /// <summary>Runs <c>binenergy ARGS</c> to the end: its exit code, standard output and standard error.</summary>
    public static (int Code, string Out, string Err) Run(IEnumerable<string> args, string? workingFolder = null, IDictionary<string, string>? environment = null)
    {
        using var process = Start(args, workingFolder, environment);
        var stderr = process.StandardError.ReadToEndAsync();
        string stdout = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return (process.ExitCode, stdout, stderr.Result);
    }
}
