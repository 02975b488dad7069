using System.Globalization;
using System.Text;

namespace BinEnergy.Core.Weather;

/// <summary>
/// A short, printable excerpt of text read from a user's file, for quoting in an error message:
/// at most <see cref="MaxLength"/> characters (longer text is cut and marked with "..."), and every
/// control character (terminal escapes, carriage returns, tabs, NUL) written as <c>\xNN</c>. An
/// error on a file that is not weather at all (a password list, a binary) then shows enough to
/// recognise it, never a whole line of it.
/// </summary>
public static class FileExcerpt
{
    /// <summary>The most characters of the file's text quoted in one excerpt.</summary>
    public const int MaxLength = 24;

    /// <summary>The most header names listed in one message.</summary>
    public const int MaxNames = 8;

    /// <summary><paramref name="text"/> cut to <see cref="MaxLength"/> characters, control characters escaped.</summary>
    public static string Of(string text)
    {
        bool cut = text.Length > MaxLength;
        string kept = cut ? text[..MaxLength] : text;
        var sb = new StringBuilder(kept.Length + 8);
        foreach (char c in kept)
        {
            if (char.IsControl(c))
            {
                sb.Append(c <= 0xFF ? "\\x" + ((int)c).ToString("X2", CultureInfo.InvariantCulture) : "\\u" + ((int)c).ToString("X4", CultureInfo.InvariantCulture));
            }
            else
            {
                sb.Append(c);
            }
        }

        return cut ? sb.Append("...").ToString() : sb.ToString();
    }

    /// <summary>The most characters of the file's text quoted in one list of names, all excerpts together.</summary>
    public const int MaxListLength = 40;

    /// <summary>
    /// The first names, each quoted as an excerpt, joined by commas ("none" when empty): at most
    /// <see cref="MaxNames"/> names and <see cref="MaxListLength"/> characters of them, then "...".
    /// </summary>
    public static string List(IReadOnlyCollection<string> names)
    {
        if (names.Count == 0)
        {
            return "none";
        }

        var quoted = new List<string>();
        int length = 0;
        foreach (string name in names.Take(MaxNames))
        {
            string excerpt = Of(name);
            if (quoted.Count > 0 && length + excerpt.Length > MaxListLength)
            {
                break;
            }

            quoted.Add("'" + excerpt + "'");
            length += excerpt.Length;
        }

        return string.Join(", ", quoted) + (quoted.Count < names.Count ? ", ..." : "");
    }
}
