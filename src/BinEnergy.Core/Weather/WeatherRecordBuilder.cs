using System.Globalization;
using System.Runtime.Intrinsics;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Turns a parsed table into an hourly record: site metadata and pressure (DESIGN 5.1), the
/// calendar (5.3: hour-ending shift, UTC to local standard time, typical years keyed on month,
/// day and hour), order checks, gap filling and the humidity rules (5.4), then the moist-air
/// state of each hour.
/// </summary>
internal static class WeatherRecordBuilder
{
    private const double DewPointClampToleranceK = 1.0;
    private const double RhDisagreementPoints = 5.0;
    private const double TemperatureDisagreementK = 1.0;
    private static readonly TimeSpan Hour = TimeSpan.FromHours(1);
    private static readonly DateTime Noon = new(2000, 1, 1, 12, 0, 0);

    public static HourlyWeather Build(RawWeatherTable raw, WeatherReadOptions options)
    {
        var quality = raw.Quality;
        string file = raw.File;
        var map = raw.Map;

        double? lat = MetaNumber(raw, "latitude", -90, 90);
        double? lon = MetaNumber(raw, "longitude", -180, 180);
        double? elevation = Elevation(raw, options);
        double? offset;
        if (raw.Metadata.TryGetValue("utc_offset_h", out var off) && off.Value == "from_longitude")
        {
            if (lon is not double longitude)
            {
                throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, "the map estimates the UTC offset from the longitude, but no longitude was found",
                    "Give the map a fixed utc_offset_h = { value = ... }");
            }

            offset = Math.Round(longitude / 15.0);
            if (map.Time.Utc)
            {
                quality.Warn(Inv($"times are UTC; local standard time taken as UTC{offset:+0;-0;+0} h, the standard meridian nearest longitude {longitude:0.###} (give the map a fixed utc_offset_h if the local zone differs)"));
            }
        }
        else
        {
            offset = MetaNumber(raw, "utc_offset_h", -12, 14);
        }

        string name = raw.Metadata.TryGetValue("name", out var nm) && nm.Value.Trim().Length > 0 ? nm.Value.Trim() : BaseName(file);

        // Calendar: shift to hour-beginning local standard time.
        double shiftHours = map.Time.HourEnding ? -1.0 : 0.0;
        if (map.Time.Utc)
        {
            if (offset is not double o)
            {
                throw new WeatherDataException(WeatherErrorKind.BadMetadata, file, "the times are UTC but the file gives no UTC offset for local standard time",
                    "Add utc_offset_h to the map's [metadata] table");
            }

            shiftHours += o;
        }

        int n = raw.Count;
        long shiftTicks = Noon.AddHours(shiftHours).Ticks - Noon.Ticks; // what AddHours adds, whatever the date
        var shifted = Shift(raw.Times, n, shiftTicks);

        bool typical = raw.TypicalYear ?? DetectTypicalYear(shifted, raw.WrittenYears);
        int calendarYear = options.CalendarYear;
        string calendarNote;
        int[]? order; // the rows in the order of their hours; null: file order
        DateTime[] keys;
        if (typical)
        {
            if (HasLeapDay(shifted) && !DateTime.IsLeapYear(calendarYear))
            {
                calendarYear = LeapYearStartingLike(calendarYear);
            }

            // Each hour moves to the same month, day and time of day in the calendar year; the move is worked out once a day.
            // The keys take the shifted times' place (each is read before its key is written).
            keys = shifted;
            var place = new sbyte[n]; // -1: moved to the front of the year, 1: to the back, 0: stays
            int front = 0, back = 0;
            long dayStart = 1, dayEnd = 0, move = 0;
            int year = 0;
            for (int i = 0; i < n; i++)
            {
                long ticks = shifted[i].Ticks;
                if (ticks < dayStart || ticks >= dayEnd)
                {
                    var day = shifted[i].Date;
                    (dayStart, dayEnd, year) = (day.Ticks, day.Ticks + TimeSpan.TicksPerDay, day.Year);
                    move = new DateTime(calendarYear, day.Month, day.Day).Ticks - day.Ticks;
                }

                keys[i] = new DateTime(ticks + move);
                int written = raw.WrittenYears[i];
                if (year != written)
                {
                    place[i] = year > written ? (sbyte)-1 : (sbyte)1;
                    (year > written ? ref front : ref back)++;
                }
            }

            if (front + back > 0)
            {
                quality.Warn($"{front + back} hour(s) crossed the year boundary when shifted to hour-beginning local standard time and were moved to the other end of the typical year");
            }

            order = front + back > 0 ? OrderByPlace(place) : null;
            string start = new DateTime(calendarYear, 1, 1).DayOfWeek.ToString();
            calendarNote = Inv($"typical year (months from different years), keyed on month, day and hour; weekdays from {calendarYear}, a {(DateTime.IsLeapYear(calendarYear) ? "leap" : "non-leap")} year starting on a {start}")
                + (calendarYear != options.CalendarYear ? Inv($" (the record has a 29 February, so {calendarYear} is used instead of {options.CalendarYear})") : "");
        }
        else
        {
            keys = shifted;
            order = null;
            calendarYear = shifted[0].Year;
            calendarNote = shifted[0].Year == shifted[^1].Year
                ? Inv($"calendar year {calendarYear} as recorded, with its own dates and weekdays")
                : Inv($"{shifted[0]:yyyy-MM-dd} to {shifted[^1]:yyyy-MM-dd} as recorded, with their own dates and weekdays");
        }

