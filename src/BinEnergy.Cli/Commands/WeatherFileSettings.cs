using BinEnergy.Reporting.Units;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// Options of the commands that read one weather file: the file, its map, the elevation, the gap policy, the calendar
/// year and the humidity convention. Each is a study key, checked by the study reader (<see cref="OneCaseStudy"/>).
/// </summary>
public class WeatherFileSettings : CommonSettings
{
    [CommandArgument(0, "<WEATHER>"), StudyKey("climate", "weather", Help = "Hourly weather file: the open CSV layout, or another layout with --map (.csv or .csv.gz)")]
    public string Weather { get; init; } = "";

    [CommandOption("--map <NAME|PATH>"), StudyKey("climate", "map")]
    public string? Map { get; init; }

    [CommandOption("--elevation <Z>"), StudyKey("climate", "elevation", nameof(DisplayUnits.Length))]
    public double? Elevation { get; init; }

    [CommandOption("--drop-long-gaps"), StudyKey("climate", "drop_long_gaps")]
    public bool DropLongGaps { get; init; }

    [CommandOption("--calendar-year <YEAR>"), StudyKey("climate", "calendar_year")]
    public int? CalendarYear { get; init; }

    [CommandOption("--humidity-over <WATER|ICE>"), StudyKey("climate", "humidity_over")]
    public string? HumidityOver { get; init; }

    [CommandOption("--max-input-mb <MB>"), Description("Largest weather file read, and the largest its gzip data may decompress to, MB. Default 1024 (about 1,000 station-years).")]
    public double? MaxInputMb { get; init; }

    /// <summary>The largest weather file, or decompressed gzip data, read, bytes.</summary>
    internal long MaxBytes => MaxInputMb is double mb ? (long)(mb * 1048576) : Core.Errors.InputFiles.DefaultMaxBytes;

    /// <summary>The file and its map, for headings.</summary>
    internal string Source() => Weather + " (" + (Map is null ? "open layout" : "map " + Map) + ")";

    public override Spectre.Console.ValidationResult Validate() => FirstBroken(
        base.Validate,
        (string.IsNullOrWhiteSpace(Weather), "give the weather file, e.g. binenergy inspect weather.csv"),
        (MaxInputMb is double mb && !(mb >= 0.001 && mb <= 1_000_000), FormattableString.Invariant($"--max-input-mb {MaxInputMb} is outside 0.001 to 1,000,000 MB")));
}
