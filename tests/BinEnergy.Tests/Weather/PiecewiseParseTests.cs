using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// A long file is parsed in pieces on all cores (where the machine has a second core): the record, its
/// line numbers, its repair counts and the first mistake in file order must be what one pass gives.
/// One pass is forced by quoting one field, which lets a record span lines (and changes no value).
/// </summary>
public sealed class PiecewiseParseTests
{
    private const int Hours = 8760;

    /// <summary>Line of hour i: the five metadata lines and the column names come first.</summary>
    private static int LineOf(int hour) => 7 + hour;

    private static HourlyWeather Read(string text) => WeatherReader.Read(Encoding.UTF8.GetBytes(text), "long.csv");

    /// <summary>The same file with the first time quoted: read in one pass.</summary>
    private static string OnePass(string text)
    {
        int at = text.IndexOf("2026-01-01T00:00", StringComparison.Ordinal);
        return text[..at] + "\"2026-01-01T00:00\"" + text[(at + "2026-01-01T00:00".Length)..];
    }

    [Fact]
    public void LongFile_GivesTheSameRecordAndRepairsAsOnePass()
    {
        // RH clamps in several pieces (an RH column added), short gaps in two pieces and a blank line in a later piece.
        string text = OpenLayoutText.File(Hours, (i, r) => i switch
        {
            100 or 101 or 7000 => r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",,", StringComparison.Ordinal),
            _ => r,
        }, header: OpenLayoutText.Header + ",rh_pct").Replace("100.1\n", "100.1,80\n", StringComparison.Ordinal);
        var lines = text.Split('\n').ToList();
        foreach (int hour in new[] { 50, 6000, 6001, 8000 })
        {
            lines[LineOf(hour) - 1] = lines[LineOf(hour) - 1][..^2] + "102";
        }

        lines.Insert(LineOf(5000), ""); // a blank line after hour 5000: the hours after it are one line further down
        text = string.Join('\n', lines);

        var split = Read(text);
        var single = Read(OnePass(text));
        Assert.Equal(Hours, split.Count);
        Assert.Equal(single.Times, split.Times);
        Assert.Equal(single.DryBulbC, split.DryBulbC);
        Assert.Equal(single.HumidityRatio, split.HumidityRatio);
        Assert.Equal(single.WetBulbC, split.WetBulbC);
        Assert.Equal(single.Quality.Counts, split.Quality.Counts);
        Assert.Equal(single.Quality.Examples.Keys, split.Quality.Examples.Keys);
        foreach (var (kind, examples) in single.Quality.Examples)
        {
            Assert.Equal(examples, split.Quality.Examples[kind]);
        }

        Assert.Equal(4, split.Quality.Counts[QualityKeys.RhClamped]);
        Assert.Equal(3, split.Quality.Counts[QualityKeys.GapFilledPrefix + "drybulb"]);
        Assert.Contains($"line {LineOf(8000) + 1}:", split.Quality.Examples[QualityKeys.RhClamped][3], StringComparison.Ordinal);
    }

    [Fact]
    public void LongFileWithWindowsLineEnds_ReadsAsWithUnixOnes()
    {
        // CRLF line ends (a file saved on Windows) and no line end after the last row: the pieces are cut after a
        // line feed, so every piece starts on a row, and the last row is read without its line end.
        string text = OpenLayoutText.File(Hours);
        var unix = Read(text);
        var windows = Read(text.TrimEnd('\n').Replace("\n", "\r\n", StringComparison.Ordinal));
        Assert.Equal(Hours, windows.Count);
        Assert.Equal(unix.Times, windows.Times);
        Assert.Equal(unix.DryBulbC, windows.DryBulbC);
        Assert.Equal(unix.WetBulbC, windows.WetBulbC);
        Assert.Equal(unix.Quality.Counts, windows.Quality.Counts);
    }

    [Theory]
    [InlineData(100)]
    [InlineData(5000)]
    [InlineData(8759)]
    public void MistakeInAnyPiece_NamesItsLine(int hour)
    {
        string text = OpenLayoutText.File(Hours, (i, r) => i == hour ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",9x,", StringComparison.Ordinal) : r);
        var e = Assert.Throws<WeatherDataException>(() => Read(text));
        Assert.Equal(WeatherErrorKind.NotANumber, e.Kind);
        Assert.Equal(LineOf(hour), e.Line);
        Assert.Equal(LineOf(hour), Assert.Throws<WeatherDataException>(() => Read(OnePass(text))).Line);
    }

    [Fact]
    public void MistakesInTwoPieces_TheFirstInFileOrderIsReported()
    {
        string text = OpenLayoutText.File(Hours, (i, r) => i switch
        {
            7000 => r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",9x,", StringComparison.Ordinal),
            300 => r + ",extra",
            _ => r,
        });
        var e = Assert.Throws<WeatherDataException>(() => Read(text));
        Assert.Equal(WeatherErrorKind.WrongFieldCount, e.Kind);
        Assert.Equal(LineOf(300), e.Line);
    }
}
