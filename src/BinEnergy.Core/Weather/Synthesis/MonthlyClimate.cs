namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// Monthly statistics of a place, the input of <see cref="WeatherSynthesizer"/>: twelve
/// <see cref="MonthStatistics"/> in calendar order plus the site metadata. Read one with
/// <see cref="MonthlyClimateReader"/>; values are SI.
/// </summary>
/// <param name="Name">Display name of the site.</param>
/// <param name="ElevationM">Elevation above sea level, m (sets the standard-atmosphere pressure).</param>
/// <param name="Latitude">Latitude, degrees north, if given.</param>
/// <param name="Longitude">Longitude, degrees east, if given.</param>
/// <param name="UtcOffsetHours">Offset of local standard time from UTC, hours, if given.</param>
/// <param name="Months">The twelve months, January first.</param>
public sealed record MonthlyClimate(
    string Name,
    double ElevationM,
    double? Latitude,
    double? Longitude,
    double? UtcOffsetHours,
    IReadOnlyList<MonthStatistics> Months);
