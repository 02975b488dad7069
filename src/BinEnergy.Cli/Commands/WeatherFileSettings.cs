using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Units;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>Options of the commands that read one weather file: the file, its map, the elevation, the gap policy and the calendar year.</summary>
public class WeatherFileSettings : CommonSettings
{
    [CommandArgument(0, "<WEATHER>")]
    [Description("Hourly weather file: the open CSV layout, or another layout with --map (.csv or .csv.gz).")]
    [StudyKey("climate", "weather")]
    public string Weather { get; init; } = "";

    [CommandOption("--map <NAME|PATH>")]
    [Description("Column map for a layout other than the open one: a shipped map (tmy3, pvgis) or the path of a TOML map file.")]
    [StudyKey("climate", "map")]
    public string? Map { get; init; }

    [CommandOption("--elevation <Z>")]
    [Description("Site elevation (ft in ip, m in si), overriding the file's metadata; sets the site pressure.")]
    [StudyKey("climate", "elevation", nameof(DisplayUnits.Length))]
    public double? Elevation { get; init; }

    [CommandOption("--drop-long-gaps")]
    [Description("Leave hours in gaps longer than 6 h out (counted and reported) instead of stopping with an error.")]
    [StudyKey("climate", "drop_long_gaps")]
    public bool DropLongGaps { get; init; }

    [CommandOption("--calendar-year <YEAR>")]
    [Description("Year whose weekdays a typical-year file uses. Default 2018 (a non-leap year starting on a Monday).")]
    [StudyKey("climate", "calendar_year")]
    public int? CalendarYear { get; init; }

    [CommandOption("--humidity-over <WATER|ICE>")]
    [Description("What the file's dew points and RH are relative to below 0 C: water (liquid water, the usual weather convention) or ice (frost points). Default: the file's own statement, else water.")]
    [TypeConverter(typeof(ChoiceConverter<Core.Psychrometrics.HumidityOver>))]
    [StudyKey("climate", "humidity_over")]
    public Core.Psychrometrics.HumidityOver? HumidityOver { get; init; }

    [CommandOption("--max-input-mb <MB>")]
    [Description("Largest weather file read, and the largest its gzip data may decompress to, MB. Default 1024 (about 1,000 station-years).")]
    public double? MaxInputMb { get; init; }

    /// <summary>The weather file and how it is read, for headings.</summary>
    internal string Source(WeatherReadOptions options) => Weather + " (" + (options.Map?.Source ?? "open layout") + ")";

    /// <summary>The file and its map, for headings, without reading the map.</summary>
    internal string Source() => Weather + " (" + (Map is null ? "open layout" : "map " + Map) + ")";

    public override Spectre.Console.ValidationResult Validate()
    {
        if (string.IsNullOrWhiteSpace(Weather))
        {
            return Spectre.Console.ValidationResult.Error("give the weather file, e.g. binenergy inspect weather.csv");
        }

        if (Elevation is double z && !(Length.From(z, Units).Metres is >= -500 and <= 9000))
        {
            return Spectre.Console.ValidationResult.Error(FormattableString.Invariant($"--elevation {z} is outside -500 to 9,000 m (-1,640 to 29,500 ft)"));
        }

        if (MaxInputMb is double mb && !(mb >= 0.001 && mb <= 1_000_000))
        {
            return Spectre.Console.ValidationResult.Error(FormattableString.Invariant($"--max-input-mb {mb} is outside 0.001 to 1,000,000 MB"));
        }

        if (CalendarYear is int y && (y < 1900 || y > 2200))
        {
            return Spectre.Console.ValidationResult.Error($"--calendar-year {y} is outside 1900 to 2200");
        }

        return base.Validate();
    }

    /// <summary>The reader options these settings describe.</summary>
    internal WeatherReadOptions ReadOptions() => new()
    {
        Map = Map is null ? null : ColumnMap.Load(Map),
        ElevationM = Elevation is double z ? Length.From(z, Units).Metres : null,
        AllowDroppingLongGaps = DropLongGaps,
        CalendarYear = CalendarYear ?? CalendarInfo.DefaultTypicalYear,
        HumidityOver = HumidityOver,
        MaxBytes = MaxInputMb is double mb ? (long)(mb * 1048576) : Core.Errors.InputFiles.DefaultMaxBytes,
    };
}
