using System.ComponentModel;
using System.Globalization;

namespace BinEnergy.Cli.Options;

/// <summary>
/// Reads an option whose value is one of a few words into an enum (Spectre.Console.Cli calls it
/// through the property's <see cref="TypeConverterAttribute"/>), with the words of <see cref="Choices"/>.
/// Options that set a study key take text instead, and the study reader checks it against the key's words.
/// </summary>
/// <typeparam name="T">The enum.</typeparam>
internal sealed class ChoiceConverter<T> : TypeConverter
    where T : struct, Enum
{
    private static readonly (string Option, string What, (string Word, T Value)[] Words) Table = Choices.Of<T>();

    public override bool CanConvertFrom(ITypeDescriptorContext? context, Type sourceType) => sourceType == typeof(string);

    public override object ConvertFrom(ITypeDescriptorContext? context, CultureInfo? culture, object value)
    {
        string text = (value as string ?? string.Empty).Trim();
        foreach (var (word, v) in Table.Words)
        {
            if (string.Equals(word, text, StringComparison.OrdinalIgnoreCase))
            {
                return v;
            }
        }

        var words = Table.Words.Select(c => c.Word).Distinct().ToList();
        throw new UsageException($"{Table.Option} {text}: '{text}' is not {Table.What}; write {string.Join(", ", words.SkipLast(1))} or {words[^1]}");
    }
}
