using System.Reflection;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Cli.Options;

/// <summary>
/// Turns a command's options into a one-case study (<see cref="StudyInput"/>) through their
/// <see cref="StudyKeyAttribute"/>s, and the study's errors back into messages about the options.
/// </summary>
internal static class StudyOptions
{
    /// <summary>Every option of <paramref name="settings"/> that was given, as study keys in the display units' spellings.</summary>
    public static StudyInput Add(StudyInput input, CommandSettings settings, DisplayUnits u)
    {
        foreach (var (property, key) in Keyed(settings))
        {
            string origin = OptionName(property);
            object? value = property.GetValue(settings);
            foreach (var (table, name) in key.Keys)
            {
                object? studyValue = value switch
                {
                    null => null,
                    bool flag => flag ? !key.Inverted : null,
                    string text when key.Numbers => NumbersOf(text, origin),
                    string text when key.List => text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries),
                    string or double or int => value,
                    _ => throw new InvalidOperationException($"option {origin} has a value of type {value.GetType().Name} that no study key takes"),
                };
                if (studyValue is not null)
                {
                    input.Set(table, KeyName(name, key.Unit, u), studyValue, origin);
                }
            }
        }

        return input;
    }

    /// <summary>A study-file error about the options as a usage error that names the option.</summary>
    public static UsageException Explain(StudyInput input, StudyFileException e)
    {
        string? origin = input.OriginOf(e.Line, e.Key);
        // On the command line a unit slip is fixed with the other --units, not with another key.
        string problem = System.Text.RegularExpressions.Regex.Replace(e.Problem, ": if that is what you meant, write [a-z0-9_]+$", ": if that is what you meant, give the other --units (ip or si)");
        return new UsageException(origin is null ? problem : origin + ": " + problem);
    }

    /// <summary>The key spelled in the display units (<c>airflow</c> with <c>Airflow</c> in ip: <c>airflow_cfm</c>).</summary>
    internal static string KeyName(string key, string? unit, DisplayUnits u) => unit is null
        ? key
        : (typeof(DisplayUnits).GetProperty(unit)?.GetValue(u) as DisplayUnit
            ?? throw new InvalidOperationException($"DisplayUnits has no unit {unit}")).NameFor(key);

    /// <summary>The options marked <see cref="StudyKeyAttribute.Required"/> that were not given, as one message; null when none is missing.</summary>
    public static string? Missing(CommandSettings settings)
    {
        var missing = Keyed(settings).Where(o => o.Key.Required && o.Property.GetValue(settings) is null)
            .Select(o => $"{OptionName(o.Property)} is required: {o.Key.What}").ToList();
        return missing.Count == 0 ? null : string.Join("; ", missing);
    }

    /// <summary>True when an option that sets a key of the study table <paramref name="table"/> was given (a flag: set).</summary>
    public static bool Given(CommandSettings settings, string table) =>
        Keyed(settings).Any(o => o.Key.Table == table && o.Property.GetValue(settings) is not (null or false));

    /// <summary>The options of <paramref name="settings"/> that set study keys, with their <see cref="StudyKeyAttribute"/>.</summary>
    private static IEnumerable<(PropertyInfo Property, StudyKeyAttribute Key)> Keyed(CommandSettings settings) =>
        settings.GetType().GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .Select(p => (p, p.GetCustomAttribute<StudyKeyAttribute>()!)).Where(o => o.Item2 is not null);

    /// <summary>The option's long name as the user types it, e.g. <c>--airflow</c>; an argument's name in capitals.</summary>
    public static string OptionName(PropertyInfo property) => property.GetCustomAttribute<CommandOptionAttribute>() is { } option
        ? "--" + option.LongNames[0]
        : property.GetCustomAttribute<CommandArgumentAttribute>()?.ValueName.ToUpperInvariant() ?? property.Name;

    /// <summary>Comma-separated numbers as the study reader takes a TOML list; a word that is not a number is a usage error naming the option.</summary>
    private static List<object> NumbersOf(string text, string origin) =>
        text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries)
            .Select(item => double.TryParse(item, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double v)
                ? (object)v
                : throw new UsageException($"{origin}: '{BinEnergy.Reporting.Output.PrintableText.Of(item)}' is not a number; give comma-separated numbers such as 0.0013,0.147,0.9506,-0.0998"))
            .ToList();
}
