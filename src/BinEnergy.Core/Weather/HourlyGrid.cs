using System.Globalization;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The reader's grid step (DESIGN 5.3 and 5.4): the rows, in the order of their hours, checked to be one or more whole
/// hours apart and placed on an hourly grid (missing rows become missing hours); then every column's gaps filled by
/// linear interpolation up to the fill limit, and hours in longer gaps dropped where allowed. Every repair is counted.
/// </summary>
/// <param name="Times">Start of each hour.</param>
/// <param name="Lines">The file line of each hour's row; 0 where the file has no row for it.</param>
/// <param name="Columns">Each quantity's values per hour, internal units.</param>
internal sealed record HourlyGrid(DateTime[] Times, int[] Lines, Dictionary<WeatherQuantity, double[]> Columns)
{
    /// <summary>Places the rows on the grid, fills gaps and drops what may be dropped.</summary>
    public static HourlyGrid Build(RawWeatherTable raw, WeatherCalendar calendar, WeatherReadOptions options)
    {
        var grid = Place(raw, calendar);
        var drop = new bool[grid.Times.Length];
        foreach (var (q, column) in grid.Columns.OrderBy(c => c.Key))
        {
            grid.FillGaps(column, q, raw, calendar.Calendar.IsTypicalYear, options, drop);
        }

        return grid.Drop(drop, raw);
    }

    /// <summary>The rows placed on the grid: hour g is <c>first + g</c> hours.</summary>
    private static HourlyGrid Place(RawWeatherTable raw, WeatherCalendar calendar)
    {
        var keys = calendar.Keys;
        var order = calendar.Order ?? Enumerable.Range(0, keys.Length).ToArray();
        bool typical = calendar.Calendar.IsTypicalYear;
        string timeColumn = raw.Map.Time.Column;
        var slot = new int[keys.Length];
        for (int k = 1; k < order.Length; k++)
        {
            int i = order[k], prev = order[k - 1];
            var step = keys[i] - keys[prev];
            if (step == TimeSpan.Zero)
            {
                throw new WeatherDataException(WeatherErrorKind.DuplicateTime, raw.File, $"the hour {Show(keys[i], typical)} appears twice, on lines {raw.Lines[prev]} and {raw.Lines[i]}",
                    "Delete one of the two rows", line: raw.Lines[i], column: timeColumn, value: RawTime(raw, i));
            }

            if (step < TimeSpan.Zero)
            {
                throw new WeatherDataException(WeatherErrorKind.TimeOutOfOrder, raw.File, $"the hour {Show(keys[i], typical)} comes before {Show(keys[prev], typical)} on line {raw.Lines[prev]}",
                    "Sort the rows by time (each row must be one hour after the one before)", line: raw.Lines[i], column: timeColumn, value: RawTime(raw, i));
            }

            if (step.Ticks % TimeSpan.TicksPerHour != 0)
            {
                throw new WeatherDataException(WeatherErrorKind.NonHourlyStep, raw.File,
                    Inv($"the row is {step.TotalMinutes:0.#} minutes after the one on line {raw.Lines[prev]}; the reader needs hourly rows"),
                    "Average sub-hourly data to whole hours first (one row per hour, on the hour)", line: raw.Lines[i], column: timeColumn, value: RawTime(raw, i));
            }

            slot[i] = slot[prev] + (int)(step.Ticks / TimeSpan.TicksPerHour);
            if (slot[i] > 24 * 366 * 30)
            {
                throw new WeatherDataException(WeatherErrorKind.NonHourlyStep, raw.File, "the record spans more than 30 years", "Split the file into years", line: raw.Lines[i]);
            }
        }

        int hours = slot[order[^1]] + 1;
        var first = keys[order[0]];
        var times = Enumerable.Range(0, hours).Select(g => first.AddHours(g)).ToArray();
        var lines = new int[hours];
        for (int i = 0; i < keys.Length; i++)
        {
            lines[slot[i]] = raw.Lines[i];
        }

        double[] OnGrid(List<double> values)
        {
            var column = Enumerable.Repeat(double.NaN, hours).ToArray();
            for (int i = 0; i < values.Count; i++)
            {
                column[slot[i]] = values[i];
            }

            return column;
        }

        return new HourlyGrid(times, lines, raw.Values.ToDictionary(c => c.Key, c => OnGrid(c.Value)));
    }

