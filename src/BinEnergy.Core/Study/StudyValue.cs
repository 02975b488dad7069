namespace BinEnergy.Core.Study;

/// <summary>
/// One validated value of a study key, in SI: a double, a string, a bool, a list of strings or
/// numbers, or (outdoor C, value) pairs; with the key as written and its line, so later
/// checks (between keys) can still point at the file.
/// </summary>
internal sealed record StudyValue(object Value, string WrittenKey, int Line, string Origin)
{
    /// <summary>The value as the user wrote it (TOML text, in the user's unit), for the report's inputs.</summary>
    public string Written { get; init; } = string.Empty;
}
