using BinEnergy.Core.Binning;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Output;

namespace BinEnergy.Cli.Options;

/// <summary>The words of every option that chooses among a few (the first word of a value is its name in study files).</summary>
internal static class Choices
{
    private static readonly Dictionary<Type, (string Option, string What, object Words)> Tables = new()
    {
        [typeof(UnitSystem)] = ("--units", "a unit system", new[] { ("ip", UnitSystem.IP), ("si", UnitSystem.SI) }),
        [typeof(TextFormat)] = ("--format", "a text format", new[] { ("table", TextFormat.Table), ("tsv", TextFormat.Tsv), ("markdown", TextFormat.Markdown), ("md", TextFormat.Markdown) }),
        [typeof(BinSplit)] = ("--by", "a split", new[] { ("month", BinSplit.Month), ("block", BinSplit.TimeOfDayBlock) }),
    };

    /// <summary>The option, what it chooses and its words, for the enum <typeparamref name="T"/>.</summary>
    public static (string Option, string What, (string Word, T Value)[] Words) Of<T>()
        where T : struct, Enum
    {
        var (option, what, words) = Tables[typeof(T)];
        return (option, what, ((string, T)[])words);
    }
}
