using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// An invented hourly year for chart tests (no real place, no real record): annual and daily
/// sine waves plus seeded noise, dew point a random depression below dry-bulb. Only the shape
/// matters here; the engine's own weather code is not under test.
/// </summary>
internal sealed class InventedClimate
{
    public static readonly string[] Names =
    [
        "Larkspur Flats", "Cinder Bay", "Oxbow Ridge", "Marrow Point", "Tallow Creek",
        "Pinecrest Hollow", "Saltmarsh End", "Gable Rock", "Fernhaven", "Quarry Mesa",
    ];

    private InventedClimate(string name, double elevationM, double[] dryBulbC, double[] humidityRatio, bool[] occupied, int[] month)
    {
        Name = name;
        PressurePa = Atmosphere.PressureAtElevationPa(elevationM);
        DryBulbC = dryBulbC;
        HumidityRatio = humidityRatio;
        Occupied = occupied;
        Month = month;
    }

    public string Name { get; }

    public double PressurePa { get; }

    public double[] DryBulbC { get; }

    public double[] HumidityRatio { get; }

    public bool[] Occupied { get; }

    /// <summary>Month index 0..11 of each hour.</summary>
    public int[] Month { get; }

    public int Hours => DryBulbC.Length;

    /// <summary>Climate number <paramref name="index"/> of the ten invented ones (milder to harsher by index).</summary>
    public static InventedClimate Make(int index, int hours = 8760)
    {
        var random = new Random(1000 + index);
        double mean = 6 + 1.6 * index;          // C
        double annual = 14 - 0.6 * index;       // K
        double daily = 5 + 0.3 * index;         // K
        double depressionMean = 3 + 0.7 * (index % 5);
        var t = new double[hours];
        var w = new double[hours];
        var occupied = new bool[hours];
        var month = new int[hours];
        double pressure = Atmosphere.PressureAtElevationPa(50 + 150 * index);
        double weather = 0;
        int[] monthStart = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334, 365];
        for (int h = 0; h < hours; h++)
        {
            int day = h / 24 % 365;
            int hour = h % 24;
            if (hour == 0)
            {
                weather = 0.8 * weather + 2.2 * (random.NextDouble() - 0.5) * 2;
            }

            t[h] = mean - annual * Math.Cos(2 * Math.PI * (day - 15) / 365.0) + daily * Math.Cos(2 * Math.PI * (hour - 15) / 24.0) + weather;
            double depression = Math.Max(0.3, depressionMean + 0.3 * Math.Max(0, t[h] - 5) + 2.5 * (random.NextDouble() - 0.3) + 0.25 * daily * Math.Cos(2 * Math.PI * (hour - 15) / 24.0));
            w[h] = MoistAir.HumidityRatioFromDewPoint(t[h] - depression, pressure);
            int weekday = day % 7;
            occupied[h] = weekday < 5 && hour >= 7 && hour < 19;
            month[h] = Array.FindLastIndex(monthStart, s => s <= day);
        }

        return new InventedClimate(Names[index % Names.Length], 50 + 150 * index, t, w, occupied, month);
    }
}
