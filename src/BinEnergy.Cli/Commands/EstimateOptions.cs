using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// Options of the commands that estimate energy by the three methods and run as one-case studies:
/// where the bin methods evaluate a bin, which method heads the output, and the check that every
/// option the study needs was given.
/// </summary>
public class EstimateOptions : BinOptions
{
    [CommandOption("--bin-point <POINT>"), StudyKey("study", "bin_point")]
    public string? BinPoint { get; init; }

    [CommandOption("--headline <METHOD>"), StudyKey("study", "headline_method")]
    public string? Headline { get; init; }

    public override ValidationResult Validate() =>
        StudyOptions.Missing(this) is { } missing ? ValidationResult.Error(missing) : base.Validate();
}
