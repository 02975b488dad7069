using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;
using MathNet.Numerics.Statistics;

namespace BinEnergy.Core.Climate;

/// <summary>
/// Design conditions taken from an hourly record itself (DESIGN 7.4), in the manner of the
/// climatic design conditions of ASHRAE Handbook—Fundamentals (2017), ch. 14: heating 99.6 % and
/// 99 % dry-bulb (exceeded in that share of the hours); cooling 0.4 %, 1 % and 2 % dry-bulb
/// with mean coincident wet-bulb; dehumidification 0.4 % and 1 % dew point with mean
/// coincident dry-bulb and the humidity ratio at the design dew point; enthalpy 0.4 % and 1 %
/// with mean coincident dry-bulb. Percentiles are MathNet sample quantiles of the hours
/// (<see cref="QuantileMethod"/>); coincident means are over the hours at the data level
/// nearest the design value (<see cref="CoincidentHours"/>). The handbook's published values
/// come from many years of observations; these come from the one record given, so a typical
/// year gives milder extremes than the long-term tables.
/// </summary>
public sealed record DesignConditions
{
    /// <summary>The MathNet quantile definition used.</summary>
    public const QuantileDefinition Definition = QuantileDefinition.R7;

    /// <summary>The percentile method, named for reports.</summary>
    public const string QuantileMethod =
        "sample quantile of the hours, Hyndman and Fan (1996) definition 7 (linear interpolation between order statistics; R's default, Excel PERCENTILE.INC)";

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

    /// <summary>Enthalpy 0.4 % and 1 % design points, in that order.</summary>
    public required IReadOnlyList<EnthalpyDesignPoint> Enthalpy { get; init; }

    /// <summary>The definitions (percentiles and coincident means) in words, for outputs.</summary>
    public static string Basis => "percentiles: " + QuantileMethod + "; " + CoincidentHours.Definition;

    /// <summary>Computes the design conditions of a record at its site pressure.</summary>
    public static DesignConditions FromRecord(HourlyWeather weather)
    {
        ArgumentNullException.ThrowIfNull(weather);
        return FromHours(weather.DryBulbC, weather.WetBulbC, weather.DewPointC, weather.EnthalpyJPerKg, weather.Site.SitePressurePa, weather.HumidityOver);
    }

    /// <summary>
    /// Computes design conditions from hourly columns of equal length at a site pressure, Pa; the dew points are over
    /// <paramref name="over"/> below 0 C (liquid water, the weather convention, by default).
    /// </summary>
    public static DesignConditions FromHours(double[] dryBulbC, double[] wetBulbC, double[] dewPointC, double[] enthalpyJPerKg, double sitePressurePa,
        HumidityOver over = HumidityOver.Water)
    {
        int n = dryBulbC.Length;
        if (n == 0 || wetBulbC.Length != n || dewPointC.Length != n || enthalpyJPerKg.Length != n)
        {
            throw new ArgumentException("the hourly columns must be non-empty and of equal length");
        }

        var db = Sorted(dryBulbC);
        var dp = Sorted(dewPointC);
        var h = Sorted(enthalpyJPerKg);
        double Q(double[] sorted, double tau) => SortedArrayStatistics.QuantileCustom(sorted, tau, Definition);

        CoolingDesignPoint Cool(double percent)
        {
            double t = Q(db, 1 - percent / 100);
            var hours = CoincidentHours.AroundSorted(db, t);
            return new CoolingDesignPoint(percent, t, hours.MeanOf(dryBulbC, wetBulbC), hours.Count);
        }

        DehumidificationDesignPoint Dehum(double percent)
        {
            double d = Q(dp, 1 - percent / 100);
            var hours = CoincidentHours.AroundSorted(dp, d);
            return new DehumidificationDesignPoint(percent, d, MoistAir.HumidityRatioFromDewPoint(d, sitePressurePa, over), hours.MeanOf(dewPointC, dryBulbC), hours.Count);
        }

        EnthalpyDesignPoint Enth(double percent)
        {
            double e = Q(h, 1 - percent / 100);
            var hours = CoincidentHours.AroundSorted(h, e);
            return new EnthalpyDesignPoint(percent, e, hours.MeanOf(enthalpyJPerKg, dryBulbC), hours.Count);
        }

        return new DesignConditions
        {
            Hours = n,
            Heating996DryBulbC = Q(db, 0.004),
            Heating990DryBulbC = Q(db, 0.01),
            Cooling = [Cool(0.4), Cool(1.0), Cool(2.0)],
            Dehumidification = [Dehum(0.4), Dehum(1.0)],
            Enthalpy = [Enth(0.4), Enth(1.0)],
        };
    }

    private static double[] Sorted(double[] values)
    {
        var copy = (double[])values.Clone();
        Array.Sort(copy);
        return copy;
    }
}
