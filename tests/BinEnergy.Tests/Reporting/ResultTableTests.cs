using BinEnergy.Reporting.Tables;

namespace BinEnergy.Tests.Reporting;

public sealed class ResultTableTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-tables-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void Table_RefusesWrongValuesAndMismatchedAppends()
    {
        var t = new ResultTable("annual").Text("climate").Number("heating_kbtu").Integer("hours");
        t.AddRow("harbor", 1.5, 12);
        Assert.Throws<ArgumentException>(() => t.AddRow("harbor", "x", 12));
        Assert.Throws<ArgumentException>(() => t.AddRow("harbor", 1.5));
        Assert.Throws<ArgumentException>(() => new ResultTable("x").Number("Heating kBtu"));
        var other = new ResultTable("annual").Text("climate").Number("heating_kwh").Integer("hours");
        Assert.Throws<ArgumentException>(() => t.Append(other));
        var same = new ResultTable("annual").Text("climate").Number("heating_kbtu").Integer("hours");
        same.AddRow("fjord", 2.5, 3);
        t.Append(same);
        Assert.Equal(2, t.RowCount);
        Assert.Equal(4.0, t["heating_kbtu"].Numbers.Sum());
    }

    [Fact]
    public void HivePartition_EscapesWhatWouldBreakAPath()
    {
        Assert.Equal("climate=harbor", HivePartition.FolderName("climate", "harbor"));
        Assert.Equal("climate=north%2Fsouth%3D1", HivePartition.FolderName("climate", "north/south=1"));
        Assert.Equal("climate=%2E%2E", HivePartition.FolderName("climate", ".."));
        Assert.Equal(Path.Combine("out", "climate=high desert", "annual.parquet"), HivePartition.PathFor("out", "climate", "high desert", "annual.parquet"));
        Assert.Throws<ArgumentException>(() => HivePartition.FolderName("cli mate", "x"));
    }

    [Fact]
    public void OutputFolder_LeavesTargetUntouchedUntilCommit()
    {
        string target = Path.Combine(folder, "out");
        using (var output = OutputFolder.Begin(target, force: false))
        {
            File.WriteAllText(output.PathFor("tables", "annual.csv"), "a\n");
            Assert.False(Directory.Exists(target));
        }

        // Disposed without commit: nothing is left, neither the target nor the staging folder.
        Assert.False(Directory.Exists(target));
        Assert.Empty(Directory.GetFileSystemEntries(folder));

        using (var output = OutputFolder.Begin(target, force: false))
        {
            File.WriteAllText(output.PathFor("tables", "annual.csv"), "a\n");
            output.Commit();
        }

        Assert.True(File.Exists(Path.Combine(target, "tables", "annual.csv")));
        Assert.Throws<OutputFolderException>(() => OutputFolder.Begin(target, force: false));
    }

    [Fact]
    public void OutputFolder_ForceReplacesOnlyItsOwnMarkedFolder()
    {
        string target = Path.Combine(folder, "out");
        using (var output = OutputFolder.Begin(target, force: false))
        {
            File.WriteAllText(output.PathFor("annual.csv"), "old\n");
            output.Commit();
        }

        Assert.StartsWith("binenergy output folder", File.ReadAllText(Path.Combine(target, OutputFolder.MarkerName)), StringComparison.Ordinal);
        using (var output = OutputFolder.Begin(target, force: true))
        {
            File.WriteAllText(output.PathFor("annual.csv"), "new\n");
            output.Commit();
        }

        Assert.Equal("new\n", File.ReadAllText(Path.Combine(target, "annual.csv")));

        // A project folder (a study file, no marker) is never replaced, and nothing in it is deleted.
        string project = Path.Combine(folder, "proj");
        Directory.CreateDirectory(project);
        File.WriteAllText(Path.Combine(project, "study.toml"), "name = \"x\"\n");
        var e = Assert.Throws<OutputFolderException>(() => OutputFolder.Begin(project, force: true));
        Assert.Contains("nothing was deleted", e.Message, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(project, "study.toml")));
        Assert.Equal(2, Directory.GetFileSystemEntries(folder).Length);
    }

    [Fact]
    public void OutputFolder_ForceRefusesTheCurrentFolderAndItsParents()
    {
        string here = Directory.GetCurrentDirectory();
        foreach (string target in new[] { ".", here, Path.GetDirectoryName(here)! })
        {
            int before = Directory.GetFileSystemEntries(here).Length;
            var e = Assert.Throws<OutputFolderException>(() => OutputFolder.Begin(target, force: true));
            Assert.Contains("current folder", e.Message, StringComparison.Ordinal);
            Assert.Equal(before, Directory.GetFileSystemEntries(here).Length);
        }
    }
}
