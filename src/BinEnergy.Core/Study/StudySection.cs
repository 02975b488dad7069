namespace BinEnergy.Core.Study;

/// <summary>
/// The validated keys of one table of a study (for one variant, after its overrides), by key
/// name without unit, in SI. Accessors throw <see cref="StudyFileException"/> for a missing
/// required key, naming the table and every accepted spelling.
/// </summary>
internal sealed class StudySection
{
    private readonly Dictionary<string, StudyValue> values;

    public StudySection(SectionDefinition definition, string file, int? line, bool present, Dictionary<string, StudyValue>? values = null)
    {
        Definition = definition;
        File = file;
        Line = line;
        Present = present;
        this.values = values ?? new Dictionary<string, StudyValue>(StringComparer.Ordinal);
    }

    public SectionDefinition Definition { get; }

    public string File { get; }

    /// <summary>Line of the table header, if the table is written.</summary>
    public int? Line { get; }

    /// <summary>True when the table is written in the file (or created by a variant's override).</summary>
    public bool Present { get; }

    public IReadOnlyDictionary<string, StudyValue> Values => values;

    public bool Has(string name) => values.ContainsKey(name);

    public StudyValue? Get(string name) => values.GetValueOrDefault(name);

    public double? Number(string name) => values.TryGetValue(name, out var v) ? (double)v.Value : null;

    public double RequiredNumber(string name) => Number(name) ?? throw Missing(name);

    public string? Text(string name) => values.TryGetValue(name, out var v) ? (string)v.Value : null;

    public string RequiredText(string name) => Text(name) ?? throw Missing(name);

    public bool? Bool(string name) => values.TryGetValue(name, out var v) ? (bool)v.Value : null;

    public IReadOnlyList<string>? TextList(string name) => values.TryGetValue(name, out var v) ? (IReadOnlyList<string>)v.Value : null;

    public IReadOnlyList<double>? NumberList(string name) => values.TryGetValue(name, out var v) ? (IReadOnlyList<double>)v.Value : null;

    /// <summary>A copy with the given values replacing (or adding to) these.</summary>
    public StudySection With(IEnumerable<KeyValuePair<string, StudyValue>> overrides, bool present)
    {
        var copy = new Dictionary<string, StudyValue>(values, StringComparer.Ordinal);
        foreach (var kv in overrides)
        {
            copy[kv.Key] = kv.Value;
        }

        return new StudySection(Definition, File, Line, present, copy);
    }

    /// <summary>An error about a value of this table, at the value's line.</summary>
    public StudyFileException ErrorAt(string name, string problem)
    {
        var v = values.GetValueOrDefault(name);
        string key = Definition.Name + "." + (v?.WrittenKey ?? name);
        string origin = v is null || v.Origin.Length == 0 ? problem : $"{problem} (set in {v.Origin})";
        return new StudyFileException(File, v?.Line ?? Line, key, origin);
    }

    public StudyFileException Missing(string name)
    {
        var def = Definition.Keys.First(k => k.Name == name);
        string spellings = string.Join(" or ", def.Alternatives.Select(a => a.Key));
        return new StudyFileException(File, Line, Definition.Name,
            $"[{Definition.Name}] needs {spellings} ({def.Description.TrimEnd('.').ToLowerInvariant()})");
    }
}
