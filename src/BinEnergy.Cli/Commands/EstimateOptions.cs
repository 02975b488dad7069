using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Loads;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>Options of the commands that estimate energy by the three methods: where the bin methods evaluate a bin, and which method heads the output.</summary>
public class EstimateOptions : BinOptions
{
    [CommandOption("--bin-point <POINT>")]
    [Description(BinPointHelp)]
    [TypeConverter(typeof(ChoiceConverter<BinEvaluationPoint>))]
    [StudyKey("study", "bin_point")]
    public BinEvaluationPoint? BinPoint { get; init; }

    [CommandOption("--headline <METHOD>")]
    [Description(HeadlineHelp)]
    [TypeConverter(typeof(ChoiceConverter<IntegrationMethod>))]
    [StudyKey("study", "headline_method")]
    public IntegrationMethod? Headline { get; init; }
}