        if (map.Time.HourEnding)
        {
            quality.Warn("hour-ending times shifted back one hour to hour-beginning");
        }

        // Order checks and the hourly grid. Rows in file order, one hour apart, are the grid itself; others are placed on it.
        DateTime first = keys[order?[0] ?? 0];
        bool inFileOrder = order is null && OneHourApart(keys);
        var gridIndex = inFileOrder ? null : new int[n];
        int prev = order?[0] ?? 0;
        for (int k = 1; k < n && !inFileOrder; k++)
        {
            int i = order?[k] ?? k;
            var step = keys[i] - keys[prev];
            if (step.Ticks == TimeSpan.TicksPerHour)
            {
                gridIndex![i] = gridIndex[prev] + 1;
                prev = i;
                continue;
            }

            if (step == TimeSpan.Zero)
            {
                throw new WeatherDataException(WeatherErrorKind.DuplicateTime, file, $"the hour {Show(keys[i], typical)} appears twice, on lines {raw.Lines[prev]} and {raw.Lines[i]}",
                    "Delete one of the two rows", line: raw.Lines[i], column: map.Time.Column, value: RawTime(raw, i));
            }

            if (step < TimeSpan.Zero)
            {
                throw new WeatherDataException(WeatherErrorKind.TimeOutOfOrder, file, $"the hour {Show(keys[i], typical)} comes before {Show(keys[prev], typical)} on line {raw.Lines[prev]}",
                    "Sort the rows by time (each row must be one hour after the one before)", line: raw.Lines[i], column: map.Time.Column, value: RawTime(raw, i));
            }

            if (step.Ticks % Hour.Ticks != 0)
            {
                throw new WeatherDataException(WeatherErrorKind.NonHourlyStep, file,
                    Inv($"the row is {step.TotalMinutes:0.#} minutes after the one on line {raw.Lines[prev]}; the reader needs hourly rows"),
                    "Average sub-hourly data to whole hours first (one row per hour, on the hour)", line: raw.Lines[i], column: map.Time.Column, value: RawTime(raw, i));
            }

            gridIndex![i] = gridIndex[prev] + (int)(step.Ticks / Hour.Ticks);
            if (gridIndex[i] > 24 * 366 * 30)
            {
                throw new WeatherDataException(WeatherErrorKind.NonHourlyStep, file, "the record spans more than 30 years", "Split the file into years", line: raw.Lines[i]);
            }

            prev = i;
        }

