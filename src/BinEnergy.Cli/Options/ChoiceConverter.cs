using System.ComponentModel;
using System.Globalization;

namespace BinEnergy.Cli.Options;

/// <summary>
/// Reads an option whose value is one of a few words into an enum (Spectre.Console.Cli calls it
/// through the property's <see cref="TypeConverterAttribute"/>), and gives the word of a value
/// back for the study key the option sets.
/// </summary>
/// <typeparam name="T">The enum.</typeparam>
internal abstract class ChoiceConverter<T> : TypeConverter
    where T : struct, Enum
{
    /// <summary>The words and their values; the first word of a value is its name in study files.</summary>
    protected abstract IReadOnlyList<(string Word, T Value)> Choices { get; }

    /// <summary>What the option chooses, for the error message (e.g. "a flow basis").</summary>
    protected abstract string What { get; }

    /// <summary>The option that takes these words, for the error message.</summary>
    protected abstract string Option { get; }

    /// <summary>The word of a value (its name in study files).</summary>
    public string WordOf(T value) => Choices.First(c => c.Value.Equals(value)).Word;

    public override bool CanConvertFrom(ITypeDescriptorContext? context, Type sourceType) => sourceType == typeof(string);

    public override object ConvertFrom(ITypeDescriptorContext? context, CultureInfo? culture, object value)
    {
        string text = (value as string ?? string.Empty).Trim();
        foreach (var (word, v) in Choices)
        {
            if (string.Equals(word, text, StringComparison.OrdinalIgnoreCase))
            {
                return v;
            }
        }

        var words = Choices.Select(c => c.Word).Distinct().ToList();
        throw new UsageException($"{Option} {text}: '{text}' is not {What}; write {string.Join(", ", words.SkipLast(1))} or {words[^1]}");
    }
}
