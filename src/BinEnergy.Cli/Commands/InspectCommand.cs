using BinEnergy.Core.Climate;
using BinEnergy.Reporting.Documents;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy inspect</c>: reads a weather file and shows its record, climate, design conditions and repairs.</summary>
public sealed class InspectCommand : Command<InspectCommand.Settings>
{
    /// <summary>The weather file and how degree-days are counted.</summary>
    public sealed class Settings : WeatherFileSettings
    {
        [CommandOption("--degree-days <METHOD>"), StudyKey("study", "degree_days")]
        public string? DegreeDays { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var (study, weather, _, _) = OneCaseStudy.ReadWeather(settings, "inspect");
        var u = settings.DisplayUnits;
        var climate = ClimateSummary.Of(weather, study.DegreeDayMethod, u.DegreeDayBaseC, u.DegreeDayCurveBasesC);
        output.Write(InspectDocument.Build(weather, climate, u, settings.Source()), settings);
        return ExitCodes.Ok;
    }
}