        int hours = inFileOrder ? n : gridIndex![order?[^1] ?? n - 1] + 1;
        DateTime[] times;
        int[] gridLine;
        var columns = new Dictionary<WeatherQuantity, double[]>();
        if (inFileOrder)
        {
            // Row i is hour i: the keys are the hours (a fresh array either way), and the parsed columns serve as they are.
            times = keys;
            gridLine = Exactly(raw.Lines, n);
            foreach (var (q, list) in raw.Values)
            {
                columns[q] = Exactly(list, n);
            }
        }
        else
        {
            times = new DateTime[hours];
            gridLine = new int[hours];
            for (int g = 0; g < hours; g++)
            {
                times[g] = new DateTime(first.Ticks + g * TimeSpan.TicksPerHour);
            }

            for (int i = 0; i < n; i++)
            {
                gridLine[gridIndex![i]] = raw.Lines[i];
            }

            foreach (var (q, list) in raw.Values)
            {
                var col = new double[hours];
                Array.Fill(col, double.NaN);
                for (int i = 0; i < n; i++)
                {
                    col[gridIndex![i]] = list[i];
                }

                columns[q] = col;
            }
        }

        var drop = new bool[hours];
        foreach (var (q, col) in columns.OrderBy(c => c.Key))
        {
            FillGaps(col, q, raw, times, gridLine, typical, options, drop, quality);
        }

        // Keep the hours not dropped.
        int kept = hours - drop.AsSpan().Count(true);
        if (kept < hours)
        {
            quality.Count(QualityKeys.LongGapHoursDropped, null, hours - kept);
            quality.Warn(Inv($"{hours - kept} hour(s) in long gaps were dropped: annual figures are for the {kept} hours present (scale by {8760.0 / kept:0.####} for a full year)"));
            if (kept == 0)
            {
                throw new WeatherDataException(WeatherErrorKind.LongGap, file, "every hour was dropped as part of a long gap", "Fill the data from another source");
            }
        }

        times = Keep(times, drop, kept);
        gridLine = Keep(gridLine, drop, kept);
        foreach (var q in columns.Keys.ToList())
        {
            columns[q] = Keep(columns[q], drop, kept);
        }

        // Site pressure (DESIGN 5.1).
        double sitePressure;
        SitePressureSource source;
        columns.TryGetValue(WeatherQuantity.Pressure, out var pressureColumn);
        if (elevation is double z)
        {
            sitePressure = Atmosphere.PressureAtElevationPa(z);
            source = SitePressureSource.StandardAtmosphereAtElevation;
        }
        else if (pressureColumn is not null)
        {
            sitePressure = pressureColumn.Average();
            source = SitePressureSource.RecordMean;
            quality.Warn("no elevation given: the site pressure is the mean of the record's pressure column");
        }
        else
        {
            sitePressure = Atmosphere.SeaLevelPressurePa;
            source = SitePressureSource.SeaLevelAssumed;
            quality.Warn("no elevation and no pressure column: sea-level pressure (101.325 kPa) assumed; give --elevation for a site above sea level");
        }

        if (pressureColumn is not null && kept > 24 && IsConstant(pressureColumn))
        {
            quality.Warn(Inv($"the pressure column is constant at {pressureColumn[0] / 1000:0.###} kPa: it looks filled rather than measured"));
        }

        var pressure = pressureColumn ?? Enumerable.Repeat(sitePressure, kept).ToArray();
        var site = new SiteInfo(name, elevation, lat, lon, offset, sitePressure, source);

        // Humidity (DESIGN 5.1 order: dew point, humidity ratio, wet-bulb, RH) and the clamps of 5.4.
        var dryBulb = columns[WeatherQuantity.DryBulb];
        var primary = new[] { WeatherQuantity.DewPoint, WeatherQuantity.HumidityRatio, WeatherQuantity.WetBulb, WeatherQuantity.RelativeHumidity }
            .First(columns.ContainsKey);

        // The states the parser solved for the rows are the hours' own when the hours are the rows in file order with none
        // dropped, the dew point is the measure used and the rows' pressure is the one settled here.
        var early = raw.States is { } solved && inFileOrder && kept == n && primary == WeatherQuantity.DewPoint
            && (pressureColumn is not null ? solved.ConstantPressurePa is null : solved.ConstantPressurePa == sitePressure) ? solved : null;
        var w = early is not null ? Exactly(early.HumidityRatio, kept) : new double[kept];
        var dewPoint = early is not null ? Exactly(early.DewPointC, kept) : new double[kept];
        var given = columns[primary];
        if (primary == WeatherQuantity.DewPoint)
        {
            ClampDewPoints(given, dryBulb, dewPoint, held: early is not null, gridLine, times, typical, quality);
        }

