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

    private static readonly string[] OpenMissing = ["null"];

    /// <summary>Codes that mean "missing" in every layout.</summary>
    private static readonly byte[][] DefaultMissing = ["NA"u8.ToArray(), "NaN"u8.ToArray(), "nan"u8.ToArray()];

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

    /// <summary>
    /// Parses a file's bytes with a map (null: the open layout). With <paramref name="statesFor"/>, the rows' moist-air
    /// states are solved on the way (<see cref="RowStates"/>), for the builder reading with those options.
    /// </summary>
    public static RawWeatherTable Parse(byte[] data, string file, ColumnMap? map, WeatherReadOptions? statesFor = null)
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
                    $"the column names are separated by '{(o == '\t' ? "tab" : FileExcerpt.Of(o.ToString()))}', not by '{sep}'",
                    map is null ? "Save the file with commas between fields and a dot as the decimal separator (the open layout is comma-separated)"
                                : "Set separator = \"" + (o == '\t' ? "\\t" : o.ToString()) + "\" in the column map, or save the file comma-separated",
                    line: headerLine, value: headerText);
            }
        }

        // Without a quote in the data every record is one line, so a row's line follows from its count and the reader
        // need not count lines; without a space or tab there is nothing to trim. Both only save time: the rows, their
        // lines and their values are the same either way.
        var body = data.AsSpan(pos);
        bool quoteOrSpace = body.IndexOfAny((byte)'"', (byte)' ', (byte)'\t') >= 0;
        bool quoted = quoteOrSpace && body.Contains((byte)'"');
        var options = new CsvReaderOptions
        {
            Separator = sep,
            HasHeader = true,
            TrackLineNumbers = quoted,
            SkipEmptyLines = false,
            TrimWhitespace = quoteOrSpace && body.IndexOfAny((byte)' ', (byte)'\t') >= 0,
            FormatProvider = CultureInfo.InvariantCulture,
        };
        using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(data, pos, data.Length - pos), options);
        string[] headers = reader.Headers.Select(h => h.Trim()).ToArray();
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
        // Arrays sized from the line count: one row a line after the column names, so the arrays are exactly as long as
        // the rows unless the file has blank lines (or lone carriage returns as line breaks: then they grow).
        int newlines = body.Count((byte)'\n');
        int capacity = Math.Max(16, newlines - (body[^1] == '\n' ? 1 : 0));
        // Not zeroed: the rows fill them from the start, and only the first rows' entries are read.
        var times = GC.AllocateUninitializedArray<DateTime>(capacity);
        var writtenYears = GC.AllocateUninitializedArray<int>(capacity);
        var lines = GC.AllocateUninitializedArray<int>(capacity);
        var columns = new NumberColumn[map.Columns.Count];
        int c0 = 0;
        foreach (var (q, spec) in map.Columns)
        {
            var kind = q == WeatherQuantity.DryBulb ? WeatherErrorKind.MissingDryBulb : q == WeatherQuantity.Pressure ? WeatherErrorKind.MissingHeader : WeatherErrorKind.MissingHumidity;
            int idx = FindColumn(headers, spec.Name, kind, file, headerLine, map, Describe(q));
            var (f, o) = WeatherUnits.ToInternal(q, spec);
            var (low, high) = Range(q);
            table.ColumnNames[q] = headers[idx];
            columns[c0++] = new NumberColumn(q, idx, f, o, low, high, GC.AllocateUninitializedArray<double>(capacity));
        }

        var states = statesFor is null ? null : PlanStates(table, columns, capacity, statesFor);
        var missing = map.MissingCodes.Where(c => c.Length > 0).Select(c => Encoding.UTF8.GetBytes(c.Trim())).Concat(DefaultMissing).ToArray();
        var missingStarts = System.Buffers.SearchValues.Create(missing.Select(c => c[0]).Distinct().ToArray());

        // A comma inside a field is possible only in a quoted field, or when the separator is another character; a
        // missing-value code such as -9900 reads as a number. Where neither can happen, the rows skip the field text.
        bool commaPossible = quoted || sep != ',';
        bool numericCode = missing.Any(code => double.TryParse(code, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v));
        var layout = new RowLayout(table, map, headers, headerLine, timeIndex, clockIndex, quoted, options.TrimWhitespace == true, commaPossible, commaPossible || numericCode, missing, missingStarts, states);
        int row, trailing = 0;
        bool solved;
        if (Pieces(data, pos, newlines, layout) is int[] cuts)
        {
            (row, solved) = ReadRowsInPieces(data, cuts, options, layout, times, writtenYears, lines, columns);
        }
        else
        {
            row = ReadRows(reader, layout, ref times, ref writtenYears, ref lines, columns, 0, canGrow: true, out trailing);
            solved = times.Length == capacity && SolveStates(layout, columns, 0, row);
        }

        table.SetRows(times, writtenYears, lines, row);
        table.States = solved ? states : null;
        foreach (var column in columns)
        {
            table.Values[column.Quantity] = column.Values;
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

    /// <summary>Files with at least this many data lines are parsed in pieces on all cores (where the machine has a second core).</summary>
    internal const int ParallelLines = 2048;

    /// <summary>About how many lines make a piece: small enough that a core that starts late still finds pieces left.</summary>
    private const int LinesPerPiece = 1024;

    /// <summary>
    /// Where the data lines can be cut into pieces for <see cref="ReadRowsInPieces"/>: the offsets of each piece's first
    /// line, then the end of the data; or null when the file must be read in one pass. It must be one pass when a
    /// record can span lines (a quote in the data), when lines end in lone carriage returns (the line count would be
    /// wrong), when a map stops at a blank line (a later piece would not know), when the file is short, or on a
    /// single core.
    /// </summary>
    private static int[]? Pieces(byte[] data, int pos, int newlines, RowLayout layout)
    {
        var body = data.AsSpan(pos);
        if (layout.Quoted || layout.Map.EndAtBlankLine || Environment.ProcessorCount < 2 || newlines < ParallelLines
            || (body.Contains((byte)'\r') && body.Count((byte)'\r') != body.Count("\r\n"u8)))
        {
            return null;
        }

        int start = pos + body.IndexOf((byte)'\n') + 1;
        int count = Math.Min(16, newlines / LinesPerPiece);
        var cuts = new List<int>(count + 1) { start };
        for (int k = 1; k < count; k++)
        {
            int target = start + (int)((long)(data.Length - start) * k / count);
            int next = data.AsSpan(target).IndexOf((byte)'\n');
            if (next >= 0 && target + next + 1 < data.Length && target + next + 1 > cuts[^1])
            {
                cuts.Add(target + next + 1);
            }
        }

        cuts.Add(data.Length);
        return cuts.Count >= 3 ? cuts.ToArray() : null;
    }

    /// <summary>
    /// <see cref="ReadRows"/> over the pieces of the data between <paramref name="cuts"/>, on all cores, each piece
    /// solving its rows' states after its rows and counting its repairs on its own. Every record is one line, so a
    /// piece's first line and row follow from the lines before it; the rows are then moved up where earlier pieces had
    /// blank lines, and the repairs joined in file order. The mistake reported is the first in file order, as a single
    /// pass would report it.
    /// </summary>
    private static (int Rows, bool Solved) ReadRowsInPieces(byte[] data, int[] cuts, CsvReaderOptions options, RowLayout layout,
        DateTime[] times, int[] writtenYears, int[] lines, NumberColumn[] columns)
    {
        int pieces = cuts.Length - 1;
        var firstRow = new int[pieces]; // the data lines before each piece
        for (int k = 1; k < pieces; k++)
        {
            firstRow[k] = firstRow[k - 1] + data.AsSpan(cuts[k - 1], cuts[k] - cuts[k - 1]).Count((byte)'\n');
        }

        var pieceOptions = new CsvReaderOptions
        {
            Separator = options.Separator,
            HasHeader = false,
            TrackLineNumbers = false,
            SkipEmptyLines = false,
            TrimWhitespace = options.TrimWhitespace,
            FormatProvider = CultureInfo.InvariantCulture,
        };
        var ends = new int[pieces];
        var solved = new bool[pieces];
        var tables = new RawWeatherTable[pieces];
        Concurrency.Pieces.Run(pieces, k =>
        {
            tables[k] = new RawWeatherTable(layout.File, layout.Map, layout.Table.IsOpenLayout);
            var pieceLayout = layout with { Table = tables[k], HeaderLine = layout.HeaderLine + firstRow[k] };
            using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(data, cuts[k], cuts[k + 1] - cuts[k]), pieceOptions);
            var (t, y, l) = (times, writtenYears, lines);
            ends[k] = ReadRows(reader, pieceLayout, ref t, ref y, ref l, columns, firstRow[k], canGrow: false, out _);
            solved[k] = SolveStates(pieceLayout, columns, firstRow[k], ends[k]);
        });

        int rows = 0;
        for (int k = 0; k < pieces; k++)
        {
            int count = ends[k] - firstRow[k];
            if (rows < firstRow[k])
            {
                // Blank lines before this piece: its rows move up behind the rows before them.
                Array.Copy(times, firstRow[k], times, rows, count);
                Array.Copy(writtenYears, firstRow[k], writtenYears, rows, count);
                Array.Copy(lines, firstRow[k], lines, rows, count);
                foreach (var column in columns)
                {
                    Array.Copy(column.Values, firstRow[k], column.Values, rows, count);
                }

                layout.States?.Move(firstRow[k], rows, count);
            }

            rows += count;
            layout.Table.Quality.Append(tables[k].Quality);
        }

        return (rows, solved.All(s => s));
    }

    /// <summary>
    /// The states the rows' moist-air state will be solved into (<see cref="RowStates"/>), or null where the parser
    /// cannot solve them: no dew point column, or no pressure for the rows yet.
    /// </summary>
    private static RowStates? PlanStates(RawWeatherTable table, NumberColumn[] columns, int capacity, WeatherReadOptions options)
    {
        if (!columns.Any(c => c.Quantity == WeatherQuantity.DewPoint))
        {
            return null;
        }

        bool rh = columns.Any(c => c.Quantity == WeatherQuantity.RelativeHumidity);
        if (columns.Any(c => c.Quantity == WeatherQuantity.Pressure))
        {
            return new RowStates(capacity, null, rh);
        }

        return WeatherRecordBuilder.PressureWithoutColumn(table, options) is double constant ? new RowStates(capacity, constant, rh) : null;
    }

    /// <summary>Solves the states of rows [<paramref name="start"/>, <paramref name="end"/>) where the layout plans them; false where it does not or cannot.</summary>
    private static bool SolveStates(RowLayout layout, NumberColumn[] columns, int start, int end)
    {
        if (layout.States is not { } states)
        {
            return false;
        }

        double[]? Of(WeatherQuantity q) => Array.Find(columns, c => c.Quantity == q).Values;
        return states.Solve(Of(WeatherQuantity.DryBulb)!, Of(WeatherQuantity.DewPoint)!, states.ConstantPressurePa is null ? Of(WeatherQuantity.Pressure) : null, start, end);
    }

    /// <summary>What the row loop needs to know about the file, fixed once the column names are read.</summary>
    private sealed record RowLayout(RawWeatherTable Table, ColumnMap Map, string[] Headers, int HeaderLine, int TimeIndex, int ClockIndex,
        bool Quoted, bool Spaces, bool CommaPossible, bool NumbersNeedText, byte[][] Missing, System.Buffers.SearchValues<byte> MissingStarts, RowStates? States)
    {
        public string File => Table.File;
    }

    /// <summary>
    /// Reads the rows after the column names into the arrays from row <paramref name="start"/> on (growing them, where
    /// <paramref name="canGrow"/>, if the file has more rows than lines counted) and returns the row after the last;
    /// <paramref name="trailing"/> counts the lines ignored after a blank line where the map says so.
    /// </summary>
    private static int ReadRows(CsvReader reader, RowLayout layout, ref DateTime[] times, ref int[] writtenYears, ref int[] lines,
        NumberColumn[] columns, int start, bool canGrow, out int trailing)
    {
        trailing = 0;
        int headerCount = layout.Headers.Length;
        bool iso = layout.Map.Time.Format == "iso";
        var isoTimes = default(IsoTime.Reader);
        bool quoted = layout.Quoted;
        bool spaces = layout.Spaces; // without a space or tab in the data, no field needs trimming
        bool numbersNeedText = layout.NumbersNeedText;
        int records = 0;
        int row = start;
        while (reader.Read())
        {
            records++;
            int line = quoted ? layout.HeaderLine + (int)reader.LineNumber - 1 : layout.HeaderLine + records;
            int fc = reader.FieldCount;
            if (fc == 1 && reader.IsEmpty(0))
            {
                if (layout.Map.EndAtBlankLine)
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
                throw WrongFieldCount(reader, layout, fc, line);
            }

            if (row == times.Length)
            {
                if (!canGrow)
                {
                    throw new InvalidOperationException("more rows than lines in a piece of the file");
                }

                int grown = Math.Max(16, 2 * row);
                Array.Resize(ref times, grown);
                Array.Resize(ref writtenYears, grown);
                Array.Resize(ref lines, grown);
                foreach (ref var column in columns.AsSpan())
                {
                    column = column with { Values = Grow(column.Values, grown) };
                }
            }

            DateTime time;
            int writtenYear;
            if (!iso)
            {
                time = MappedTime(reader, layout, line, out writtenYear);
            }
            else if (!isoTimes.TryParse(spaces ? reader.GetSpan(layout.TimeIndex).Trim(" \t"u8) : reader.GetSpan(layout.TimeIndex), out time, out writtenYear))
            {
                throw BadTime(layout.File, line, layout.Headers[layout.TimeIndex], reader.GetString(layout.TimeIndex), "yyyy-MM-ddTHH:mm (ISO 8601, local standard time)");
            }

            times[row] = time;
            writtenYears[row] = writtenYear;
            lines[row] = line;
            foreach (ref readonly var column in columns.AsSpan())
            {
                // Where no missing-value code reads as a number and no field can hold a comma, a field that parses to a
                // finite number is one; only the others need their text looked at.
                if (numbersNeedText || !reader.TryParse<double>(column.Index, out double raw) || !double.IsFinite(raw))
                {
                    raw = NumberFromText(reader, layout, column, line);
                    if (double.IsNaN(raw))
                    {
                        column.Values[row] = double.NaN;
                        continue;
                    }
                }

                double v = raw * column.Factor + column.Offset;
                if (!(v >= column.Low && v <= column.High))
                {
                    throw OutOfRange(layout.Table, column.Quantity, layout.Headers[column.Index], line, raw, v, reader.GetSpan(column.Index).Trim(" \t"u8));
                }

                if (v > 100.0 && column.Quantity == WeatherQuantity.RelativeHumidity)
                {
                    layout.Table.Quality.Count(QualityKeys.RhClamped, Inv($"line {line}: RH {v:0.##} % set to 100 %"));
                    v = 100.0;
                }

                column.Values[row] = v;
            }

            row++;
        }

        return row;
    }

    /// <summary>A number field read from its text: NaN for a missing-value code or an empty field; an error for anything but a finite number.</summary>
    private static double NumberFromText(CsvReader reader, RowLayout layout, in NumberColumn column, int line)
    {
        var span = reader.GetSpan(column.Index).Trim(" \t"u8);
        if (span.IsEmpty || (layout.MissingStarts.Contains(span[0]) && IsMissing(span, layout.Missing)))
        {
            return double.NaN;
        }

        // A comma inside a (quoted) number would be read as a thousands separator: refuse it first.
        if ((layout.CommaPossible && span.Contains((byte)',')) || !reader.TryParse<double>(column.Index, out double raw) || !double.IsFinite(raw))
        {
            string s = Encoding.UTF8.GetString(span);
            throw new WeatherDataException(WeatherErrorKind.NotANumber, layout.File, $"the {Describe(column.Quantity)} is not a number", s.Contains(',')
                ? "Write decimals with a dot (12.5, not 12,5)"
                : "Write a number, or leave the field empty (or use a missing-value code" + (layout.Table.IsOpenLayout ? " such as NA" : " the map lists") + ") where the value is missing",
                line: line, column: layout.Headers[column.Index], value: s);
        }

        return raw;
    }

    /// <summary>The time of a row in a map's format (one or two columns).</summary>
    private static DateTime MappedTime(CsvReader reader, RowLayout layout, int line, out int writtenYear)
    {
        var timeLayout = layout.Map.Time;
        string text = reader.GetString(layout.TimeIndex);
        if (!TryParseExact24(text, timeLayout.Format, out var date, out bool was24))
        {
            throw BadTime(layout.File, line, layout.Headers[layout.TimeIndex], text, timeLayout.Format);
        }

        writtenYear = was24 ? date.AddDays(-1).Year : date.Year;
        if (layout.ClockIndex < 0)
        {
            return date;
        }

        string clock = reader.GetString(layout.ClockIndex);
        if (!TryParseExact24("2001-01-01 " + clock, "yyyy-MM-dd " + timeLayout.TimeFormat, out var tod, out _))
        {
            throw BadTime(layout.File, line, layout.Headers[layout.ClockIndex], clock, timeLayout.TimeFormat!);
        }

        writtenYear = date.Year;
        return date.Date + (tod - new DateTime(2001, 1, 1));
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

            if (!OpenColumns.TryGetValue(h, out var qu))
            {
                continue;
            }

            if (columns.TryGetValue(qu.Q, out var existing))
            {
                throw new WeatherDataException(WeatherErrorKind.DuplicateColumn, file, $"the columns '{FileExcerpt.Of(existing.Name)}' and '{FileExcerpt.Of(h)}' both give the {Describe(qu.Q)}",
                    "Keep one of them", line: headerLine, column: h);
            }

            columns[qu.Q] = new ColumnSpec(h, qu.Unit);
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
                "Check that this file has the layout the map describes (columns found: " + FileExcerpt.List(headers) + ")",
                line: headerLine, column: name);
        }

        return idx;
    }

    /// <summary>One number column being read: where it is, how its unit converts, its physical range and its values.</summary>
    private readonly record struct NumberColumn(WeatherQuantity Quantity, int Index, double Factor, double Offset, double Low, double High, double[] Values);

    private static double[] Grow(double[] values, int length)
    {
        Array.Resize(ref values, length);
        return values;
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

        return false;
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
