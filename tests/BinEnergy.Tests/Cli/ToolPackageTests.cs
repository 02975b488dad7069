using System.Diagnostics;
using System.Reflection.PortableExecutable;
using BinEnergy.Core.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Cli;

/// <summary>
/// The command line installs like any .NET tool: <c>dotnet pack</c> of src/BinEnergy.Cli makes the tool package, which
/// <c>dotnet tool install --tool-path</c> installs as the <c>binenergy</c> command, compiled ReadyToRun, carrying the demo study.
/// </summary>
public sealed class ToolPackageTests : IDisposable
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "binenergy-tool-" + Guid.NewGuid().ToString("N")[..8]);

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void PackedTool_InstallsIntoAToolPath_AndRunsVersionAndAir()
    {
        string packages = Path.Combine(folder, "packages");
        string tools = Path.Combine(folder, "tools");

        // Only the linux-x64 package (the portable fallback adds a minute and every platform's native libraries); its own
        // bin and obj folders, so the build the other tests run from is not touched.
        var pack = Run("dotnet", ["pack", Path.Combine(RepoPaths.Root, "src", "BinEnergy.Cli"), "-c", "Release", "-o", packages,
            "--artifacts-path", Path.Combine(folder, "artifacts"), "-p:ToolPackageRuntimeIdentifiers=linux-x64", "-p:RuntimeIdentifiers=linux-x64", "--nologo"]);
        Assert.True(pack.Code == 0, pack.Out + pack.Err);
        Assert.True(File.Exists(Path.Combine(packages, $"BinEnergy.Cli.linux-x64.{StudyRunner.EngineVersion}.nupkg")), string.Join(", ", Directory.GetFiles(packages)));

        var install = Run("dotnet", ["tool", "install", "--tool-path", tools, "--add-source", packages, "BinEnergy.Cli"]);
        Assert.True(install.Code == 0, install.Out + install.Err);
        string command = Path.Combine(tools, "binenergy");

        var version = Run(command, ["--version"]);
        Assert.True(version.Code == 0, version.Err);
        Assert.Equal($"binenergy {BinEnergy.Cli.CliApp.ToolVersion} (engine {StudyRunner.EngineVersion})", version.Out.Trim());

        // 95 F dry-bulb, 75 F wet-bulb at sea level: 98.4 gr/lb (the psychrometric chart gives about 98 to 99 gr/lb, recalled from
        // memory) and a sensible factor of 60 x (1 / 14.2995 ft3/lb) x (0.2403 + 0.444 x 0.01406) = 1.0344 Btu/(h cfm F) (hand check
        // from the specific volume and humidity ratio the command prints; DESIGN 4's 60 x rho x (0.240 + 0.444 W)).
        var air = Run(command, ["air", "--drybulb", "95", "--wetbulb", "75", "--format", "tsv"]);
        Assert.True(air.Code == 0, air.Err);
        var lines = air.Out.Split('\n');
        Assert.Contains("Humidity ratio, gr/lb\t98.4", lines);
        Assert.Contains(lines, l => l.StartsWith("Sensible factor, Btu/(h cfm F)\t1.0344\t", StringComparison.Ordinal));

        // The installed assemblies are compiled ahead of time (ReadyToRun: a managed native header in the CLI header).
        string dll = Directory.GetFiles(tools, "binenergy.dll", SearchOption.AllDirectories).Single();
        using (var pe = new PEReader(File.OpenRead(dll)))
        {
            Assert.True(pe.PEHeaders.CorHeader!.ManagedNativeHeaderDirectory.Size > 0, dll + " is not ReadyToRun");
        }

        // The tool carries the demo study, so `binenergy demo` finds it from any folder.
        Assert.Single(Directory.GetFiles(tools, "demo-study.toml", SearchOption.AllDirectories));
    }

    private static (int Code, string Out, string Err) Run(string file, IEnumerable<string> args)
    {
        var info = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        info.Environment["DOTNET_NOLOGO"] = "1";
        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        string stdout = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return (process.ExitCode, stdout, stderr.Result);
    }
}
