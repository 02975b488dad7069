namespace BinEnergy.Core.Weather;

/// <summary>
/// Where a column map finds one metadata value (site name, elevation, latitude, longitude, UTC
/// offset) in the lines before the column names: a field of a comma-separated header line, the
/// first group of a regular expression matched against the header lines, a fixed value, or (for
/// the UTC offset only) an estimate from the longitude.
/// </summary>
/// <param name="Line">1-based line of the file, with <paramref name="Field"/>.</param>
/// <param name="Field">1-based comma-separated field of that line.</param>
/// <param name="Pattern">A regular expression with one group, tried on each header line in turn.</param>
/// <param name="Value">A fixed value.</param>
/// <param name="FromLongitude">UTC offset only: the nearest standard meridian, round(longitude / 15) hours.</param>
public sealed record MetadataSource(int? Line = null, int? Field = null, string? Pattern = null, string? Value = null, bool FromLongitude = false);
