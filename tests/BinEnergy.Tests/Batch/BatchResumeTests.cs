using System.Diagnostics;
using System.Text.Json;

namespace BinEnergy.Tests.Batch;

/// <summary>
/// A batch killed with SIGKILL (no handler, no cleanup) keeps the parts its manifest lists; <c>--resume</c> removes the
/// unfinished files, runs the inputs no part holds, and the rows are then exactly those of an uninterrupted batch. A
/// resume with a changed study or input list is refused with the reason, and a second run into the folder without
/// --resume or --force is refused.
/// </summary>
public sealed class BatchResumeTests
{
    private static readonly Dictionary<string, string[]> Order = new()
    {
        ["annual"] = ["climate", "variant", "year", "method"],
        ["bins"] = ["climate", "variant", "method", "bin_low_f"],
        ["economizer"] = ["climate", "variant", "year", "method", "control"],
    };

    private static List<JsonElement> Parts(string output)
    {
        string manifest = Path.Combine(output, "manifest.json");
        if (!File.Exists(manifest))
        {
            return [];
        }

        using var json = JsonDocument.Parse(File.ReadAllText(manifest));
        return [.. json.RootElement.GetProperty("parts").EnumerateArray().Select(p => p.Clone())];
    }

    [Fact]
    public void KilledWithSigkill_ResumeGivesTheRowsOfAnUninterruptedBatch()
    {
        using var f = new BatchFolder(12);
        string whole = Path.Combine(f.Path, "whole"), killed = Path.Combine(f.Path, "killed");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", whole);
        Assert.True(code == 0, err);

        // One file at a time, a part after every file: kill once three parts are listed.
        using (var run = Support.CliProcess.Start(["batch", f.Study, "--weather", f.Weather, "--out", killed, "--workers", "1", "--rows-per-part", "1"]))
        {
            var clock = Stopwatch.StartNew();
            while (Parts(killed).Count < 3 && !run.HasExited && clock.Elapsed < TimeSpan.FromMinutes(2))
            {
                Thread.Sleep(20);
            }

            Assert.False(run.HasExited, "the batch finished before it could be killed");
            run.Kill(); // SIGKILL on Linux
            run.WaitForExit();
        }

        int kept = Parts(killed).Count;
        Assert.InRange(kept, 3, 11);

        // A second run without --resume or --force is refused, and so is a resume of a changed study.
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", killed);
        Assert.Equal(3, code);
        Assert.Contains("add --resume to finish it, or --force to start over", err, StringComparison.Ordinal);
        string changed = Path.Combine(f.Path, "changed.toml");
        File.WriteAllText(changed, File.ReadAllText(f.Study).Replace("airflow_cfm = 2000", "airflow_cfm = 2100", StringComparison.Ordinal));
        (code, _, err) = BatchFolder.Cli("batch", changed, "--weather", f.Weather, "--out", killed, "--resume");
        Assert.Equal(3, code);
        Assert.Contains("--resume refused: the study file changed since the batch began", err, StringComparison.Ordinal);

        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", killed, "--resume");
        Assert.True(code == 0, err);
        Assert.Contains(FormattableString.Invariant($"resuming: kept {kept} finished parts holding {kept} inputs"), err, StringComparison.Ordinal);

        var one = BatchFolder.Read(whole, hive: true, Order);
        var resumed = BatchFolder.Read(killed, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            Assert.Equal(BatchFolder.Rows(one[table]), BatchFolder.Rows(resumed[table]));
        }

        // Every file under tables/ is a listed part: nothing the killed run left half-written remains.
        var listed = Parts(killed).SelectMany(p => p.GetProperty("files").EnumerateArray().Select(e => e.GetString()!)).ToHashSet();
        var present = Directory.EnumerateFiles(Path.Combine(killed, "tables"), "*", SearchOption.AllDirectories)
            .Select(p => Path.GetRelativePath(killed, p).Replace(Path.DirectorySeparatorChar, '/')).ToHashSet();
        Assert.Equal(listed, present);
        Assert.Equal(12, BatchFolder.Summary(Path.Combine(killed, "summary.json")).GetProperty("batch").GetProperty("done").GetInt32());

        // The input list changed (a file more): refused.
        File.Copy(f.File(0), Path.Combine(f.Weather, "station-99.csv"));
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", killed, "--resume");
        Assert.Equal(3, code);
        Assert.Contains("the list of weather files changed", err, StringComparison.Ordinal);
    }

    [Fact]
    public async Task StoppedWithCtrlC_ExitsWithTheShellsCode_KeepsWhatItFinished_AndResumes()
    {
        using var f = new BatchFolder(8);
        string whole = Path.Combine(f.Path, "whole"), stopped = Path.Combine(f.Path, "stopped");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", whole);
        Assert.True(code == 0, err);

        string stderr;
        using (var run = Support.CliProcess.Start(["batch", f.Study, "--weather", f.Weather, "--out", stopped, "--workers", "1", "--rows-per-part", "1"]))
        {
            var errors = run.StandardError.ReadToEndAsync();
            var clock = Stopwatch.StartNew();
            while (Parts(stopped).Count < 2 && !run.HasExited && clock.Elapsed < TimeSpan.FromMinutes(2))
            {
                Thread.Sleep(20);
            }

            Assert.False(run.HasExited, "the batch finished before it could be stopped");
            using (var signal = Process.Start("kill", ["-INT", run.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
            {
                await signal.WaitForExitAsync();
            }

            await run.WaitForExitAsync();
            stderr = await errors;

            // 128 + SIGINT, as a shell reports a process stopped by Ctrl-C.
            Assert.Equal(130, run.ExitCode);
        }

        Assert.Contains("stopping after the current step", stderr, StringComparison.Ordinal);
        Assert.Contains("stopped (Ctrl-C)", stderr, StringComparison.Ordinal);
        Assert.InRange(Parts(stopped).Count, 2, 7);
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", f.Weather, "--out", stopped, "--resume");
        Assert.True(code == 0, err);
        var one = BatchFolder.Read(whole, hive: true, Order);
        var resumed = BatchFolder.Read(stopped, hive: true, Order);
        foreach (var table in Order.Keys)
        {
            Assert.Equal(BatchFolder.Rows(one[table]), BatchFolder.Rows(resumed[table]));
        }
    }
}
