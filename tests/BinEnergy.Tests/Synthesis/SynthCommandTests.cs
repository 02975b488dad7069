using System.IO.Compression;
using System.Text.Json;
using BinEnergy.Tests.Cli;

namespace BinEnergy.Tests.Synthesis;

/// <summary><c>binenergy synth</c> end to end: what it writes, what it refuses and what bad input gets.</summary>
public sealed class SynthCommandTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-synth-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private string Monthly => SampleClimates.MonthlyPath("kelpwick");

    [Fact]
    public void Writes_TheSynthesizersText_AndReports()
    {
        string output = Path.Combine(folder, "k.csv");
        var (code, stdout, stderr) = AirCommandTests.Run("synth", "--monthly", Monthly, "--seed", "5", "--out", output);
        Assert.Equal(0, code);
        Assert.Equal("", stderr);
        Assert.Equal(SampleClimates.Text("kelpwick", 5), File.ReadAllText(output));
        Assert.Contains("Kelpwick", stdout);
        Assert.Contains("8,760 hours of 2018, seed 5", stdout);
        Assert.Contains("corrected toward the monthly targets", stdout);
        Assert.Contains("licensed engineer", stdout);
        Assert.Single(Directory.GetFiles(folder)); // no temporary file left behind
    }

    [Fact]
    public void RefusesToOverwrite_UnlessForced()
    {
        string output = Path.Combine(folder, "k.csv");
        File.WriteAllText(output, "keep me");
        var (code, _, stderr) = AirCommandTests.Run("synth", "--monthly", Monthly, "--seed", "5", "--out", output);
        Assert.Equal(3, code); // an output in the way: exit 3, as for run, demo and convert
        Assert.Contains("--force", stderr);
        Assert.Equal("keep me", File.ReadAllText(output));

        (code, _, _) = AirCommandTests.Run("synth", "--monthly", Monthly, "--seed", "5", "--out", output, "--force");
        Assert.Equal(0, code);
        Assert.StartsWith("# name: Kelpwick", File.ReadAllText(output));
    }

    [Fact]
    public void RefusesToOverwriteItsOwnInput_EvenWhenForced()
    {
        string monthly = Path.Combine(folder, "monthly-copy.csv");
        File.Copy(Monthly, monthly);
        var (code, _, stderr) = AirCommandTests.Run("synth", "--monthly", monthly, "--seed", "5", "--out", monthly, "--force");
        Assert.Equal(2, code);
        Assert.Contains("must differ from the --monthly input", stderr);
        Assert.Equal(File.ReadAllText(Monthly), File.ReadAllText(monthly));
    }

    [Fact]
    public void BadMonthlyFile_ExitsThree_NamingFileAndLine_AndWritesNothing()
    {
        string monthly = Path.Combine(folder, "bad-monthly.csv");
        File.WriteAllText(monthly, File.ReadAllText(Monthly).Replace("\n7,17.8,", "\n7,seventeen,"));
        string output = Path.Combine(folder, "out.csv");
        var (code, _, stderr) = AirCommandTests.Run("synth", "--monthly", monthly, "--seed", "1", "--out", output);
        Assert.Equal(3, code);
        Assert.Contains("bad-monthly.csv, line 14, 'drybulb_max_c': 'seventeen' is not a number", stderr);
        Assert.DoesNotContain("   at ", stderr); // no stack trace
        Assert.False(File.Exists(output));
        Assert.Single(Directory.GetFiles(folder));
    }

    [Theory]
    [InlineData("--year", "2024", "non-leap")]
    [InlineData("--out", "/no/such/folder/x.csv", "does not exist")]
    public void BadOptions_ExitTwo(string option, string value, string words)
    {
        var args = new List<string> { "synth", "--monthly", Monthly, "--seed", "1", "--out", Path.Combine(folder, "x.csv") };
        int at = args.IndexOf(option);
        if (at >= 0)
        {
            args[at + 1] = value;
        }
        else
        {
            args.AddRange([option, value]);
        }

        var (code, _, stderr) = AirCommandTests.Run(args.ToArray());
        Assert.Equal(2, code);
        Assert.Contains(words, stderr);
    }

    [Fact]
    public void MissingSeed_ExitsTwo()
    {
        var (code, _, stderr) = AirCommandTests.Run("synth", "--monthly", Monthly, "--out", Path.Combine(folder, "x.csv"));
        Assert.Equal(2, code);
        Assert.Contains("--seed", stderr);
    }

    [Fact]
    public void GzipOutput_HoldsTheSameText()
    {
        string output = Path.Combine(folder, "k.csv.gz");
        var (code, _, _) = AirCommandTests.Run("synth", "--monthly", Monthly, "--seed", "5", "--out", output);
        Assert.Equal(0, code);
        using var reader = new StreamReader(new GZipStream(File.OpenRead(output), CompressionMode.Decompress));
        Assert.Equal(SampleClimates.Text("kelpwick", 5), reader.ReadToEnd());
    }

    [Fact]
    public void Json_ListsTheMonths_InTheChosenUnits()
    {
        var (code, stdout, _) = AirCommandTests.Run("synth", "--monthly", Monthly, "--seed", "5", "--out", Path.Combine(folder, "k.csv"), "--json", "--units", "si");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        var months = doc.RootElement.GetProperty("months");
        Assert.Equal(12, months.GetArrayLength());
        Assert.Equal(17.8, months[6].GetProperty("drybulb_max_target_c").GetDouble(), 1e-9); // kelpwick-monthly.csv, July
        Assert.Equal(17.8, months[6].GetProperty("drybulb_max_c").GetDouble(), 0.5);
        Assert.Equal(8760, doc.RootElement.GetProperty("hours").GetInt32());
    }
}
