namespace BinEnergy.Core.Study;

/// <summary>What the study schema says about a key, for the help of the command-line options that set it.</summary>
public static class StudyKeys
{
    /// <summary>The description and documented default (null when the key has none) of <c>[table] key</c>, named without its unit or as one of its spellings.</summary>
    /// <exception cref="KeyNotFoundException">The schema has no such key.</exception>
    public static (string Description, string? Default) Describe(string table, string key)
    {
        var section = StudySchema.Get(table);
        var def = section.Find(key)?.Definition ?? section.Keys.FirstOrDefault(k => k.Name == key) ?? throw new KeyNotFoundException($"[{table}] {key}");
        return (def.Description, def.DefaultText);
    }

    /// <summary>The unit of <c>[table] key</c> spelled with its suffix (<c>per_area_cfm</c>: cfm/ft2), empty for a pure number.</summary>
    /// <exception cref="KeyNotFoundException">The schema has no such spelling.</exception>
    public static string UnitOf(string table, string spelledKey) =>
        StudySchema.Get(table).Find(spelledKey)?.Alternative.Unit ?? throw new KeyNotFoundException($"[{table}] {spelledKey}");
}
