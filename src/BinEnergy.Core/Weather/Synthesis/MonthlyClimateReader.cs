using System.Globalization;
using System.Text.RegularExpressions;
using BinEnergy.Core.Units;
using CsvHelper;

namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// Reads a monthly-statistics file, the project's own small CSV layout for the input of
/// <c>binenergy synth</c> (described in docs/synthesis.md):
/// <code>
/// # name: Port Calloway
/// # elevation_m: 8
/// month,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k
/// 1,16.2,5.8,4.5,4.1
/// ...
/// </code>
/// Metadata lines <c># key: value</c> come first (keys <c>name</c>, <c>elevation_m</c> or
/// <c>elevation_ft</c>, optional <c>latitude</c>, <c>longitude</c>, <c>utc_offset_h</c>, free-text
/// <c>note</c> and <c>source</c>); then a header and twelve rows, one per month. Every column
/// carries its unit: <c>_c</c> or <c>_f</c> for temperatures, <c>_k</c> or <c>_f</c> (Fahrenheit
/// degrees, a difference) for the spread. Numbers use a dot as the decimal separator.
/// Every problem is a <see cref="MonthlyClimateException"/> naming the file, line and key.
/// </summary>
public static partial class MonthlyClimateReader
{
    /// <summary>Lowest and highest mean daily extreme accepted, C.</summary>
    public const double MinDryBulbC = -60, MaxDryBulbC = 55;

    /// <summary>Largest mean daily range accepted, K.</summary>
    public const double MaxDailyRangeK = 30;

    /// <summary>Largest day-to-day spread accepted, K.</summary>
    public const double MaxSpreadK = 15;

    /// <summary>Elevations accepted, m (the Dead Sea shore to the highest towns).</summary>
    public const double MinElevationM = -450, MaxElevationM = 5_500;

    private static readonly string[] MetadataKeys =
        ["name", "elevation_m", "elevation_ft", "latitude", "longitude", "utc_offset_h", "note", "source"];

    private static readonly string[] MonthNames =
        ["jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"];

    /// <summary>Reads a file from disk.</summary>
    /// <exception cref="MonthlyClimateException">The file is missing, unreadable or holds impossible values.</exception>
    public static MonthlyClimate Read(string path)
    {
        var (text, problem) = Errors.InputFiles.ReadText(path, 16L << 20, "a smaller file (a monthly-statistics file is 12 rows)");
        if (problem is not null)
        {
            throw new MonthlyClimateException(path, null, null, $"cannot be read ({problem.Text}); check the path given to --monthly");
        }

        return Parse(text!, path);
    }

    /// <summary>Parses the text of a file; <paramref name="fileName"/> is used in error messages.</summary>
    /// <exception cref="MonthlyClimateException">The text is not a valid monthly-statistics file.</exception>
    public static MonthlyClimate Parse(string text, string fileName)
    {
        text = text.TrimStart('\uFEFF');
        var metadata = ReadMetadata(text, fileName, out int headerLine);
        if (headerLine == 0)
        {
            throw new MonthlyClimateException(fileName, null, null,
                "has no header line; after the '# key: value' lines give 'month,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k' (or the _f columns) and twelve rows");
        }

        string name = metadata.TryGetValue("name", out var n) && n.Value.Length > 0
            ? n.Value
            : throw new MonthlyClimateException(fileName, null, "name", "the site name is missing; add a line '# name: My Town' at the top");
        double elevation = ReadElevation(metadata, fileName);
        double? latitude = OptionalNumber(metadata, "latitude", -90, 90, "degrees north", fileName);
        double? longitude = OptionalNumber(metadata, "longitude", -180, 180, "degrees east", fileName);
        double? utcOffset = OptionalNumber(metadata, "utc_offset_h", -14, 14, "hours", fileName);
        var months = ReadMonths(text, fileName);
        return new MonthlyClimate(name, elevation, latitude, longitude, utcOffset, months);
    }

    private readonly record struct MetadataValue(string Value, int Line);

