using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Output;

namespace BinEnergy.Cli.Options;

/// <summary><c>--units</c>: ip or si.</summary>
internal sealed class UnitSystemChoice : ChoiceConverter<UnitSystem>
{
    protected override IReadOnlyList<(string Word, UnitSystem Value)> Choices { get; } = [("ip", UnitSystem.IP), ("si", UnitSystem.SI)];

    protected override string What => "a unit system";

    protected override string Option => "--units";
}

/// <summary><c>--format</c>: table, tsv or markdown.</summary>
internal sealed class TextFormatChoice : ChoiceConverter<TextFormat>
{
    protected override IReadOnlyList<(string Word, TextFormat Value)> Choices { get; } =
        [("table", TextFormat.Table), ("tsv", TextFormat.Tsv), ("markdown", TextFormat.Markdown), ("md", TextFormat.Markdown)];

    protected override string What => "a text format";

    protected override string Option => "--format";
}

/// <summary><c>--flow-basis</c>: site, standard or actual.</summary>
internal sealed class FlowBasisChoice : ChoiceConverter<FlowBasis>
{
    protected override IReadOnlyList<(string Word, FlowBasis Value)> Choices { get; } =
        [("site", FlowBasis.Site), ("standard", FlowBasis.Standard), ("actual", FlowBasis.Actual)];

    protected override string What => "a flow basis";

    protected override string Option => "--flow-basis";
}

/// <summary><c>--ventilate</c>: occupied or always.</summary>
internal sealed class VentilationChoice : ChoiceConverter<VentilationOperation>
{
    protected override IReadOnlyList<(string Word, VentilationOperation Value)> Choices { get; } =
        [("occupied", VentilationOperation.Occupied), ("always", VentilationOperation.Always)];

    protected override string What => "a ventilation period";

    protected override string Option => "--ventilate";
}

/// <summary><c>--bin-point</c>: mean, or mid (midpoint).</summary>
internal sealed class BinPointChoice : ChoiceConverter<BinEvaluationPoint>
{
    protected override IReadOnlyList<(string Word, BinEvaluationPoint Value)> Choices { get; } =
        [("mean", BinEvaluationPoint.MeanDryBulb), ("mid", BinEvaluationPoint.Midpoint), ("midpoint", BinEvaluationPoint.Midpoint)];

    protected override string What => "a bin evaluation point";

    protected override string Option => "--bin-point";
}

/// <summary><c>--headline</c>: hourly, joint-bin or bin.</summary>
internal sealed class MethodChoice : ChoiceConverter<IntegrationMethod>
{
    protected override IReadOnlyList<(string Word, IntegrationMethod Value)> Choices { get; } =
        [("hourly", IntegrationMethod.Hourly), ("joint-bin", IntegrationMethod.JointBin), ("bin", IntegrationMethod.Bin)];

    protected override string What => "a method";

    protected override string Option => "--headline";
}

/// <summary><c>--by</c>: month or block.</summary>
internal sealed class BinSplitChoice : ChoiceConverter<BinSplit>
{
    protected override IReadOnlyList<(string Word, BinSplit Value)> Choices { get; } =
        [("month", BinSplit.Month), ("block", BinSplit.TimeOfDayBlock)];

    protected override string What => "a split";

    protected override string Option => "--by";
}
