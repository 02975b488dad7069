using System.IO.Compression;
using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// The malformed-weather corpus: each invented file is written to a scratch folder, read, and
/// must fail with the exact kind of error and a message naming the file and the line or column
/// (or, for what is legitimately readable, read correctly). Rows of the corpus are lines 7 on:
/// five metadata lines, then the header on line 6.
/// </summary>
public sealed class MalformedWeatherTests
{
    private static readonly string Dir = TestData.Scratch("malformed-weather");

    private static byte[] Text(string s) => Encoding.UTF8.GetBytes(s);

    private static string F(int hours, Func<int, string, string?> edit) => OpenLayoutText.File(hours, edit);

    /// <summary>(file name, content, expected kind, expected line or null when the error is about the whole file).</summary>
    public static TheoryData<string, byte[], WeatherErrorKind, int?> Corpus()
    {
        var gz = Gzip(OpenLayoutText.File(48));
        var cases = new TheoryData<string, byte[], WeatherErrorKind, int?>
        {
            { "empty.csv", [], WeatherErrorKind.EmptyFile, null },
            { "blank-lines.csv", Text("\n \n\t\n"), WeatherErrorKind.EmptyFile, null },
            { "metadata-only.csv", Text(OpenLayoutText.Metadata), WeatherErrorKind.MissingHeader, null },
            { "header-only.csv", Text(OpenLayoutText.Metadata + OpenLayoutText.Header + "\n"), WeatherErrorKind.NoData, 6 },
            { "no-time-column.csv", Text(OpenLayoutText.File(header: "date,drybulb_c,dewpoint_c,pressure_kpa")), WeatherErrorKind.MissingTimeColumn, 6 },
            { "missing-drybulb.csv", Text(OpenLayoutText.File(header: "time,temp,dewpoint_c,pressure_kpa")), WeatherErrorKind.MissingDryBulb, 6 },
            { "no-humidity.csv", Text(OpenLayoutText.File(header: "time,drybulb_c,cloud,pressure_kpa")), WeatherErrorKind.MissingHumidity, 6 },
            { "two-drybulb-columns.csv", Text(OpenLayoutText.File(header: "time,drybulb_c,drybulb_f,pressure_kpa")), WeatherErrorKind.DuplicateColumn, 6 },
            { "text-in-number.csv", Text(F(48, (i, r) => i == 5 ? r.Replace(",100.1", ",high") : r)), WeatherErrorKind.NotANumber, 12 },
            { "comma-decimal-quoted.csv", Text(F(48, (i, r) => i == 3 ? r.Replace(",100.1", ",\"100,1\"") : r)), WeatherErrorKind.NotANumber, 10 },
            { "comma-decimal.csv", Text(F(48, (i, r) => i == 0 ? r.Replace(",100.1", ",100,1") : r)), WeatherErrorKind.WrongFieldCount, 7 },
            { "semicolon-separator.csv", Text(F(48, (i, r) => r.Replace(',', ';')).Replace("time,drybulb_c,dewpoint_c,pressure_kpa", "time;drybulb_c;dewpoint_c;pressure_kpa")), WeatherErrorKind.WrongSeparator, 6 },
            { "tab-separator.csv", Text(F(48, (i, r) => r.Replace(',', '\t')).Replace("time,drybulb_c,dewpoint_c,pressure_kpa", "time\tdrybulb_c\tdewpoint_c\tpressure_kpa")), WeatherErrorKind.WrongSeparator, 6 },
            { "duplicated-hour.csv", Text(F(48, (i, r) => i == 10 ? OpenLayoutText.Row(9) : r)), WeatherErrorKind.DuplicateTime, 17 },
            { "hour-backwards.csv", Text(F(48, (i, r) => i == 10 ? OpenLayoutText.Row(4) : r)), WeatherErrorKind.TimeOutOfOrder, 17 },
            { "thirty-minute-steps.csv", Text(F(48, (i, r) => i == 1 ? r.Replace("T01:00", "T00:30") : r)), WeatherErrorKind.NonHourlyStep, 8 },
            { "ten-hour-gap-rows.csv", Text(F(48, (i, r) => i is >= 20 and < 30 ? null : r)), WeatherErrorKind.LongGap, null },
            { "ten-hour-gap-values.csv", Text(F(48, (i, r) => i is >= 20 and < 30 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",,") : r)), WeatherErrorKind.LongGap, 27 },
            { "rh-150.csv", Text(OpenLayoutText.File(48, (i, r) => i == 7 ? "2026-01-01T07:00,9.5,150" : r.Split(',')[0] + ",9.5,80", header: "time,drybulb_c,rh_pct")), WeatherErrorKind.ValueOutOfRange, 14 },
            { "rh-negative.csv", Text(OpenLayoutText.File(48, (i, r) => i == 2 ? "2026-01-01T02:00,9.5,-4" : r.Split(',')[0] + ",9.5,80", header: "time,drybulb_c,rh_pct")), WeatherErrorKind.ValueOutOfRange, 9 },
            { "drybulb-90c.csv", Text(F(48, (i, r) => i == 30 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",90,") : r)), WeatherErrorKind.ValueOutOfRange, 37 },
            { "dewpoint-minus-120.csv", Text(F(48, (i, r) => i == 4 ? r.Replace("," + OpenLayoutText.DewPoint(i) + ",", ",-120,") : r)), WeatherErrorKind.ValueOutOfRange, 11 },
            { "pressure-in-hpa-as-kpa.csv", Text(F(48, (i, r) => r.Replace(",100.1", ",1001"))), WeatherErrorKind.ValueOutOfRange, 7 },
            { "truncated-last-line.csv", Text(F(48, (i, r) => r).TrimEnd('\n')[..^7]), WeatherErrorKind.WrongFieldCount, 54 },
            { "bad-timestamp.csv", Text(F(48, (i, r) => i == 2 ? r.Replace("2026-01-01T02:00", "2026/01/01 02:00") : r)), WeatherErrorKind.BadTimestamp, 9 },
            { "impossible-date.csv", Text(F(48, (i, r) => i == 2 ? r.Replace("2026-01-01T02:00", "2026-02-30T02:00") : r)), WeatherErrorKind.BadTimestamp, 9 },
            { "bad-elevation.csv", Text(OpenLayoutText.File(metadata: "# name: Test Fen\n# elevation_m: high\n# latitude: 52.1\n# longitude: 0.3\n# utc_offset_h: 0\n")), WeatherErrorKind.BadMetadata, 2 },
            { "wetbulb-too-low.csv", Text(OpenLayoutText.File(48, (i, r) => r.Split(',')[0] + (i == 6 ? ",30,-20" : ",20,15"), header: "time,drybulb_c,wetbulb_c")), WeatherErrorKind.ValueOutOfRange, 13 },
            // A blank line (CRLF ends) and a quoted note over two lines each push the later rows one line down.
            { "blank-line-then-text.csv", Text(F(48, (i, r) => i == 3 ? "\n" + r : i == 5 ? r.Replace(",100.1", ",high") : r).Replace("\n", "\r\n")), WeatherErrorKind.NotANumber, 13 },
            { "quoted-note-over-two-lines.csv", Text(OpenLayoutText.File(48, (i, r) => r + (i == 1 ? ",\"two\nlines\"" : ",ok") + (i == 5 ? ",x" : ""), header: OpenLayoutText.Header + ",note")), WeatherErrorKind.WrongFieldCount, 13 },
            { "infinity.csv", Text(F(48, (i, r) => i == 8 ? r.Replace(",100.1", ",Infinity") : r)), WeatherErrorKind.NotANumber, 15 },
            { "not-gzip.csv.gz", Text(OpenLayoutText.File()), WeatherErrorKind.BadCompression, null },
            { "damaged.csv.gz", gz[..(gz.Length / 2)], WeatherErrorKind.BadCompression, null },
        };
        return cases;
    }

    [Theory]
    [MemberData(nameof(Corpus))]
    public void MalformedFile_FailsWithItsKindNamingFileAndPlace(string name, byte[] content, WeatherErrorKind kind, int? line)
    {
        string path = Path.Combine(Dir, name);
        File.WriteAllBytes(path, content);
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path));
        Assert.Equal(kind, e.Kind);
        Assert.StartsWith(path, e.Message, StringComparison.Ordinal);
        Assert.Equal(line, e.Line);
        if (line is int l)
        {
            Assert.Contains($"line {l}", e.Message, StringComparison.Ordinal);
        }

        Assert.DoesNotContain('\n', e.Message);
        Assert.False(string.IsNullOrWhiteSpace(e.Fix));
    }

    [Fact]
    public void Corpus_HasAtLeast25Files() => Assert.True(Corpus().Count() >= 25);

    [Fact]
    public void LongGap_NamesColumnAndFirstAndLastMissingTime()
    {
        string path = Path.Combine(Dir, "gap-message.csv");
        File.WriteAllText(path, F(48, (i, r) => i is >= 20 and < 30 ? null : r));
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path));
        Assert.Equal("drybulb_c", e.Column);
        Assert.Contains("2026-01-01 20:00 to 2026-01-02 05:00", e.Message, StringComparison.Ordinal);
        Assert.Contains("10 hours", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WrongPressureUnit_SuggestsTheUnitTheNumbersFit()
    {
        string path = Path.Combine(Dir, "pressure-fix.csv");
        File.WriteAllText(path, F(48, (i, r) => r.Replace(",100.1", ",1001")));
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path));
        Assert.Equal("pressure_kpa", e.Column);
        Assert.Equal("1001", e.Value);
        Assert.Contains("pressure_hpa", e.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void DryBulbInFahrenheitUnderACelsiusName_SuggestsRenaming()
    {
        string path = Path.Combine(Dir, "fahrenheit.csv");
        File.WriteAllText(path, F(48, (i, r) => i == 30 ? r.Replace("," + OpenLayoutText.DryBulb(i) + ",", ",95,") : r));
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path));
        Assert.Contains("_f", e.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void ByteOrderMark_ReadsTheSameAsWithout()
    {
        var plain = WeatherReader.Read(Text(OpenLayoutText.File()), "plain.csv");
        var bom = WeatherReader.Read([0xEF, 0xBB, 0xBF, .. Text(OpenLayoutText.File())], "bom.csv");
        Assert.Equal(48, bom.Count);
        Assert.Equal("Test Fen", bom.Site.Name);
        Assert.Equal(plain.DryBulbC, bom.DryBulbC);
        Assert.Equal(100.0, bom.Site.ElevationM);
    }

    [Fact]
    public void CrLfLineEnds_ReadTheSameAsLf()
    {
        var plain = WeatherReader.Read(Text(OpenLayoutText.File()), "plain.csv");
        var crlf = WeatherReader.Read(Text(OpenLayoutText.File().Replace("\n", "\r\n")), "crlf.csv");
        Assert.Equal(48, crlf.Count);
        Assert.Equal("Test Fen", crlf.Site.Name);
        Assert.Equal(plain.DryBulbC, crlf.DryBulbC);
        Assert.Equal(plain.PressurePa, crlf.PressurePa);
    }

    [Fact]
    public void ByteOrderMarkAndCrLfInAGzipFile_Read()
    {
        string path = Path.Combine(Dir, "bom-crlf.csv.gz");
        File.WriteAllBytes(path, Gzip("\uFEFF" + OpenLayoutText.File().Replace("\n", "\r\n")));
        var w = WeatherReader.Read(path);
        Assert.Equal(48, w.Count);
        Assert.Equal(OpenLayoutText.DryBulb(47), w.DryBulbC[47]);
    }

    private static byte[] Gzip(string text)
    {
        using var ms = new MemoryStream();
        using (var gz = new GZipStream(ms, CompressionLevel.Fastest))
        {
            gz.Write(Encoding.UTF8.GetBytes(text));
        }

        return ms.ToArray();
    }
}