    /// <summary>Fills each run of missing hours of a column by linear interpolation, or marks it to drop, or refuses it.</summary>
    private void FillGaps(double[] column, WeatherQuantity q, RawWeatherTable raw, bool typical, WeatherReadOptions options, bool[] drop)
    {
        string name = WeatherQuantityFacts.Of(q).Name;
        string columnName = raw.ColumnNames[q];
        for (int g = Array.FindIndex(column, double.IsNaN); g >= 0 && g < column.Length; g = Array.FindIndex(column, g, double.IsNaN))
        {
            int start = g;
            while (g < column.Length && double.IsNaN(column[g]))
            {
                g++;
            }

            int length = g - start;
            if (length > options.MaxGapHours)
            {
                if (!options.AllowDroppingLongGaps)
                {
                    int? firstLine = Lines.Skip(start).Take(length).FirstOrDefault(l => l > 0) is int fl && fl > 0 ? fl : null;
                    throw new WeatherDataException(WeatherErrorKind.LongGap, raw.File,
                        $"the {name} is missing for {length} hours in a row, from {Show(Times[start], typical)} to {Show(Times[g - 1], typical)} ({(firstLine is null ? "no rows exist for these hours" : "rows from line " + firstLine)})",
                        $"Gaps of up to {options.MaxGapHours} hours are filled by linear interpolation; fill this one from another source, or allow dropping long gaps (--drop-long-gaps) so those hours are left out of annual figures",
                        line: firstLine, column: columnName);
                }

                Array.Fill(drop, true, start, length);
                continue;
            }

            double before = start > 0 ? column[start - 1] : double.NaN;
            double after = g < column.Length ? column[g] : double.NaN;
            if (double.IsNaN(before) && double.IsNaN(after))
            {
                throw new WeatherDataException(WeatherErrorKind.LongGap, raw.File, $"the {name} column has no values at all", "Fill the column, or remove it", column: columnName);
            }

            for (int k = start; k < g; k++)
            {
                column[k] = double.IsNaN(before) ? after : double.IsNaN(after) ? before : before + (after - before) * (k - start + 1) / (length + 1);
            }

            string span = length == 1 ? Show(Times[start], typical) : $"{Show(Times[start], typical)} to {Show(Times[g - 1], typical)}";
            raw.Quality.Count(QualityKeys.GapFilledPrefix + WeatherQuantityFacts.Of(q).Key, $"{columnName}: {length} hour(s) {span} filled by linear interpolation", length);
        }
    }

    /// <summary>The grid without the hours marked to drop, counted and warned about.</summary>
    private HourlyGrid Drop(bool[] drop, RawWeatherTable raw)
    {
        int dropped = drop.Count(d => d);
        if (dropped == 0)
        {
            return this;
        }

        int kept = Times.Length - dropped;
        raw.Quality.Count(QualityKeys.LongGapHoursDropped, null, dropped);
        raw.Quality.Warn(Inv($"{dropped} hour(s) in long gaps were dropped: annual figures are for the {kept} hours present (scale by {8760.0 / kept:0.####} for a full year)"));
        if (kept == 0)
        {
            throw new WeatherDataException(WeatherErrorKind.LongGap, raw.File, "every hour was dropped as part of a long gap", "Fill the data from another source");
        }

        T[] Keep<T>(T[] values) => values.Where((_, i) => !drop[i]).ToArray();
        return new HourlyGrid(Keep(Times), Keep(Lines), Columns.ToDictionary(c => c.Key, c => Keep(c.Value)));
    }

    /// <summary>A time for messages: month-day-hour for typical years (their calendar year is not the source's).</summary>
    internal static string Show(DateTime t, bool typical) => t.ToString(typical ? "MM-dd HH:mm" : "yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture);

    /// <summary>Where an hour is, for repair examples: its line and time, or only its time for a filled hour.</summary>
    internal string Where(int hour, bool typical) => Lines[hour] > 0 ? $"line {Lines[hour]} ({Show(Times[hour], typical)})" : Show(Times[hour], typical);

    private static string RawTime(RawWeatherTable raw, int i) => raw.Times[i].ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture) + " as read";

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
