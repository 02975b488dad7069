using BinEnergy.Core.Study;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Cli.Options;

/// <summary>
/// The study-file key an option sets (<c>[ventilation] airflow_cfm</c> for <c>--airflow</c>), so a
/// single command runs as a one-case study through the same checks and engines as <c>run</c>.
/// It is also the option's help: the key's description and default come from the study schema, the
/// units from <see cref="DisplayUnits"/>, so the help and the study file cannot say different things.
/// </summary>
/// <param name="table">The study table.</param>
/// <param name="key">The key without its unit suffix.</param>
/// <param name="unit">The <see cref="DisplayUnits"/> property whose unit gives the key its suffix
/// (<c>nameof(DisplayUnits.Airflow)</c> makes <c>airflow</c> <c>airflow_cfm</c> or <c>airflow_ls</c>); null for a key without one.</param>
[AttributeUsage(AttributeTargets.Property)]
internal sealed class StudyKeyAttribute(string table, string key, string? unit = null) : DescriptionAttribute
{
    private static readonly DisplayUnits Ip = new(UnitSystem.IP);
    private static readonly DisplayUnits Si = new(UnitSystem.SI);

    public string Table { get; } = table;

    public string Key { get; } = key;

    public string? Unit { get; } = unit;

    /// <summary>More keys the option sets to the same value, as <c>table.key</c> in the same unit (<c>--return-temp</c> is also the ventilation setpoints).</summary>
    public string[] Also { get; init; } = [];

    /// <summary>The command needs the option (the study would need the key).</summary>
    public bool Required { get; init; }

    /// <summary>What the option adds on the command line to the key's description (how it combines with other options).</summary>
    public string? Note { get; init; }

    /// <summary>The option's own help, for an option whose sense differs from the key's (a flag that sets the opposite).</summary>
    public string? Help { get; init; }

    /// <summary>For a flag: the key gets the opposite (<c>--non-integrated</c> sets <c>integrated = false</c>).</summary>
    public bool Inverted { get; init; }

    /// <summary>For text: split at commas into a list.</summary>
    public bool List { get; init; }

    /// <summary>For text: split at commas into a list of numbers (invariant culture).</summary>
    public bool Numbers { get; init; }

    /// <summary>The key as an ip study file spells it (its unit tells apart keys that share a name, such as a capacity and a capacity per airflow).</summary>
    private string Spelled => Unit is null ? Key : StudyOptions.KeyName(Key, Unit, Ip);

    /// <summary>Every key the option sets: its own, then <see cref="Also"/>.</summary>
    public IEnumerable<(string Table, string Key)> Keys =>
        Also.Select(k => k.Split('.', 2)).Select(p => (p[0], p[1])).Prepend((Table, Key));

    /// <summary>The schema's description without its final stop, lower-cased at the start (for "--x is required: ...").</summary>
    public string What => StudyKeys.Describe(Table, Spelled).Description.TrimEnd('.') is var d && d.Length > 0 ? char.ToLowerInvariant(d[0]) + d[1..] : d;

    /// <summary>The option's help (Spectre markup): the key's description, its units in both systems, the note, and its default or that it is required.</summary>
    public override string Description
    {
        get
        {
            var (description, defaultText) = StudyKeys.Describe(Table, Spelled);
            string? otherwise = defaultText is null or "true" or "false" ? null : "Default " + defaultText.TrimEnd('.') + ".";
            string?[] parts = [(Help ?? description).TrimEnd('.') + "." + Units(), Note, Required ? "Required." : otherwise, $"Study file: [{Table}] {(Unit is null ? Key : Key + "_<unit>")}."];
            // Spectre reads help as markup: the study table's brackets are escaped.
            return Spectre.Console.Markup.Escape(string.Join(" ", parts.OfType<string>()));
        }
    }

    /// <summary>" In F (ip) or C (si).": the key's unit in both systems, from its spellings; empty for a key without a unit.</summary>
    private string Units() => Unit is null ? string.Empty : $" In {Symbol(Ip)} (ip) or {Symbol(Si)} (si).";

    private string Symbol(DisplayUnits u) => StudyKeys.UnitOf(Table, StudyOptions.KeyName(Key, Unit, u));
}