    private static Dictionary<string, MetadataValue> ReadMetadata(string text, string fileName, out int headerLine)
    {
        var values = new Dictionary<string, MetadataValue>(StringComparer.Ordinal);
        headerLine = 0;
        using var reader = new StringReader(text);
        int lineNumber = 0;
        while (reader.ReadLine() is string line)
        {
            lineNumber++;
            string trimmed = line.Trim();
            if (trimmed.Length == 0)
            {
                continue;
            }

            if (!trimmed.StartsWith('#'))
            {
                headerLine = lineNumber;
                break;
            }

            var m = MetadataLine().Match(trimmed);
            if (!m.Success)
            {
                continue; // a free comment such as "# Invented climate for the demo"
            }

            string key = m.Groups[1].Value.ToLowerInvariant();
            if (Array.IndexOf(MetadataKeys, key) < 0)
            {
                throw new MonthlyClimateException(fileName, lineNumber, key,
                    $"unknown metadata key; the keys are {string.Join(", ", MetadataKeys)}");
            }

            if (values.TryGetValue(key, out var earlier))
            {
                throw new MonthlyClimateException(fileName, lineNumber, key, $"given twice (first on line {earlier.Line}); keep one");
            }

            values[key] = new MetadataValue(m.Groups[2].Value.Trim(), lineNumber);
        }

        return values;
    }

    private static double ReadElevation(Dictionary<string, MetadataValue> metadata, string fileName)
    {
        bool metres = metadata.ContainsKey("elevation_m");
        bool feet = metadata.ContainsKey("elevation_ft");
        if (metres && feet)
        {
            throw new MonthlyClimateException(fileName, metadata["elevation_ft"].Line, "elevation_ft", "give elevation_m or elevation_ft, not both");
        }

        if (!metres && !feet)
        {
            throw new MonthlyClimateException(fileName, null, "elevation_m",
                "the site elevation is missing (it sets the air pressure); add '# elevation_m: 120' or '# elevation_ft: 400'");
        }

        string key = metres ? "elevation_m" : "elevation_ft";
        var value = metadata[key];
        double z = ParseNumber(value.Value, fileName, value.Line, key);
        double zm = metres ? z : Length.FromFeet(z).Metres;
        if (!(zm >= MinElevationM && zm <= MaxElevationM))
        {
            throw new MonthlyClimateException(fileName, value.Line, key,
                FormattableString.Invariant($"elevation {z:0.#} {(metres ? "m" : "ft")} is outside {MinElevationM:0} to {MaxElevationM:0} m; check the value and its unit"));
        }

        return zm;
    }

    private static double? OptionalNumber(Dictionary<string, MetadataValue> metadata, string key, double min, double max, string unit, string fileName)
    {
        if (!metadata.TryGetValue(key, out var value))
        {
            return null;
        }

        double x = ParseNumber(value.Value, fileName, value.Line, key);
        if (!(x >= min && x <= max))
        {
            throw new MonthlyClimateException(fileName, value.Line, key,
                FormattableString.Invariant($"{x} is outside {min} to {max} {unit}"));
        }

        return x;
    }

    /// <summary>One data column: its key, the quantity it gives and whether it is in Fahrenheit.</summary>
    private enum Quantity { Max, Min, DewPoint, Spread }

    private static readonly (string Key, Quantity Quantity, bool Fahrenheit)[] Columns =
    [
        ("drybulb_max_c", Quantity.Max, false), ("drybulb_max_f", Quantity.Max, true),
        ("drybulb_min_c", Quantity.Min, false), ("drybulb_min_f", Quantity.Min, true),
        ("dewpoint_c", Quantity.DewPoint, false), ("dewpoint_f", Quantity.DewPoint, true),
        ("daily_mean_sd_k", Quantity.Spread, false), ("daily_mean_sd_f", Quantity.Spread, true),
    ];

