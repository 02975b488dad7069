using System.Globalization;
using System.IO.Compression;
using System.Text;
using System.Text.RegularExpressions;
using BinEnergy.Core.Errors;
using CsvHelper;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Turns the bytes of a weather file into a <see cref="RawWeatherTable"/> in one pass: the metadata lines, the
/// column-name line, then one row per hour tokenised by CsvHelper into columns, numbers parsed in the invariant
/// culture, units converted and physical ranges checked (DESIGN 5.1, 5.2, 5.4), all from <see cref="WeatherQuantityFacts"/>.
/// </summary>
internal static class WeatherFileParser
{
    private static readonly string[] OpenMissing = ["null"];

    /// <summary>Codes that mean "missing" in every layout.</summary>
    private static readonly string[] DefaultMissing = ["NA", "NaN", "nan"];

    /// <summary>The open layout's metadata keys (DESIGN 5.1).</summary>
    private static readonly string[] OpenMetadataKeys = ["name", "station_id", "elevation_m", "elevation_ft", "latitude", "longitude", "utc_offset_h", "typical_year", "humidity_over"];


    /// <summary>
    /// Reads the whole file as bytes, un-gzipping when it is gzip data, within the bounds of <see cref="InputFiles"/>: a
    /// regular file of at most <paramref name="maxBytes"/>, also once decompressed.
    /// </summary>
    public static byte[] LoadBytes(string path, long maxBytes = InputFiles.DefaultMaxBytes)
    {
        var (data, problem, gzip) = InputFiles.Read(path, maxBytes, WeatherReadOptions.LimitOption, decompress: true);
        if (problem is not null)
        {
            throw problem.Kind switch
            {
                InputFiles.ProblemKind.Empty => new WeatherDataException(WeatherErrorKind.EmptyFile, path, problem.Text,
                    "An open-layout weather file starts with optional '# key: value' lines, then the line " + OpenLayoutWriter.Header + ", then one row per hour; " + char.ToLowerInvariant(problem.Fix[0]) + problem.Fix[1..]),
                InputFiles.ProblemKind.Damaged => new WeatherDataException(WeatherErrorKind.BadCompression, path, problem.Text, problem.Fix),
                InputFiles.ProblemKind.TooLarge => new WeatherDataException(WeatherErrorKind.FileTooLarge, path, problem.Text, problem.Fix),
                _ => new WeatherDataException(WeatherErrorKind.FileNotFound, path, "the weather file cannot be opened: " + problem.Text, problem.Fix),
            };
        }

        if (path.EndsWith(".gz", StringComparison.OrdinalIgnoreCase) && !gzip)
        {
            throw new WeatherDataException(WeatherErrorKind.BadCompression, path, "the name ends in .gz but the file is not gzip data",
                "Compress it with gzip, or remove the .gz from its name");
        }

        return data!;
    }

    /// <summary>Parses a file's bytes with a map (null: the open layout).</summary>
    public static RawWeatherTable Parse(byte[] data, string file, ColumnMap? map)
    {
        var (pos, headerText, headerLine, preamble, metadata) = ReadPreamble(data, file, map);
        char sep = map?.Separator ?? ',';
        CheckSeparator(headerText, sep, map, file, headerLine);
        var options = new CsvReaderOptions
        {
            Separator = sep,
            HasHeader = true,
            TrackLineNumbers = true,
            SkipEmptyLines = false,
            TrimWhitespace = true,
            FormatProvider = CultureInfo.InvariantCulture,
        };
        using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(data, pos, data.Length - pos), options);
        string[] headers = reader.Headers.Select(h => h.Trim()).ToArray();
        map ??= OpenLayoutMap(headers, file, headerLine);
        var table = new RawWeatherTable(file, map, openLayout: map.Source == "open layout", headers, headerLine);
        foreach (var (k, v) in metadata)
        {
            table.Metadata[k] = v;
        }

