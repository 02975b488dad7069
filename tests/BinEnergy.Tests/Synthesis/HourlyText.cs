using System.Globalization;

namespace BinEnergy.Tests.Synthesis;

/// <summary>
/// An independent, deliberately plain reading of the open CSV layout for the synthesizer's
/// checks: split each data line on commas, no project code involved, so a fault in the
/// synthesizer's own measuring cannot hide itself.
/// </summary>
internal sealed class HourlyText
{
    public required string[] Times { get; init; }

    public required double[] DryBulbC { get; init; }

    public required double[] DewPointC { get; init; }

    public required double[] RelativeHumidityPct { get; init; }

    public required double[] PressureKPa { get; init; }

    public required Dictionary<string, string> Metadata { get; init; }

    public static HourlyText Parse(string text)
    {
        var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var meta = new Dictionary<string, string>();
        int i = 0;
        for (; lines[i].StartsWith('#'); i++)
        {
            int colon = lines[i].IndexOf(':');
            meta[lines[i][1..colon].Trim()] = lines[i][(colon + 1)..].Trim();
        }

        Assert.Equal("time,drybulb_c,dewpoint_c,rh_pct,pressure_kpa", lines[i]);
        var rows = lines.Skip(i + 1).Select(l => l.Split(',')).ToArray();
        double Num(string s) => double.Parse(s, CultureInfo.InvariantCulture);
        return new HourlyText
        {
            Times = rows.Select(r => r[0]).ToArray(),
            DryBulbC = rows.Select(r => Num(r[1])).ToArray(),
            DewPointC = rows.Select(r => Num(r[2])).ToArray(),
            RelativeHumidityPct = rows.Select(r => Num(r[3])).ToArray(),
            PressureKPa = rows.Select(r => Num(r[4])).ToArray(),
            Metadata = meta,
        };
    }

    /// <summary>Month (1..12) of hour i, from the time text "yyyy-MM-ddTHH:mm".</summary>
    public int MonthOf(int i) => int.Parse(Times[i].AsSpan(5, 2), CultureInfo.InvariantCulture);

    /// <summary>Per calendar day (keyed by "yyyy-MM-dd"): month, largest and smallest hourly dry-bulb.</summary>
    public IEnumerable<(int Month, double Max, double Min)> Days() =>
        Enumerable.Range(0, Times.Length)
            .GroupBy(i => Times[i][..10])
            .Select(g => (MonthOf(g.First()), g.Max(i => DryBulbC[i]), g.Min(i => DryBulbC[i])));

    /// <summary>Monthly mean daily maximum, minimum and range, and mean hourly dew point, months 1..12.</summary>
    public (double Max, double Min, double Range, double DewPoint)[] MonthlyStatistics()
    {
        var days = Days().ToArray();
        return Enumerable.Range(1, 12).Select(m =>
        {
            var d = days.Where(x => x.Month == m).ToArray();
            var dew = Enumerable.Range(0, Times.Length).Where(i => MonthOf(i) == m).Select(i => DewPointC[i]);
            return (d.Average(x => x.Max), d.Average(x => x.Min), d.Average(x => x.Max - x.Min), dew.Average());
        }).ToArray();
    }
}
