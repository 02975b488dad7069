using BinEnergy.Core.Binning;
using BinEnergy.Core.Units;

namespace BinEnergy.Cli.Options;

/// <summary>The words of <c>--units</c>.</summary>
internal sealed class UnitSystemChoice() : ChoiceConverter<UnitSystem>("--units", "a unit system", ("ip", UnitSystem.IP), ("si", UnitSystem.SI));

/// <summary>The words of <c>--format</c>.</summary>
internal sealed class TextFormatChoice() : ChoiceConverter<TextFormat>("--format", "a text format", ("table", TextFormat.Table), ("tsv", TextFormat.Tsv), ("markdown", TextFormat.Markdown), ("md", TextFormat.Markdown));

/// <summary>The words of <c>--by</c>.</summary>
internal sealed class BinSplitChoice() : ChoiceConverter<BinSplit>("--by", "a split", ("month", BinSplit.Month), ("block", BinSplit.TimeOfDayBlock));
