using System.Globalization;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Writes an hourly record in the project's open CSV layout (DESIGN 5.1): <c># key: value</c>
/// metadata lines, then <c>time,drybulb_c,dewpoint_c,rh_pct,pressure_kpa</c>, one row per
/// hour, hour-beginning local standard time. Dew point is the humidity measure that reads
/// back first; RH is written beside it for people and other tools.
/// </summary>
public static class OpenLayoutWriter
{
    /// <summary>The header line of the open layout as this writer emits it.</summary>
    public const string Header = "time,drybulb_c,dewpoint_c,rh_pct,pressure_kpa";

    /// <summary>
    /// The comment lines of a record converted from another file: its source and how it was read, the calendar, whether
    /// it is a typical year, the repairs counted and the reader's notes, so the converted file says where it came from.
    /// </summary>
    public static IEnumerable<string> ConversionNotes(HourlyWeather weather, string sourceFile, string readWith)
    {
        yield return "source: " + sourceFile + " read with the " + readWith;
        yield return "calendar: " + weather.Calendar.Note;
        if (weather.Calendar.IsTypicalYear)
        {
            yield return "typical_year: true";
        }

        yield return "repairs: " + (weather.Quality.Counts.Count == 0 ? "none" : string.Join(", ", weather.Quality.Counts.Select(kv => kv.Key + " " + kv.Value)));
        foreach (string w in weather.Quality.Warnings)
        {
            yield return "note: " + w;
        }
    }

    /// <summary>Writes the record. Numbers use the invariant culture (dot decimal separator).</summary>
    public static void Write(HourlyWeather weather, TextWriter writer, IEnumerable<string>? commentLines = null)
    {
        var c = CultureInfo.InvariantCulture;
        var site = weather.Site;
        writer.Write("# name: ");
        writer.WriteLine(site.Name.Replace('\n', ' ').Replace('\r', ' '));
        if (site.StationId is { } id)
        {
            writer.Write("# station_id: ");
            writer.WriteLine(id.Replace('\n', ' ').Replace('\r', ' '));
        }

        if (site.ElevationM is double z)
        {
            writer.WriteLine(string.Create(c, $"# elevation_m: {z:0.#}"));
        }

        if (site.Latitude is double lat)
        {
            writer.WriteLine(string.Create(c, $"# latitude: {lat:0.####}"));
        }

        if (site.Longitude is double lon)
        {
            writer.WriteLine(string.Create(c, $"# longitude: {lon:0.####}"));
        }

        if (site.UtcOffsetHours is double off)
        {
            writer.WriteLine(string.Create(c, $"# utc_offset_h: {off:0.##}"));
        }

        if (weather.HumidityOver == HumidityOver.Ice)
        {
            writer.WriteLine("# humidity_over: ice");
        }

        foreach (var line in commentLines ?? [])
        {
            writer.Write("# ");
            writer.WriteLine(line.Replace('\n', ' ').Replace('\r', ' '));
        }

        writer.WriteLine(Header);
        for (int i = 0; i < weather.Count; i++)
        {
            // RH in the record's own convention, as the dew point is (over liquid water unless the record says ice).
            double rh = MoistAir.VapourPressureFromHumidityRatio(weather.HumidityRatio[i], weather.PressurePa[i])
                / Saturation.VapourPressurePa(weather.DryBulbC[i], weather.HumidityOver) * 100.0;
            writer.WriteLine(string.Create(c,
                $"{weather.Times[i]:yyyy-MM-ddTHH:mm},{weather.DryBulbC[i]:0.###},{weather.DewPointC[i]:0.###},{Math.Min(rh, 100.0):0.##},{weather.PressurePa[i] / 1000.0:0.####}"));
        }
    }
}
