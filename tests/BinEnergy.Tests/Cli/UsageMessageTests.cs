namespace BinEnergy.Tests.Cli;

/// <summary>Command-line mistakes get plain words: the nearest option, what a value should look like, and the command's own help.</summary>
public sealed class UsageMessageTests
{
    [Theory]
    [InlineData("inspect,x.csv,--mapp,tmy3", "--mapp is not an option of binenergy inspect; did you mean --map? (see binenergy inspect --help)")]
    [InlineData("outdoor-air,x.csv,--airflw,10", "did you mean --airflow? (see binenergy outdoor-air --help)")]
    [InlineData("inspect,x.csv,--airflow,10", "--airflow is not an option of binenergy inspect (see binenergy inspect --help)")]
    [InlineData("synth,--monthly,a.csv,--seed,-1,--out,x.csv", "--seed -1: '-1' is not a whole number, 0 or more (see binenergy synth --help)")]
    [InlineData("outdoor-air,x.csv,--airflow,\"1,5\",--heat-to,70", "is not a number, with a dot as the decimal separator (see binenergy outdoor-air --help)")]
    [InlineData("inspect,-", "'-' (standard input) is not read: give the path of a file")]
    public void AMistake_IsExplained_WithTheCommandsHelp(string args, string message)
    {
        var (code, _, err) = AirCommandTests.Run(Split(args));
        Assert.Equal(2, code);
        Assert.Contains(message, err, StringComparison.Ordinal);
        Assert.DoesNotContain("Nullable", err, StringComparison.Ordinal);
    }

    /// <summary>Comma-separated arguments, a quoted one kept whole.</summary>
    private static string[] Split(string args) =>
        System.Text.RegularExpressions.Regex.Matches(args, "\"[^\"]*\"|[^,]+").Select(m => m.Value.Trim('"')).ToArray();

    [Fact]
    public void HelpExamples_KeepTheQuotesAScheduleNeeds()
    {
        var (code, stdout, _) = AirCommandTests.Run("bins", "--help");
        Assert.Equal(0, code);
        Assert.Contains("--occupied \"Mon-Fri 07:00-19:00; Sat 08:00-13:00\"", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void AnOutputInTheWay_IsExitCode3_ForEveryCommandThatWrites()
    {
        string folder = Directory.CreateTempSubdirectory("binenergy-exit-").FullName;
        try
        {
            string file = Path.Combine(folder, "taken.csv");
            File.WriteAllText(file, "not ours\n");
            string taken = Path.Combine(folder, "taken");
            Directory.CreateDirectory(taken);
            File.WriteAllText(Path.Combine(taken, "note.txt"), "not ours\n");
            string weather = Path.Combine(Weather.TestData.WeatherOpen, "725300TYA.CSV.gz");
            string monthly = Path.Combine(Weather.TestData.Root, "weather-samples", "frostmere-monthly.csv");
            Assert.Equal(3, AirCommandTests.Run("convert", weather, "--map", "tmy3", "--out", file).Code);
            Assert.Equal(3, AirCommandTests.Run("synth", "--monthly", monthly, "--seed", "1", "--out", file).Code);
            Assert.Equal(3, AirCommandTests.Run("demo", "--out", taken).Code);
            Assert.Equal("not ours\n", File.ReadAllText(file));
            Assert.Equal("not ours\n", File.ReadAllText(Path.Combine(taken, "note.txt")));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
