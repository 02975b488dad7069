using BinEnergy.Core.Weather;
using MathNet.Numerics.Statistics;

namespace BinEnergy.Core.Climate;

/// <summary>
/// Design conditions taken from an hourly record itself (DESIGN 7.4), in the manner of the
/// climatic design conditions of ASHRAE Handbook—Fundamentals (2017), ch. 14: heating 99.6 % and
/// 99 % dry-bulb (exceeded in that share of the hours); cooling 0.4 %, 1 % and 2 % dry-bulb
/// with mean coincident wet-bulb; dehumidification 0.4 % and 1 % dew point with mean
/// coincident dry-bulb. Percentiles are MathNet sample quantiles of the hours
/// (<see cref="QuantileMethod"/>); means are over the hours within
/// <see cref="CoincidenceWindowK"/> of the design value. The handbook's published values
/// come from many years of observations; these come from the one record given, so a typical
/// year gives milder extremes than the long-term tables.
/// </summary>
public sealed record DesignConditions
{
    /// <summary>Half-width of the coincidence window, K (about 1 F either side of the design value).</summary>
    public const double CoincidenceWindowK = 0.5;

    /// <summary>The MathNet quantile definition used.</summary>
    public const QuantileDefinition Definition = QuantileDefinition.R7;

    /// <summary>The percentile method, named for reports.</summary>
    public const string QuantileMethod =
        "sample quantile of the hours, Hyndman and Fan (1996) definition 7 (linear interpolation between order statistics; R's default, Excel PERCENTILE.INC), MathNet.Numerics QuantileDefinition.R7";

    /// <summary>Hours in the record.</summary>
    public required int Hours { get; init; }

    /// <summary>Heating 99.6 % dry-bulb, C.</summary>
    public required double Heating996DryBulbC { get; init; }

    /// <summary>Heating 99 % dry-bulb, C.</summary>
    public required double Heating990DryBulbC { get; init; }

    /// <summary>Cooling 0.4 %, 1 % and 2 % design points, in that order.</summary>
    public required IReadOnlyList<CoolingDesignPoint> Cooling { get; init; }

    /// <summary>Dehumidification 0.4 % and 1 % design points, in that order.</summary>
    public required IReadOnlyList<DehumidificationDesignPoint> Dehumidification { get; init; }

    /// <summary>Computes the design conditions of a record.</summary>
    public static DesignConditions FromRecord(HourlyWeather weather) =>
        FromHours(weather.DryBulbC, weather.WetBulbC, weather.DewPointC, weather.HumidityRatio);

    /// <summary>Computes design conditions from hourly columns of equal length.</summary>
    public static DesignConditions FromHours(double[] dryBulbC, double[] wetBulbC, double[] dewPointC, double[] humidityRatio)
    {
        int n = dryBulbC.Length;
        if (n == 0 || wetBulbC.Length != n || dewPointC.Length != n || humidityRatio.Length != n)
        {
            throw new ArgumentException("the hourly columns must be non-empty and of equal length");
        }

        var db = (double[])dryBulbC.Clone();
        Array.Sort(db);
        var dp = (double[])dewPointC.Clone();
        Array.Sort(dp);
        double Q(double[] sorted, double tau) => SortedArrayStatistics.QuantileCustom(sorted, tau, Definition);

        CoolingDesignPoint Cool(double percent)
        {
            double t = Q(db, 1 - percent / 100);
            var (mean, count) = CoincidentMean(dryBulbC, t, wetBulbC);
            return new CoolingDesignPoint(percent, t, mean, count);
        }

        DehumidificationDesignPoint Dehum(double percent)
        {
            double d = Q(dp, 1 - percent / 100);
            var (mdb, count) = CoincidentMean(dewPointC, d, dryBulbC);
            var (mw, _) = CoincidentMean(dewPointC, d, humidityRatio);
            return new DehumidificationDesignPoint(percent, d, mw, mdb, count);
        }

        return new DesignConditions
        {
            Hours = n,
            Heating996DryBulbC = Q(db, 0.004),
            Heating990DryBulbC = Q(db, 0.01),
            Cooling = [Cool(0.4), Cool(1.0), Cool(2.0)],
            Dehumidification = [Dehum(0.4), Dehum(1.0)],
        };
    }

    /// <summary>Mean of <paramref name="values"/> over the hours whose <paramref name="key"/> lies within the window of <paramref name="design"/>.</summary>
    private static (double Mean, int Count) CoincidentMean(double[] key, double design, double[] values)
    {
        double sum = 0;
        int count = 0;
        for (int i = 0; i < key.Length; i++)
        {
            if (Math.Abs(key[i] - design) <= CoincidenceWindowK + 1e-9)
            {
                sum += values[i];
                count++;
            }
        }

        return (count > 0 ? sum / count : double.NaN, count);
    }
}
