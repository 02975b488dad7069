using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Batch;

/// <summary>
/// The kinds of batch problems: those that stop an input (a missing or unreadable file, bad data, a bad
/// station-list row, a duplicate name, a study value a climate cannot take) and the cautions a case gives,
/// named by what they are about, so thousands of files' warnings group into a few lines.
/// </summary>
public static class BatchProblemKinds
{
    public const string MissingFile = "missing-file";
    public const string UnreadableFile = "unreadable-file";
    public const string BadWeatherData = "bad-weather-data";
    public const string BadStationRow = "bad-station-row";
    public const string DuplicateName = "duplicate-name";
    public const string StudyValue = "study-value";

    /// <summary>The kind of an error that stopped an input.</summary>
    public static string Of(Exception e) => e switch
    {
        WeatherDataException { Kind: WeatherErrorKind.FileNotFound } => MissingFile,
        WeatherDataException { Kind: WeatherErrorKind.FileTooLarge or WeatherErrorKind.EmptyFile or WeatherErrorKind.BadCompression } => UnreadableFile,
        WeatherDataException => BadWeatherData,
        StudyFileException => StudyValue,
        IOException or UnauthorizedAccessException => UnreadableFile,
        _ => BadWeatherData,
    };

    /// <summary>The kind of a case's caution, from what it is about (the first matching phrase), or <c>other</c>.</summary>
    public static string OfCaution(string message)
    {
        foreach (var (phrase, kind) in Cautions)
        {
            if (message.Contains(phrase, StringComparison.OrdinalIgnoreCase))
            {
                return kind;
            }
        }

        return "other";
    }

    private static readonly (string Phrase, string Kind)[] Cautions =
    [
        ("not a whole year", "partial-year"),
        ("no complete calendar year", "partial-year"),
        ("COP was held", "cop-curve-end"),
        ("repaired values", "weather-repairs"),
        ("sea-level standard", "sea-level-pressure"),
        ("people-and-area minimum", "low-airflow"),
        ("airflow is zero", "low-airflow"),
        ("No hour is ventilated", "no-ventilated-hours"),
        ("headline", "headline-method"),
    ];
}