    private static MonthStatistics[] ReadMonths(string text, string fileName)
    {
        var options = CsvReaderOptions.Default with
        {
            Separator = ',',
            CommentPrefix = '#',
            TrimWhitespace = true,
            SkipEmptyLines = true,
            TrackLineNumbers = true,
            HasHeader = true,
            FieldCountMismatch = CsvFieldCountHandling.Allow,
            FormatProvider = CultureInfo.InvariantCulture,
        };
        using var csv = CsvReader.FromText(text, options);
        csv.ReadHeader();
        var headers = csv.Headers.Select(h => h.Trim().ToLowerInvariant()).ToArray();
        int headerLine = HeaderLineOf(text);
        int monthIndex = Array.IndexOf(headers, "month");
        if (monthIndex < 0)
        {
            string hint = headers.Length == 1 && headers[0].Contains(';')
                ? " (the columns must be separated by commas, not semicolons)"
                : string.Empty;
            throw new MonthlyClimateException(fileName, headerLine, "month",
                $"the header has no 'month' column{hint}; expected month,drybulb_max_c,drybulb_min_c,dewpoint_c,daily_mean_sd_k");
        }

        var index = new Dictionary<Quantity, (int Column, bool Fahrenheit, string Key)>();
        for (int i = 0; i < headers.Length; i++)
        {
            if (i == monthIndex)
            {
                continue;
            }

            int c = Array.FindIndex(Columns, col => col.Key == headers[i]);
            if (c < 0)
            {
                throw new MonthlyClimateException(fileName, headerLine, headers[i],
                    $"unknown column; the columns are month and one of each pair: {string.Join(", ", Columns.Select(col => col.Key))}");
            }

            var col = Columns[c];
            if (index.TryGetValue(col.Quantity, out var other))
            {
                throw new MonthlyClimateException(fileName, headerLine, headers[i], $"says the same as column '{other.Key}'; keep one");
            }

            index[col.Quantity] = (i, col.Fahrenheit, col.Key);
        }

        foreach (var q in Enum.GetValues<Quantity>())
        {
            if (!index.ContainsKey(q))
            {
                var pair = Columns.Where(col => col.Quantity == q).Select(col => col.Key);
                throw new MonthlyClimateException(fileName, headerLine, pair.First(),
                    $"the header has no column for this quantity; add {string.Join(" or ", pair)}");
            }
        }

        var months = new MonthStatistics?[12];
        var monthLines = new int[12];
        while (csv.Read())
        {
            int line = (int)csv.LineNumber;
            if (csv.FieldCount != headers.Length)
            {
                throw new MonthlyClimateException(fileName, line, null,
                    $"has {csv.FieldCount} fields but the header has {headers.Length}; use a dot as the decimal separator and one value per column");
            }

            int month = ParseMonth(csv.GetString(monthIndex), fileName, line);
            if (months[month - 1] is not null)
            {
                throw new MonthlyClimateException(fileName, line, "month", $"month {month} is given twice (also on line {monthLines[month - 1]})");
            }

            double Field(Quantity q)
            {
                var (column, _, key) = index[q];
                return ParseNumber(csv.GetString(column), fileName, line, key);
            }

            double max = ToCelsius(Field(Quantity.Max), index[Quantity.Max].Fahrenheit);
            double min = ToCelsius(Field(Quantity.Min), index[Quantity.Min].Fahrenheit);
            double dew = ToCelsius(Field(Quantity.DewPoint), index[Quantity.DewPoint].Fahrenheit);
            double sd = index[Quantity.Spread].Fahrenheit
                ? TemperatureDifference.FromFahrenheitDegrees(Field(Quantity.Spread)).Kelvin
                : Field(Quantity.Spread);
            var stats = new MonthStatistics(month, max, min, dew, sd);
            Validate(stats, index, fileName, line);
            months[month - 1] = stats;
            monthLines[month - 1] = line;
        }

        var missing = Enumerable.Range(1, 12).Where(m => months[m - 1] is null).ToArray();
        if (missing.Length > 0)
        {
            throw new MonthlyClimateException(fileName, null, "month",
                $"month{(missing.Length > 1 ? "s" : "")} {string.Join(", ", missing)} {(missing.Length > 1 ? "are" : "is")} missing; give one row for each of the twelve months");
        }

        return months.Select(m => m!).ToArray();
    }

