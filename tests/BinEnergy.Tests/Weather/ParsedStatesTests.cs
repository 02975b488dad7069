using System.Globalization;
using System.Text;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// The parser solves each row's moist-air state beside its rows (<see cref="RowStates"/>); the builder uses them only
/// where they are the hours' own. Wherever it uses them the record must be exactly the one it builds when it solves the
/// states itself, and wherever they would not hold (gaps, moved hours, another humidity measure, an unreadable
/// elevation) it must set them aside.
/// </summary>
public sealed class ParsedStatesTests
{
    private const int Hours = 8760;

    /// <summary>Builds a file's record twice: from a parse that solved the states, and from one that did not.</summary>
    private static (HourlyWeather WithStates, HourlyWeather Without, bool Solved) BothWays(byte[] data, string name, WeatherReadOptions options)
    {
        var raw = WeatherFileParser.Parse(data, name, options.Map, statesFor: options);
        bool solved = raw.States is not null;
        var with = WeatherRecordBuilder.Build(raw, options);
        var plain = WeatherFileParser.Parse(data, name, options.Map);
        Assert.Null(plain.States);
        return (with, WeatherRecordBuilder.Build(plain, options), solved);
    }

    private static void AssertSameRecord(HourlyWeather expected, HourlyWeather actual)
    {
        Assert.Equal(expected.Times, actual.Times);
        Assert.Equal(expected.DryBulbC, actual.DryBulbC);
        Assert.Equal(expected.DewPointC, actual.DewPointC);
        Assert.Equal(expected.HumidityRatio, actual.HumidityRatio);
        Assert.Equal(expected.PressurePa, actual.PressurePa);
        Assert.Equal(expected.WetBulbC, actual.WetBulbC);
        Assert.Equal(expected.EnthalpyJPerKg, actual.EnthalpyJPerKg);
        Assert.Equal(expected.Site, actual.Site);
        Assert.Equal(expected.Quality.Counts, actual.Quality.Counts);
        Assert.Equal(expected.Quality.Warnings, actual.Quality.Warnings);
        Assert.Equal(expected.Quality.Examples.Keys, actual.Quality.Examples.Keys);
        foreach (var (kind, examples) in expected.Quality.Examples)
        {
            Assert.Equal(examples, actual.Quality.Examples[kind]);
        }
    }

    [Theory]
    [InlineData("722040TYA.CSV")]
    [InlineData("725300TYA.CSV")]
    [InlineData("723650TYA.CSV")]
    [InlineData("725945TYA.CSV")]
    [InlineData("703165TY.csv")]
    public void Tmy3Files_StatesSolvedWhileParsing_AreTheBuildersOwn(string name)
    {
        var options = new WeatherReadOptions { Map = ColumnMap.Load("tmy3") };
        var (with, without, solved) = BothWays(WeatherFileParser.LoadBytes(TestData.Open(name)), name, options);
        Assert.True(solved); // dew point and station pressure columns, hour-ending local time: nothing moves
        AssertSameRecord(without, with);
    }

    [Fact]
    public void PvgisFile_HasNoDewPointColumn_SoTheBuilderSolvesTheStates()
    {
        var options = new WeatherReadOptions { Map = ColumnMap.Load("pvgis") };
        var (with, without, solved) = BothWays(WeatherFileParser.LoadBytes(TestData.Open(TestData.PvgisFile)), TestData.PvgisFile, options);
        Assert.False(solved);
        AssertSameRecord(without, with);
    }

    [Fact]
    public void OpenLayoutWithRhColumn_TheRhCheckIsTheSame()
    {
        // Arcata, converted to the open layout (dew point, RH and pressure): its dew points above the dry-bulb are
        // clamped and counted, and its RH column is checked against the RH of the states either way.
        var arcata = WeatherReader.Read(TestData.Open("725945TYA.CSV"), new WeatherReadOptions { Map = ColumnMap.Load("tmy3") });
        var text = new StringWriter(CultureInfo.InvariantCulture) { NewLine = "\n" };
        OpenLayoutWriter.Write(arcata, text);
        var (with, without, solved) = BothWays(Encoding.UTF8.GetBytes(text.ToString()), "arcata.csv", WeatherReadOptions.Default);
        Assert.True(solved);
        AssertSameRecord(without, with);
    }

