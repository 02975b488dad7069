namespace BinEnergy.Core.Binning;

/// <summary>
/// Running sums over the hours of a cell (or of cells merged into a bin): hours, dry-bulb, humidity
/// ratio and a per-hour weight (an airflow multiplier), for the means a bin method evaluates at.
/// </summary>
public struct CellStatistics
{
    /// <summary>Hours counted.</summary>
    public double Hours;

    /// <summary>Sum of the hours' dry-bulbs, C.</summary>
    public double SumDryBulbC;

    /// <summary>Sum of the hours' humidity ratios, kg/kg.</summary>
    public double SumHumidityRatio;

    /// <summary>Sum of the hours' weights.</summary>
    public double SumWeight;

    /// <summary>Mean dry-bulb, C (NaN without hours).</summary>
    public readonly double MeanDryBulbC => Hours > 0 ? SumDryBulbC / Hours : double.NaN;

    /// <summary>Mean coincident humidity ratio, kg/kg (NaN without hours).</summary>
    public readonly double MeanHumidityRatio => Hours > 0 ? SumHumidityRatio / Hours : double.NaN;

    /// <summary>Mean weight (1 without hours).</summary>
    public readonly double MeanWeight => Hours > 0 ? SumWeight / Hours : 1.0;

    /// <summary>Adds one hour.</summary>
    public void Add(double dryBulbC, double humidityRatio, double weight)
    {
        Hours += 1;
        SumDryBulbC += dryBulbC;
        SumHumidityRatio += humidityRatio;
        SumWeight += weight;
    }

    /// <summary>Adds the sums of another cell.</summary>
    public void Add(in CellStatistics other)
    {
        Hours += other.Hours;
        SumDryBulbC += other.SumDryBulbC;
        SumHumidityRatio += other.SumHumidityRatio;
        SumWeight += other.SumWeight;
    }
}
