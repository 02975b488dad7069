using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Climate;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>The options of <c>binenergy inspect</c>: the weather file and how degree-days are counted.</summary>
public sealed class InspectSettings : WeatherFileSettings
{
    [CommandOption("--degree-days <METHOD>"), StudyKey("study", "degree_days")]
    public string? DegreeDays { get; init; }
}
