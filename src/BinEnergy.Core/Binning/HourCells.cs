using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Binning;

/// <summary>
/// Where each hour of a record falls in the grid of calendar month x dry-bulb bin x humidity-ratio
/// bin (DESIGN 6): the one grouping from which the hourly sums by bin and month, the classic bin
/// method (cells merged over month and humidity), joint bins (merged over month) and their
/// monthly forms are all taken. Only cells that hold hours are kept. Built once per record and
/// pair of scales; the engines then only read <see cref="CellOfHour"/>.
/// </summary>
public sealed class HourCells
{
    private HourCells(DryBulbBinScale dryBulb, HumidityBinScale humidity, int firstDryBulb, int dryBulbBins, int firstHumidity,
        int[] cellOfHour, int[] month, int[] dryBulbBin, int[] humidityBin)
    {
        DryBulbScale = dryBulb;
        HumidityScale = humidity;
        FirstDryBulbIndex = firstDryBulb;
        DryBulbBins = dryBulbBins;
        FirstHumidityIndex = firstHumidity;
        CellOfHour = cellOfHour;
        MonthOfCell = month;
        DryBulbBinOfCell = dryBulbBin;
        HumidityBinOfCell = humidityBin;
    }

    /// <summary>The dry-bulb bins.</summary>
    public DryBulbBinScale DryBulbScale { get; }

    /// <summary>The humidity-ratio bins of the joint grid.</summary>
    public HumidityBinScale HumidityScale { get; }

    /// <summary>Index k of the lowest dry-bulb bin (the same range as <see cref="BinTable"/> of the record).</summary>
    public int FirstDryBulbIndex { get; }

    /// <summary>Number of dry-bulb bins from the lowest to the highest that holds an hour.</summary>
    public int DryBulbBins { get; }

    /// <summary>Index j of the lowest humidity bin.</summary>
    public int FirstHumidityIndex { get; }

    /// <summary>Number of cells that hold at least one hour.</summary>
    public int Count => MonthOfCell.Length;

    /// <summary>The cell of each hour of the record.</summary>
    public int[] CellOfHour { get; }

    /// <summary>Calendar month of each cell, 0 (January) to 11.</summary>
    public int[] MonthOfCell { get; }

    /// <summary>Dry-bulb bin of each cell, 0 for the lowest bin (add <see cref="FirstDryBulbIndex"/> for k).</summary>
    public int[] DryBulbBinOfCell { get; }

    /// <summary>Humidity bin of each cell, 0 for the lowest (add <see cref="FirstHumidityIndex"/> for j).</summary>
    public int[] HumidityBinOfCell { get; }

    /// <summary>Number of humidity bins from the lowest to the highest that holds an hour.</summary>
    public int HumidityBins => Count == 0 ? 0 : HumidityBinOfCell.Max() + 1;

    /// <summary>
    /// The cells' statistics merged over month and humidity (one per dry-bulb bin: the classic bin
    /// method's) and over month (one per dry-bulb x humidity bin, index bin x <see cref="HumidityBins"/> + humidity bin: joint bins').
    /// </summary>
    public (CellStatistics[] ByBin, CellStatistics[] ByJointCell) Merge(CellStatistics[] cells)
    {
        ArgumentNullException.ThrowIfNull(cells);
        int nj = HumidityBins;
        var byBin = new CellStatistics[DryBulbBins];
        var byJoint = new CellStatistics[DryBulbBins * nj];
        for (int c = 0; c < Count; c++)
        {
            int b = DryBulbBinOfCell[c];
            byBin[b].Add(cells[c]);
            byJoint[b * nj + HumidityBinOfCell[c]].Add(cells[c]);
        }

        return (byBin, byJoint);
    }

    /// <summary>Places every hour of <paramref name="weather"/> in its cell.</summary>
    public static HourCells Build(HourlyWeather weather, DryBulbBinScale dryBulb, HumidityBinScale humidity)
    {
        ArgumentNullException.ThrowIfNull(weather);
        var (first, last) = BinTable.IndexRange(weather, dryBulb);
        int nk = weather.Count == 0 ? 0 : last - first + 1;
        var t = weather.DryBulbC;
        var w = weather.HumidityRatio;
        var times = weather.Times;
        int jFirst = int.MaxValue, jLast = int.MinValue;
        var j = new int[t.Length];
        for (int i = 0; i < t.Length; i++)
        {
            j[i] = humidity.IndexOf(w[i]);
            jFirst = Math.Min(jFirst, j[i]);
            jLast = Math.Max(jLast, j[i]);
        }

        int nj = t.Length == 0 ? 0 : jLast - jFirst + 1;
        var compact = new Dictionary<int, int>();
        var cellOfHour = new int[t.Length];
        var month = new List<int>();
        var bin = new List<int>();
        var hum = new List<int>();
        for (int i = 0; i < t.Length; i++)
        {
            int m = times[i].Month - 1;
            int k = dryBulb.IndexOf(t[i]) - first;
            int jj = j[i] - jFirst;
            int dense = (m * nk + k) * nj + jj;
            if (!compact.TryGetValue(dense, out int c))
            {
                c = month.Count;
                compact[dense] = c;
                month.Add(m);
                bin.Add(k);
                hum.Add(jj);
            }

            cellOfHour[i] = c;
        }

        return new HourCells(dryBulb, humidity, first, nk, t.Length == 0 ? 0 : jFirst, cellOfHour, [.. month], [.. bin], [.. hum]);
    }
}
