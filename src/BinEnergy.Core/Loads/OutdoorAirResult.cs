using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Loads;

/// <summary>
/// An outdoor-air estimate of one record by the three integration methods (hourly sum, joint
/// bins, bin method): annual, per dry-bulb bin and per month, with the energy the plant buys,
/// the peaks at the design conditions, the assumptions and the warnings.
/// </summary>
public sealed record OutdoorAirResult
{
    /// <summary>The year's figures by each method.</summary>
    public required ByMethod<EnergyFigures> Annual { get; init; }

    /// <summary>Per dry-bulb bin, ascending, each by the three methods (the hourly figures are the bin's own hours summed).</summary>
    public required IReadOnlyList<OutdoorAirBinRow> Bins { get; init; }

    /// <summary>Per calendar month with ventilated hours, by the three methods.</summary>
    public required IReadOnlyList<OutdoorAirMonth> Months { get; init; }

    /// <summary>Each hour's figures (zero for an hour without ventilation), when asked for; null otherwise. They add up to the hourly annual figures.</summary>
    public IReadOnlyList<EnergyFigures>? Hours { get; init; }

    /// <summary>True when energy bought, cost and carbon were computed (a plant was given).</summary>
    public bool HasPlant { get; init; }

    /// <summary>Peak load rates at the record's design conditions.</summary>
    public OutdoorAirPeaks? Peaks { get; init; }

    /// <summary>The record's design conditions the peaks were computed at (null for an empty record).</summary>
    public Climate.DesignConditions? Design { get; init; }

    /// <summary>The assumptions.</summary>
    public required OutdoorAirAssumptions Assumptions { get; init; }

    /// <summary>Cautions about the inputs (for example, an airflow below the entered people-and-area minimum).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }

    /// <summary>Hours in which a COP curve was held at its end value (hourly method).</summary>
    public required CurveClampCounter Clamps { get; init; }

    /// <summary>How many complete years these figures are the mean of (1 for a single or typical year).</summary>
    public int YearsAveraged { get; init; } = 1;

    /// <summary>
    /// The mean year of a result computed over <paramref name="years"/> complete years: every energy and
    /// ventilated hour divided by <paramref name="years"/> (the bins' weather statistics stay those of all the
    /// hours; <see cref="OutdoorAirBinRow.YearsAveraged"/> says how many years they span). Peaks stay those of the record.
    /// </summary>
    public OutdoorAirResult PerYear(int years)
    {
        if (years <= 1)
        {
            return this;
        }

        double f = 1.0 / years;
        return this with
        {
            Annual = Annual.Select(a => a.Scaled(f)),
            Bins = [.. Bins.Select(b => b with { Figures = b.Figures.Select(x => x.Scaled(f)), YearsAveraged = years })],
            Months = [.. Months.Select(m => m with { Figures = m.Figures.Select(x => x.Scaled(f)) })],
            Hours = null,
            YearsAveraged = years,
        };
    }

    /// <summary>
    /// A method against the hourly sum for one load figure, percent: 100 (method - hourly) / hourly;
    /// 0 when both are zero; null when only the hourly figure is zero.
    /// </summary>
    public double? DifferencePercent(IntegrationMethod method, LoadFigure figure) =>
        MethodDifference.Percent(Annual[method].Loads[figure].Joules, Annual.Hourly.Loads[figure].Joules);
}
