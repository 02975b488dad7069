using System.ComponentModel;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>Options of the commands that read one weather file: the file, its map, the elevation and the gap policy.</summary>
public class WeatherFileSettings : CommonSettings
{
    [CommandArgument(0, "<WEATHER>")]
    [Description("Hourly weather file: the open CSV layout, or another layout with --map (.csv or .csv.gz).")]
    public string Weather { get; init; } = "";

    [CommandOption("--map <NAME|PATH>")]
    [Description("Column map for a layout other than the open one: a shipped map (tmy3, pvgis) or the path of a TOML map file.")]
    public string? Map { get; init; }

    [CommandOption("--elevation <Z>")]
    [Description("Site elevation (ft in ip, m in si), overriding the file's metadata; sets the site pressure.")]
    public double? Elevation { get; init; }

    [CommandOption("--drop-long-gaps")]
    [Description("Leave hours in gaps longer than 6 h out (counted and reported) instead of stopping with an error.")]
    public bool DropLongGaps { get; init; }

    [CommandOption("--calendar-year <YEAR>")]
    [Description("Year whose weekdays a typical-year file uses. Default 2018 (a non-leap year starting on a Monday).")]
    public int? CalendarYear { get; init; }

    /// <summary>The reader options these settings describe.</summary>
    internal WeatherReadOptions ReadOptions(UnitSystem units)
    {
        if (string.IsNullOrWhiteSpace(Weather))
        {
            throw new UsageException("give the weather file, e.g. binenergy inspect weather.csv");
        }

        double? elevationM = null;
        if (Elevation is double z)
        {
            elevationM = Length.From(z, units).Metres;
            if (!(elevationM >= -500 && elevationM <= 9000))
            {
                throw new UsageException(units == UnitSystem.IP
                    ? FormattableString.Invariant($"--elevation {z} ft is outside -1,640 to 29,500 ft")
                    : FormattableString.Invariant($"--elevation {z} m is outside -500 to 9,000 m"));
            }
        }

        if (CalendarYear is int y && (y < 1900 || y > 2200))
        {
            throw new UsageException($"--calendar-year {y} is outside 1900 to 2200");
        }

        return new WeatherReadOptions
        {
            Map = Map is null ? null : ColumnMap.Load(Map),
            ElevationM = elevationM,
            AllowDroppingLongGaps = DropLongGaps,
            CalendarYear = CalendarYear ?? CalendarInfo.DefaultTypicalYear,
        };
    }
}
