namespace BinEnergy.Core.Weather;

/// <summary>Where the site pressure used for indoor states and the site flow basis came from (DESIGN 5.1).</summary>
public enum SitePressureSource
{
    /// <summary>The standard atmosphere at the known site elevation (Handbook ch. 1, eq. 3).</summary>
    StandardAtmosphereAtElevation,

    /// <summary>The mean of the record's own pressure column (no elevation known).</summary>
    RecordMean,

    /// <summary>Sea level, 101.325 kPa: neither an elevation nor a pressure column was given (a warning is shown).</summary>
    SeaLevelAssumed,
}

/// <summary>Metadata of a weather site, in SI.</summary>
/// <param name="Name">Display name of the site.</param>
/// <param name="ElevationM">Elevation above sea level in metres, if known.</param>
/// <param name="Latitude">Latitude in degrees north, if known.</param>
/// <param name="Longitude">Longitude in degrees east, if known.</param>
/// <param name="UtcOffsetHours">Offset of local standard time from UTC, in hours, if known.</param>
/// <param name="SitePressurePa">The site pressure (see <see cref="SitePressureSource"/>), Pa.</param>
/// <param name="PressureSource">Where <paramref name="SitePressurePa"/> came from.</param>
public sealed record SiteInfo(
    string Name,
    double? ElevationM,
    double? Latitude,
    double? Longitude,
    double? UtcOffsetHours,
    double SitePressurePa,
    SitePressureSource PressureSource)
{
    /// <summary>The station's identifier in the file's header (a TMY3 file's USAF number), if the file or map gives one.</summary>
    public string? StationId { get; init; }
}
