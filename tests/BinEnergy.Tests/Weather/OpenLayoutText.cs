using System.Globalization;
using System.Text;

namespace BinEnergy.Tests.Weather;

/// <summary>Builds invented open-layout files for tests (an invented site, smooth invented weather).</summary>
internal static class OpenLayoutText
{
    public const string Header = "time,drybulb_c,dewpoint_c,pressure_kpa";

    /// <summary>Metadata of the invented site "Test Fen" at 100 m.</summary>
    public const string Metadata = "# name: Test Fen\n# elevation_m: 100\n# latitude: 52.1\n# longitude: 0.3\n# utc_offset_h: 0\n";

    /// <summary>Dry-bulb of invented hour i, C: a daily swing of 4 K around 10 C.</summary>
    public static double DryBulb(int i) => Math.Round(10 + 4 * Math.Sin(2 * Math.PI * (i % 24) / 24), 2);

    /// <summary>Dew point of invented hour i, C: 3 K below the dry-bulb.</summary>
    public static double DewPoint(int i) => Math.Round(DryBulb(i) - 3, 2);

    /// <summary>The row of hour i starting at 2026-01-01T00:00.</summary>
    public static string Row(int i) =>
        string.Create(CultureInfo.InvariantCulture, $"{new DateTime(2026, 1, 1).AddHours(i):yyyy-MM-ddTHH:mm},{DryBulb(i)},{DewPoint(i)},100.1");

    /// <summary>A whole file of <paramref name="hours"/> hours, each row passed through <paramref name="edit"/> (null drops the row).</summary>
    public static string File(int hours = 48, Func<int, string, string?>? edit = null, string header = Header, string metadata = Metadata)
    {
        var sb = new StringBuilder(metadata).Append(header).Append('\n');
        for (int i = 0; i < hours; i++)
        {
            string? row = edit is null ? Row(i) : edit(i, Row(i));
            if (row is not null)
            {
                sb.Append(row).Append('\n');
            }
        }

        return sb.ToString();
    }
}
