using BinEnergy.Core.Binning;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
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
        [typeof(FlowBasis)] = ("--flow-basis", "a flow basis", new[] { ("site", FlowBasis.Site), ("standard", FlowBasis.Standard), ("actual", FlowBasis.Actual) }),
        [typeof(VentilationOperation)] = ("--ventilate", "a ventilation period", new[] { ("occupied", VentilationOperation.Occupied), ("always", VentilationOperation.Always) }),
        [typeof(BinEvaluationPoint)] = ("--bin-point", "a bin evaluation point",
            new[] { ("mean", BinEvaluationPoint.MeanDryBulb), ("mid", BinEvaluationPoint.Midpoint), ("midpoint", BinEvaluationPoint.Midpoint) }),
        [typeof(IntegrationMethod)] = ("--headline", "a method", IntegrationMethods.All.Select(m => (IntegrationMethods.Name(m), m)).ToArray()),
        [typeof(DaylightSaving)] = ("--daylight-saving", "a daylight-saving rule",
            new[] { ("none", DaylightSaving.None), ("north-america", DaylightSaving.NorthAmerica), ("europe", DaylightSaving.Europe) }),
        [typeof(DegreeDayMethod)] = ("--degree-days", "a degree-day method", DegreeDayMethods.All.Select(m => (DegreeDayMethods.Name(m), m)).ToArray()),
        [typeof(HumidityOver)] = ("--humidity-over", "a humidity convention", new[] { ("water", HumidityOver.Water), ("ice", HumidityOver.Ice) }),
        [typeof(Core.Economizer.AirSystemType)] = ("--system", "an air-system type",
            Core.Economizer.AirSystemTypes.All.Select(t => (Core.Economizer.AirSystemTypes.Name(t), t)).ToArray()),
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