        for (int i = 0; i < kept && primary != WeatherQuantity.DewPoint; i++)
        {
            double t = dryBulb[i];
            double p = pressure[i];
            double v = given[i];
            switch (primary)
            {
                case WeatherQuantity.HumidityRatio:
                    double ws = Saturation.HumidityRatio(t, p);
                    if (v > ws)
                    {
                        quality.Count(QualityKeys.HumidityRatioAboveSaturationClamped,
                            Inv($"{Where(gridLine[i], times[i], typical)}: humidity ratio {v:0.#####} above saturation {ws:0.#####} at {t:0.0#} C, set to saturation"));
                        v = ws;
                    }

                    w[i] = v;
                    dewPoint[i] = HourlyStateSolver.DewPoint(v, p, t);
                    break;
                case WeatherQuantity.WetBulb:
                    if (v > t)
                    {
                        quality.Count(QualityKeys.WetBulbAboveDryBulbClamped,
                            Inv($"{Where(gridLine[i], times[i], typical)}: wet-bulb {v:0.0##} C above dry-bulb {t:0.0##} C, set to the dry-bulb"));
                        v = t;
                    }

                    double fromWetBulb;
                    try
                    {
                        fromWetBulb = MoistAir.HumidityRatioFromWetBulb(t, v, p);
                    }
                    catch (PsychrometricException)
                    {
                        throw new WeatherDataException(WeatherErrorKind.ValueOutOfRange, file,
                            Inv($"the wet-bulb {v:0.0#} C is too low for the dry-bulb {t:0.0#} C: even perfectly dry air has a higher wet-bulb"),
                            "Check the wet-bulb and dry-bulb columns (units, order)", line: gridLine[i] > 0 ? gridLine[i] : null, column: raw.ColumnNames[primary]);
                    }

                    w[i] = fromWetBulb;
                    dewPoint[i] = HourlyStateSolver.DewPoint(w[i], p, t);
                    break;
                default:
                    double pw = v / 100.0 * Saturation.VapourPressurePa(t);
                    w[i] = MoistAir.HumidityRatioFromVapourPressure(pw, p);
                    dewPoint[i] = pw > 0 ? Math.Min(HourlyStateSolver.DewPointFromVapourPressure(pw), t) : Saturation.MinTemperatureC;
                    break;
            }
        }

        // The moist-air state of every hour (Handbook ch. 1): the humidity ratio from the dew point (eqs. 5, 6 and 20) where
        // the dew point is the measure used, the wet-bulb (eqs. 33 and 35), the enthalpy (eq. 32) and, to check the file's
        // RH column, the RH (eq. 12); all per hour, so a long record is done in pieces on all cores.
        // Already done where the parser's states hold.
        bool fromDewPoint = primary == WeatherQuantity.DewPoint;
        var wetBulb = early is not null ? Exactly(early.WetBulbC, kept) : new double[kept];
        var enthalpy = early is not null ? Exactly(early.EnthalpyJPerKg, kept) : new double[kept];
        double[]? relativeHumidity = primary == WeatherQuantity.RelativeHumidity || !columns.ContainsKey(WeatherQuantity.RelativeHumidity) ? null
            : early?.RelativeHumidity is { } solvedRh ? Exactly(solvedRh, kept) : new double[kept];
        if (early is null)
        {
            HourlyStateBatchSolver.InPieces(kept, (start, length) => HourlyStateBatchSolver.States(dryBulb.AsSpan(start, length), pressure.AsSpan(start, length),
                dewPoint.AsSpan(start, length), w.AsSpan(start, length), fromDewPoint, wetBulb.AsSpan(start, length), enthalpy.AsSpan(start, length),
                relativeHumidity is null ? [] : relativeHumidity.AsSpan(start, length)));
        }

