using BinEnergy.Core.Weather;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy inspect</c>: reads a weather file and shows its record, climate, design conditions and repairs.</summary>
public sealed class InspectCommand : Command<WeatherFileSettings>
{
    public override int Execute(CommandContext context, WeatherFileSettings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var units = settings.UnitSystem;
        var options = settings.ReadOptions(units);
        var weather = WeatherReader.Read(settings.Weather, options);
        var report = new InspectReport(weather, units, settings.Weather + " (" + (options.Map?.Source ?? "open layout") + ")");
        if (settings.Json)
        {
            output.WriteJson(report.ToJson());
        }
        else
        {
            report.Render(output.Console);
        }

        return ExitCodes.Ok;
    }
}
