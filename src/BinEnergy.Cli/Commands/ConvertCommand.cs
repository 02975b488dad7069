using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy convert</c>: reads a weather file (through a map) and writes it in the open CSV layout.</summary>
public sealed class ConvertCommand : Command<ConvertCommand.Settings>
{
    public sealed class Settings : WeatherFileSettings
    {
        [CommandOption("--out <FILE>"), Description("The open-layout file to write (.csv, or .csv.gz to compress). Required.")]
        public string? Out { get; init; }

        [CommandOption("--force"), Description("Replace --out if it exists.")]
        public bool Force { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        string target = CommandOutput.TargetFile(settings.Out, settings.Weather, settings.Force, "the open-layout file to write");
        var (_, weather, _, _) = OneCaseStudy.ReadWeather(settings, "convert");
        var comments = OpenLayoutWriter.ConversionNotes(weather, Path.GetFileName(settings.Weather), settings.Map is null ? "open layout" : "map " + settings.Map);
        if (!TextFile.WriteAtomically(target, settings.Force, w => OpenLayoutWriter.Write(weather, w, comments)))
        {
            throw CommandOutput.InTheWay(settings.Out!);
        }

        output.Write(ConvertDocument.Build(weather, settings.Out!), settings);
        return ExitCodes.Ok;
    }
}
