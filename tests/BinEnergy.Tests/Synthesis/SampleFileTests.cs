namespace BinEnergy.Tests.Synthesis;

/// <summary>The committed demo climates in weather-samples/ are exactly what the synthesizer makes from their monthly files and seeds.</summary>
public class SampleFileTests
{
    [Theory]
    [MemberData(nameof(SampleClimates.Data), MemberType = typeof(SampleClimates))]
    public void CommittedHourlyFile_EqualsItsRegeneration(string name, ulong seed)
    {
        string committed = File.ReadAllText(SampleClimates.HourlyPath(name));
        string regenerated = SampleClimates.Text(name, seed);
        Assert.True(committed == regenerated,
            $"{name}-hourly.csv differs from what seed {seed} makes; regenerate it as weather-samples/README.md says");
        Assert.Contains($"# synthesis: monthly file {name}-monthly.csv, seed {seed}, year 2018", committed);
    }

    [Fact]
    public void Readme_NamesEverySampleAndSeed()
    {
        string readme = File.ReadAllText(Path.Combine(SampleClimates.Folder, "README.md"));
        foreach (var (name, seed) in SampleClimates.All)
        {
            Assert.Contains($"--monthly weather-samples/{name}-monthly.csv --seed {seed} --out weather-samples/{name}-hourly.csv", readme);
        }
    }
}
