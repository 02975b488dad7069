using System.Globalization;
using Tomlyn;
using Tomlyn.Model;

namespace BinEnergy.Core.Weather;

/// <summary>Reads a <see cref="ColumnMap"/> from TOML (Tomlyn), checking every key and unit.</summary>
internal static class ColumnMapToml
{
    private static readonly string[] TopKeys =
        ["name", "description", "header_line", "header_starts_with", "separator", "missing", "end_at_blank_line", "typical_year", "humidity_over", "time", "columns", "metadata"];

    private static readonly string[] TimeKeys = ["column", "format", "date_column", "date_format", "time_column", "time_format", "hour", "zone"];

    private static readonly string[] ColumnKeys = ["name", "unit", "scale", "offset"];

    private static readonly string[] MetadataKeys = ["line", "field", "pattern", "value", "from_longitude"];

    internal static readonly string[] MetadataNames = ["name", "station_id", "elevation_m", "latitude", "longitude", "utc_offset_h"];

    public static ColumnMap Parse(string toml, string source, string? name)
    {
        TomlTable root;
        try
        {
            root = TomlSerializer.Deserialize<TomlTable>(toml) ?? new TomlTable();
        }
        catch (TomlException e)
        {
            throw new WeatherDataException(WeatherErrorKind.BadMap, source, "the column map is not valid TOML: " + FirstLine(e.Message),
                "Correct the TOML syntax at that place", line: e.Line > 0 ? e.Line : null);
        }

        CheckKeys(root, TopKeys, source, "");
        var timeTable = Table(root, "time", source, required: true)!;
        CheckKeys(timeTable, TimeKeys, source, "time.");
        string? column = Str(timeTable, "column", source, "time.");
        string? dateColumn = Str(timeTable, "date_column", source, "time.");
        if ((column is null) == (dateColumn is null))
        {
            throw Bad(source, "time", "the [time] table needs either 'column' and 'format' (one column) or 'date_column', 'date_format', 'time_column' and 'time_format'");
        }

        TimeLayout time;
        string hour = Str(timeTable, "hour", source, "time.") ?? "beginning";
        string zone = Str(timeTable, "zone", source, "time.") ?? "local";
        if (hour is not ("beginning" or "ending"))
        {
            throw Bad(source, "time.hour", $"'{hour}' is not 'beginning' or 'ending'");
        }

        if (zone is not ("local" or "utc"))
        {
            throw Bad(source, "time.zone", $"'{zone}' is not 'local' or 'utc'");
        }

        if (column is not null)
        {
            time = new TimeLayout(column, Required(timeTable, "format", source, "time."), null, null, hour == "ending", zone == "utc");
        }
        else
        {
            time = new TimeLayout(dateColumn!, Required(timeTable, "date_format", source, "time."),
                Required(timeTable, "time_column", source, "time."), Required(timeTable, "time_format", source, "time."), hour == "ending", zone == "utc");
        }

        var columnsTable = Table(root, "columns", source, required: true)!;
        var columns = new Dictionary<WeatherQuantity, ColumnSpec>();
        foreach (var (key, value) in columnsTable)
        {
            if (WeatherQuantityFacts.ByKey(key) is not { } facts)
            {
                throw Bad(source, "columns." + key, "unknown quantity" + Suggest(key, WeatherQuantityFacts.All.Select(f => f.Key)));
            }

            if (value is not TomlTable spec)
            {
                throw Bad(source, "columns." + key, "expected a table such as { name = \"Dry-bulb (C)\", unit = \"c\" }");
            }

            CheckKeys(spec, ColumnKeys, source, "columns." + key + ".");
            string unit = Required(spec, "unit", source, "columns." + key + ".").ToLowerInvariant();
            if (!facts.Units.ContainsKey(unit))
            {
                throw Bad(source, "columns." + key + ".unit", $"'{unit}' is not a unit for {key}; use one of {string.Join(", ", facts.Units.Keys)}");
            }

            columns[facts.Quantity] = new ColumnSpec(Required(spec, "name", source, "columns." + key + "."), unit,
                Num(spec, "scale", source, "columns." + key + ".") ?? 1.0, Num(spec, "offset", source, "columns." + key + ".") ?? 0.0);
        }

        var metadata = new Dictionary<string, MetadataSource>(StringComparer.Ordinal);
        if (Table(root, "metadata", source, required: false) is TomlTable metaTable)
        {
            foreach (var (key, value) in metaTable)
            {
                if (Array.IndexOf(MetadataNames, key) < 0)
                {
                    throw Bad(source, "metadata." + key, "unknown metadata key" + Suggest(key, MetadataNames));
                }

                if (value is not TomlTable m)
                {
                    throw Bad(source, "metadata." + key, "expected a table such as { line = 1, field = 7 } or { pattern = \"Elevation \\\\(m\\\\): *(\\\\S+)\" }");
                }

                CheckKeys(m, MetadataKeys, source, "metadata." + key + ".");
                var src = new MetadataSource(
                    Int(m, "line", source, "metadata." + key + "."),
                    Int(m, "field", source, "metadata." + key + "."),
                    Str(m, "pattern", source, "metadata." + key + "."),
                    m.TryGetValue("value", out var v) ? Convert.ToString(v, CultureInfo.InvariantCulture) : null,
                    m.TryGetValue("from_longitude", out var fl) && fl is true);
                if (src.Line.HasValue != src.Field.HasValue || (src.Line is null && src.Pattern is null && src.Value is null && !src.FromLongitude))
                {
                    throw Bad(source, "metadata." + key, "give 'line' and 'field' together, or 'pattern', or 'value'" + (key == "utc_offset_h" ? ", or 'from_longitude = true'" : ""));
                }

                if (src.FromLongitude && key != "utc_offset_h")
                {
                    throw Bad(source, "metadata." + key, "'from_longitude' only applies to utc_offset_h");
                }

                metadata[key] = src;
            }
        }

        string separator = Str(root, "separator", source, "") ?? ",";
        if (separator.Length != 1)
        {
            throw Bad(source, "separator", "the separator must be one character, such as \",\" or \";\"");
        }

        bool? typical = root.TryGetValue("typical_year", out var ty) ? ty switch
        {
            bool b => b,
            "auto" => null,
            _ => throw Bad(source, "typical_year", "use true, false or \"auto\""),
        } : null;

        var humidityOver = (Str(root, "humidity_over", source, "") ?? "water") switch
        {
            "water" => Psychrometrics.HumidityOver.Water,
            "ice" => Psychrometrics.HumidityOver.Ice,
            _ => throw Bad(source, "humidity_over", "use \"water\" (dew points and RH over liquid water at every temperature, the usual weather convention) or \"ice\" (frost points below 0 C)"),
        };
        int? headerLine = Int(root, "header_line", source, "");
        string? headerStarts = Str(root, "header_starts_with", source, "");
        if ((headerLine is null) == (headerStarts is null))
        {
            throw Bad(source, "header_line", "give either 'header_line' (the 1-based line of the column names) or 'header_starts_with'");
        }

        if (headerLine is < 1)
        {
            throw Bad(source, "header_line", "the header line is 1-based: 1 or more");
        }

        var missing = new List<string>();
        if (root.TryGetValue("missing", out var miss))
        {
            if (miss is not TomlArray arr)
            {
                throw Bad(source, "missing", "expected a list of strings such as [\"-9900\", \"NA\"]");
            }

            missing.AddRange(arr.Select(x => Convert.ToString(x, CultureInfo.InvariantCulture) ?? ""));
        }

        return new ColumnMap
        {
            Name = Str(root, "name", source, "") ?? name ?? "map",
            Source = source,
            Description = Str(root, "description", source, "") ?? "",
            HeaderLine = headerLine,
            HeaderStartsWith = headerStarts,
            Separator = separator[0],
            MissingCodes = missing,
            Time = time,
            Columns = columns,
            Metadata = metadata,
            EndAtBlankLine = root.TryGetValue("end_at_blank_line", out var eb) && eb is true,
            TypicalYear = typical,
            HumidityOver = humidityOver,
        };
    }