        table.TypicalYear = table.IsOpenLayout && metadata.TryGetValue("typical_year", out var typ)
            ? typ.Item1.Trim().ToLowerInvariant() switch
            {
                "true" or "yes" => true,
                "false" or "no" => false,
                _ => throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, "typical_year must be true or false", "Write '# typical_year: true' or remove the line", line: typ.Item2, value: typ.Item1),
            }
            : map.TypicalYear;
        ReadMapMetadata(map, preamble, table, file);
        var layout = new RowLayout(table, FindColumn(headers, map.Time.Column, WeatherErrorKind.MissingTimeColumn, file, headerLine, map, "time"),
            map.Time.TimeColumn is string tc ? FindColumn(headers, tc, WeatherErrorKind.MissingTimeColumn, file, headerLine, map, "time of day") : -1,
            NumberColumns(table), map.MissingCodes.Where(c => c.Length > 0).Select(c => c.Trim()).Concat(DefaultMissing).Select(Encoding.UTF8.GetBytes).ToArray());
        int trailing = ReadRows(reader, layout);
        if (table.Count == 0)
        {
            throw new WeatherDataException(WeatherErrorKind.NoData, file, "the file has column names but no data rows",
                "Add one row per hour under the column-name line", line: headerLine);
        }

        if (trailing > 0)
        {
            table.Quality.Warn($"{trailing} line(s) after the data (legend and notices) were ignored, as the map says");
        }

        return table;
    }

    /// <summary>The lines before the column names (metadata, for the open layout read on the way), and where the column names are.</summary>
    private static (int Pos, string HeaderText, int HeaderLine, List<(int Line, string Text)> Preamble, Dictionary<string, (string, int?)> Metadata)
        ReadPreamble(byte[] data, string file, ColumnMap? map)
    {
        int pos = data.Length >= 3 && data[0] == 0xEF && data[1] == 0xBB && data[2] == 0xBF ? 3 : 0;
        if (data.AsSpan(pos).IndexOfAnyExcept(" \t\r\n"u8) < 0)
        {
            throw new WeatherDataException(WeatherErrorKind.EmptyFile, file, "the file is empty",
                map is null ? "An open-layout weather file starts with optional '# key: value' lines, then the line " + OpenLayoutWriter.Header + ", then one row per hour"
                            : "Check that this is the weather file the map " + map.Name + " describes");
        }

        var preamble = new List<(int Line, string Text)>();
        var metadata = new Dictionary<string, (string, int?)>(StringComparer.Ordinal);
        for (int lineNo = 1; ; lineNo++)
        {
            if (pos >= data.Length)
            {
                throw new WeatherDataException(WeatherErrorKind.MissingHeader, file, "the column-name line was not found before the end of the file",
                    map is null ? "Add the line " + OpenLayoutWriter.Header + " after the '#' lines" : MapHeaderFix(map));
            }

            int end = data.AsSpan(pos).IndexOf((byte)'\n');
            string text = Encoding.UTF8.GetString(data, pos, (end < 0 ? data.Length : pos + end) - pos).TrimEnd('\r');
            bool isHeader = map is null
                ? !text.StartsWith('#') && text.Trim().Length > 0
                : map.HeaderLine is int hl ? lineNo == hl : text.StartsWith(map.HeaderStartsWith!, StringComparison.Ordinal);
            if (isHeader)
            {
                return (pos, text, lineNo, preamble, metadata);
            }

            if (map is null && text.StartsWith('#'))
            {
                ReadOpenMetadata(text, lineNo, metadata, file);
            }

            preamble.Add((lineNo, text));
            pos = end < 0 ? data.Length : pos + end + 1;
            if (map?.HeaderStartsWith is not null && lineNo >= 500)
            {
                throw new WeatherDataException(WeatherErrorKind.MissingHeader, file, $"no line in the first 500 starts with '{map.HeaderStartsWith}'", MapHeaderFix(map));
            }
        }
    }

    /// <summary>A column-name line without the separator but with another one is a file saved with another separator.</summary>
    private static void CheckSeparator(string headerText, char sep, ColumnMap? map, string file, int headerLine)
    {
        char? other = headerText.Contains(sep) ? null : headerText.Contains(';') ? ';' : headerText.Contains('\t') ? '\t' : headerText.Contains('|') ? '|' : null;
        if (other is char o)
        {
            throw new WeatherDataException(WeatherErrorKind.WrongSeparator, file,
                $"the column names are separated by '{(o == '\t' ? "tab" : FileExcerpt.Of(o.ToString()))}', not by '{sep}'",
                map is null ? "Save the file with commas between fields and a dot as the decimal separator (the open layout is comma-separated)"
                            : "Set separator = \"" + (o == '\t' ? "\\t" : o.ToString()) + "\" in the column map, or save the file comma-separated",
                line: headerLine, value: headerText);
        }
    }

    private static void ReadOpenMetadata(string text, int line, Dictionary<string, (string, int?)> metadata, string file)
    {
        string body = text.TrimStart('#').Trim();
        int colon = body.IndexOf(':');
        if (colon <= 0)
        {
            return;
        }

        string key = body[..colon].Trim().ToLowerInvariant();
        if (Array.IndexOf(OpenMetadataKeys, key) >= 0)
        {
            if (metadata.ContainsKey(key))
            {
                throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, $"the metadata key '{FileExcerpt.Of(key)}' is given twice", "Keep one of the two lines", line: line);
            }

            metadata[key] = (body[(colon + 1)..].Trim(), line);
        }
    }

    private static void ReadMapMetadata(ColumnMap map, List<(int Line, string Text)> preamble, RawWeatherTable table, string file)
    {
        foreach (var (key, src) in map.Metadata)
        {
            if (src.Value is string fixedValue)
            {
                table.Metadata[key] = (fixedValue, null);
            }
            else if (src.FromLongitude)
            {
                table.Metadata[key] = ("from_longitude", null);
            }
            else if (src.Line is int l)
            {
                var entry = preamble.FirstOrDefault(p => p.Line == l);
                if (entry.Text is null)
                {
                    throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, $"the map reads {key} from line {l}, which is not before the column names",
                        "Check that this file has the layout the map " + map.Name + " describes", line: l);
                }

                using var lineReader = CsvReader.FromText(entry.Text, new CsvReaderOptions { HasHeader = false, Separator = map.Separator, TrimWhitespace = true });
                if (!lineReader.Read() || lineReader.FieldCount < src.Field!.Value || src.Field < 1)
                {
                    throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, $"the map reads {key} from field {src.Field} of this line, which has fewer fields",
                        "Check that this file has the layout the map " + map.Name + " describes", line: l, value: entry.Text);
                }

                table.Metadata[key] = (lineReader.GetString(src.Field.Value - 1), l);
            }
            else if (src.Pattern is string pattern)
            {
                var regex = new Regex(pattern, RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));
                foreach (var (l2, text) in preamble)
                {
                    var m = regex.Match(text);
                    if (m.Success && m.Groups.Count > 1)
                    {
                        table.Metadata[key] = (m.Groups[1].Value.Trim(), l2);
                        break;
                    }
                }
            }
        }
    }

    /// <summary>The number columns the map names, each found in the header, with its unit conversion and range.</summary>
    private static NumberColumn[] NumberColumns(RawWeatherTable table)
    {
        var columns = new List<NumberColumn>();
        foreach (var (q, spec) in table.Map.Columns)
        {
            var facts = WeatherQuantityFacts.Of(q);
            int idx = FindColumn(table.Headers, spec.Name, facts.MissingColumnError, table.File, table.HeaderLine, table.Map, facts.Name);
            var (f, o) = facts.ToInternal(spec);
            table.ColumnNames[q] = table.Headers[idx];
            columns.Add(new NumberColumn(facts, idx, f, o, table.AddColumn(q)));
        }

        return columns.ToArray();
    }

    /// <summary>What the row loop needs to know about the file, fixed once the column names are read.</summary>
    private sealed record RowLayout(RawWeatherTable Table, int TimeIndex, int ClockIndex, NumberColumn[] Columns, byte[][] Missing)
    {
        public SeenTimes Seen { get; } = new();

        public string File => Table.File;

        public ColumnMap Map => Table.Map;

        public string[] Headers => Table.Headers;
    }

    /// <summary>One number column being read: where it is, how its unit converts, and the values read so far.</summary>
    private sealed record NumberColumn(WeatherQuantityFacts Facts, int Index, double Factor, double Offset, List<double> Values);

    /// <summary>
    /// Reads the rows after the column names into the table; returns the number of lines ignored after a blank line
    /// where the map says the data end there.
    /// </summary>
    private static int ReadRows(CsvReader reader, RowLayout layout)
    {
        var table = layout.Table;
        int headerCount = layout.Headers.Length;
        while (reader.Read())
        {
            int line = table.HeaderLine + (int)reader.LineNumber - 1;
            int fc = reader.FieldCount;
            if (fc == 1 && reader.IsEmpty(0))
            {
                if (layout.Map.EndAtBlankLine)
                {
                    int trailing = 0;
                    while (reader.Read())
                    {
                        trailing++;
                    }

                    return trailing;
                }

                continue;
            }

            if (fc != headerCount)
            {
                throw WrongFieldCount(reader, layout, fc, line);
            }

            var time = layout.Map.Time.Format == "iso" ? IsoTime(reader, layout, line, out int writtenYear) : MappedTime(reader, layout, line, out writtenYear);
            if (time.Year is < 2 or > 9998)
            {
                // Shifting such a time by an hour or a UTC offset would leave the calendar's range.
                throw new WeatherDataException(WeatherErrorKind.BadTimestamp, layout.File, Inv($"the year {time.Year} is outside the years the reader takes (2 to 9998)"),
                    "Check the year of this row", line: line, column: layout.Headers[layout.TimeIndex], value: reader.GetString(layout.TimeIndex));
            }

            table.AddRow(time, writtenYear, line);
            foreach (var column in layout.Columns)
            {
                column.Values.Add(Number(reader, layout, column, line));
            }
        }

        return 0;
    }

    /// <summary>
    /// A number field in the internal unit: NaN for a missing-value code or an empty field; an error for anything but a
    /// finite number in the physical range. RH of 100 to 103 % is set to 100 % and counted (DESIGN 5.4). Read from the
    /// field's UTF-8 bytes; its text is made only for a message.
    /// </summary>
    private static double Number(CsvReader reader, RowLayout layout, NumberColumn column, int line)
    {
        var span = reader.GetSpan(column.Index).Trim(" \t"u8);
        if (span.IsEmpty || IsMissing(span, layout.Missing))
        {
            return double.NaN;
        }

        // A comma inside a (quoted) number would be read as a thousands separator: refuse it first.
        if (span.Contains((byte)',') || !double.TryParse(span, NumberStyles.Float, CultureInfo.InvariantCulture, out double raw) || !double.IsFinite(raw))
        {
            string text = Encoding.UTF8.GetString(span);
            throw new WeatherDataException(WeatherErrorKind.NotANumber, layout.File, $"the {column.Facts.Name} is not a number", text.Contains(',')
                ? "Write decimals with a dot (12.5, not 12,5)"
                : "Write a number, or leave the field empty (or use a missing-value code" + (layout.Table.IsOpenLayout ? " such as NA" : " the map lists") + ") where the value is missing",
                line: line, column: layout.Headers[column.Index], value: text);
        }

        double v = raw * column.Factor + column.Offset;
        if (!(v >= column.Facts.Low && v <= column.Facts.High))
        {
            throw OutOfRange(layout.Table, column.Facts, layout.Headers[column.Index], line, raw, v, Encoding.UTF8.GetString(span));
        }

        if (v > 100.0 && column.Facts.Quantity == WeatherQuantity.RelativeHumidity)
        {
            layout.Table.Quality.Count(QualityKeys.RhClamped, Inv($"line {line}: RH {v:0.##} % set to 100 %"));
            v = 100.0;
        }

        return v;
    }

    private static bool IsMissing(ReadOnlySpan<byte> field, byte[][] codes)
    {
        foreach (var code in codes)
        {
            if (field.SequenceEqual(code))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The time of a row of the open layout (<see cref="Weather.IsoTime"/>).</summary>
    private static DateTime IsoTime(CsvReader reader, RowLayout layout, int line, out int writtenYear)
    {
        if (!Weather.IsoTime.TryParse(reader.GetSpan(layout.TimeIndex).Trim(" \t"u8), out var time, out writtenYear))
        {
            throw BadTime(layout.File, line, layout.Headers[layout.TimeIndex], reader.GetString(layout.TimeIndex), "yyyy-MM-ddTHH:mm (ISO 8601, local standard time)");
        }

        return time;
    }

    /// <summary>
    /// The time of a row in a map's format (one or two columns). A file repeats each date for the hours of its day and
    /// has few distinct clock times, so the last date and the clock times read are kept (<see cref="RowLayout.Seen"/>).
    /// </summary>
    private static DateTime MappedTime(CsvReader reader, RowLayout layout, int line, out int writtenYear)
    {
        var timeLayout = layout.Map.Time;
        var seen = layout.Seen;
        string text = reader.GetString(layout.TimeIndex);
        if (text != seen.DateText)
        {
            if (!TryParseExact24(text, timeLayout.Format, out var parsed, out bool was24))
            {
                throw BadTime(layout.File, line, layout.Headers[layout.TimeIndex], text, timeLayout.Format);
            }

            (seen.DateText, seen.Date, seen.DateWas24) = (text, parsed, was24);
        }

        var date = seen.Date;
        writtenYear = seen.DateWas24 ? date.AddDays(-1).Year : date.Year;
        if (layout.ClockIndex < 0)
        {
            return date;
        }

        string clock = reader.GetString(layout.ClockIndex);
        if (!seen.Clocks.TryGetValue(clock, out var timeOfDay))
        {
            if (!TryParseExact24("2001-01-01 " + clock, "yyyy-MM-dd " + timeLayout.TimeFormat, out var tod, out _))
            {
                throw BadTime(layout.File, line, layout.Headers[layout.ClockIndex], clock, timeLayout.TimeFormat!);
            }

            seen.Clocks[clock] = timeOfDay = tod - new DateTime(2001, 1, 1);
        }

        writtenYear = date.Year;
        return date.Date + timeOfDay;
    }

    /// <summary>The last date text a map's rows gave and what it read as, and the clock times read so far.</summary>
    private sealed class SeenTimes
    {
        public string? DateText { get; set; }

        public DateTime Date { get; set; }

        public bool DateWas24 { get; set; }

        public Dictionary<string, TimeSpan> Clocks { get; } = new(StringComparer.Ordinal);
    }

    private static WeatherDataException WrongFieldCount(CsvReader reader, RowLayout layout, int fc, int line)
    {
        int headerCount = layout.Headers.Length;
        string raw = Encoding.UTF8.GetString(reader.RawRecord);
        bool decimalComma = fc > headerCount && Regex.IsMatch(raw, @"\d,\d");
        return new WeatherDataException(WeatherErrorKind.WrongFieldCount, layout.File,
            $"the row has {fc} fields but the header has {headerCount}",
            fc < headerCount
                ? "The line looks cut short: complete it or delete it (a file cut off during download or copy ends like this)"
                : decimalComma
                    ? "A comma may be used as the decimal separator: write decimals with a dot (12.5, not 12,5)"
                    : "Remove the extra fields, or quote text that contains the separator",
            line: line, value: raw);
    }

    private static ColumnMap OpenLayoutMap(string[] headers, string file, int headerLine)
    {
        var columns = new Dictionary<WeatherQuantity, ColumnSpec>();
        bool hasTime = false;
        foreach (var h in headers)
        {
            if (h.Equals("time", StringComparison.OrdinalIgnoreCase))
            {
                hasTime = true;
                continue;
            }

            if (WeatherQuantityFacts.All.SelectMany(f => f.OpenColumns.Select(c => (f.Quantity, c.Column, c.Unit)))
                    .FirstOrDefault(c => c.Column.Equals(h, StringComparison.OrdinalIgnoreCase)) is not { Column: not null } qu)
            {
                continue;
            }

            if (columns.TryGetValue(qu.Quantity, out var existing))
            {
                throw new WeatherDataException(WeatherErrorKind.DuplicateColumn, file, $"the columns '{FileExcerpt.Of(existing.Name)}' and '{FileExcerpt.Of(h)}' both give the {WeatherQuantityFacts.Of(qu.Quantity).Name}",
                    "Keep one of them", line: headerLine, column: h);
            }

            columns[qu.Quantity] = new ColumnSpec(h, qu.Unit);
        }

        string found = FileExcerpt.List(headers);
        string otherLayout = "; if the file comes from another source, read it with a column map (--map tmy3, --map pvgis or a map file)";
        if (!hasTime)
        {
            throw new WeatherDataException(WeatherErrorKind.MissingTimeColumn, file, "there is no 'time' column (columns found: " + found + ")",
                "The open layout's first column is time, written like 2026-01-01T00:00" + otherLayout, line: headerLine);
        }

        if (!columns.ContainsKey(WeatherQuantity.DryBulb))
        {
            throw new WeatherDataException(WeatherErrorKind.MissingDryBulb, file, "there is no dry-bulb column (columns found: " + found + ")",
                "Name the dry-bulb column drybulb_c or drybulb_f" + otherLayout, line: headerLine);
        }

        if (!columns.Keys.Any(q => WeatherQuantityFacts.Of(q).IsHumidity))
        {
            throw new WeatherDataException(WeatherErrorKind.MissingHumidity, file, "there is no humidity column (columns found: " + found + ")",
                "Add one of dewpoint_c, dewpoint_f, humidity_ratio, wetbulb_c, wetbulb_f or rh_pct", line: headerLine);
        }

        return new ColumnMap
        {
            Name = "open",
            Source = "open layout",
            Description = "the project's open hourly CSV layout",
            HeaderLine = headerLine,
            MissingCodes = OpenMissing,
            Time = new TimeLayout("time", "iso", null, null, HourEnding: false, Utc: false),
            Columns = columns,
        };
    }

    private static int FindColumn(string[] headers, string name, WeatherErrorKind kind, string file, int headerLine, ColumnMap map, string what)
    {
        int idx = Array.IndexOf(headers, name);
        if (idx < 0)
        {
            idx = Array.FindIndex(headers, h => string.Equals(h.Trim(), name.Trim(), StringComparison.OrdinalIgnoreCase));
        }

        if (idx < 0)
        {
            throw new WeatherDataException(kind, file, $"the {what} column '{name}' named by the {map.Source} is not in the header",
                "Check that this file has the layout the map describes (columns found: " + FileExcerpt.List(headers) + ")",
                line: headerLine, column: name);
        }

        return idx;
    }

    private static WeatherDataException BadTime(string file, int line, string column, string text, string format) =>
        new(WeatherErrorKind.BadTimestamp, file, "the time does not read as " + format, "Write every time in that format", line: line, column: column, value: text);

    private static WeatherDataException OutOfRange(RawWeatherTable table, WeatherQuantityFacts facts, string column, int line, double raw, double v, string text)
    {
        double low = facts.Low, high = facts.High;
        string? pressureUnit = facts.Units.Where(u => raw * u.Value.Factor >= low && raw * u.Value.Factor <= high).Select(u => u.Key).FirstOrDefault();
        string fix = facts.Quantity switch
        {
            WeatherQuantity.Pressure when pressureUnit is string u =>
                table.IsOpenLayout ? $"The number looks like a pressure in {u}: name the column pressure_{(u == "mbar" ? "hpa" : u)}" : $"The number looks like a pressure in {u}: set unit = \"{u}\" for the pressure in the map",
            WeatherQuantity.DryBulb or WeatherQuantity.DewPoint or WeatherQuantity.WetBulb when (raw - 32) / 1.8 >= low && (raw - 32) / 1.8 <= high && column.EndsWith("_c", StringComparison.OrdinalIgnoreCase) =>
                "If the column is in F, name it with _f instead of _c; otherwise correct the value",
            WeatherQuantity.RelativeHumidity when raw is >= 0 and <= 1.03 && !table.IsOpenLayout => "Values above 103 % are not physical; correct the value",
            WeatherQuantity.HumidityRatio when raw is > 0.05 and < 50 => "The number looks like g/kg or gr/lb: the open layout's humidity_ratio is in kg/kg (lb/lb), e.g. 0.0095",
            _ => "Correct the value, or leave the field empty to have short gaps filled",
        };
        return new WeatherDataException(WeatherErrorKind.ValueOutOfRange, table.File, $"the {facts.Name} {facts.Show(v)} is outside the physical range {facts.ShowRange()}", fix,
            line: line, column: column, value: text);
    }

    /// <summary>ParseExact in the invariant culture, accepting an hour of 24 (midnight at the end of the day).</summary>
    internal static bool TryParseExact24(string text, string format, out DateTime value, out bool was24)
    {
        was24 = false;
        text = text.Trim();
        if (DateTime.TryParseExact(text, format, CultureInfo.InvariantCulture, DateTimeStyles.None, out value))
        {
            return true;
        }

        int k = format.IndexOf("HH", StringComparison.Ordinal);
        if (k >= 0 && text.Length == format.Length && text.AsSpan(k, 2).SequenceEqual("24"))
        {
            string zero = string.Concat(text.AsSpan(0, k), "00", text.AsSpan(k + 2));
            if (DateTime.TryParseExact(zero, format, CultureInfo.InvariantCulture, DateTimeStyles.None, out value) && value.TimeOfDay == TimeSpan.Zero
                && value.Date < DateTime.MaxValue.Date)
            {
                value = value.AddDays(1);
                was24 = true;
                return true;
            }
        }

        return false;
    }

    private static string MapHeaderFix(ColumnMap map) =>
        "Check that this file has the layout the " + map.Source + " describes" + (map.HeaderLine is int l ? $" (column names on line {l})" : $" (a line starting '{map.HeaderStartsWith}')");

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
