using System.Text;
using BinEnergy.Core.Errors;

namespace BinEnergy.Core.Weather;

/// <summary>
/// A weather file (or the column map that describes it) cannot be read as it stands. The
/// message is one paragraph naming the file, the line and column where known, the value,
/// what is wrong and how to fix it; the properties carry the same facts for programs.
/// </summary>
public sealed class WeatherDataException : InputDataException
{
    public WeatherDataException(
        WeatherErrorKind kind,
        string file,
        string problem,
        string fix,
        int? line = null,
        string? column = null,
        string? value = null,
        Exception? inner = null)
        : base(Compose(file, line, column, value, problem, fix), inner)
    {
        Kind = kind;
        File = file;
        Line = line;
        Column = column;
        Value = value;
        Problem = problem;
        Fix = fix;
    }

    /// <summary>What kind of problem this is.</summary>
    public WeatherErrorKind Kind { get; }

    /// <summary>The file as the user named it.</summary>
    public string File { get; }

    /// <summary>1-based line of the file, when the problem sits on one line.</summary>
    public int? Line { get; }

    /// <summary>The column (or map key) concerned, when there is one.</summary>
    public string? Column { get; }

    /// <summary>The offending value as written in the file, when there is one.</summary>
    public string? Value { get; }

    /// <summary>What is wrong, without the location.</summary>
    public string Problem { get; }

    /// <summary>How to fix it.</summary>
    public string Fix { get; }

    private static string Compose(string file, int? line, string? column, string? value, string problem, string fix)
    {
        var sb = new StringBuilder();
        sb.Append(file);
        if (line is int l)
        {
            sb.Append(", line ").Append(l.ToString(System.Globalization.CultureInfo.InvariantCulture));
        }

        if (column is not null)
        {
            sb.Append(", column '").Append(FileExcerpt.Of(column)).Append('\'');
        }

        sb.Append(": ").Append(problem);
        if (value is not null)
        {
            sb.Append(" (value '").Append(FileExcerpt.Of(value)).Append("')");
        }

        sb.Append(". ").Append(fix);
        if (!fix.EndsWith('.'))
        {
            sb.Append('.');
        }

        return sb.ToString();
    }
}
