using System.Globalization;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Turns a parsed table into an hourly record in named steps: the site (DESIGN 5.1), the calendar
/// (<see cref="WeatherCalendar"/>, 5.3), the hourly grid with its gaps (<see cref="HourlyGrid"/>, 5.3 and 5.4), the
/// site pressure (5.1), the humidity (<see cref="WeatherHumidity"/>, 5.1 and 5.4) and the moist-air states
/// (<see cref="HourlyWeather"/>).
/// </summary>
internal static class WeatherRecordBuilder
{
    public static HourlyWeather Build(RawWeatherTable raw, WeatherReadOptions options)
    {
        var (name, latitude, longitude, elevation, utcOffset) = SiteMetadata(raw, options);
        var calendar = WeatherCalendar.Place(raw, ShiftHours(raw, utcOffset), options);
        var grid = HourlyGrid.Build(raw, calendar, options);
        WeatherChecks.DewPointsAgainstDryBulb(grid, raw);
        WeatherChecks.DryBulbOutliers(grid, raw.Quality, calendar.Calendar.IsTypicalYear);
        WeatherChecks.AnnualMeanForLatitude(grid, latitude, elevation, raw.Quality);
        var (sitePressure, source, pressureColumn) = SitePressure(grid, elevation, raw.Quality);
        var pressure = pressureColumn ?? Enumerable.Repeat(sitePressure, grid.Times.Length).ToArray();
        var over = HumidityConvention(raw, options);
        bool typical = calendar.Calendar.IsTypicalYear;
        var (w, dewPoint) = WeatherHumidity.Resolve(grid, pressure, over, raw, typical);
        WeatherHumidity.CheckConvention(grid, over, raw.Quality);
        var columns = new HourlyColumns
        {
            Times = grid.Times,
            DryBulbC = grid.Columns[WeatherQuantity.DryBulb],
            HumidityRatio = w,
            PressurePa = pressure,
            DewPointC = dewPoint,
            HumidityOver = over,
        };
        var weather = new HourlyWeather(new SiteInfo(name, elevation, latitude, longitude, utcOffset, sitePressure, source) { StationId = StationId(raw) }, columns, raw.Quality, calendar.Calendar)
        {
            HourlyPressureFromRecord = pressureColumn is not null,
        };
        WeatherHumidity.CheckOtherMeasures(weather, grid, raw, typical);
        return weather;
    }

    /// <summary>The station id from the metadata (trimmed), or null when the file and its map give none.</summary>
    private static string? StationId(RawWeatherTable raw) =>
        raw.Metadata.TryGetValue("station_id", out var id) && id.Value.Trim().Length > 0 ? id.Value.Trim() : null;

    /// <summary>Name, latitude, longitude, elevation and UTC offset from the metadata (the options' elevation first).</summary>
    private static (string Name, double? Latitude, double? Longitude, double? ElevationM, double? UtcOffset) SiteMetadata(RawWeatherTable raw, WeatherReadOptions options)
    {
        double? lat = MetaNumber(raw, "latitude", -90, 90);
        double? lon = MetaNumber(raw, "longitude", -180, 180);
        double? elevation = options.ElevationM ?? MetaNumber(raw, "elevation_m", -500, 9000)
            ?? (MetaNumber(raw, "elevation_ft", -1600, 29500) is double ft ? ft * Units.Conversions.MetresPerFoot : null);
        double? offset = MetaNumber(raw, "utc_offset_h", -12, 14, orFromLongitude: true);
        if (raw.Metadata.TryGetValue("utc_offset_h", out var off) && off.Value == "from_longitude")
        {
            if (lon is not double longitude)
            {
                throw new WeatherDataException(WeatherErrorKind.BadMetadata, raw.File, "the map estimates the UTC offset from the longitude, but no longitude was found",
                    "Give the map a fixed utc_offset_h = { value = ... }");
            }

            offset = Math.Round(longitude / 15.0);
            if (raw.Map.Time.Utc)
            {
                raw.Quality.Warn(Inv($"times are UTC; local standard time taken as UTC{offset:+0;-0;+0} h, the standard meridian nearest longitude {longitude:0.###} (give the map a fixed utc_offset_h if the local zone differs)"));
            }
        }

        string name = raw.Metadata.TryGetValue("name", out var nm) && nm.Value.Trim().Length > 0 ? nm.Value.Trim() : BaseName(raw.File);
        return (name, lat, lon, elevation, offset);
    }

