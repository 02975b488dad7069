using System.Diagnostics;
using System.IO.Compression;
using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;
using BinEnergy.Core.Weather.Synthesis;
using BinEnergy.Tests.Cli;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// Inputs are bounded: only regular files are read (a pipe, a device or a folder is refused by name, before it could
/// hang or fill the memory), and a file or its decompressed gzip data above the limit stops with the limit and the
/// option that raises it.
/// </summary>
public sealed class InputBoundsTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-bounds-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private string Fifo()
    {
        string path = Path.Combine(folder, "pipe.csv");
        using var mkfifo = Process.Start(new ProcessStartInfo("mkfifo", [path]) { UseShellExecute = false })!;
        mkfifo.WaitForExit();
        Assert.Equal(0, mkfifo.ExitCode);
        return path;
    }

    [Fact]
    public void APipe_IsRefusedByName_WithoutWaitingForAWriter()
    {
        string pipe = Fifo();
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(pipe));
        Assert.Equal(WeatherErrorKind.EmptyFile, e.Kind);
        Assert.Contains("not a regular file", e.Message, StringComparison.Ordinal);
        Assert.StartsWith(pipe, e.Message, StringComparison.Ordinal);
        Assert.Throws<WeatherDataException>(() => ColumnMap.Load(pipe));
        Assert.Throws<StudyFileException>(() => StudyFileReader.Read(pipe));
        Assert.Throws<MonthlyClimateException>(() => MonthlyClimateReader.Read(pipe));
    }

    [Theory]
    [InlineData("/dev/zero")]
    [InlineData("/dev/urandom")]
    public void ADevice_IsRefused_AsWeatherMapStudyAndMonthlyFile(string device)
    {
        Assert.Contains("not a regular file", Assert.Throws<WeatherDataException>(() => WeatherReader.Read(device)).Message, StringComparison.Ordinal);
        Assert.Contains("not a regular file", Assert.Throws<WeatherDataException>(() => ColumnMap.Load(device)).Message, StringComparison.Ordinal);
        Assert.Contains("not a regular file", Assert.Throws<StudyFileException>(() => StudyFileReader.Read(device)).Message, StringComparison.Ordinal);
        Assert.Contains("not a regular file", Assert.Throws<MonthlyClimateException>(() => MonthlyClimateReader.Read(device)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AFolder_AndAPathWithANul_AreRefusedByName()
    {
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(folder));
        Assert.Equal(WeatherErrorKind.FileNotFound, e.Kind);
        Assert.Contains("is a folder, not a file", e.Message, StringComparison.Ordinal);
        Assert.Contains("is a folder", Assert.Throws<WeatherDataException>(() => ColumnMap.Load(folder)).Message, StringComparison.Ordinal);
        Assert.Contains("is a folder", Assert.Throws<StudyFileException>(() => StudyFileReader.Read(folder)).Message, StringComparison.Ordinal);
        var nul = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(Path.Combine(folder, "a\0b.csv")));
        Assert.Contains("NUL character", nul.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AFileAboveTheLimit_NamesTheLimitAndTheOption()
    {
        string path = Path.Combine(folder, "big.csv");
        File.WriteAllText(path, OpenLayoutText.File(8760)); // a year in the open layout: about 0.4 MB
        long size = new FileInfo(path).Length;
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path, new WeatherReadOptions { MaxBytes = size - 1 }));
        Assert.Equal(WeatherErrorKind.FileTooLarge, e.Kind);
        Assert.Contains("above the limit of", e.Message, StringComparison.Ordinal);
        Assert.Contains("--max-input-mb", e.Message, StringComparison.Ordinal);
        Assert.Equal(8760, WeatherReader.Read(path, new WeatherReadOptions { MaxBytes = size }).Count);
    }

    [Fact]
    public void GzipDataThatExpandPastTheLimit_StopAtTheLimit()
    {
        // 64 MiB of zeros compress to about 64 KB: read with a 16 MiB limit, decompression stops at 16 MiB.
        string path = Path.Combine(folder, "bomb.csv.gz");
        using (var gz = new GZipStream(File.Create(path), CompressionLevel.SmallestSize))
        {
            var zeros = new byte[1 << 20];
            for (int i = 0; i < 64; i++)
            {
                gz.Write(zeros);
            }
        }

        Assert.True(new FileInfo(path).Length < 1 << 20);
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(path, new WeatherReadOptions { MaxBytes = 16L << 20 }));
        Assert.Equal(WeatherErrorKind.FileTooLarge, e.Kind);
        Assert.Contains("decompress to more than the limit of 16 MB", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TheCommandLine_RefusesAPipeAndTakesTheLimitOption()
    {
        var (code, _, err) = AirCommandTests.Run("inspect", Fifo());
        Assert.Equal(3, code);
        Assert.Contains("not a regular file", err, StringComparison.Ordinal);
        string path = Path.Combine(folder, "year.csv");
        File.WriteAllText(path, OpenLayoutText.File(8760));
        (code, _, err) = AirCommandTests.Run("inspect", path, "--max-input-mb", "0.1");
        Assert.Equal(3, code);
        Assert.Contains("above the limit of 0.1 MB", err, StringComparison.Ordinal);
        Assert.Contains("--max-input-mb", err, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("9999-12-31T24:00", "does not read as")] // past the calendar's last day (DateTime's documented range ends 9999-12-31)
    [InlineData("9999-12-31T23:00", "outside the years the reader takes")]
    [InlineData("0001-01-01T00:00", "outside the years the reader takes")]
    public void TimesAtTheCalendarsEdges_AreRefusedWithTheirLine(string time, string message)
    {
        string text = OpenLayoutText.File(3, (i, row) => i == 1 ? time + row[16..] : row);
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(System.Text.Encoding.UTF8.GetBytes(text), "edge.csv"));
        Assert.Equal(WeatherErrorKind.BadTimestamp, e.Kind);
        Assert.Equal(8, e.Line); // five metadata lines, the column names, then the second row
        Assert.Contains(message, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AMappedTimeAtTheCalendarsEnd_IsRefused_NotACrash()
    {
        // The tmy3 map's 24:00 on the calendar's last day.
        string text = "1,\"EDGE\",XX,-6.0,41.0,-87.0,200\nDate (MM/DD/YYYY),Time (HH:MM),Dry-bulb (C),Dew-point (C),RHum (%),Pressure (mbar)\n"
            + "12/31/9999,23:00,1.0,-2.0,80,1000\n12/31/9999,24:00,1.0,-2.0,80,1000\n";
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(System.Text.Encoding.UTF8.GetBytes(text), "edge.csv", new WeatherReadOptions { Map = ColumnMap.Load("tmy3") }));
        Assert.Equal(WeatherErrorKind.BadTimestamp, e.Kind);
        Assert.Equal(3, e.Line);
    }
}
