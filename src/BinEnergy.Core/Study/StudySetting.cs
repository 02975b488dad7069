using System.Globalization;

namespace BinEnergy.Core.Study;

/// <summary>One key of a study as the user wrote it: the dotted key with its unit suffix and the value's TOML text.</summary>
/// <param name="Key">The key, e.g. <c>ventilation.airflow_cfm</c>.</param>
/// <param name="Value">The value as written, e.g. <c>3170</c> or <c>"wheel"</c>.</param>
public sealed record StudySetting(string Key, string Value)
{
    /// <summary>A raw TOML value (string, integer, float, bool or a list of those) as TOML text.</summary>
    public static string Format(object value) => value switch
    {
        string s => "\"" + s + "\"",
        bool b => b ? "true" : "false",
        long l => l.ToString(CultureInfo.InvariantCulture),
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        IEnumerable<object> list => "[" + string.Join(", ", list.Select(Format)) + "]",
        _ => Convert.ToString(value, CultureInfo.InvariantCulture) ?? string.Empty,
    };

    /// <summary><c>key = value</c>.</summary>
    public override string ToString() => Key + " = " + Value;
}
