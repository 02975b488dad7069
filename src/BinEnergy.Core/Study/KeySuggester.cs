namespace BinEnergy.Core.Study;

/// <summary>
/// Finds the valid key nearest to a misspelled one by Levenshtein edit distance (insertions,
/// deletions and substitutions each cost 1; V. I. Levenshtein, 1966), accepting a match within
/// a third of the key's length (at least 2 edits), or a distance the caller sets.
/// </summary>
public static class KeySuggester
{
    /// <summary>The candidate nearest <paramref name="written"/>, or null when none is within the allowed distance.</summary>
    public static string? Nearest(string written, IEnumerable<string> candidates, int? maxDistance = null)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            int d = Distance(written, c);
            if (d < bestDistance || (d == bestDistance && best is not null && string.CompareOrdinal(c, best) < 0))
            {
                best = c;
                bestDistance = d;
            }
        }

        int allowed = maxDistance ?? Math.Max(2, written.Length / 3);
        return bestDistance <= allowed ? best : null;
    }

    /// <summary>The Levenshtein distance between two strings (two-row dynamic programme).</summary>
    public static int Distance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