    [Theory]
    [InlineData(null)] // the file's elevation, 100 m
    [InlineData(1619.0)] // given on the command line: Albuquerque's elevation (the TMY3 header)
    public void NoPressureColumn_TheRowsTakeTheSitePressure(double? elevation)
    {
        string text = OpenLayoutText.File(Hours, header: "time,drybulb_c,dewpoint_c").Replace(",100.1\n", "\n", StringComparison.Ordinal);
        var options = new WeatherReadOptions { ElevationM = elevation };
        var (with, without, solved) = BothWays(Encoding.UTF8.GetBytes(text), "no-pressure.csv", options);
        Assert.True(solved);
        AssertSameRecord(without, with);
        Assert.Equal(Atmosphere.PressureAtElevationPa(elevation ?? 100), with.PressurePa[Hours / 2]);
    }

    [Fact]
    public void BlankLinesInTheFirstHalf_AndClampsInBoth_GiveTheOnePassRecord()
    {
        // Blank lines in the first half move the second half's rows up behind the first's; dew points above the
        // dry-bulb in both halves are clamped and counted with their lines.
        var lines = OpenLayoutText.File(Hours, (i, r) => i is 10 or 7000
            ? r.Replace("," + OpenLayoutText.DewPoint(i) + ",", "," + (OpenLayoutText.DryBulb(i) + 0.5).ToString(CultureInfo.InvariantCulture) + ",", StringComparison.Ordinal)
            : r).Split('\n').ToList();
        lines.Insert(6 + 2000, "");
        lines.Insert(6 + 3000, "   ");
        string text = string.Join('\n', lines);
        var (with, without, solved) = BothWays(Encoding.UTF8.GetBytes(text), "blank-lines.csv", WeatherReadOptions.Default);
        Assert.True(solved);
        AssertSameRecord(without, with);
        Assert.Equal(Hours, with.Count);
        Assert.Equal(2, with.Quality.Counts[QualityKeys.DewPointAboveDryBulbClamped]);
        Assert.StartsWith($"line {7 + 7000 + 2} (", with.Quality.Examples[QualityKeys.DewPointAboveDryBulbClamped][1], StringComparison.Ordinal);
        Assert.Equal(OpenLayoutText.DryBulb(7000), with.DewPointC[7000]);
    }

    [Fact]
    public void AGap_SetsTheStatesAside()
    {
        string text = OpenLayoutText.File(Hours, (i, r) => i == 6000 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",,", StringComparison.Ordinal) : r);
        var (with, without, solved) = BothWays(Encoding.UTF8.GetBytes(text), "gap.csv", WeatherReadOptions.Default);
        Assert.False(solved);
        AssertSameRecord(without, with);
        Assert.Equal(1, with.Quality.Counts[QualityKeys.GapFilledPrefix + "drybulb"]);
    }

    [Fact]
    public void AMissingRow_TheStatesAreNotUsed_AndTheFilledHourIsSolved()
    {
        // The rows are complete but one hour has no row: the hours are not the rows, so the builder solves them all.
        string text = OpenLayoutText.File(Hours, (i, r) => i == 5000 ? null : r);
        var (with, without, solved) = BothWays(Encoding.UTF8.GetBytes(text), "missing-row.csv", WeatherReadOptions.Default);
        Assert.True(solved);
        AssertSameRecord(without, with);
        Assert.Equal(Hours, with.Count);
        Assert.Equal(MoistAir.WetBulb(with.DryBulbC[5000], with.HumidityRatio[5000], with.PressurePa[5000]), with.WetBulbC[5000], 1e-6);
    }

    [Fact]
    public void AnUnreadableElevation_NoStates_AndTheReaderNamesTheLine()
    {
        string text = OpenLayoutText.File(Hours, header: "time,drybulb_c,dewpoint_c", metadata: "# elevation_m: high\n").Replace(",100.1\n", "\n", StringComparison.Ordinal);
        var raw = WeatherFileParser.Parse(Encoding.UTF8.GetBytes(text), "bad-elevation.csv", null, statesFor: WeatherReadOptions.Default);
        Assert.Null(raw.States);
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(Encoding.UTF8.GetBytes(text), "bad-elevation.csv"));
        Assert.Equal(WeatherErrorKind.BadMetadata, e.Kind);
        Assert.Equal(1, e.Line);
    }
}
