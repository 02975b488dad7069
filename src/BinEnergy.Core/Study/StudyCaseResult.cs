using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// The results of one climate x variant: the outdoor-air engine's result (annual, bin and monthly
/// figures by the three methods, with the plant's energy, cost and carbon, and the peaks), the
/// economizer evaluation, and the warnings. Tables, summary, charts and report all read this.
/// </summary>
public sealed record StudyCaseResult
{
    public required StudyCase Case { get; init; }

    /// <summary>The weather record the case ran on.</summary>
    public required HourlyWeather Weather { get; init; }

    /// <summary>The outdoor-air engine's result (identical to the <c>outdoor-air</c> command's for the same settings).</summary>
    public required OutdoorAirResult OutdoorAir { get; init; }

    /// <summary>The economizer evaluation (identical to the <c>economizer</c> command's), or null without an economizer.</summary>
    public EconomizerEvaluation? Economizer { get; init; }

    /// <summary>
    /// The record's calendar years and their own results: one entry (the case's results) for a typical year
    /// or a record within one year; one per year for a multi-year record, whose <see cref="OutdoorAir"/> and
    /// <see cref="Economizer"/> are then the mean of its complete years (partial years are not mixed in).
    /// </summary>
    public required IReadOnlyList<CaseYear> Years { get; init; }

    /// <summary>True when the record spans several calendar years (the case's figures are a mean year).</summary>
    public bool IsMultiYear => Years.Count > 1;

    /// <summary>Each hour's figures over the whole record when the run kept them (<c>--hourly</c>), else null.</summary>
    public IReadOnlyList<EnergyFigures>? HourlyFigures { get; init; }

    /// <summary>Occupied flag per hour.</summary>
    public required bool[] Occupied { get; init; }

    /// <summary>Cautions for this case (low airflow, clamped COP curves, weather repairs, headline method far from hourly, ...).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
}