    private static void CheckKeys(TomlTable table, string[] known, string source, string prefix)
    {
        foreach (var key in table.Keys)
        {
            if (Array.IndexOf(known, key) < 0)
            {
                throw Bad(source, prefix + key, "unknown key" + Suggest(key, known));
            }
        }
    }

    private static TomlTable? Table(TomlTable t, string key, string source, bool required)
    {
        if (!t.TryGetValue(key, out var v))
        {
            return required ? throw Bad(source, key, $"the map needs a [{key}] table") : null;
        }

        return v as TomlTable ?? throw Bad(source, key, $"'{key}' must be a table ([{key}])");
    }

    private static string? Str(TomlTable t, string key, string source, string prefix) =>
        !t.TryGetValue(key, out var v) ? null : v as string ?? throw Bad(source, prefix + key, "expected a string in quotes");

    private static string Required(TomlTable t, string key, string source, string prefix) =>
        Str(t, key, source, prefix) ?? throw Bad(source, prefix + key, "this key is required");

    private static double? Num(TomlTable t, string key, string source, string prefix) =>
        !t.TryGetValue(key, out var v) ? null : v switch
        {
            long l => l,
            double d => d,
            _ => throw Bad(source, prefix + key, "expected a number"),
        };

    private static int? Int(TomlTable t, string key, string source, string prefix) =>
        !t.TryGetValue(key, out var v) ? null : v is long l && l is >= 0 and < 1_000_000 ? (int)l : throw Bad(source, prefix + key, "expected a whole number");

    private static WeatherDataException Bad(string source, string key, string problem) =>
        new(WeatherErrorKind.BadMap, source, problem, "Correct the column map (see docs/weather.md for its keys)", column: key);

    private static string FirstLine(string s) => s.Split('\n')[0].Trim();

    /// <summary>", did you mean 'x'?" for the nearest known key (Levenshtein distance up to 3), else the list of keys.</summary>
    internal static string Suggest(string key, IEnumerable<string> known)
    {
        var list = known.ToList();
        var best = list.Select(k => (k, d: Study.KeySuggester.Distance(key, k))).OrderBy(x => x.d).FirstOrDefault();
        return best.k is not null && best.d <= 3
            ? $", did you mean '{best.k}'?"
            : "; known keys: " + string.Join(", ", list);
    }
}
