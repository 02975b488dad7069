using System.Diagnostics;
using System.Text.Json;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

/// <summary>
/// A run killed with SIGKILL at any moment leaves the output folder as the previous complete run or the new complete
/// one (or, in the instant between the two renames, the previous one set aside, which the next run puts back), and the
/// next run into the same place cleans up whatever the killed one left. The runs are real processes of the command
/// line (the built binenergy.dll), killed at moments spread over a run's duration by a seeded random number.
/// </summary>
public sealed class KilledRunTests(Xunit.Abstractions.ITestOutputHelper log) : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-killed-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    /// <summary>The example study with a given airflow, so each complete output can be told from the other by its summary.</summary>
    private string Study(int airflow)
    {
        string path = Path.Combine(folder, $"study-{airflow}.toml");
        File.WriteAllText(path, ExampleStudy.Text.Replace("airflow_cfm = 2000", $"airflow_cfm = {airflow}", StringComparison.Ordinal));
        return path;
    }

    private static Process Start(string study, string output) => CliProcess.Start(["run", study, "--out", output, "--force"]);

    /// <summary>The study hash a complete output folder records, or null where the folder is not a complete output.</summary>
    private static string? CompleteRun(string output)
    {
        string summary = Path.Combine(output, "summary.json");
        if (!File.Exists(summary) || !File.Exists(Path.Combine(output, "report.html")) || !File.Exists(Path.Combine(output, "tables", "annual.parquet")))
        {
            return null;
        }

        using var json = JsonDocument.Parse(File.ReadAllText(summary));
        return json.RootElement.GetProperty("study_sha256").GetString();
    }

    private static string HashOf(string study) => Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(study)));

    [Fact]
    public void KilledAtRandomMoments_TheOutputIsTheOldOrTheNewRun_AndTheNextRunCleansUp()
    {
        ExampleStudy.WriteWeather(folder);
        string output = Path.Combine(folder, "out");
        string a = Study(2000), b = Study(2600);
        var clock = Stopwatch.StartNew();
        using (var first = Start(a, output))
        {
            first.WaitForExit();
            Assert.Equal(0, first.ExitCode);
        }

        double runMs = clock.Elapsed.TotalMilliseconds;
        string previous = CompleteRun(output) ?? throw new InvalidOperationException("the first run left no complete output");
        var random = new Random(20261204);
        var outcomes = new Dictionary<string, int>();
        for (int k = 0; k < 8; k++)
        {
            string next = previous == HashOf(a) ? b : a;
            using var run = Start(next, output);
            bool killed = !run.WaitForExit((int)(runMs * random.NextDouble()));
            if (killed)
            {
                run.Kill(); // SIGKILL on Linux: no handler, no cleanup
                run.WaitForExit();
            }

            string? now = CompleteRun(output);
            string parent = Path.GetDirectoryName(output)!;
            var aside = Directory.GetDirectories(parent, ".out.partial-*.old");
            if (now is null)
            {
                // Killed between the two renames: the previous run is set aside, whole, for the next run to put back.
                Assert.True(killed && !Directory.Exists(output) && aside.Any(d => CompleteRun(d) == previous), $"kill {k}: the output is neither run");
                outcomes["previous set aside"] = outcomes.GetValueOrDefault("previous set aside") + 1;
            }
            else
            {
                Assert.True(now == previous || now == HashOf(next), $"kill {k}: the output belongs to neither run");
                Assert.True(killed || now == HashOf(next), $"kill {k}: a finished run must leave its own output");
                string key = now == previous ? "previous" : "new";
                outcomes[key] = outcomes.GetValueOrDefault(key) + 1;
                previous = now;
            }
        }

        // The next run into the same place puts back what was set aside and removes every leftover partial folder.
        using (var last = Start(previous == HashOf(a) ? b : a, output))
        {
            last.WaitForExit();
            Assert.Equal(0, last.ExitCode);
        }

        Assert.NotNull(CompleteRun(output));
        Assert.Empty(Directory.GetDirectories(folder, ".out.partial-*"));
        log.WriteLine("after each kill: " + string.Join(", ", outcomes.Select(o => $"{o.Key} {o.Value}")));
        Assert.Equal(8, outcomes.Values.Sum());
    }
}
