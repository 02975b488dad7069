namespace BinEnergy.Core.Loads;

/// <summary>
/// An annual outdoor-air estimate by the bin method (the headline) and by the hourly sum
/// over the same record (the check), with the difference per figure, per-bin rows, monthly
/// totals, peaks at the design conditions and the assumptions.
/// </summary>
public sealed record OutdoorAirResult
{
    /// <summary>Totals by the bin method (loads at each bin's evaluation point and mean coincident W, times hours).</summary>
    public required OutdoorAirTotals Bin { get; init; }

    /// <summary>Totals summed hour by hour.</summary>
    public required OutdoorAirTotals Hourly { get; init; }

    /// <summary>
    /// Each hour's loads by the hourly method (null for an hour without ventilation), one per hour of the record, when
    /// asked for (<c>keepHours</c>); null otherwise. They add up to <see cref="Hourly"/>.
    /// </summary>
    public IReadOnlyList<OutdoorAirTotals?>? Hours { get; init; }

    /// <summary>Totals by joint dry-bulb x humidity-ratio bins, when asked for.</summary>
    public OutdoorAirTotals? JointBin { get; init; }

    /// <summary>Per-bin rows, ascending.</summary>
    public required IReadOnlyList<OutdoorAirBinRow> Bins { get; init; }

    /// <summary>Monthly totals (hourly method), months with hours only.</summary>
    public required IReadOnlyList<OutdoorAirMonth> Months { get; init; }

    /// <summary>Peak load rates at the record's design conditions.</summary>
    public OutdoorAirPeaks? Peaks { get; init; }

    /// <summary>The assumptions.</summary>
    public required OutdoorAirAssumptions Assumptions { get; init; }

    /// <summary>Cautions about the inputs (for example, an airflow below the entered people-and-area minimum).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }

    /// <summary>
    /// Bin method against the hourly sum, percent: 100 (bin - hourly) / hourly; 0 when both
    /// are zero; null when only the hourly figure is zero (no percentage exists).
    /// </summary>
    public double? DifferencePercent(LoadFigure figure) => Percent(Bin.Get(figure).Joules, Hourly.Get(figure).Joules);

    /// <summary>Joint bins against the hourly sum, percent (as <see cref="DifferencePercent"/>); null without joint bins.</summary>
    public double? JointDifferencePercent(LoadFigure figure) =>
        JointBin is null ? null : Percent(JointBin.Get(figure).Joules, Hourly.Get(figure).Joules);

    private static double? Percent(double estimate, double reference)
    {
        // Below a joule per year the figure is zero for every practical purpose.
        if (Math.Abs(reference) < 1.0)
        {
            return Math.Abs(estimate) < 1.0 ? 0.0 : null;
        }

        return 100.0 * (estimate - reference) / reference;
    }
}
