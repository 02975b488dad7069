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
    /// <summary>
    /// Every distinct warning of the run, in order: a warning that every variant of a climate
    /// gives (the weather file's repairs, say) once, prefixed with the climate; the others
    /// prefixed with their climate and variant.
    /// </summary>
    public IReadOnlyList<string> Warnings =>
        Cases.GroupBy(c => c.Case.Climate.Name, StringComparer.Ordinal).SelectMany(g =>
        {
            var everyVariant = g.Select(c => (IEnumerable<string>)c.Warnings).Aggregate((a, b) => a.Intersect(b, StringComparer.Ordinal)).ToHashSet(StringComparer.Ordinal);
            return everyVariant.Count > 0 && g.Count() > 1
                ? g.SelectMany(c => c.Warnings.Select(w => everyVariant.Contains(w) ? $"{g.Key}: {w}" : $"{g.Key} / {c.Case.Variant.Name}: {w}"))
                : g.SelectMany(c => c.Warnings.Select(w => $"{g.Key} / {c.Case.Variant.Name}: {w}"));
        }).Distinct(StringComparer.Ordinal).ToList();
}
