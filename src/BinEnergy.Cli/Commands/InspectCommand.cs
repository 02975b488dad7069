using BinEnergy.Core.Climate;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Documents;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy inspect</c>: reads a weather file and shows its record, climate, design conditions and repairs.</summary>
public sealed class InspectCommand : Command<InspectSettings>
{
    public override int Execute(CommandContext context, InspectSettings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var options = settings.ReadOptions();
        var weather = WeatherReader.Read(settings.Weather, options);
        var u = settings.DisplayUnits;
        var climate = ClimateSummary.Of(weather, settings.DegreeDays, u.DegreeDayBaseC, u.DegreeDayCurveBasesC);
        output.Write(InspectDocument.Build(weather, climate, settings.DisplayUnits, settings.Source(options)), settings);
        return ExitCodes.Ok;
    }
}
