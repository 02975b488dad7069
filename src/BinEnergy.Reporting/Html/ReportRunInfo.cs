namespace BinEnergy.Reporting.Html;

/// <summary>What was run: the input files and settings, the study's hash, the engine version and when.</summary>
public sealed record ReportRunInfo
{
    /// <summary>Inputs as labelled values: study file, weather files, climates, variants, units ...</summary>
    public required IReadOnlyList<ReportKeyValue> Inputs { get; init; }

    /// <summary>Hash of the inputs (as written to summary.json).</summary>
    public required string StudyHash { get; init; }

    /// <summary>BinEnergy version that produced the results.</summary>
    public required string EngineVersion { get; init; }

    /// <summary>When the run started.</summary>
    public required DateTimeOffset RunAt { get; init; }
}
