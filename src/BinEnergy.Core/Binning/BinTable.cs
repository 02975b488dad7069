using System.Globalization;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Binning;

/// <summary>
/// A dry-bulb bin table of an hourly record (DESIGN 6): hours per bin and occupancy class
/// with the bin's mean dry-bulb, mean coincident humidity ratio, mean coincident wet-bulb and
/// mean enthalpy. Rows run ascending and contiguously from the coldest to the warmest bin
/// that has hours (bins in between without hours are kept, with zero hours).
/// </summary>
/// <remarks>
/// Invariants, checked in the tests: the hours of all rows sum to the hours of the record;
/// in every row occupied + unoccupied = all. The per-hour loop reads the record's column
/// arrays and allocates nothing.
/// </remarks>
public sealed class BinTable
{
    private readonly HourlyWeather weather;
    private readonly bool[]? occupied;

    private BinTable(HourlyWeather weather, bool[]? occupied, DryBulbBinScale scale, int firstIndex, IReadOnlyList<BinRow> rows)
    {
        this.weather = weather;
        this.occupied = occupied;
        Scale = scale;
        FirstIndex = firstIndex;
        Rows = rows;
        Hours = rows.Sum(r => r.All.Hours);
        OccupiedHours = rows.Sum(r => r.Occupied.Hours);
    }

    /// <summary>The binning rule (width and display unit).</summary>
    public DryBulbBinScale Scale { get; }

    /// <summary>The rows, ascending by bin.</summary>
    public IReadOnlyList<BinRow> Rows { get; }

    /// <summary>Bin index k of the first row.</summary>
    public int FirstIndex { get; }

    /// <summary>Hours in the table (the record's hours, or a group's).</summary>
    public int Hours { get; }

    /// <summary>Occupied hours in the table.</summary>
    public int OccupiedHours { get; }

    /// <summary>Unoccupied hours in the table.</summary>
    public int UnoccupiedHours => Hours - OccupiedHours;

    /// <summary>The row of bin index k, or null when k is outside the table.</summary>
    public BinRow? RowOf(int k) => k >= FirstIndex && k < FirstIndex + Rows.Count ? Rows[k - FirstIndex] : null;

    /// <summary>
    /// Bins a record by dry-bulb. <paramref name="occupied"/> gives each hour's occupancy
    /// (e.g. <see cref="Schedules.OccupancySchedule.Flags"/>); without it every hour counts as occupied.
    /// </summary>
    public static BinTable Build(HourlyWeather weather, DryBulbBinScale scale, bool[]? occupied = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        CheckFlags(weather, occupied);
        var (first, last) = IndexRange(weather, scale);
        int bins = weather.Count == 0 ? 0 : last - first + 1;
        var sums = Accumulate(weather, scale, occupied, first, bins, null, 1);
        return FromSums(weather, occupied, scale, first, bins, sums, 0);
    }

    /// <summary>Bins a record with a width given as a temperature difference, aligned in the display unit of <paramref name="units"/>.</summary>
    public static BinTable Build(HourlyWeather weather, TemperatureDifference width, UnitSystem units, bool[]? occupied = null) =>
        Build(weather, new DryBulbBinScale(width, units), occupied);

    /// <summary>Bins a record with a width in the display unit of <paramref name="units"/> (F degrees or K).</summary>
    public static BinTable Build(HourlyWeather weather, double width, UnitSystem units, bool[]? occupied = null) =>
        Build(weather, new DryBulbBinScale(width, units), occupied);

    /// <summary>
    /// Splits the table by month or by time-of-day block. Every group's table has the same
    /// bin range as this one, so rows line up across groups; groups without hours are left out.
    /// </summary>
    public IReadOnlyList<BinGroup> Split(BinSplit split, TimeOfDayBlocks? blocks = null)
    {
        blocks ??= TimeOfDayBlocks.Default;
        int groupCount = split == BinSplit.Month ? 12 : blocks.Count;
        var groupOf = new int[weather.Count];
        for (int i = 0; i < groupOf.Length; i++)
        {
            var t = weather.Times[i];
            groupOf[i] = split == BinSplit.Month ? t.Month - 1 : blocks.BlockOf(t.Hour);
        }

        var sums = Accumulate(weather, Scale, occupied, FirstIndex, Rows.Count, groupOf, groupCount);
        var groups = new List<BinGroup>();
        for (int g = 0; g < groupCount; g++)
        {
            var table = FromSums(weather, occupied, Scale, FirstIndex, Rows.Count, sums, g);
            if (table.Hours == 0)
            {
                continue;
            }

            string label = split == BinSplit.Month
                ? CultureInfo.InvariantCulture.DateTimeFormat.GetAbbreviatedMonthName(g + 1)
                : blocks.Label(g);
            groups.Add(new BinGroup(split == BinSplit.Month ? g + 1 : g, label, table));
        }

        return groups;
    }

    /// <summary>
    /// Joint bins of dry-bulb (this table's scale) and humidity ratio, width in gr/lb (IP) or
    /// g/kg (SI), aligned to multiples of the width from zero (DESIGN 6).
    /// </summary>
    public JointBinTable Joint(double humidityWidthInDisplayUnit) =>
        JointBinTable.Build(weather, Scale, new HumidityBinScale(humidityWidthInDisplayUnit, Scale.Units), occupied);

    /// <summary>The lowest and highest bin index of the record (0, -1 when it is empty).</summary>
    internal static (int First, int Last) IndexRange(HourlyWeather weather, DryBulbBinScale scale)
    {
        var t = weather.DryBulbC;
        if (t.Length == 0)
        {
            return (0, -1);
        }

        double min = t[0], max = t[0];
        for (int i = 1; i < t.Length; i++)
        {
            double v = t[i];
            if (v < min)
            {
                min = v;
            }
            else if (v > max)
            {
                max = v;
            }
        }

        return (scale.IndexOf(min), scale.IndexOf(max));
    }

    internal static void CheckFlags(HourlyWeather weather, bool[]? occupied)
    {
        if (occupied is not null && occupied.Length != weather.Count)
        {
            throw new ArgumentException(FormattableString.Invariant(
                $"occupancy flags have {occupied.Length} entries but the record has {weather.Count} hours"), nameof(occupied));
        }
    }

    private static BinSums Accumulate(HourlyWeather weather, DryBulbBinScale scale, bool[]? occupied, int first, int bins,
        int[]? groupOf, int groupCount)
    {
        var sums = new BinSums(bins * groupCount);
        var t = weather.DryBulbC;
        var w = weather.HumidityRatio;
        var wb = weather.WetBulbC;
        var h = weather.EnthalpyJPerKg;
        for (int i = 0; i < t.Length; i++)
        {
            int cell = scale.IndexOf(t[i]) - first;
            if (groupOf is not null)
            {
                cell += groupOf[i] * bins;
            }

            sums.Add(cell, occupied is null || occupied[i], t[i], w[i], wb[i], h[i]);
        }

        return sums;
    }

    private static BinTable FromSums(HourlyWeather weather, bool[]? occupied, DryBulbBinScale scale, int first, int bins,
        BinSums sums, int group)
    {
        var rows = new BinRow[bins];
        for (int b = 0; b < bins; b++)
        {
            int k = first + b;
            int cell = group * bins + b;
            rows[b] = new BinRow(k, scale.Low(k), scale.High(k), scale.Mid(k),
                sums.Statistics(cell, OccupancyClass.All),
                sums.Statistics(cell, OccupancyClass.Occupied),
                sums.Statistics(cell, OccupancyClass.Unoccupied));
        }

        return new BinTable(weather, occupied, scale, first, rows);
    }
}
