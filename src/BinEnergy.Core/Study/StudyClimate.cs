namespace BinEnergy.Core.Study;

/// <summary>One climate of a study.</summary>
/// <param name="Name">Its name, as in the tables' <c>climate</c> column.</param>
/// <param name="WeatherPath">Absolute path of the weather file.</param>
/// <param name="Map">The column map (shipped name or absolute path), or null for the open layout.</param>
/// <param name="ElevationM">Elevation override, m, or null to use the file's metadata.</param>
/// <param name="Line">Line of its name in the study file.</param>
public sealed record StudyClimate(string Name, string WeatherPath, string? Map, double? ElevationM, int Line)
{
    /// <summary>Leave hours in long gaps out (counted) instead of stopping.</summary>
    public bool DropLongGaps { get; init; }

    /// <summary>The year whose weekdays a typical-year file uses, or null for the default.</summary>
    public int? CalendarYear { get; init; }

    /// <summary>What the file's dew points and RH are relative to below 0 C, or null for the file's own statement.</summary>
    public Psychrometrics.HumidityOver? HumidityOver { get; init; }
}
