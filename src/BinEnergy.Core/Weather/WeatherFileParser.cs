using System.Globalization;
using System.IO.Compression;
using System.Text;
using System.Text.RegularExpressions;
using CsvHelper;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Turns the bytes of a weather file into a <see cref="RawWeatherTable"/>: metadata lines, the
/// column-name line, then one row per hour tokenised by CsvHelper, numbers parsed in the
/// invariant culture, units converted and physical ranges checked (DESIGN 5.1, 5.2, 5.4).
/// </summary>
internal static class WeatherFileParser
{
    /// <summary>Physical ranges, internal units (DESIGN 5.4; dew point and humidity ratio: the same spirit).</summary>
    internal static (double Low, double High) Range(WeatherQuantity q) => q switch
    {
        WeatherQuantity.DryBulb => (-70.0, 60.0),
        WeatherQuantity.WetBulb => (-70.0, 60.0),
        WeatherQuantity.DewPoint => (-90.0, 60.0),
        WeatherQuantity.RelativeHumidity => (0.0, 103.0),
        WeatherQuantity.HumidityRatio => (0.0, 0.05),
        _ => (50_000.0, 110_000.0),
    };

    /// <summary>The open layout's column names: quantity and unit from the suffix (DESIGN 5.1).</summary>
    private static readonly Dictionary<string, (WeatherQuantity Q, string Unit)> OpenColumns = new(StringComparer.OrdinalIgnoreCase)
    {
        ["drybulb_c"] = (WeatherQuantity.DryBulb, "c"),
        ["drybulb_f"] = (WeatherQuantity.DryBulb, "f"),
        ["dewpoint_c"] = (WeatherQuantity.DewPoint, "c"),
        ["dewpoint_f"] = (WeatherQuantity.DewPoint, "f"),
        ["wetbulb_c"] = (WeatherQuantity.WetBulb, "c"),
        ["wetbulb_f"] = (WeatherQuantity.WetBulb, "f"),
        ["rh_pct"] = (WeatherQuantity.RelativeHumidity, "pct"),
        ["humidity_ratio"] = (WeatherQuantity.HumidityRatio, "kg/kg"),
        ["pressure_kpa"] = (WeatherQuantity.Pressure, "kpa"),
        ["pressure_pa"] = (WeatherQuantity.Pressure, "pa"),
        ["pressure_hpa"] = (WeatherQuantity.Pressure, "hpa"),
        ["pressure_psia"] = (WeatherQuantity.Pressure, "psia"),
        ["pressure_inhg"] = (WeatherQuantity.Pressure, "inhg"),
    };

    private static readonly string[] OpenMissing = ["NA", "NaN", "nan", "null"];

    /// <summary>Reads the whole file as bytes, un-gzipping when it is gzip data.</summary>
    public static byte[] LoadBytes(string path)
    {
        byte[] data;
        try
        {
            data = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new WeatherDataException(WeatherErrorKind.FileNotFound, path, "the weather file cannot be opened: " + e.Message.TrimEnd('.'),
                "Check the path and that the file can be read", inner: e);
        }

        bool gzipMagic = data.Length >= 2 && data[0] == 0x1f && data[1] == 0x8b;
        if (!gzipMagic)
        {
            if (path.EndsWith(".gz", StringComparison.OrdinalIgnoreCase) && data.Length > 0)
            {
                throw new WeatherDataException(WeatherErrorKind.BadCompression, path, "the name ends in .gz but the file is not gzip data",
                    "Compress it with gzip, or remove the .gz from its name");
            }

            return data;
        }

        try
        {
            using var input = new MemoryStream(data);
            using var gz = new GZipStream(input, CompressionMode.Decompress);
            using var output = new MemoryStream(data.Length * 4);
            gz.CopyTo(output);

            // The gzip trailer ends with the uncompressed size mod 2^32 (RFC 1952, ISIZE): a file cut short fails this check.
            uint size = data.Length >= 18 ? BitConverter.ToUInt32(data, data.Length - 4) : uint.MaxValue;
            if (size != (uint)output.Length)
            {
                throw new InvalidDataException("the size in the gzip trailer does not match the data");
            }

            return output.ToArray();
        }
        catch (InvalidDataException e)
        {
            throw new WeatherDataException(WeatherErrorKind.BadCompression, path, "the gzip data is damaged or truncated (" + e.Message.TrimEnd('.') + ")",
                "Download or compress the file again", inner: e);
        }
    }

