using System.Globalization;
using System.Text;

namespace BinEnergy.Reporting.Output;

/// <summary>
/// Text made safe to print: control characters (terminal escape sequences, carriage returns,
/// NUL) from names and values read out of user files are shown as <c>\xNN</c> instead of being
/// sent to the terminal, where they could move the cursor, recolour or rewrite the screen.
/// </summary>
public static class PrintableText
{
    /// <summary><paramref name="text"/> with every control character but the line break written as <c>\xNN</c> (<c>\uNNNN</c> above 0xFF).</summary>
    public static string Of(string text)
    {
        if (!text.Any(c => char.IsControl(c) && c != '\n'))
        {
            return text;
        }

        var sb = new StringBuilder(text.Length + 8);
        foreach (char c in text)
        {
            if (char.IsControl(c) && c != '\n')
            {
                sb.Append(c <= 0xFF ? "\\x" + ((int)c).ToString("X2", CultureInfo.InvariantCulture) : "\\u" + ((int)c).ToString("X4", CultureInfo.InvariantCulture));
            }
            else
            {
                sb.Append(c);
            }
        }

        return sb.ToString();
    }
}