    /// <summary>Hours to add to each written time for hour-beginning local standard time (DESIGN 5.3).</summary>
    private static double ShiftHours(RawWeatherTable raw, double? utcOffset)
    {
        double shift = raw.Map.Time.HourEnding ? -1.0 : 0.0;
        if (raw.Map.Time.Utc)
        {
            shift += utcOffset ?? throw new WeatherDataException(WeatherErrorKind.BadMetadata, raw.File, "the times are UTC but the file gives no UTC offset for local standard time",
                "Add utc_offset_h to the map's [metadata] table");
        }

        return shift;
    }

    /// <summary>The site pressure (DESIGN 5.1): the standard atmosphere at the elevation, else the record's mean pressure, else sea level.</summary>
    private static (double Pressure, SitePressureSource Source, double[]? Column) SitePressure(HourlyGrid grid, double? elevation, QualityReport quality)
    {
        grid.Columns.TryGetValue(WeatherQuantity.Pressure, out var column);
        (double, SitePressureSource, double[]?) result = (Atmosphere.SeaLevelPressurePa, SitePressureSource.SeaLevelAssumed, null);
        if (elevation is double z)
        {
            result = (Atmosphere.PressureAtElevationPa(z), SitePressureSource.StandardAtmosphereAtElevation, column);
        }
        else if (column is not null)
        {
            quality.Warn("no elevation given: the site pressure is the mean of the record's pressure column");
            result = (column.Average(), SitePressureSource.RecordMean, column);
        }
        else
        {
            quality.Warn("no elevation and no pressure column: sea-level pressure (101.325 kPa) assumed; give --elevation for a site above sea level");
        }

        if (column is not null && column.Length > 24 && column.Max() - column.Min() < 1e-6)
        {
            quality.Warn(Inv($"the pressure column is constant at {column[0] / 1000:0.###} kPa: it looks filled rather than measured"));
        }

        return result;
    }

    /// <summary>What the file's dew points and RH are relative to below 0 C: the options, else the file (open-layout metadata or map), else liquid water.</summary>
    private static HumidityOver HumidityConvention(RawWeatherTable raw, WeatherReadOptions options)
    {
        if (options.HumidityOver is HumidityOver given)
        {
            return given;
        }

        if (raw.Metadata.TryGetValue("humidity_over", out var entry))
        {
            return entry.Value.Trim().ToLowerInvariant() switch
            {
                "water" => HumidityOver.Water,
                "ice" => HumidityOver.Ice,
                _ => throw new WeatherDataException(WeatherErrorKind.BadMetadata, raw.File, "humidity_over must be water or ice",
                    "Write '# humidity_over: water' (dew points and RH over liquid water, the usual convention) or '# humidity_over: ice' (frost points below 0 C)",
                    line: entry.Line, value: entry.Value),
            };
        }

        return raw.Map.HumidityOver;
    }

    private static double? MetaNumber(RawWeatherTable raw, string key, double low, double high, bool orFromLongitude = false)
    {
        if (!raw.Metadata.TryGetValue(key, out var entry) || (orFromLongitude && entry.Value == "from_longitude"))
        {
            return null;
        }

        if (!double.TryParse(entry.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !(v >= low && v <= high))
        {
            throw new WeatherDataException(WeatherErrorKind.BadMetadata, raw.File, Inv($"the {key} is not a number between {low} and {high}"),
                raw.IsOpenLayout ? $"Write it like '# {key}: 12.5' (a dot as decimal separator)" : "Check that this file has the layout the " + raw.Map.Source + " describes",
                line: entry.Line, column: key, value: entry.Value);
        }

        return v;
    }

    private static string BaseName(string file)
    {
        string name = Path.GetFileName(file);
        foreach (var ext in new[] { ".gz", ".csv" })
        {
            if (name.EndsWith(ext, StringComparison.OrdinalIgnoreCase))
            {
                name = name[..^ext.Length];
            }
        }

        return name;
    }

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