    /// <summary>Parses a file's bytes with a map (null: the open layout).</summary>
    public static RawWeatherTable Parse(byte[] data, string file, ColumnMap? map)
    {
        int pos = data.Length >= 3 && data[0] == 0xEF && data[1] == 0xBB && data[2] == 0xBF ? 3 : 0;
        if (data.AsSpan(pos).IndexOfAnyExcept(" \t\r\n"u8) < 0)
        {
            throw new WeatherDataException(WeatherErrorKind.EmptyFile, file, "the file is empty",
                map is null ? "An open-layout weather file starts with optional '# key: value' lines, then the line " + OpenLayoutWriter.Header + ", then one row per hour"
                            : "Check that this is the weather file the map " + map.Name + " describes");
        }

        var preamble = new List<(int Line, string Text)>();
        int lineNo = 1;
        string headerText;
        var metadata = new Dictionary<string, (string, int?)>(StringComparer.Ordinal);
        while (true)
        {
            if (pos >= data.Length)
            {
                throw new WeatherDataException(WeatherErrorKind.MissingHeader, file, "the column-name line was not found before the end of the file",
                    map is null ? "Add the line " + OpenLayoutWriter.Header + " after the '#' lines"
                                : MapHeaderFix(map));
            }

            int end = data.AsSpan(pos).IndexOf((byte)'\n');
            int next = end < 0 ? data.Length : pos + end + 1;
            string text = Encoding.UTF8.GetString(data, pos, (end < 0 ? data.Length : pos + end) - pos).TrimEnd('\r');
            bool isHeader = map is null
                ? !text.StartsWith('#') && text.Trim().Length > 0
                : map.HeaderLine is int hl ? lineNo == hl : text.StartsWith(map.HeaderStartsWith!, StringComparison.Ordinal);
            if (isHeader)
            {
                headerText = text;
                break;
            }

            if (map is null && text.StartsWith('#'))
            {
                ReadOpenMetadata(text, lineNo, metadata, file);
            }

            preamble.Add((lineNo, text));
            pos = next;
            lineNo++;
            if (map?.HeaderStartsWith is not null && lineNo > 500)
            {
                throw new WeatherDataException(WeatherErrorKind.MissingHeader, file, $"no line in the first 500 starts with '{map.HeaderStartsWith}'", MapHeaderFix(map));
            }
        }

        int headerLine = lineNo;
        char sep = map?.Separator ?? ',';
        if (!headerText.Contains(sep))
        {
            char? other = headerText.Contains(';') ? ';' : headerText.Contains('\t') ? '\t' : headerText.Contains('|') ? '|' : null;
            if (other is char o)
            {
                throw new WeatherDataException(WeatherErrorKind.WrongSeparator, file,
                    $"the column names are separated by '{(o == '\t' ? "tab" : o.ToString())}', not by '{sep}'",
                    map is null ? "Save the file with commas between fields and a dot as the decimal separator (the open layout is comma-separated)"
                                : "Set separator = \"" + (o == '\t' ? "\\t" : o.ToString()) + "\" in the column map, or save the file comma-separated",
                    line: headerLine, value: headerText);
            }
        }

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
        string[] headers = reader.Headers.ToArray();
        map ??= OpenLayoutMap(headers, file, headerLine);
        var table = new RawWeatherTable(file, map, openLayout: map.Source == "open layout");
        foreach (var (k, v) in metadata)
        {
            table.Metadata[k] = v;
        }

        if (table.IsOpenLayout && metadata.TryGetValue("typical_year", out var typ))
        {
            table.TypicalYear = typ.Item1.Trim().ToLowerInvariant() switch
            {
                "true" or "yes" => true,
                "false" or "no" => false,
                _ => throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, "typical_year must be true or false", "Write '# typical_year: true' or remove the line", line: typ.Item2, value: typ.Item1),
            };
        }
        else
        {
            table.TypicalYear = map.TypicalYear;
        }

        ReadMapMetadata(map, preamble, table, file);

        int timeIndex = FindColumn(headers, map.Time.Column, WeatherErrorKind.MissingTimeColumn, file, headerLine, map, "time");
        int clockIndex = map.Time.TimeColumn is string tc ? FindColumn(headers, tc, WeatherErrorKind.MissingTimeColumn, file, headerLine, map, "time of day") : -1;
        var columns = new List<(WeatherQuantity Q, int Index, double Factor, double Offset, List<double> Values)>();
        foreach (var (q, spec) in map.Columns)
        {
            var kind = q == WeatherQuantity.DryBulb ? WeatherErrorKind.MissingDryBulb : q == WeatherQuantity.Pressure ? WeatherErrorKind.MissingHeader : WeatherErrorKind.MissingHumidity;
            int idx = FindColumn(headers, spec.Name, kind, file, headerLine, map, Describe(q));
            var (f, o) = WeatherUnits.ToInternal(q, spec);
            var list = new List<double>(8784);
            table.Values[q] = list;
            table.ColumnNames[q] = headers[idx];
            columns.Add((q, idx, f, o, list));
        }

