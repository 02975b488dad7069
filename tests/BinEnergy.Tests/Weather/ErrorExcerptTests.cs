using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// An error on a file that is not weather at all quotes at most a short, printable excerpt of it:
/// never a whole line (a password list's first line names an account, its home and its shell),
/// and never a raw control character that a terminal would act on.
/// </summary>
public sealed class ErrorExcerptTests
{
    // The layout of a Unix password list, an invented account (recalled from memory: name, password
    // placeholder, user id, group id, comment, home, shell, colon-separated).
    private const string PasswordLine = "fenwarden:x:1042:1042:Fen Warden,,,:/home/fenwarden:/bin/bash";

    private static byte[] PasswordList() =>
        Encoding.UTF8.GetBytes(PasswordLine + "\n" + "marshkeeper:x:1043:1043::/home/marshkeeper:/usr/sbin/nologin\n");

    [Fact]
    public void PasswordList_ReadAsOpenLayout_QuotesAShortExcerptNotTheLine()
    {
        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(PasswordList(), "accounts.csv"));

        Assert.Equal(WeatherErrorKind.MissingTimeColumn, e.Kind);
        Assert.Contains("'fenwarden:x:1042:1042:Fe...'", e.Message);
        Assert.DoesNotContain("/bin/bash", e.Message);
        Assert.DoesNotContain("/home/fenwarden", e.Message);
    }

    [Fact]
    public void PasswordList_ReadWithTheTmy3Map_QuotesAShortExcerptNotTheLine()
    {
        var options = new WeatherReadOptions { Map = ColumnMap.Load("tmy3") };

        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(PasswordList(), "accounts.csv", options));

        Assert.Contains("accounts.csv, line 1", e.Message);
        Assert.DoesNotContain("/bin/bash", e.Message);
        Assert.DoesNotContain("/home/fenwarden", e.Message);
    }

    [Fact]
    public void HeaderWithATerminalEscape_IsQuotedWithTheEscapeWrittenOut()
    {
        // ESC [ 2 J clears a terminal (ECMA-48, control sequence ED).
        byte[] file = Encoding.UTF8.GetBytes("\u001b[2Jdate,drybulb_c,dewpoint_c\n2026-01-01T00:00,1,0\n");

        var e = Assert.Throws<WeatherDataException>(() => WeatherReader.Read(file, "escape.csv"));

        Assert.Contains("'\\x1B[2Jdate'", e.Message);
        Assert.DoesNotContain(e.Message, c => char.IsControl(c));
    }

    [Theory]
    [InlineData("drybulb_c", "drybulb_c")]
    [InlineData("abcdefghijklmnopqrstuvwxyz", "abcdefghijklmnopqrstuvwx...")]
    [InlineData("a\tb\rc", "a\\x09b\\x0Dc")]
    public void Excerpt_CutsLongTextAndEscapesControlCharacters(string text, string expected) =>
        Assert.Equal(expected, FileExcerpt.Of(text));
}
