namespace BinEnergy.Core.Study;

/// <summary>
/// One variant of a study: its name and the study's tables with its overrides applied (a
/// study without [[variant]] tables has one variant, "base", with no overrides).
/// </summary>
public sealed class StudyVariant
{
    internal StudyVariant(string name, int? line, IReadOnlyDictionary<string, StudySection> sections, IReadOnlyList<string> overrides)
    {
        Name = name;
        Line = line;
        Sections = sections;
        Overrides = overrides;
    }

    /// <summary>Its name, as in the tables' <c>variant</c> column.</summary>
    public string Name { get; }

    /// <summary>Line of its name in the study file, if written.</summary>
    public int? Line { get; }

    /// <summary>The keys it overrides, as written (e.g. <c>ventilation.airflow_cfm</c>).</summary>
    public IReadOnlyList<string> Overrides { get; }

    /// <summary>The settings it changes against the base, as written (<c>ventilation.airflow_cfm = 3170</c>).</summary>
    public IReadOnlyList<StudySetting> Changes { get; init; } = [];

    internal IReadOnlyDictionary<string, StudySection> Sections { get; }
}
