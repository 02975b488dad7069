using System.Reflection;
using System.Text.RegularExpressions;

namespace BinEnergy.Cli;

/// <summary>The command-line parser's messages in plain words: the nearest option for a misspelled one, what a value should look like, and the command's own help.</summary>
internal static partial class UsageMessages
{
    /// <summary>A parse or conversion message reworded; <paramref name="command"/> is the command the arguments name, if any.</summary>
    public static string Explain(string message, string? command, string[] args)
    {
        string help = command is null ? "(see binenergy --help)" : $"(see binenergy {command} --help)";
        if (UnknownOption().Match(message) is { Success: true } unknown)
        {
            string name = unknown.Groups[1].Value;
            string? near = command is null ? null : Nearest(name, OptionNames(CommandRegistry.SettingsTypes[command]));
            return $"--{name} is not an option of {(command is null ? "binenergy" : "binenergy " + command)}" + (near is null ? "" : $"; did you mean --{near}?") + " " + help;
        }

        if (UnknownCommand().Match(message) is { Success: true } unknownCommand)
        {
            string name = unknownCommand.Groups[1].Value;
            string? near = Nearest(name, CommandRegistry.SettingsTypes.Keys);
            return $"'{name}' is not a binenergy command" + (near is null ? "" : $"; did you mean {near}?") + " " + help;
        }

        if (FailedToConvert().Match(message) is { Success: true } convert)
        {
            string value = convert.Groups[1].Value;
            int at = Array.IndexOf(args, value);
            string option = at > 0 && args[at - 1].StartsWith("--", StringComparison.Ordinal) ? args[at - 1] : "";
            var property = command is null || option.Length == 0 ? null : CommandRegistry.SettingsTypes[command].GetProperties()
                .FirstOrDefault(p => p.GetCustomAttribute<CommandOptionAttribute>()?.LongNames.Contains(option[2..]) == true);
            var type = property is null ? null : Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType;
            string expected = (type?.Name ?? convert.Groups[2].Value) switch
            {
                "UInt64" or "UInt32" or "UInt16" or "Byte" => "a whole number, 0 or more",
                "Int64" or "Int32" or "Int16" => "a whole number",
                "Double" or "Single" or "Decimal" => "a number, with a dot as the decimal separator",
                var other => "a " + other,
            };
            return $"{(option.Length > 0 ? option + " " : "")}{value}: '{value}' is not {expected} {help}";
        }

        return message.TrimEnd('.') + " " + help;
    }

    /// <summary>The long option names a settings type declares (with those of its base types).</summary>
    internal static IEnumerable<string> OptionNames(Type settings) =>
        settings.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .SelectMany(p => p.GetCustomAttribute<CommandOptionAttribute>()?.LongNames ?? []);

    /// <summary>The known name nearest <paramref name="name"/> (<see cref="Core.Study.KeySuggester"/>), or one that starts with it.</summary>
    internal static string? Nearest(string name, IEnumerable<string> known)
    {
        var names = known.ToList();
        return Core.Study.KeySuggester.Nearest(name.ToLowerInvariant(), names)
            ?? names.Where(k => k.StartsWith(name, StringComparison.OrdinalIgnoreCase)).Order(StringComparer.Ordinal).FirstOrDefault();
    }

    [GeneratedRegex("^Unknown option '(.*)'\\.?$")]
    private static partial Regex UnknownOption();

    [GeneratedRegex("^Unknown command '(.*)'\\.?$")]
    private static partial Regex UnknownCommand();

    [GeneratedRegex("^Failed to convert '(.*)' to (.*)\\.$")]
    private static partial Regex FailedToConvert();
}
