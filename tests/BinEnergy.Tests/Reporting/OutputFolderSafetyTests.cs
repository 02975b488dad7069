using BinEnergy.Cli;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Tables;
using BinEnergy.Tests.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>The output folder's lock, its recovery after a stopped run, and its refusal to replace a folder holding the run's inputs.</summary>
public sealed class OutputFolderSafetyTests : IDisposable
{
    private readonly string scratch = Directory.CreateTempSubdirectory("binenergy-output-folder-").FullName;

    public void Dispose() => Directory.Delete(scratch, recursive: true);

    [Fact]
    public void ASecondRunIntoTheSamePlace_IsStoppedByTheLock_UntilTheFirstEnds()
    {
        string target = Path.Combine(scratch, "out");
        using (var first = OutputFolder.Begin(target, force: false))
        {
            var e = Assert.Throws<OutputFolderException>(() => OutputFolder.Begin(target, force: true));
            Assert.Contains("another binenergy run is writing into", e.Message, StringComparison.Ordinal);
            Assert.Contains(".out.lock", e.Message, StringComparison.Ordinal);
            File.WriteAllText(first.PathFor("a.txt"), "first");
            first.Commit();
        }

        Assert.False(File.Exists(Path.Combine(scratch, ".out.lock"))); // removed when the run ends
        using (var second = OutputFolder.Begin(target, force: true))
        {
            File.WriteAllText(second.PathFor("a.txt"), "second");
            second.Commit();
        }

        Assert.Equal("second", File.ReadAllText(Path.Combine(target, "a.txt")));
        Assert.True(File.Exists(Path.Combine(target, OutputFolder.MarkerName)));
        Assert.Equal(["out"], Directory.GetFileSystemEntries(scratch).Select(Path.GetFileName)); // nothing left beside it
    }

    [Fact]
    public void ARunKilledBetweenTheTwoRenames_IsRecoveredByTheNext()
    {
        // The state a kill -9 leaves between "old folder aside" and "new folder in place": no target, the old one
        // aside, the new one still partial; plus a partial folder of a run killed while writing.
        string target = Path.Combine(scratch, "results");
        string aside = Path.Combine(scratch, ".results.partial-1234abcd.old");
        Directory.CreateDirectory(aside);
        File.WriteAllText(Path.Combine(aside, OutputFolder.MarkerName), "binenergy output folder\n");
        File.WriteAllText(Path.Combine(aside, "summary.json"), "{\"old\": true}");
        Directory.CreateDirectory(Path.Combine(scratch, ".results.partial-1234abcd"));
        Directory.CreateDirectory(Path.Combine(scratch, ".results.partial-99999999"));

        using (var output = OutputFolder.Begin(target, force: true))
        {
            // Put back, not lost (this run then fails before its commit, so the earlier output stays in place).
            Assert.Contains(output.Recovered, r => r.Contains("previous output was put back", StringComparison.Ordinal));
            Assert.Contains(output.Recovered, r => r.Contains("removed 2 unfinished output folder(s)", StringComparison.Ordinal));
        }

        Assert.Equal("{\"old\": true}", File.ReadAllText(Path.Combine(target, "summary.json")));
        Assert.Equal(["results"], Directory.GetFileSystemEntries(scratch).Select(Path.GetFileName));
    }

    [Fact]
    public void RunIntoTheStudysOwnFolder_WithForce_DeletesNothing()
    {
        // binenergy run proj/study.toml --out proj --force: the folder holds the study, its weather and the user's notes.
        string proj = Path.Combine(scratch, "proj");
        Directory.CreateDirectory(proj);
        var weather = SyntheticWeather.Year(meanC: 11, name: "Harbor (invented)");
        using (var writer = new StreamWriter(Path.Combine(proj, "harbor.csv")))
        {
            OpenLayoutWriter.Write(weather, writer);
        }

        File.WriteAllText(Path.Combine(proj, "study.toml"), ExampleStudy.Text);
        File.WriteAllText(Path.Combine(proj, "notes.txt"), "my notes");
        File.WriteAllText(Path.Combine(proj, OutputFolder.MarkerName), "binenergy output folder\n"); // even if it looks like ours
        var before = Directory.GetFileSystemEntries(proj).Order().ToList();

        var stderr = new StringWriter();
        int code = CliApp.Run(["run", Path.Combine(proj, "study.toml"), "--out", proj, "--force"], new StringWriter(), stderr);
        Assert.Equal(3, code);
        Assert.Contains("holds an input of this run", stderr.ToString(), StringComparison.Ordinal);
        Assert.Equal(before, Directory.GetFileSystemEntries(proj).Order().ToList());
        Assert.Equal("my notes", File.ReadAllText(Path.Combine(proj, "notes.txt")));
        Assert.Equal([proj], Directory.GetFileSystemEntries(scratch)); // no partial folder or lock left beside it
    }

    [Fact]
    public void RunIntoTheCurrentFolder_WithForce_DeletesNothing()
    {
        // binenergy run study.toml --out . --force, in a scratch folder, as its own process (the current folder is per process).
        var weather = SyntheticWeather.Year(meanC: 11, name: "Harbor (invented)");
        using (var writer = new StreamWriter(Path.Combine(scratch, "harbor.csv")))
        {
            OpenLayoutWriter.Write(weather, writer);
        }

        File.WriteAllText(Path.Combine(scratch, "study.toml"), ExampleStudy.Text);
        File.WriteAllText(Path.Combine(scratch, "notes.txt"), "my notes");
        var before = Directory.GetFileSystemEntries(scratch).Order().ToList();
        var (code, _, error) = Support.CliProcess.Run(["run", "study.toml", "--out", ".", "--force"], scratch);
        Assert.Equal(3, code);
        Assert.Contains("nothing was deleted", error, StringComparison.Ordinal);
        Assert.Equal(before, Directory.GetFileSystemEntries(scratch).Order().ToList());
        Assert.Equal("my notes", File.ReadAllText(Path.Combine(scratch, "notes.txt")));
    }
}
