using MathNet.Numerics.Statistics;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// How one figure spreads across climates: count, lowest, quartiles, median, mean and highest of
/// the finite values. Quartiles are MathNet sample quantiles by Hyndman and Fan (1996) definition 7
/// (linear interpolation between order statistics; R's default, Excel PERCENTILE.INC), the
/// definition the design conditions use.
/// </summary>
/// <param name="Count">How many finite values.</param>
/// <param name="Min">The lowest.</param>
/// <param name="LowerQuartile">The 25th percentile.</param>
/// <param name="Median">The 50th percentile.</param>
/// <param name="UpperQuartile">The 75th percentile.</param>
/// <param name="Mean">The arithmetic mean.</param>
/// <param name="Max">The highest.</param>
public sealed record FigureDistribution(int Count, double Min, double LowerQuartile, double Median, double UpperQuartile, double Mean, double Max)
{
    /// <summary>The distribution of the finite values of <paramref name="values"/> (all NaN when there are none).</summary>
    public static FigureDistribution Of(IEnumerable<double> values)
    {
        var sorted = values.Where(double.IsFinite).Order().ToArray();
        if (sorted.Length == 0)
        {
            return new FigureDistribution(0, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN);
        }

        double Q(double tau) => SortedArrayStatistics.QuantileCustom(sorted, tau, QuantileDefinition.R7);
        return new FigureDistribution(sorted.Length, sorted[0], Q(0.25), Q(0.5), Q(0.75), sorted.Average(), sorted[^1]);
    }
}
