namespace BinEnergy.Core.Study;

/// <summary>A table of the study file: its name, whether it repeats ([[climate]]), its keys, and whether variants may override it.</summary>
internal sealed record SectionDefinition(string Name, bool IsArray, IReadOnlyList<KeyDefinition> Keys, bool Overridable, string Description)
{
    /// <summary>The key definition and spelling for a key as written, or null.</summary>
    public (KeyDefinition Definition, KeyAlternative Alternative)? Find(string key)
    {
        foreach (var d in Keys)
        {
            foreach (var a in d.Alternatives)
            {
                if (a.Key == key)
                {
                    return (d, a);
                }
            }
        }

        return null;
    }

    /// <summary>Every valid spelling of every key.</summary>
    public IEnumerable<string> AllKeys => Keys.SelectMany(d => d.Alternatives.Select(a => a.Key));
}
