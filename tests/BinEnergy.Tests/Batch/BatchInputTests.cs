using BinEnergy.Core.Batch;

namespace BinEnergy.Tests.Batch;

/// <summary>
/// Bad inputs stop only their file: a missing file, a file with a bad row, a bad station-list row and a duplicate
/// name are each one row of the warnings table (file, line, kind, message), counted in summary.json and grouped on
/// standard error, while the good file runs; <c>--strict</c> makes the first one fatal and keeps what was written.
/// Also: the shard a scheduler's variables give, and the files a glob names.
/// </summary>
public sealed class BatchInputTests
{
    [Fact]
    public void BadInputs_StopOnlyTheirFile_AreListedWithFileAndLine_AndCounted()
    {
        using var f = new BatchFolder(2);
        // A copy of a good file with a word where line 20's dry-bulb should be.
        var lines = File.ReadAllLines(f.File(1));
        var fields = lines[19].Split(',');
        fields[1] = "warm";
        lines[19] = string.Join(',', fields);
        File.WriteAllLines(f.File(1), lines);
        string list = Path.Combine(f.Path, "stations.csv");
        File.WriteAllLines(list,
        [
            "weather,name,elevation_m,region",
            "weather/station-00.csv,a-good,,north",
            "weather/missing.csv,b-missing,,north",
            "weather/station-01.csv,c-bad-row,,south",
            "weather/station-00.csv,d-bad-elevation,high,south",
            "weather/station-00.csv,a-good,,south",
        ]);
        string output = Path.Combine(f.Path, "out");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", output, "--csv");
        Assert.True(code == 0, err);

        var summary = BatchFolder.Summary(Path.Combine(output, "summary.json")).GetProperty("batch");
        Assert.Equal(5, summary.GetProperty("files").GetInt32());
        Assert.Equal(1, summary.GetProperty("done").GetInt32());
        Assert.Equal(4, summary.GetProperty("failed").GetInt32());
        var kinds = summary.GetProperty("warnings");
        foreach (string kind in new[] { "missing-file", "bad-weather-data", "bad-station-row", "duplicate-name" })
        {
            Assert.Equal(1, kinds.GetProperty(kind).GetInt32());
            Assert.Contains($"binenergy: warning: {kind}: 1 (", err, StringComparison.Ordinal);
        }

        var warnings = File.ReadAllLines(Directory.GetFiles(Path.Combine(output, "tables", "warnings"), "*.csv", SearchOption.AllDirectories).Single());
        Assert.Equal("climate,file,line,kind,message,region", warnings[0]);
        string Row(string kind) => warnings.Single(l => l.Contains("," + kind + ",", StringComparison.Ordinal));
        Assert.StartsWith($"b-missing,{list},3,missing-file,", Row("missing-file"), StringComparison.Ordinal);
        Assert.StartsWith($"c-bad-row,{f.File(1)},20,bad-weather-data,", Row("bad-weather-data"), StringComparison.Ordinal);
        Assert.StartsWith($"line 5,{list},5,bad-station-row,", Row("bad-station-row"), StringComparison.Ordinal);
        Assert.Contains("line 6: the name 'a-good' is already given on line 2", Row("duplicate-name"), StringComparison.Ordinal);

        // The good file's rows are there: 3 variants x 3 methods of one typical year.
        var annual = File.ReadAllLines(Directory.GetFiles(Path.Combine(output, "tables", "annual"), "*.csv", SearchOption.AllDirectories).Single());
        Assert.Equal(9, annual.Length - 1);
        Assert.All(annual.Skip(1), l => Assert.StartsWith("a-good,", l, StringComparison.Ordinal));
    }

