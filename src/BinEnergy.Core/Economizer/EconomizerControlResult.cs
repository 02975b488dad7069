using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// One control's year by the three integration methods (hourly sum over the occupied hours; joint
/// dry-bulb x humidity-ratio bins; the classic dry-bulb bins), each against the baseline by the
/// same method (negative savings are kept), with breakdowns by bin (every method) and by month
/// (hourly).
/// </summary>
public sealed record EconomizerControlResult
{
    /// <summary>The control (the baseline's is <see cref="EconomizerControl.None"/>).</summary>
    public required EconomizerControl Control { get; init; }

    /// <summary>The year's totals by each method.</summary>
    public required ByMethod<EconomizerTotals> Totals { get; init; }

    /// <summary>The baseline's year by each method (the same system without an economizer).</summary>
    public required ByMethod<EconomizerTotals> Baseline { get; init; }

    /// <summary>Totals per row of <see cref="EconomizerEvaluation.Bins"/> by each method (hourly: each hour in its dry-bulb bin).</summary>
    public required IReadOnlyList<ByMethod<EconomizerTotals>> ByBin { get; init; }

    /// <summary>Hourly totals per calendar month, January first (12 entries).</summary>
    public required IReadOnlyList<EconomizerTotals> ByMonth { get; init; }

    /// <summary>Every total multiplied by <paramref name="factor"/> (e.g. to a mean year).</summary>
    public EconomizerControlResult Scaled(double factor) => this with
    {
        Totals = Totals.Select(t => t.Scaled(factor)),
        Baseline = Baseline.Select(t => t.Scaled(factor)),
        ByBin = [.. ByBin.Select(b => b.Select(t => t.Scaled(factor)))],
        ByMonth = [.. ByMonth.Select(t => t.Scaled(factor))],
    };

    /// <summary>Coil energy saved against the baseline by a method (negative when the control adds load).</summary>
    public Energy Savings(IntegrationMethod method) => Totals[method].SavingsAgainst(Baseline[method]);

    /// <summary>Savings in percent of the baseline coil energy by a method; null when the baseline has none.</summary>
    public double? SavingsPercent(IntegrationMethod method) => Totals[method].SavingsPercentAgainst(Baseline[method]);

    /// <summary>Compressor electricity, cost and carbon saved against the baseline by a method.</summary>
    public SiteEnergy CompressorSavings(IntegrationMethod method) => Totals[method].CompressorSavingsAgainst(Baseline[method]);

    /// <summary>Reheat and preheat saved against the baseline by a method (negative when the control adds heating).</summary>
    public Energy HeatingSavings(IntegrationMethod method) => Totals[method].HeatingSavingsAgainst(Baseline[method]);

    /// <summary>Everything bought (compressor and heating) saved against the baseline by a method.</summary>
    public SiteEnergy PurchasedSavings(IntegrationMethod method) => Totals[method].PurchasedSavingsAgainst(Baseline[method]);

    /// <summary>A method's total coil energy against the hourly sum, in percent of the hourly value; null when that is zero.</summary>
    public double? CoilDifferencePercent(IntegrationMethod method) =>
        MethodDifference.Percent(Totals[method].CoilTotal.Joules, Totals.Hourly.CoilTotal.Joules);

    /// <summary>A method's savings against the hourly savings, in percent of the hourly savings; null when those are zero.</summary>
    public double? SavingsDifferencePercent(IntegrationMethod method) =>
        MethodDifference.Percent(Savings(method).Joules, Savings(IntegrationMethod.Hourly).Joules);
}
