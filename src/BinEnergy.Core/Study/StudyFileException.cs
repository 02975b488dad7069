using BinEnergy.Core.Errors;

namespace BinEnergy.Core.Study;

/// <summary>
/// A study file cannot be used as written. The message names the file, the line and the key,
/// says what is wrong and how to fix it (for an unknown key, the nearest valid one).
/// </summary>
public sealed class StudyFileException : InputDataException
{
    /// <summary>Creates the error; the message is prefixed with "FILE, line N, key K: ".</summary>
    /// <param name="file">The study file (as the user named it).</param>
    /// <param name="line">1-based line, or null when the problem is not on one line.</param>
    /// <param name="key">The full dotted key (e.g. <c>ventilation.airflow_cfm</c>), or null.</param>
    /// <param name="problem">What is wrong and how to fix it.</param>
    public StudyFileException(string file, int? line, string? key, string problem)
        : base(Format(file, line, key, problem))
    {
        File = file;
        Line = line;
        Key = key;
        Problem = problem;
    }

    /// <summary>The study file.</summary>
    public string File { get; }

    /// <summary>1-based line, if known.</summary>
    public int? Line { get; }

    /// <summary>The full dotted key, if the problem is with one key.</summary>
    public string? Key { get; }

    /// <summary>The message without the location.</summary>
    public string Problem { get; }

    private static string Format(string file, int? line, string? key, string problem)
    {
        string where = file;
        if (line is int l)
        {
            where += $", line {l}";
        }

        if (key is not null)
        {
            where += $", key {key}";
        }

        return $"{where}: {problem}";
    }
}