        var missing = map.MissingCodes.Where(c => c.Length > 0).Select(c => Encoding.UTF8.GetBytes(c.Trim())).ToArray();
        bool iso = map.Time.Format == "iso";
        int headerCount = headers.Length;
        int trailing = 0;
        while (reader.Read())
        {
            int line = headerLine + (int)reader.LineNumber - 1;
            int fc = reader.FieldCount;
            if (fc == 1 && reader.IsEmpty(0))
            {
                if (map.EndAtBlankLine)
                {
                    while (reader.Read())
                    {
                        trailing++;
                    }

                    break;
                }

                continue;
            }

            if (fc != headerCount)
            {
                string raw = Encoding.UTF8.GetString(reader.RawRecord);
                bool decimalComma = fc > headerCount && Regex.IsMatch(raw, @"\d,\d");
                throw new WeatherDataException(WeatherErrorKind.WrongFieldCount, file,
                    $"the row has {fc} fields but the header has {headerCount}",
                    fc < headerCount
                        ? "The line looks cut short: complete it or delete it (a file cut off during download or copy ends like this)"
                        : decimalComma
                            ? "A comma may be used as the decimal separator: write decimals with a dot (12.5, not 12,5)"
                            : "Remove the extra fields, or quote text that contains the separator",
                    line: line, value: raw);
            }

            DateTime time;
            int writtenYear;
            if (iso)
            {
                if (!IsoTime.TryParse(reader.GetSpan(timeIndex), out time, out bool was24))
                {
                    throw BadTime(file, line, headers[timeIndex], reader.GetString(timeIndex), "yyyy-MM-ddTHH:mm (ISO 8601, local standard time)");
                }

                writtenYear = was24 ? time.AddDays(-1).Year : time.Year;
            }
            else
            {
                string text = reader.GetString(timeIndex);
                if (!TryParseExact24(text, map.Time.Format, out var date, out bool was24))
                {
                    throw BadTime(file, line, headers[timeIndex], text, map.Time.Format);
                }

                writtenYear = was24 ? date.AddDays(-1).Year : date.Year;
                time = date;
                if (clockIndex >= 0)
                {
                    string clock = reader.GetString(clockIndex);
                    if (!TryParseExact24("2001-01-01 " + clock, "yyyy-MM-dd " + map.Time.TimeFormat, out var tod, out _))
                    {
                        throw BadTime(file, line, headers[clockIndex], clock, map.Time.TimeFormat!);
                    }

                    time = date.Date + (tod - new DateTime(2001, 1, 1));
                    writtenYear = date.Year;
                }
            }

            table.Times.Add(time);
            table.WrittenYears.Add(writtenYear);
            table.Lines.Add(line);
            foreach (var (q, idx, f, o, list) in columns)
            {
                var span = reader.GetSpan(idx);
                if (span.IsEmpty || IsMissing(span, missing))
                {
                    list.Add(double.NaN);
                    continue;
                }

                if (!double.TryParse(span, NumberStyles.Float, CultureInfo.InvariantCulture, out double raw) || !double.IsFinite(raw))
                {
                    string s = Encoding.UTF8.GetString(span);
                    throw new WeatherDataException(WeatherErrorKind.NotANumber, file, $"the {Describe(q)} is not a number", s.Contains(',')
                        ? "Write decimals with a dot (12.5, not 12,5)"
                        : "Write a number, or leave the field empty (or use a missing-value code" + (table.IsOpenLayout ? " such as NA" : " the map lists") + ") where the value is missing",
                        line: line, column: headers[idx], value: s);
                }

                double v = raw * f + o;
                var (low, high) = Range(q);
                if (!(v >= low && v <= high))
                {
                    throw OutOfRange(table, q, headers[idx], line, raw, v, span);
                }

                if (q == WeatherQuantity.RelativeHumidity && v > 100.0)
                {
                    table.Quality.Count(QualityKeys.RhClamped, Inv($"line {line}: RH {v:0.##} % set to 100 %"));
                    v = 100.0;
                }

                list.Add(v);
            }
        }

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

