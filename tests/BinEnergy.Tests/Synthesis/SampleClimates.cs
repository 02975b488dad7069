using BinEnergy.Core.Weather.Synthesis;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Synthesis;

/// <summary>The invented climates in weather-samples/ and the seeds their hourly files were made with.</summary>
internal static class SampleClimates
{
    /// <summary>Sample name (file stem) and seed, as listed in weather-samples/README.md.</summary>
    public static readonly (string Name, ulong Seed)[] All =
    [
        ("port-verrin", 3),
        ("frostmere", 3),
        ("alcor-mesa", 2),
        ("kelpwick", 2),
    ];

    public static string Folder => Path.Combine(RepoPaths.Root, "weather-samples");

    public static string MonthlyPath(string name) => Path.Combine(Folder, name + "-monthly.csv");

    public static string HourlyPath(string name) => Path.Combine(Folder, name + "-hourly.csv");

    public static MonthlyClimate Climate(string name) => MonthlyClimateReader.Read(MonthlyPath(name));

    public static SynthesisResult Synthesize(string name, ulong seed) => WeatherSynthesizer.Synthesize(Climate(name), seed);

    public static string Text(string name, ulong seed) =>
        SynthesizedYearWriter.ToText(Synthesize(name, seed), name + "-monthly.csv");

    public static TheoryData<string, ulong> Data()
    {
        var data = new TheoryData<string, ulong>();
        foreach (var (name, seed) in All)
        {
            data.Add(name, seed);
        }

        return data;
    }
}
