using BinEnergy.Core.Study;

namespace BinEnergy.Core.Batch;

/// <summary>
/// The climates of a batch named on the command line (<c>--charts-for NAME[,NAME...]</c>), matched to the inputs before
/// anything runs. A name is a station list's <c>name</c>, a file's id (its path relative to the folder or list, without
/// its ending), or the name the tables give an unlisted file (<c>site name (id)</c>). A name that matches no input is an
/// error that names it and the inputs it is close to (Levenshtein distance, <see cref="KeySuggester"/>, or containing it).
/// </summary>
public sealed class BatchClimateSelection
{
    private readonly Dictionary<string, string> byKey;

    private BatchClimateSelection(IReadOnlyList<string> names, Dictionary<string, string> byKey)
    {
        Names = names;
        this.byKey = byKey;
    }

    /// <summary>No climate named.</summary>
    public static BatchClimateSelection None { get; } = new([], new Dictionary<string, string>(StringComparer.Ordinal));

    /// <summary>The names as given, without repeats, in the order given.</summary>
    public IReadOnlyList<string> Names { get; }

    /// <summary>The name given for <paramref name="station"/>, or null when it was not named.</summary>
    public string? NameOf(BatchStation station) => byKey.GetValueOrDefault(station.Key);

    /// <summary>Matches <paramref name="names"/> (comma-separated, as the option takes them) to the inputs.</summary>
    /// <exception cref="BatchInputException">A name matches no input (the message lists every such name with its close matches), or the list is empty.</exception>
    public static BatchClimateSelection Choose(string? names, BatchInputs inputs, string option = "--charts-for")
    {
        if (names is null)
        {
            return None;
        }

        var given = names.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries).Distinct(StringComparer.Ordinal).ToList();
        if (given.Count == 0)
        {
            throw new BatchInputException($"{option} '{names}' names no climate: give one or more names separated by commas, as the station list's name column or the files' ids");
        }

        var byKey = new Dictionary<string, string>(StringComparer.Ordinal);
        var unknown = new List<string>();
        foreach (string name in given)
        {
            var station = inputs.Stations.FirstOrDefault(s => s.ListedName == name)
                ?? inputs.Stations.FirstOrDefault(s => s.Id == name)
                ?? inputs.Stations.FirstOrDefault(s => s.ListedName is null && name.EndsWith($" ({s.Id})", StringComparison.Ordinal));
            if (station is null)
            {
                unknown.Add(name);
            }
            else
            {
                byKey.TryAdd(station.Key, name);
            }
        }

        if (unknown.Count > 0)
        {
            var candidates = inputs.Stations.Select(s => s.ListedName ?? s.Id).ToList();
            string Close(string name)
            {
                var close = Nearest(name, candidates);
                return close.Count == 0 ? $"'{name}' (nothing close)" : $"'{name}' (close: {string.Join(", ", close.Select(c => $"'{c}'"))})";
            }

            throw new BatchInputException($"{option}: {(unknown.Count == 1 ? "no input is named" : FormattableString.Invariant($"{unknown.Count} names match no input:"))} {string.Join("; ", unknown.Select(Close))}. "
                + "Give the station list's name column, or a file's id (its path relative to the folder or list, without its ending), or the tables' climate name");
        }

        return new BatchClimateSelection(given, byKey);
    }

    /// <summary>Up to three candidates close to <paramref name="name"/>: those that contain it or it contains (ignoring case), then those within a third of its length in edits.</summary>
    private static List<string> Nearest(string name, IReadOnlyList<string> candidates)
    {
        int allowed = Math.Max(2, name.Length / 3);
        return candidates
            .Select(c => (Name: c, Contains: c.Contains(name, StringComparison.OrdinalIgnoreCase) || name.Contains(c, StringComparison.OrdinalIgnoreCase),
                Distance: KeySuggester.Distance(name.ToLowerInvariant(), c.ToLowerInvariant())))
            .Where(c => c.Contains || c.Distance <= allowed)
            .OrderBy(c => c.Contains ? 0 : 1).ThenBy(c => c.Distance).ThenBy(c => c.Name, StringComparer.Ordinal)
            .Take(3).Select(c => c.Name).ToList();
    }
}
