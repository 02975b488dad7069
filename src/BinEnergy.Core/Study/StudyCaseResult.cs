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

    /// <summary>Occupied flag per hour.</summary>
    public required bool[] Occupied { get; init; }

    /// <summary>Cautions for this case (low airflow, clamped COP curves, weather repairs, headline method far from hourly, ...).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
}
