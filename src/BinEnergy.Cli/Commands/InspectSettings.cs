using System.ComponentModel;
using BinEnergy.Cli.Options;
using BinEnergy.Core.Climate;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>The options of <c>binenergy inspect</c>: the weather file and how degree-days are counted.</summary>
public sealed class InspectSettings : WeatherFileSettings
{
    [CommandOption("--degree-days <METHOD>")]
    [Description("How degree-days are counted: daily-mean (default: the mean of each day's hours, as published degree-days are), hourly (degree-hours / 24) or max-min ((daily max + min) / 2).")]
    [TypeConverter(typeof(ChoiceConverter<DegreeDayMethod>))]
    public DegreeDayMethod DegreeDays { get; init; } = DegreeDayMethod.DailyMean;
}
