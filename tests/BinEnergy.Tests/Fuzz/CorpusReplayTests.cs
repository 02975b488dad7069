using BinEnergy.Core.Errors;
using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Fuzz;

/// <summary>Every input that once crashed a reader (tests/data/fuzz-corpus) now reads, or fails with the project's own input error.</summary>
public sealed class CorpusReplayTests
{
    private static string Corpus(string kind) => Path.Combine(TestData.Root, "tests", "data", "fuzz-corpus", kind);

    public static TheoryData<string> WeatherFiles() => [.. Directory.GetFiles(Corpus("weather"), "*.csv").Select(p => Path.GetFileName(p))];

    [Theory]
    [MemberData(nameof(WeatherFiles))]
    public void WeatherFile_ReadsOrFailsWithAnInputError(string name)
    {
        string path = Path.Combine(Corpus("weather"), name);
        string mapFile = Path.ChangeExtension(path, ".map");
        var options = File.Exists(mapFile) ? new WeatherReadOptions { Map = ColumnMap.Load(File.ReadAllText(mapFile).Trim()) } : WeatherReadOptions.Default;
        var e = Record.Exception(() => WeatherReader.Read(path, options));
        Assert.True(e is null or InputDataException, $"{name}: {e}");
        Assert.True(e is null || e.Message.StartsWith(path, StringComparison.Ordinal), $"{name}: the message names the file: {e?.Message}");
    }

    /// <summary>The files of a corpus folder (git keeps no empty folder: none has crashed a map or study reader yet).</summary>
    private static string[] Files(string kind) => Directory.Exists(Corpus(kind)) ? Directory.GetFiles(Corpus(kind), "*.toml") : [];

    [Fact]
    public void MapsAndStudies_ReadOrFailWithAnInputError()
    {
        foreach (var path in Files("maps"))
        {
            var e = Record.Exception(() => ColumnMap.Load(path));
            Assert.True(e is null or InputDataException, $"{path}: {e}");
        }

        foreach (var path in Files("studies"))
        {
            var e = Record.Exception(() => StudyCaseBuilder.Build(StudyFileReader.Read(path)));
            Assert.True(e is null or InputDataException, $"{path}: {e}");
        }
    }
}
