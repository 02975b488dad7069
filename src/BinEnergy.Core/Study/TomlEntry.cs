namespace BinEnergy.Core.Study;

/// <summary>
/// One key of a study file as written: its table (<c>ventilation</c>, <c>climate</c>,
/// <c>variant</c> ...), the position within an array of tables (0 for a plain table), the key
/// below the table (dotted when nested, e.g. <c>ventilation.airflow_cfm</c> inside a variant),
/// the raw value (string, long, double, bool, or a list of those) and its 1-based line.
/// </summary>
internal sealed record TomlEntry(string Table, int Index, string Key, object Value, int Line)
{
    /// <summary>The key as a user would write it in full, e.g. <c>variant[2].recovery.enabled</c>.</summary>
    public string FullKey => Table + (Index > 0 || Table is "climate" or "variant" ? $"[{Index + 1}]" : string.Empty) + "." + Key;
}