        var weather = new HourlyWeather(site, times, dryBulb, w, pressure, dewPoint, wetBulb, enthalpy, quality, new CalendarInfo(calendarYear, typical, calendarNote))
        {
            HourlyPressureFromRecord = pressureColumn is not null,
        };
        CheckSecondaryMeasures(weather, columns, primary, relativeHumidity, gridLine, typical, quality);
        return weather;
    }

    /// <summary>
    /// Dew point given (DESIGN 5.1): clamped to the dry-bulb and counted where above it (5.4). Where <paramref name="held"/>,
    /// the parser's states already hold the clamped dew points and only the counting is left.
    /// </summary>
    private static void ClampDewPoints(double[] given, double[] dryBulb, double[] dewPoint, bool held, int[] gridLine, DateTime[] times, bool typical, QualityReport quality)
    {
        if (!held)
        {
            given.AsSpan(0, dewPoint.Length).CopyTo(dewPoint);
        }

        for (int i = 0; (i = NextAbove(given, dryBulb, i)) < dewPoint.Length; i++)
        {
            double t = dryBulb[i];
            double v = given[i];
            bool suspect = v - t > DewPointClampToleranceK;
            quality.Count(suspect ? QualityKeys.DewPointAboveDryBulbSuspect : QualityKeys.DewPointAboveDryBulbClamped,
                Inv($"{Where(gridLine[i], times[i], typical)}: dew point {v:0.0##} C above dry-bulb {t:0.0##} C, set to the dry-bulb"));
            dewPoint[i] = t;
        }
    }

    /// <summary>The first index at or after <paramref name="from"/> where the value is above the limit, or the length when none is; four at a time.</summary>
    private static int NextAbove(double[] values, double[] limits, int from)
    {
        int i = from;
        for (; i + 4 <= values.Length; i += 4)
        {
            if (Vector256.GreaterThanAny(Vector256.Create(values.AsSpan(i, 4)), Vector256.Create(limits.AsSpan(i, 4))))
            {
                break;
            }
        }

        for (; i < values.Length; i++)
        {
            if (values[i] > limits[i])
            {
                return i;
            }
        }

        return values.Length;
    }

    /// <summary>The other humidity measures, checked against the one used (DESIGN 5.1): disagreements are counted, not repaired.</summary>
    private static void CheckSecondaryMeasures(HourlyWeather weather, Dictionary<WeatherQuantity, double[]> columns, WeatherQuantity primary, double[]? relativeHumidity,
        int[] gridLine, bool typical, QualityReport quality)
    {
        foreach (var (q, col) in columns)
        {
            if (q == primary || !WeatherFileParser.IsHumidity(q))
            {
                continue;
            }

            string key = QualityKeys.DisagreesPrefix + QualityKeys.Role(q);
            string against = WeatherFileParser.Describe(primary);
            var (expected, fixedTolerance, relativeTolerance, unit) = q switch
            {
                WeatherQuantity.RelativeHumidity => (relativeHumidity!, RhDisagreementPoints, 0.0, "%"),
                WeatherQuantity.WetBulb => (weather.WetBulbC, TemperatureDisagreementK, 0.0, "C"),
                WeatherQuantity.DewPoint => (weather.DewPointC, TemperatureDisagreementK, 0.0, "C"),
                _ => (weather.HumidityRatio, 0.0005, 0.05, "kg/kg"),
            };
            for (int i = 0; (i = NextDisagreement(col, expected, fixedTolerance, relativeTolerance, i)) < weather.Count; i++)
            {
                quality.Count(key, Inv($"{Where(gridLine[i], weather.Times[i], typical)}: {WeatherFileParser.Describe(q)} {col[i]:0.###} {unit} in the file, {expected[i]:0.###} {unit} from the {against}"));
            }
        }
    }

    /// <summary>
    /// The first hour at or after <paramref name="from"/> where the file's value differs from the expected one by more
    /// than the larger of <paramref name="fixedTolerance"/> and <paramref name="relativeTolerance"/> times the expected
    /// value, or the length when none does; four hours at a time.
    /// </summary>
    private static int NextDisagreement(double[] values, double[] expected, double fixedTolerance, double relativeTolerance, int from)
    {
        int i = from;
        var fixedTol = Vector256.Create(fixedTolerance);
        var relativeTol = Vector256.Create(relativeTolerance);
        for (; i + 4 <= values.Length; i += 4)
        {
            var e = Vector256.Create(expected.AsSpan(i, 4));
            var difference = Vector256.Abs(Vector256.Create(values.AsSpan(i, 4)) - e);
            if (Vector256.GreaterThanAny(difference, Vector256.Max(fixedTol, relativeTol * e)))
            {
                break;
            }
        }

        for (; i < values.Length; i++)
        {
            if (Math.Abs(values[i] - expected[i]) > Math.Max(fixedTolerance, relativeTolerance * expected[i]))
            {
                return i;
            }
        }

        return values.Length;
    }

    private static void FillGaps(double[] col, WeatherQuantity q, RawWeatherTable raw, DateTime[] times, int[] gridLine, bool typical, WeatherReadOptions options, bool[] drop, QualityReport quality)
    {
        int hours = col.Length;
        int g = 0;
        string key = QualityKeys.GapFilledPrefix + QualityKeys.Role(q);
        string column = raw.ColumnNames[q];
        while ((g = NextMissing(col, g)) < hours)
        {
            int start = g;
            while (g < hours && double.IsNaN(col[g]))
            {
                g++;
            }

            int length = g - start;
            string span = length == 1 ? Show(times[start], typical) : $"{Show(times[start], typical)} to {Show(times[g - 1], typical)}";
            if (length > options.MaxGapHours)
            {
                if (options.AllowDroppingLongGaps)
                {
                    for (int k = start; k < g; k++)
                    {
                        drop[k] = true;
                    }

                    continue;
                }

                int? firstLine = Enumerable.Range(start, length).Select(k => gridLine[k]).FirstOrDefault(l => l > 0) is int fl && fl > 0 ? fl : null;
                string lines = firstLine is null ? "no rows exist for these hours" : "rows from line " + firstLine;
                throw new WeatherDataException(WeatherErrorKind.LongGap, raw.File,
                    $"the {WeatherFileParser.Describe(q)} is missing for {length} hours in a row, from {Show(times[start], typical)} to {Show(times[g - 1], typical)} ({lines})",
                    $"Gaps of up to {options.MaxGapHours} hours are filled by linear interpolation; fill this one from another source, or allow dropping long gaps (--drop-long-gaps) so those hours are left out of annual figures",
                    line: firstLine, column: column);
            }

            double before = start > 0 ? col[start - 1] : double.NaN;
            double after = g < hours ? col[g] : double.NaN;
            for (int k = start; k < g; k++)
            {
                col[k] = double.IsNaN(before) ? after
                    : double.IsNaN(after) ? before
                    : before + (after - before) * (k - start + 1) / (length + 1);
            }

            if (double.IsNaN(before) && double.IsNaN(after))
            {
                throw new WeatherDataException(WeatherErrorKind.LongGap, raw.File, $"the {WeatherFileParser.Describe(q)} column has no values at all",
                    "Fill the column, or remove it", column: column);
            }

            quality.Count(key, $"{column}: {length} hour(s) {span} filled by linear interpolation", length);
        }
    }

    /// <summary>The site elevation, m: the one the options give, else the file's metadata, else null.</summary>
    private static double? Elevation(RawWeatherTable raw, WeatherReadOptions options) =>
        options.ElevationM ?? MetaNumber(raw, "elevation_m", -500, 9000)
            ?? (MetaNumber(raw, "elevation_ft", -1600, 29500) is double ft ? ft * Units.Conversions.MetresPerFoot : null);

    /// <summary>
    /// The pressure every hour carries, Pa, when the file has no pressure column, as <see cref="Build"/> settles it (DESIGN
    /// 5.1): the standard atmosphere at the site elevation, else sea level. Null when the metadata's elevation is not a
    /// number in range (<see cref="Build"/> reports that).
    /// </summary>
    internal static double? PressureWithoutColumn(RawWeatherTable raw, WeatherReadOptions options)
    {
        try
        {
            return Elevation(raw, options) is double z ? Atmosphere.PressureAtElevationPa(z) : Atmosphere.SeaLevelPressurePa;
        }
        catch (WeatherDataException)
        {
            return null;
        }
    }

    /// <summary>
    /// A typical year mixes source years month by month: the year changes somewhere other than
    /// at a 31 December to 1 January step. A one-year or multi-year calendar record changes
    /// year only there.
    /// </summary>
    private static bool DetectTypicalYear(DateTime[] shifted, int[] writtenYears)
    {
        for (int i = 1; i < shifted.Length; i++)
        {
            if (writtenYears[i] != writtenYears[i - 1] && !(shifted[i - 1].Month == 12 && shifted[i].Month == 1) && !(shifted[i].Month == 1 && shifted[i].Day == 1))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Whether any hour falls on a 29 February (dates looked at once a day).</summary>
    private static bool HasLeapDay(DateTime[] hours)
    {
        long dayStart = 1, dayEnd = 0;
        foreach (var hour in hours)
        {
            if (hour.Ticks < dayStart || hour.Ticks >= dayEnd)
            {
                var day = hour.Date;
                (dayStart, dayEnd) = (day.Ticks, day.Ticks + TimeSpan.TicksPerDay);
                if (day.Month == 2 && day.Day == 29)
                {
                    return true;
                }
            }
        }

        return false;
    }

    /// <summary>The leap year nearest <paramref name="year"/> whose 1 January falls on the same weekday.</summary>
    private static int LeapYearStartingLike(int year)
    {
        var weekday = new DateTime(year, 1, 1).DayOfWeek;
        for (int d = 1; d < 40; d++)
        {
            foreach (int y in new[] { year + d, year - d })
            {
                if (y is > 1 and < 9999 && DateTime.IsLeapYear(y) && new DateTime(y, 1, 1).DayOfWeek == weekday)
                {
                    return y;
                }
            }
        }

        return 2024;
    }

    private static double? MetaNumber(RawWeatherTable raw, string key, double low, double high)
    {
        if (!raw.Metadata.TryGetValue(key, out var entry))
        {
            return null;
        }

        if (!double.TryParse(entry.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !(v >= low && v <= high))
        {
            throw new WeatherDataException(WeatherErrorKind.BadMetadata, raw.File, Inv($"the {key} is not a number between {low} and {high}"),
                raw.IsOpenLayout ? $"Write it like '# {key}: 12.5' (a dot as decimal separator)" : "Check that this file has the layout the " + raw.Map.Source + " describes",
                line: entry.Line, column: key, value: entry.Value);
        }

        return v;
    }

    /// <summary>The index of the first missing value (NaN) at or after <paramref name="from"/>, or the length when there is none; four values at a time.</summary>
    private static int NextMissing(double[] values, int from) => from + IndexOfMissing(values.AsSpan(from));

    /// <summary>The index of the first missing value (NaN), or the length when there is none; four values at a time.</summary>
    internal static int IndexOfMissing(ReadOnlySpan<double> values)
    {
        int i = 0;
        for (; i + 4 <= values.Length; i += 4)
        {
            var v = Vector256.Create(values.Slice(i, 4));
            if (!Vector256.EqualsAll(v, v))
            {
                break; // a NaN is the only value not equal to itself
            }
        }

        for (; i < values.Length; i++)
        {
            if (double.IsNaN(values[i]))
            {
                return i;
            }
        }

        return values.Length;
    }

    /// <summary>
    /// The first <paramref name="n"/> times moved by <paramref name="ticks"/>: four at a time on their ticks (a DateTime
    /// with no kind set is its ticks), or one by one through <see cref="DateTime.AddTicks"/> (which raises the error)
    /// where a time would leave the calendar's range or has a kind set.
    /// </summary>
    private static DateTime[] Shift(DateTime[] times, int n, long ticks)
    {
        var shifted = GC.AllocateUninitializedArray<DateTime>(n);
        var from = System.Runtime.InteropServices.MemoryMarshal.Cast<DateTime, long>(times.AsSpan(0, n));
        var to = System.Runtime.InteropServices.MemoryMarshal.Cast<DateTime, long>(shifted.AsSpan());
        long low = Math.Max(DateTime.MinValue.Ticks, DateTime.MinValue.Ticks - ticks);
        long high = Math.Min(DateTime.MaxValue.Ticks, DateTime.MaxValue.Ticks - ticks);
        var move = Vector256.Create(ticks);
        bool inRange = true;
        int i = 0;
        for (; i + 4 <= n; i += 4)
        {
            var t = Vector256.Create(from.Slice(i, 4));
            inRange &= Vector256.GreaterThanOrEqualAll(t, Vector256.Create(low)) && Vector256.LessThanOrEqualAll(t, Vector256.Create(high));
            (t + move).CopyTo(to.Slice(i, 4));
        }

        for (; i < n; i++)
        {
            inRange &= from[i] >= low && from[i] <= high;
            to[i] = from[i] + ticks;
        }

        if (!inRange)
        {
            // Outside the calendar's range, or a time with a kind set (its kind bits put it above the range): one by one.
            for (int k = 0; k < n; k++)
            {
                shifted[k] = times[k].AddTicks(ticks);
            }
        }

        return shifted;
    }

    /// <summary>Whether each time is one hour after the one before, four at a time.</summary>
    private static bool OneHourApart(DateTime[] times)
    {
        var ticks = System.Runtime.InteropServices.MemoryMarshal.Cast<DateTime, long>(times.AsSpan()); // a DateTime is its ticks (with no kind set)
        var hour = Vector256.Create(TimeSpan.TicksPerHour);
        int i = 1;
        for (; i + 4 <= ticks.Length; i += 4)
        {
            var step = Vector256.Create(ticks.Slice(i, 4)) - Vector256.Create(ticks.Slice(i - 1, 4));
            if (step != hour)
            {
                return false;
            }
        }

        for (; i < times.Length; i++)
        {
            if (times[i].Ticks - times[i - 1].Ticks != TimeSpan.TicksPerHour)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>
    /// Whether the values span less than 1e-6 (a column filled with one value). A value 2e-6 or more from the first
    /// settles it as not constant, four values at a time; only a column with none is measured exactly.
    /// </summary>
    private static bool IsConstant(double[] values)
    {
        var low = Vector256.Create(values[0] - 2e-6);
        var high = Vector256.Create(values[0] + 2e-6);
        for (int i = 0; i + 4 <= values.Length; i += 4)
        {
            var v = Vector256.Create(values.AsSpan(i, 4));
            if (!Vector256.GreaterThanAll(v, low) || !Vector256.LessThanAll(v, high))
            {
                return false;
            }
        }

        return values.Max() - values.Min() < 1e-6;
    }

    /// <summary>Row indices in file order, those placed at -1 first and those at 1 last.</summary>
    private static int[] OrderByPlace(sbyte[] place)
    {
        var order = new int[place.Length];
        int k = 0;
        foreach (sbyte wanted in new sbyte[] { -1, 0, 1 })
        {
            for (int i = 0; i < place.Length; i++)
            {
                if (place[i] == wanted)
                {
                    order[k++] = i;
                }
            }
        }

        return order;
    }

    /// <summary>The first <paramref name="n"/> values: the array itself when that is all of it, else a copy.</summary>
    private static T[] Exactly<T>(T[] values, int n) => values.Length == n ? values : values[..n];

    private static T[] Keep<T>(T[] values, bool[] drop, int kept)
    {
        if (kept == values.Length)
        {
            return values;
        }

        var result = new T[kept];
        int j = 0;
        for (int i = 0; i < values.Length; i++)
        {
            if (!drop[i])
            {
                result[j++] = values[i];
            }
        }

        return result;
    }

    private static string BaseName(string file)
    {
        string name = Path.GetFileName(file);
        foreach (var ext in new[] { ".gz", ".csv", ".CSV" })
        {
            if (name.EndsWith(ext, StringComparison.OrdinalIgnoreCase))
            {
                name = name[..^ext.Length];
            }
        }

        return name;
    }

    private static string RawTime(RawWeatherTable raw, int i) => raw.Times[i].ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture) + " as read";

    /// <summary>A time for messages: month-day-hour for typical years (their calendar year is not the source's).</summary>
    internal static string Show(DateTime t, bool typical) =>
        t.ToString(typical ? "MM-dd HH:mm" : "yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture);

    private static string Where(int line, DateTime t, bool typical) => line > 0 ? $"line {line} ({Show(t, typical)})" : Show(t, typical);

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
