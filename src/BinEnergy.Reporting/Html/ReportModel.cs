namespace BinEnergy.Reporting.Html;

/// <summary>
/// Everything a report page shows. The page always has, in this order: what was run,
/// assumptions, results, warnings and cautions (<see cref="Text.Cautions.Report"/> plus
/// <see cref="ExtraCautions"/>). All text is plain; <see cref="HtmlReport"/> escapes it.
/// </summary>
public sealed record ReportModel
{
    /// <summary>The study's name (user text).</summary>
    public required string StudyName { get; init; }

    public required ReportRunInfo Run { get; init; }

    public required ReportAssumptions Assumptions { get; init; }

    /// <summary>Input sections (weather files, settings, variants, defaults), each with tables.</summary>
    public IReadOnlyList<ReportSection> Inputs { get; init; } = [];

    /// <summary>Result sections (per study, per climate ...), each with tables and charts.</summary>
    public IReadOnlyList<ReportSection> Results { get; init; } = [];

    /// <summary>Warnings of the run (airflow below the entered minimum, data repairs, clamped curves ...).</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>Cautions beyond the standard ones (e.g. a note on economizer high limits).</summary>
    public IReadOnlyList<string> ExtraCautions { get; init; } = [];
}
