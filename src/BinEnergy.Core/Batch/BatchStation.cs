namespace BinEnergy.Core.Batch;

/// <summary>
/// One weather file of a batch, as the inputs list it: the file, its column map and elevation override,
/// the name the station list gives it (or null, so the name comes from the file), and the station list's
/// other columns, carried into every table as text attributes.
/// </summary>
/// <param name="Key">A stable key of the input, unique in the list: the listed name, else the file's path relative to the inputs' folder.</param>
/// <param name="WeatherPath">Absolute path of the weather file.</param>
/// <param name="ListedName">The station list's <c>name</c>, or null.</param>
/// <param name="Map">The column map (shipped name or absolute path), or null for the open layout.</param>
/// <param name="ElevationM">The station list's <c>elevation_m</c>, or null to use the file's metadata.</param>
/// <param name="Attributes">The station list's other columns and their values, in the list's column order.</param>
/// <param name="Source">Where the input was listed: the station list, the folder or the glob, as the user gave it.</param>
/// <param name="Line">The line of the station list, or null for a folder or glob.</param>
public sealed record BatchStation(
    string Key,
    string WeatherPath,
    string? ListedName,
    string? Map,
    double? ElevationM,
    IReadOnlyList<KeyValuePair<string, string>> Attributes,
    string Source,
    int? Line)
{
    /// <summary>The file's path relative to the inputs' folder, without its extension (the station's id when the list gives no name).</summary>
    public required string Id { get; init; }

    /// <summary>
    /// The station's name in the tables: the listed name; else the file's site name and the station's id
    /// (<c>Kelpwick (kelpwick-hourly)</c>); else, when the file names no site, the id.
    /// </summary>
    public string NameFor(string? siteName) =>
        ListedName ?? (string.IsNullOrWhiteSpace(siteName) || string.Equals(siteName, Id, StringComparison.OrdinalIgnoreCase) || string.Equals(siteName, Path.GetFileName(WeatherPath), StringComparison.OrdinalIgnoreCase)
            ? Id
            : $"{siteName.Trim()} ({Id})");

    /// <summary>Where the input is, for messages: the station list and line, or the file.</summary>
    public string Where => Line is int l ? FormattableString.Invariant($"{Source}, line {l}") : WeatherPath;
}
