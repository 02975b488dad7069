namespace BinEnergy.Core.Weather;

/// <summary>
/// Reads an hourly weather file into an <see cref="HourlyWeather"/> record in SI: the project's
/// open CSV layout, or any layout a <see cref="ColumnMap"/> describes; plain or gzip-compressed.
/// Applies the calendar and quality rules of DESIGN 5.3 and 5.4 (hour-ending data shifted,
/// typical years placed on a calendar year, short gaps filled, every repair counted) and fails
/// with a <see cref="WeatherDataException"/> naming file, line, column and fix otherwise.
/// </summary>
public static class WeatherReader
{
    /// <summary>Reads a weather file.</summary>
    /// <param name="path">The file (<c>.csv</c> or <c>.csv.gz</c>; gzip is recognised by its content).</param>
    /// <param name="options">The map, elevation override, gap policy and calendar year; null for the open layout with defaults.</param>
    /// <exception cref="WeatherDataException">The file cannot be read as it stands.</exception>
    public static HourlyWeather Read(string path, WeatherReadOptions? options = null)
    {
        options ??= WeatherReadOptions.Default;
        options.Validate();
        return Read(WeatherFileParser.LoadBytes(path, options.MaxBytes), path, options);
    }

    /// <summary>Reads weather from bytes already in memory (already un-gzipped); <paramref name="fileName"/> names it in messages.</summary>
    /// <exception cref="WeatherDataException">The data cannot be read as they stand.</exception>
    public static HourlyWeather Read(byte[] data, string fileName, WeatherReadOptions? options = null)
    {
        options ??= WeatherReadOptions.Default;
        options.Validate();
        var raw = WeatherFileParser.Parse(data, fileName, options.Map);
        return WeatherRecordBuilder.Build(raw, options);
    }
}
