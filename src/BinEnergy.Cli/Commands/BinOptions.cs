using BinEnergy.Reporting.Units;

namespace BinEnergy.Cli.Commands;

/// <summary>Options shared by the commands that bin a weather file: bin width, occupancy schedule, holidays.</summary>
public class BinOptions : WeatherFileSettings
{
    [CommandOption("--width <W>"), StudyKey("study", "bin_width", nameof(DisplayUnits.TemperatureDifference))]
    public double? Width { get; init; }

    [CommandOption("--occupied <SCHEDULE>"), StudyKey("schedule", "occupied")]
    public string? Occupied { get; init; }

    [CommandOption("--holidays <DATES>"), StudyKey("schedule", "holidays", List = true, Note = "Comma-separated.")]
    public string? Holidays { get; init; }

    [CommandOption("--daylight-saving <RULE>"), StudyKey("schedule", "daylight_saving")]
    public string? DaylightSaving { get; init; }

    [CommandOption("--csv"), Description("Write the main table as CSV to standard output (the same column names and units as the study tables).")]
    public bool Csv { get; init; }
}