    private static void Validate(MonthStatistics s, Dictionary<Quantity, (int Column, bool Fahrenheit, string Key)> index, string fileName, int line)
    {
        string Shown(Quantity q, double c) => index[q].Fahrenheit
            ? FormattableString.Invariant($"{Conversions.CelsiusToFahrenheit(c):0.#} F")
            : FormattableString.Invariant($"{c:0.#} C");

        foreach (var (q, value) in new[] { (Quantity.Max, s.DryBulbMaxC), (Quantity.Min, s.DryBulbMinC) })
        {
            if (!(value >= MinDryBulbC && value <= MaxDryBulbC))
            {
                throw new MonthlyClimateException(fileName, line, index[q].Key,
                    $"{Shown(q, value)} is outside {Shown(q, MinDryBulbC)} to {Shown(q, MaxDryBulbC)}; check the value and the column's unit");
            }
        }

        if (!(s.DryBulbMaxC > s.DryBulbMinC))
        {
            throw new MonthlyClimateException(fileName, line, index[Quantity.Max].Key,
                $"the mean daily maximum {Shown(Quantity.Max, s.DryBulbMaxC)} must be above the mean daily minimum {Shown(Quantity.Min, s.DryBulbMinC)}");
        }

        if (s.DailyRangeK > MaxDailyRangeK)
        {
            throw new MonthlyClimateException(fileName, line, index[Quantity.Max].Key,
                FormattableString.Invariant($"a mean daily range of {s.DailyRangeK:0.#} K is more than {MaxDailyRangeK:0} K; check the maximum and minimum"));
        }

        if (!(s.DewPointC >= MinDryBulbC && s.DewPointC < s.DailyMidpointC))
        {
            throw new MonthlyClimateException(fileName, line, index[Quantity.DewPoint].Key,
                $"the mean dew point {Shown(Quantity.DewPoint, s.DewPointC)} must be below the month's mean dry-bulb (the midpoint of max and min, {Shown(Quantity.DewPoint, s.DailyMidpointC)}): air cannot hold more water than at saturation");
        }

        if (!(s.DailyMeanSpreadK >= 0 && s.DailyMeanSpreadK <= MaxSpreadK))
        {
            throw new MonthlyClimateException(fileName, line, index[Quantity.Spread].Key,
                FormattableString.Invariant($"a day-to-day spread of {s.DailyMeanSpreadK:0.##} K is outside 0 to {MaxSpreadK:0} K (typical values are 2 to 6 K)"));
        }
    }

    private static int HeaderLineOf(string text)
    {
        using var reader = new StringReader(text);
        int n = 0;
        while (reader.ReadLine() is string line)
        {
            n++;
            string t = line.Trim();
            if (t.Length > 0 && !t.StartsWith('#'))
            {
                return n;
            }
        }

        return n;
    }

    private static int ParseMonth(string? text, string fileName, int line)
    {
        string t = (text ?? string.Empty).Trim().ToLowerInvariant();
        if (int.TryParse(t, NumberStyles.None, CultureInfo.InvariantCulture, out int m) && m >= 1 && m <= 12)
        {
            return m;
        }

        int byName = t.Length >= 3 ? Array.IndexOf(MonthNames, t[..3]) : -1;
        if (byName >= 0)
        {
            return byName + 1;
        }

        throw new MonthlyClimateException(fileName, line, "month", $"'{text}' is not a month; use 1 to 12 (or jan to dec)");
    }

    private static double ParseNumber(string? text, string fileName, int line, string key)
    {
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double x) && double.IsFinite(x))
        {
            return x;
        }

        throw new MonthlyClimateException(fileName, line, key,
            string.IsNullOrEmpty(text)
                ? "the value is empty; give a number"
                : $"'{text}' is not a number; use a dot as the decimal separator");
    }

    private static double ToCelsius(double value, bool fahrenheit) =>
        fahrenheit ? Temperature.FromFahrenheit(value).Celsius : value;

    [GeneratedRegex(@"^#\s*([A-Za-z_][A-Za-z0-9_]*)\s*:(.*)$")]
    private static partial Regex MetadataLine();
}
