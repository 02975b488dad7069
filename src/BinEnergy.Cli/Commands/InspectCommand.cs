using BinEnergy.Core.Climate;
using BinEnergy.Reporting.Documents;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy inspect</c>: reads a weather file and shows its record, climate, design conditions and repairs.</summary>
public sealed class InspectCommand : Command<InspectSettings>
{
    public override int Execute(CommandContext context, InspectSettings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var (study, weather, _, _) = OneCaseStudy.ReadWeather(settings, "inspect");
        var u = settings.DisplayUnits;
        var climate = ClimateSummary.Of(weather, study.DegreeDayMethod, u.DegreeDayBaseC, u.DegreeDayCurveBasesC);
        output.Write(InspectDocument.Build(weather, climate, u, settings.Source()), settings);
        return ExitCodes.Ok;
    }
}
