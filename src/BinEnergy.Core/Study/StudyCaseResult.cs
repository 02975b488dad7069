using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Study.Results;
using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// The results of one climate x variant: the outdoor-air engine's own result (for reports and
/// charts), the annual, monthly and per-bin figures with the plant's energy, cost and carbon,
/// the economizer figures, the peaks, and the warnings.
/// </summary>
public sealed record StudyCaseResult
{
    public required StudyCase Case { get; init; }

    /// <summary>The weather record the case ran on.</summary>
    public required HourlyWeather Weather { get; init; }

    /// <summary>The outdoor-air engine's result (identical to the <c>outdoor-air</c> command's for the same settings).</summary>
    public required OutdoorAirResult OutdoorAir { get; init; }

    /// <summary>Annual figures by the bin method.</summary>
    public required LoadFigures AnnualBin { get; init; }

    /// <summary>Annual figures summed hour by hour.</summary>
    public required LoadFigures AnnualHourly { get; init; }

    /// <summary>Monthly figures (hourly method), months 1-12 with hours.</summary>
    public required IReadOnlyList<(int Month, LoadFigures Figures)> Months { get; init; }

    /// <summary>Per-bin figures (bin method).</summary>
    public required IReadOnlyList<BinFigures> Bins { get; init; }

    /// <summary>Per-hour figures (hourly method), only when asked for.</summary>
    public IReadOnlyList<LoadFigures>? Hours { get; init; }

    /// <summary>Occupied flag per hour.</summary>
    public required bool[] Occupied { get; init; }

    /// <summary>Economizer figures per method and control (baseline <c>none</c> first); empty without an economizer.</summary>
    public required IReadOnlyList<EconomizerFigures> Economizer { get; init; }

    /// <summary>The economizer engine's own evaluation (identical to the <c>economizer</c> command's), or null without an economizer.</summary>
    public Economizer.EconomizerEvaluation? EconomizerEvaluation { get; init; }

    /// <summary>Peak outdoor-air loads at the design conditions.</summary>
    public required IReadOnlyList<PeakFigures> Peaks { get; init; }

    /// <summary>Hours in which a COP curve was held at its end value.</summary>
    public required CurveClampCounter Clamps { get; init; }

    /// <summary>Cautions for this case (low airflow, clamped COP curves, weather repairs, ...).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
}
