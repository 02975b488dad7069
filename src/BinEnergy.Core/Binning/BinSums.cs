using BinEnergy.Core.Units;

namespace BinEnergy.Core.Binning;

/// <summary>
/// Running sums of hours, dry-bulb, humidity ratio, wet-bulb and enthalpy per cell and per
/// occupancy class (0 occupied, 1 unoccupied); the class "all" is their sum. One flat array
/// per quantity so the per-hour loop touches no objects.
/// </summary>
internal sealed class BinSums
{
    private readonly int[] count;
    private readonly double[] dryBulb;
    private readonly double[] humidity;
    private readonly double[] wetBulb;
    private readonly double[] enthalpy;

    public BinSums(int cells)
    {
        Cells = cells;
        count = new int[cells * 2];
        dryBulb = new double[cells * 2];
        humidity = new double[cells * 2];
        wetBulb = new double[cells * 2];
        enthalpy = new double[cells * 2];
    }

    public int Cells { get; }

    public void Add(int cell, bool occupied, double t, double w, double wb, double h)
    {
        int j = cell * 2 + (occupied ? 0 : 1);
        count[j]++;
        dryBulb[j] += t;
        humidity[j] += w;
        wetBulb[j] += wb;
        enthalpy[j] += h;
    }

    public int Hours(int cell) => count[cell * 2] + count[cell * 2 + 1];

    public BinStatistics Statistics(int cell, OccupancyClass occupancy)
    {
        int a = cell * 2;
        int n;
        double t, w, wb, h;
        switch (occupancy)
        {
            case OccupancyClass.Occupied:
                (n, t, w, wb, h) = (count[a], dryBulb[a], humidity[a], wetBulb[a], enthalpy[a]);
                break;
            case OccupancyClass.Unoccupied:
                (n, t, w, wb, h) = (count[a + 1], dryBulb[a + 1], humidity[a + 1], wetBulb[a + 1], enthalpy[a + 1]);
                break;
            default:
                (n, t, w, wb, h) = (count[a] + count[a + 1], dryBulb[a] + dryBulb[a + 1], humidity[a] + humidity[a + 1],
                    wetBulb[a] + wetBulb[a + 1], enthalpy[a] + enthalpy[a + 1]);
                break;
        }

        if (n == 0)
        {
            return BinStatistics.Empty;
        }

        return new BinStatistics(n, Temperature.FromCelsius(t / n), HumidityRatio.FromKilogramsPerKilogram(w / n),
            Temperature.FromCelsius(wb / n), SpecificEnthalpy.FromJoulesPerKilogram(h / n));
    }
}
