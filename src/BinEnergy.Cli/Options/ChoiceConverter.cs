using System.ComponentModel;
using System.Globalization;

namespace BinEnergy.Cli.Options;

/// <summary>
/// Reads an option whose value is one of a few words into an enum (Spectre.Console.Cli calls it
/// through the property's <see cref="TypeConverterAttribute"/>), with the words of <see cref="Choices"/>,
/// and gives the word of a value back for the study key the option sets.
/// </summary>
/// <typeparam name="T">The enum.</typeparam>
internal sealed class ChoiceConverter<T> : TypeConverter
    where T : struct, Enum
{
    private static readonly (string Option, string What, (string Word, T Value)[] Words) Table = Choices.Of<T>();

    /// <summary>The word of a value (its name in study files).</summary>
    public static string WordOf(T value) => Table.Words.First(c => c.Value.Equals(value)).Word;

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
