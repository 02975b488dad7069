using System.Globalization;

namespace BinEnergy.Cli.Options;

/// <summary>
/// Reads an option whose value is one of a few words into an enum (Spectre.Console.Cli calls it
/// through the property's <see cref="TypeConverterAttribute"/>); each such option has its words in <c>Choices.cs</c>.
/// Options that set a study key take text instead, and the study reader checks it against the key's words.
/// </summary>
/// <typeparam name="T">The enum.</typeparam>
/// <param name="option">The option, for the error message.</param>
/// <param name="what">What it chooses ("a unit system").</param>
/// <param name="words">Its words and their values (the first word of a value is its name in study files).</param>
internal abstract class ChoiceConverter<T>(string option, string what, params (string Word, T Value)[] words) : TypeConverter
    where T : struct, Enum
{
    public override bool CanConvertFrom(ITypeDescriptorContext? context, Type sourceType) => sourceType == typeof(string);

    public override object ConvertFrom(ITypeDescriptorContext? context, CultureInfo? culture, object value)
    {
        string text = (value as string ?? string.Empty).Trim();
        foreach (var (word, v) in words)
        {
            if (string.Equals(word, text, StringComparison.OrdinalIgnoreCase))
            {
                return v;
            }
        }

        var distinct = words.Select(c => c.Word).Distinct().ToList();
        throw new UsageException($"{option} {text}: '{text}' is not {what}; write {string.Join(", ", distinct.SkipLast(1))} or {distinct[^1]}");
    }
}