    private static void ReadOpenMetadata(string text, int line, Dictionary<string, (string, int?)> metadata, string file)
    {
        string body = text.TrimStart('#').Trim();
        int colon = body.IndexOf(':');
        if (colon <= 0)
        {
            return;
        }

        string key = body[..colon].Trim().ToLowerInvariant();
        if (key is "name" or "elevation_m" or "elevation_ft" or "latitude" or "longitude" or "utc_offset_h" or "typical_year")
        {
            if (metadata.ContainsKey(key))
            {
                throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, $"the metadata key '{key}' is given twice", "Keep one of the two lines", line: line);
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

            if (!OpenColumns.TryGetValue(h, out var qu))
            {
                continue;
            }

            if (columns.TryGetValue(qu.Q, out var existing))
            {
                throw new WeatherDataException(WeatherErrorKind.DuplicateColumn, file, $"the columns '{existing.Name}' and '{h}' both give the {Describe(qu.Q)}",
                    "Keep one of them", line: headerLine, column: h);
            }

            columns[qu.Q] = new ColumnSpec(h, qu.Unit);
        }

        string found = headers.Length == 0 ? "none" : string.Join(", ", headers.Select(x => "'" + x + "'"));
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

        if (!columns.Keys.Any(IsHumidity))
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

    internal static bool IsHumidity(WeatherQuantity q) => q is WeatherQuantity.DewPoint or WeatherQuantity.HumidityRatio or WeatherQuantity.WetBulb or WeatherQuantity.RelativeHumidity;

    internal static string Describe(WeatherQuantity q) => q switch
    {
        WeatherQuantity.DryBulb => "dry-bulb",
        WeatherQuantity.DewPoint => "dew point",
        WeatherQuantity.HumidityRatio => "humidity ratio",
        WeatherQuantity.WetBulb => "wet-bulb",
        WeatherQuantity.RelativeHumidity => "relative humidity",
        _ => "pressure",
    };

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
                "Check that this file has the layout the map describes (columns found: " + string.Join(", ", headers.Take(12).Select(h => "'" + h + "'")) + (headers.Length > 12 ? ", ..." : "") + ")",
                line: headerLine, column: name);
        }

        return idx;
    }

    private static bool IsMissing(ReadOnlySpan<byte> span, byte[][] codes)
    {
        foreach (var c in codes)
        {
            if (span.SequenceEqual(c))
            {
                return true;
            }
        }

        return span.Length is 2 or 3 && (span.SequenceEqual("NA"u8) || span.SequenceEqual("NaN"u8) || span.SequenceEqual("nan"u8));
    }

    private static WeatherDataException BadTime(string file, int line, string column, string text, string format) =>
        new(WeatherErrorKind.BadTimestamp, file, "the time does not read as " + format, "Write every time in that format", line: line, column: column, value: text);

    private static WeatherDataException OutOfRange(RawWeatherTable table, WeatherQuantity q, string column, int line, double raw, double v, ReadOnlySpan<byte> span)
    {
        var (low, high) = Range(q);
        string unit = WeatherUnits.InternalUnit(q);
        string shown = q == WeatherQuantity.Pressure ? Inv($"{v / 1000:0.###} kPa") : Inv($"{v:0.####} {unit}");
        string range = q == WeatherQuantity.Pressure ? Inv($"{low / 1000:0} to {high / 1000:0} kPa") : Inv($"{low:0.###} to {high:0.###} {unit}");
        string fix = q switch
        {
            WeatherQuantity.Pressure when WeatherUnits.PlausiblePressureUnits(raw).FirstOrDefault() is string u =>
                table.IsOpenLayout ? $"The number looks like a pressure in {u}: name the column pressure_{(u == "mbar" ? "hpa" : u)}" : $"The number looks like a pressure in {u}: set unit = \"{u}\" for the pressure in the map",
            WeatherQuantity.DryBulb or WeatherQuantity.DewPoint or WeatherQuantity.WetBulb when (raw - 32) / 1.8 >= low && (raw - 32) / 1.8 <= high && column.EndsWith("_c", StringComparison.OrdinalIgnoreCase) =>
                "If the column is in F, name it with _f instead of _c; otherwise correct the value",
            WeatherQuantity.RelativeHumidity when raw is >= 0 and <= 1.03 && !table.IsOpenLayout => "Values above 103 % are not physical; correct the value",
            WeatherQuantity.HumidityRatio when raw is > 0.05 and < 50 => "The number looks like g/kg or gr/lb: the open layout's humidity_ratio is in kg/kg (lb/lb), e.g. 0.0095",
            _ => "Correct the value, or leave the field empty to have short gaps filled",
        };
        return new WeatherDataException(WeatherErrorKind.ValueOutOfRange, table.File, $"the {Describe(q)} {shown} is outside the physical range {range}", fix,
            line: line, column: column, value: Encoding.UTF8.GetString(span));
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
            if (DateTime.TryParseExact(zero, format, CultureInfo.InvariantCulture, DateTimeStyles.None, out value) && value.TimeOfDay.Hours == 0 && value.Minute == 0)
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
