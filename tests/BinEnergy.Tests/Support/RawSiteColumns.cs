using System.Globalization;
using System.IO.Compression;

namespace BinEnergy.Tests.Support;

/// <summary>
/// The six real check files read straight from their raw columns, without the project's
/// reader or psychrometrics, for independent checks: dry-bulb, humidity ratio from the
/// file's own dew point (TMY3) or RH (PVGIS) through the Magnus form of the saturation
/// pressure with the Alduchov and Eskridge (1996) coefficients, the file's station pressure
/// per hour, and the header elevation.
/// </summary>
internal sealed record RawSiteColumns(string File, string Map, double ElevationM, double[] DryBulbC, double[] HumidityRatio)
{
    /// <summary>The five TMY3 files and the PVGIS file, as in tests/data/weather-open/SOURCES.md.</summary>
    public static readonly (string File, string Map, string Place)[] Sites =
    [
        ("722040TYA.CSV.gz", "tmy3", "Melbourne FL"),
        ("725300TYA.CSV.gz", "tmy3", "Chicago O'Hare IL"),
        ("723650TYA.CSV.gz", "tmy3", "Albuquerque NM"),
        ("725945TYA.CSV.gz", "tmy3", "Arcata CA"),
        ("703165TY.csv.gz", "tmy3", "Sand Point AK"),
        ("tmy_45.000_8.000_2005_2023.csv.gz", "pvgis", "45 N 8 E, Piedmont IT"),
    ];

    public static string PathOf(string file) => Path.Combine(RepoPaths.Data, "weather-open", file);

    /// <summary>Saturation vapour pressure over water, Pa: 610.94 exp(17.625 t / (t + 243.04)) (Alduchov and Eskridge 1996).</summary>
    public static double MagnusPa(double t) => 610.94 * Math.Exp(17.625 * t / (t + 243.04));

    /// <summary>Humidity ratio from vapour pressure: 0.621945 p_w / (p - p_w) (the ideal-gas mixing ratio).</summary>
    public static double Mixing(double pw, double p) => 0.621945 * pw / (p - pw);

    public static RawSiteColumns Read(string file, string map)
    {
        var lines = ReadLines(PathOf(file));
        return map == "tmy3" ? Tmy3(file, lines) : Pvgis(file, lines);
    }

    private static List<string> ReadLines(string path)
    {
        using var gz = new GZipStream(System.IO.File.OpenRead(path), CompressionMode.Decompress);
        using var reader = new StreamReader(gz);
        var lines = new List<string>();
        while (reader.ReadLine() is string line)
        {
            lines.Add(line);
        }

        return lines;
    }

    private static double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);

    private static RawSiteColumns Tmy3(string file, List<string> lines)
    {
        double elevation = D(lines[0].Split(',')[^1]);
        var header = lines[1].Split(',');
        int db = Array.IndexOf(header, "Dry-bulb (C)"), dp = Array.IndexOf(header, "Dew-point (C)"), pr = Array.IndexOf(header, "Pressure (mbar)");
        var rows = lines.Skip(2).Where(l => l.Length > 0).Select(l => l.Split(',')).ToList();
        var t = rows.Select(r => D(r[db])).ToArray();

        // Dew point above dry-bulb (Arcata, September 1981) is taken as saturation, as the quality policy does.
        var w = rows.Select((r, i) => Mixing(MagnusPa(Math.Min(D(r[dp]), t[i])), 100 * D(r[pr]))).ToArray();
        return new RawSiteColumns(file, "tmy3", elevation, t, w);
    }

    private static RawSiteColumns Pvgis(string file, List<string> lines)
    {
        double elevation = D(lines.First(l => l.StartsWith("Elevation", StringComparison.Ordinal)).Split(':')[1]);
        int start = lines.FindIndex(l => l.StartsWith("time(UTC)", StringComparison.Ordinal));
        var header = lines[start].Split(',');
        int db = Array.IndexOf(header, "T2m"), rh = Array.IndexOf(header, "RH"), sp = Array.IndexOf(header, "SP");
        var rows = lines.Skip(start + 1).TakeWhile(l => l.Length > 0).Select(l => l.Split(',')).ToList();
        var t = rows.Select(r => D(r[db])).ToArray();
        var w = rows.Select((r, i) => Mixing(Math.Min(D(r[rh]), 100) / 100 * MagnusPa(t[i]), D(r[sp]))).ToArray();
        return new RawSiteColumns(file, "pvgis", elevation, t, w);
    }
}
