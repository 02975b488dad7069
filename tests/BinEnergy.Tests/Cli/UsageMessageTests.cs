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
    [InlineData("inpsect,x.csv", "'inpsect' is not a binenergy command; did you mean inspect? (see binenergy --help)")]
    [InlineData("inspect,-", "'-' (standard input) is not read: give the path of a file")]
    [InlineData("outdoor-air,WEATHER,--airflow,1000,--heat-to,21,--cool-to,24,--max-rh,60", "--heat-to: 21 F is out of range: expected 0 to 40 C (32 to 104 F); 21 would be in range in C: if that is what you meant, give the other --units (ip or si)")]
    [InlineData("outdoor-air,WEATHER,--airflow,1000,--heat-to,70,--cool-to,75,--max-rh,0.5", "--max-rh: 0.5 is out of range: expected a percentage from 1 to 100 (RH is in percent: 50 for 50 %, not 0.5)")]
    public void AMistake_IsExplained_WithTheCommandsHelp(string args, string message)
    {
        // WEATHER: an open-layout year (the options are checked against the study schema once the file is known to read).
        string weather = Path.Combine(Path.GetTempPath(), "binenergy-usage-year.csv");
        File.WriteAllText(weather, Weather.OpenLayoutText.File(8760));
        var (code, _, err) = AirCommandTests.Run(Split(args).Select(a => a == "WEATHER" ? weather : a).ToArray());
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

    [Fact]
    public void ARecordShorterThanAYear_IsNotCalledAnnual()
    {
        string weather = Path.Combine(Path.GetTempPath(), "binenergy-usage-2998.csv");
        File.WriteAllText(weather, Weather.OpenLayoutText.File(2998));
        var (code, stdout, _) = AirCommandTests.Run("outdoor-air", weather, "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60");
        Assert.Equal(0, code);
        Assert.DoesNotContain("Annual outdoor-air energy", stdout, StringComparison.Ordinal);
        Assert.Contains("over the record's 2,998 hours (not a full year)", stdout, StringComparison.Ordinal);
        Assert.Contains("not annual figures", stdout, StringComparison.Ordinal);
        (code, stdout, _) = AirCommandTests.Run("economizer", weather, "--supply-airflow", "10000", "--min-outdoor-airflow", "2000", "--supply-temp", "55",
            "--return-temp", "75", "--return-rh", "50", "--design-load", "216000", "--design-outdoor", "95", "--balance-point", "45");
        Assert.Equal(0, code);
        Assert.Contains("not annual figures", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void AnRhThatLooksLikeAFraction_IsWarnedAbout()
    {
        var (code, stdout, _) = AirCommandTests.Run("air", "--drybulb", "70", "--rh", "0.5");
        Assert.Equal(0, code);
        Assert.Contains("RH is given in percent, so --rh 0.5 means 0.5 %; for 50 % write 50", stdout, StringComparison.Ordinal);
        (code, stdout, _) = AirCommandTests.Run("air", "--drybulb", "70", "--rh", "50");
        Assert.DoesNotContain("RH is given in percent", stdout, StringComparison.Ordinal);
    }
}