    [Fact]
    public void Strict_TheFirstBadFileIsFatal_AndWhatWasWrittenIsKept()
    {
        using var f = new BatchFolder(1);
        string list = Path.Combine(f.Path, "stations.csv");
        File.WriteAllLines(list, ["weather,name", "weather/station-00.csv,a-good", "weather/missing.csv,b-missing"]);
        string output = Path.Combine(f.Path, "out");
        var (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", output, "--strict", "--workers", "1");
        Assert.Equal(3, code);
        Assert.Contains("--strict: " + Path.Combine(f.Weather, "missing.csv"), err, StringComparison.Ordinal);
        Assert.Contains("a-good", File.ReadAllText(Path.Combine(output, "manifest.json")), StringComparison.Ordinal);
        Assert.Single(Directory.GetFiles(Path.Combine(output, "tables", "annual"), "*.parquet", SearchOption.AllDirectories));

        // A bad station-list row is fatal before anything runs.
        File.WriteAllLines(list, ["weather,name,elevation_m", "weather/station-00.csv,a-good,tall"]);
        (code, _, err) = BatchFolder.Cli("batch", f.Study, "--weather", list, "--out", Path.Combine(f.Path, "out2"), "--strict");
        Assert.Equal(3, code);
        Assert.Contains("stations.csv, line 2: elevation_m 'tall' is not an elevation in metres", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Shard_FromOptionSlurmOrKubernetes_AndItsMistakesNamed()
    {
        static Func<string, string?> Env(params (string Key, string Value)[] vars) => k => vars.FirstOrDefault(v => v.Key == k).Value;
        Assert.Equal((1, 4), Part(BatchShard.Choose("1/4", null, Env())));
        // Slurm: --array=1-4 gives ids 1..4 with MIN 1 and MAX 4 (or COUNT 4); part = id - min.
        Assert.Equal((2, 4), Part(BatchShard.Choose(null, null, Env(("SLURM_ARRAY_TASK_ID", "3"), ("SLURM_ARRAY_TASK_MIN", "1"), ("SLURM_ARRAY_TASK_MAX", "4")))));
        Assert.Equal((3, 4), Part(BatchShard.Choose(null, null, Env(("SLURM_ARRAY_TASK_ID", "3"), ("SLURM_ARRAY_TASK_COUNT", "4")))));
        Assert.Equal((0, 5), Part(BatchShard.Choose(null, 5, Env(("JOB_COMPLETION_INDEX", "0")))));
        Assert.Equal((0, 1), Part(BatchShard.Choose(null, null, Env())));
        // The option wins over the scheduler's variables.
        Assert.Equal((0, 2), Part(BatchShard.Choose("0/2", null, Env(("SLURM_ARRAY_TASK_ID", "3"), ("SLURM_ARRAY_TASK_COUNT", "4")))));

        Assert.Contains("not a part I/N", Assert.Throws<BatchInputException>(() => BatchShard.Choose("4/4", null, Env())).Message, StringComparison.Ordinal);
        Assert.Contains("give --shards N", Assert.Throws<BatchInputException>(() => BatchShard.Choose(null, null, Env(("JOB_COMPLETION_INDEX", "2")))).Message, StringComparison.Ordinal);
        Assert.Contains("neither SLURM_ARRAY_TASK_COUNT nor SLURM_ARRAY_TASK_MAX", Assert.Throws<BatchInputException>(() => BatchShard.Choose(null, null, Env(("SLURM_ARRAY_TASK_ID", "2")))).Message, StringComparison.Ordinal);

        // Every station is in exactly one of the parts.
        var shards = Enumerable.Range(0, 3).Select(i => new BatchShard(i, 3, "test")).ToList();
        Assert.All(Enumerable.Range(0, 100), p => Assert.Single(shards, s => s.Holds(p)));
    }

    private static (int, int) Part(BatchShard s) => (s.Index, s.Count);

    [Fact]
    public void Glob_AnyDepthAndNames_SortedAndStable()
    {
        using var f = new BatchFolder(3);
        string deep = Path.Combine(f.Weather, "east", "coast");
        Directory.CreateDirectory(deep);
        File.Move(f.File(2), Path.Combine(deep, "station-02.csv"));
        File.WriteAllText(Path.Combine(f.Weather, "notes.md"), "not weather");

        var inputs = BatchInputList.Read(Path.Combine(f.Weather, "**", "*.csv"));
        Assert.Equal(["east/coast/station-02", "station-00", "station-01"], inputs.Stations.Select(s => s.Id));
        Assert.Equal("Calder Reach (east/coast/station-02)", inputs.Stations[0].NameFor("Calder Reach"));
        Assert.Equal("station-00", inputs.Stations[1].NameFor(null));
        // A folder takes its own weather files, not its subfolders'; the same list gives the same hash.
        Assert.Equal(["station-00", "station-01"], BatchInputList.Read(f.Weather).Stations.Select(s => s.Id));
        Assert.Equal(inputs.Hash, BatchInputList.Read(Path.Combine(f.Weather, "**", "*.csv")).Hash);
        Assert.Contains("no file matches the glob", Assert.Throws<BatchInputException>(() => BatchInputList.Read(Path.Combine(f.Weather, "*.epw"))).Message, StringComparison.Ordinal);
    }
}
