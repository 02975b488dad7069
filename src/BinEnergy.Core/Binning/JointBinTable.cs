using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Binning;

/// <summary>
/// Joint bins of dry-bulb x humidity ratio (DESIGN 6). One-dimensional dry-bulb bins carry a
/// single mean humidity ratio per bin, so a load that starts above a humidity threshold
/// (dehumidification, an enthalpy high limit) is misjudged wherever the bin holds both
/// humid and dry hours; splitting each bin by humidity ratio removes most of that error.
/// Only cells with hours are listed, ascending by dry-bulb, then by humidity ratio.
/// </summary>
public sealed class JointBinTable
{
    private JointBinTable(DryBulbBinScale dryBulbScale, HumidityBinScale humidityScale, IReadOnlyList<JointBinCell> cells)
    {
        DryBulbScale = dryBulbScale;
        HumidityScale = humidityScale;
        Cells = cells;
        Hours = cells.Sum(c => c.All.Hours);
    }

    /// <summary>The dry-bulb binning rule.</summary>
    public DryBulbBinScale DryBulbScale { get; }

    /// <summary>The humidity-ratio binning rule.</summary>
    public HumidityBinScale HumidityScale { get; }

    /// <summary>Cells with at least one hour.</summary>
    public IReadOnlyList<JointBinCell> Cells { get; }

    /// <summary>Hours in the table.</summary>
    public int Hours { get; }

    /// <summary>Bins a record jointly by dry-bulb and humidity ratio; without flags every hour counts as occupied.</summary>
    public static JointBinTable Build(HourlyWeather weather, DryBulbBinScale dryBulbScale, HumidityBinScale humidityScale, bool[]? occupied = null)
    {
        ArgumentNullException.ThrowIfNull(weather);
        BinTable.CheckFlags(weather, occupied);
        var (first, last) = BinTable.IndexRange(weather, dryBulbScale);
        var w = weather.HumidityRatio;
        int jFirst = 0, jLast = -1;
        if (w.Length > 0)
        {
            jFirst = humidityScale.IndexOf(w.Min());
            jLast = humidityScale.IndexOf(w.Max());
        }

        int nk = last - first + 1, nj = jLast - jFirst + 1;
        var sums = new BinSums(Math.Max(nk * nj, 0));
        var t = weather.DryBulbC;
        for (int i = 0; i < t.Length; i++)
        {
            int cell = (dryBulbScale.IndexOf(t[i]) - first) * nj + humidityScale.IndexOf(w[i]) - jFirst;
            sums.Add(cell, occupied is null || occupied[i], t[i], w[i], weather.WetBulbC[i], weather.EnthalpyJPerKg[i]);
        }

        var cells = new List<JointBinCell>();
        for (int a = 0; a < nk; a++)
        {
            for (int b = 0; b < nj; b++)
            {
                int cell = a * nj + b;
                if (sums.Hours(cell) == 0)
                {
                    continue;
                }

                int k = first + a, j = jFirst + b;
                cells.Add(new JointBinCell(k, j, dryBulbScale.Low(k), dryBulbScale.High(k), dryBulbScale.Mid(k),
                    humidityScale.Low(j), humidityScale.High(j),
                    sums.Statistics(cell, OccupancyClass.All),
                    sums.Statistics(cell, OccupancyClass.Occupied),
                    sums.Statistics(cell, OccupancyClass.Unoccupied)));
            }
        }

        return new JointBinTable(dryBulbScale, humidityScale, cells);
    }
}
