namespace BinEnergy.Core.Study;

/// <summary>
/// Everything a study run computed: the study, one result per climate x variant (climates
/// outer, variants inner), and the engine version. Tables, summary, charts and the report
/// are all drawn from this object; nothing downstream recomputes physics.
/// </summary>
/// <param name="Study">The study as read.</param>
/// <param name="Cases">The results per climate x variant.</param>
/// <param name="EngineVersion">The engine's informational version.</param>
public sealed record StudyRunResult(StudyDefinition Study, IReadOnlyList<StudyCaseResult> Cases, string EngineVersion)
{
    /// <summary>Every distinct warning of the run, in order, each prefixed with its climate and variant.</summary>
    public IReadOnlyList<string> Warnings =>
        Cases.SelectMany(c => c.Warnings.Select(w => $"{c.Case.Climate.Name} / {c.Case.Variant.Name}: {w}")).Distinct().ToList();
}
