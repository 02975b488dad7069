namespace BinEnergy.Cli.Options;

/// <summary>
/// The study-file key an option sets (<c>[ventilation] airflow_cfm</c> for <c>--airflow</c>), so a
/// single command runs as a one-case study through the same checks and engines as <c>run</c>.
/// </summary>
/// <param name="table">The study table.</param>
/// <param name="key">The key without its unit suffix.</param>
/// <param name="unit">The <see cref="Reporting.Units.DisplayUnits"/> property whose unit gives the key its suffix
/// (<c>nameof(DisplayUnits.Airflow)</c> makes <c>airflow</c> <c>airflow_cfm</c> or <c>airflow_ls</c>); null for a key without one.</param>
[AttributeUsage(AttributeTargets.Property, AllowMultiple = true)]
internal sealed class StudyKeyAttribute(string table, string key, string? unit = null) : Attribute
{
    public string Table { get; } = table;

    public string Key { get; } = key;

    public string? Unit { get; } = unit;

    /// <summary>For a flag: the key gets the opposite (<c>--non-integrated</c> sets <c>integrated = false</c>).</summary>
    public bool Inverted { get; init; }

    /// <summary>For text: split at commas into a list.</summary>
    public bool List { get; init; }

    /// <summary>For text: split at commas into a list of numbers (invariant culture).</summary>
    public bool Numbers { get; init; }
}
