using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// One control's year: the bin method (bin evaluation point and mean coincident humidity ratio of the
/// occupied hours, times the bin's occupied hours), the hourly sum over the same occupied
/// hours, optionally the joint-bin method, the savings of each against the baseline by the
/// same method, and the breakdowns by bin and by month.
/// </summary>
public sealed record EconomizerControlResult
{
    /// <summary>The control (the baseline's is <see cref="EconomizerControl.None"/>).</summary>
    public required EconomizerControl Control { get; init; }

    /// <summary>Totals by the bin method.</summary>
    public required EconomizerTotals Bin { get; init; }

    /// <summary>Totals by the hourly sum.</summary>
    public required EconomizerTotals Hourly { get; init; }

    /// <summary>Totals by joint dry-bulb x humidity-ratio bins; null when not asked for.</summary>
    public EconomizerTotals? JointBin { get; init; }

    /// <summary>Bin-method totals per row of <see cref="EconomizerEvaluation.Bins"/> (all of a bin's hours in one mode).</summary>
    public required IReadOnlyList<EconomizerTotals> ByBin { get; init; }

    /// <summary>Hourly totals per row of <see cref="EconomizerEvaluation.Bins"/>, each hour put in its dry-bulb bin.</summary>
    public required IReadOnlyList<EconomizerTotals> ByBinHourly { get; init; }

    /// <summary>Hourly totals per calendar month, January first (12 entries).</summary>
    public required IReadOnlyList<EconomizerTotals> ByMonth { get; init; }

    /// <summary>Bin-method savings against the bin-method baseline (negative when the control adds load).</summary>
    public required Energy BinSavings { get; init; }

    /// <summary>Bin-method savings in percent of the baseline coil energy; null when the baseline has none.</summary>
    public required double? BinSavingsPercent { get; init; }

    /// <summary>Hourly savings against the hourly baseline (negative when the control adds load).</summary>
    public required Energy HourlySavings { get; init; }

    /// <summary>Hourly savings in percent of the baseline coil energy; null when the baseline has none.</summary>
    public required double? HourlySavingsPercent { get; init; }

    /// <summary>Joint-bin savings against the joint-bin baseline; null when joint bins were not asked for.</summary>
    public Energy? JointBinSavings { get; init; }

    /// <summary>
    /// Bin method against the hourly sum for the total coil energy, in percent of the hourly
    /// value ((bin - hourly) / hourly x 100); null when the hourly value is zero.
    /// </summary>
    public double? CoilDifferencePercent => Percent(Bin.CoilTotal, Hourly.CoilTotal);

    /// <summary>Bin-method savings against hourly savings, in percent of the hourly savings; null when those are zero.</summary>
    public double? SavingsDifferencePercent => Percent(BinSavings, HourlySavings);

    private static double? Percent(Energy bin, Energy hourly) =>
        hourly.Joules != 0 ? (bin.Joules - hourly.Joules) / Math.Abs(hourly.Joules) * 100.0 : null;
}
