using System.Diagnostics;
using System.Text.Json;

namespace BinEnergy.Tests.Support;

/// <summary>
/// Runs a reference script from tests/reference under Node.js, passing JSON on standard
/// input and reading JSON from standard output. It fails loudly, never skips, when Node.js
/// or the npm packages are missing: the checks against outside libraries must run in CI.
/// </summary>
public static class NodeReference
{
    /// <summary>Runs <paramref name="script"/> (a file in tests/reference) and deserialises its output.</summary>
    public static T Run<T>(string script, object input)
    {
        string modules = Path.Combine(RepoPaths.Reference, "node_modules");
        if (!Directory.Exists(modules))
        {
            throw new InvalidOperationException(
                $"{modules} is missing: run ./test.sh (it installs the npm reference packages) instead of dotnet test alone");
        }

        var psi = new ProcessStartInfo("node", Path.Combine(RepoPaths.Reference, script))
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            WorkingDirectory = RepoPaths.Reference,
        };
        using var process = Process.Start(psi) ?? throw new InvalidOperationException("could not start node (is Node.js installed?)");
        var stdoutTask = process.StandardOutput.ReadToEndAsync();
        var stderrTask = process.StandardError.ReadToEndAsync();
        process.StandardInput.Write(JsonSerializer.Serialize(input));
        process.StandardInput.Close();
        process.WaitForExit();
        string stdout = stdoutTask.Result;
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"node {script} failed ({process.ExitCode}): {stderrTask.Result}");
        }

        return JsonSerializer.Deserialize<T>(stdout) ?? throw new InvalidOperationException($"node {script} printed no JSON");
    }
}
