namespace BinEnergy.Core.Weather;

/// <summary>
/// What reading a weather file repaired or noticed (DESIGN 5.4). Every repair is counted;
/// nothing is repaired silently. Counts are keyed by a short stable name (for example
/// <c>gaps_filled_hours</c>, <c>rh_clamped</c>, <c>dewpoint_above_drybulb_clamped</c>) so
/// outputs can list them; <see cref="Examples"/> keeps the first few occurrences of each.
/// </summary>
public sealed class QualityReport
{
    private readonly SortedDictionary<string, int> counts = new(StringComparer.Ordinal);
    private readonly SortedDictionary<string, List<string>> examples = new(StringComparer.Ordinal);
    private readonly List<string> warnings = [];

    /// <summary>How many first occurrences of each repair are kept as examples.</summary>
    public const int MaxExamples = 5;

    /// <summary>Repair counts by name.</summary>
    public IReadOnlyDictionary<string, int> Counts => counts;

    /// <summary>The first occurrences of each repair, as readable text ("line 1234 (1981-09-03 14:00): ...").</summary>
    public IReadOnlyDictionary<string, List<string>> Examples => examples;

    /// <summary>Notices that are not repairs (e.g. "no elevation: sea-level pressure assumed").</summary>
    public IReadOnlyList<string> Warnings => warnings;

    /// <summary>Total number of repairs of every kind (not counting <see cref="Disagreements"/>, which change nothing).</summary>
    public int TotalRepairs => Repairs.Sum(kv => kv.Value);

    /// <summary>The counts of values changed or dropped (gaps filled, values clamped, hours dropped), by name.</summary>
    public IEnumerable<KeyValuePair<string, int>> Repairs => counts.Where(kv => !kv.Key.StartsWith(QualityKeys.DisagreesPrefix, StringComparison.Ordinal));

    /// <summary>
    /// The counts of hours where a second humidity measure disagrees with the one used, by name
    /// (<see cref="QualityKeys.DisagreesPrefix"/>): checks, not repairs.
    /// </summary>
    public IEnumerable<KeyValuePair<string, int>> Disagreements => counts.Where(kv => kv.Key.StartsWith(QualityKeys.DisagreesPrefix, StringComparison.Ordinal));

    /// <summary>Counts one repair of a kind, keeping its description while fewer than <see cref="MaxExamples"/> are kept.</summary>
    public void Count(string kind, string? example = null, int howMany = 1)
    {
        counts[kind] = counts.GetValueOrDefault(kind) + howMany;
        if (example is null)
        {
            return;
        }

        if (!examples.TryGetValue(kind, out var list))
        {
            list = [];
            examples[kind] = list;
        }

        if (list.Count < MaxExamples)
        {
            list.Add(example);
        }
    }

    /// <summary>Adds the counts, examples (while fewer than <see cref="MaxExamples"/> are kept) and notices of a report on later lines.</summary>
    internal void Append(QualityReport later)
    {
        foreach (var (kind, count) in later.counts)
        {
            counts[kind] = counts.GetValueOrDefault(kind) + count;
        }

        foreach (var (kind, list) in later.examples)
        {
            if (!examples.TryGetValue(kind, out var mine))
            {
                mine = [];
                examples[kind] = mine;
            }

            mine.AddRange(list.Take(MaxExamples - mine.Count));
        }

        warnings.AddRange(later.warnings);
    }

    /// <summary>Adds a notice.</summary>
    public void Warn(string warning) => warnings.Add(warning);
}
