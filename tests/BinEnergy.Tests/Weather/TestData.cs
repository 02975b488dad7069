using System.IO.Compression;

namespace BinEnergy.Tests.Weather;

/// <summary>Paths of the test data and a scratch folder per test class.</summary>
internal static class TestData
{
    /// <summary>The repository root (the folder holding BinEnergy.sln).</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>tests/data/weather-open.</summary>
    public static string WeatherOpen => Path.Combine(Root, "tests", "data", "weather-open");

    /// <summary>The five TMY3 files.</summary>
    public static readonly string[] Tmy3Files = ["722040TYA.CSV", "725300TYA.CSV", "723650TYA.CSV", "725945TYA.CSV", "703165TY.csv"];

    /// <summary>The PVGIS file.</summary>
    public const string PvgisFile = "tmy_45.000_8.000_2005_2023.csv";

    /// <summary>The compressed copy of a check file.</summary>
    public static string Open(string name) => Path.Combine(WeatherOpen, name + ".gz");

    /// <summary>The lines of a check file, decompressed (for the independent computations).</summary>
    public static string[] Lines(string name)
    {
        using var gz = new GZipStream(File.OpenRead(Open(name)), CompressionMode.Decompress);
        using var reader = new StreamReader(gz);
        return reader.ReadToEnd().Split('\n').Select(l => l.TrimEnd('\r')).ToArray();
    }

    /// <summary>A fresh scratch folder.</summary>
    public static string Scratch(string name)
    {
        string dir = Path.Combine(Path.GetTempPath(), "binenergy-tests", name + "-" + Environment.ProcessId);
        Directory.CreateDirectory(dir);
        return dir;
    }

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "BinEnergy.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("BinEnergy.sln not found above " + AppContext.BaseDirectory);
    }
}
