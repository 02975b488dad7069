using BinEnergy.Core.Errors;

namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// A monthly-statistics file (the input of <c>binenergy synth</c>) is unreadable or holds
/// impossible values. The message names the file, the line and the key or column, what is
/// wrong and how to fix it.
/// </summary>
public sealed class MonthlyClimateException : InputDataException
{
    /// <summary>Creates the error.</summary>
    /// <param name="file">The file's path as the user gave it.</param>
    /// <param name="line">1-based line number, or null when the problem is the file as a whole.</param>
    /// <param name="key">The metadata key or column concerned, if any.</param>
    /// <param name="problem">What is wrong and how to fix it.</param>
    public MonthlyClimateException(string file, int? line, string? key, string problem)
        : base(Compose(file, line, key, problem))
    {
        File = file;
        Line = line;
        Key = key;
    }

    /// <summary>The file's path as given.</summary>
    public string File { get; }

    /// <summary>1-based line number, if known.</summary>
    public int? Line { get; }

    /// <summary>The key or column concerned, if any.</summary>
    public string? Key { get; }

    private static string Compose(string file, int? line, string? key, string problem)
    {
        string where = line is int l ? $"{file}, line {l}" : file;
        if (key is not null)
        {
            where += $", '{key}'";
        }

        return $"{where}: {problem}";
    }
}
