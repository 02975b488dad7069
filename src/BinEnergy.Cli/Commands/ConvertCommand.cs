using System.ComponentModel;
using BinEnergy.Core.Weather;
using BinEnergy.Reporting.Documents;
using BinEnergy.Reporting.Tables;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary><c>binenergy convert</c>: reads a weather file (through a map) and writes it in the open CSV layout.</summary>
public sealed class ConvertCommand : Command<ConvertCommand.Settings>
{
    public sealed class Settings : WeatherFileSettings
    {
        [CommandOption("--out <FILE>")]
        [Description("The open-layout file to write (.csv, or .csv.gz to compress). Required.")]
        public string? Out { get; init; }

        [CommandOption("--force")]
        [Description("Replace --out if it exists.")]
        public bool Force { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        if (string.IsNullOrWhiteSpace(settings.Out))
        {
            throw new UsageException("--out FILE.csv is required: the open-layout file to write");
        }

        string target = Path.GetFullPath(settings.Out);
        if (string.Equals(target, Path.GetFullPath(settings.Weather), StringComparison.Ordinal))
        {
            throw new UsageException("--out must differ from the input file");
        }

        if (File.Exists(target) && !settings.Force)
        {
            throw new Reporting.Tables.OutputFolderException($"{settings.Out} exists; add --force to replace it, or choose another --out");
        }

        var options = settings.ReadOptions();
        var weather = WeatherReader.Read(settings.Weather, options);
        var comments = new List<string>
        {
            "source: " + Path.GetFileName(settings.Weather) + " read with the " + (options.Map?.Source ?? "open layout"),
            "calendar: " + weather.Calendar.Note,
        };
        if (weather.Calendar.IsTypicalYear)
        {
            comments.Add("typical_year: true");
        }

        comments.Add("repairs: " + (weather.Quality.Counts.Count == 0 ? "none" : string.Join(", ", weather.Quality.Counts.Select(kv => kv.Key + " " + kv.Value))));
        comments.AddRange(weather.Quality.Warnings.Select(w => "note: " + w));

        string? dir = Path.GetDirectoryName(target);
        if (dir is not null && !Directory.Exists(dir))
        {
            throw new UsageException($"the folder of --out does not exist: {dir}");
        }

        if (!TextFile.WriteAtomically(target, settings.Force, w => OpenLayoutWriter.Write(weather, w, comments)))
        {
            throw new Reporting.Tables.OutputFolderException($"{settings.Out} exists; add --force to replace it, or choose another --out");
        }

        output.Write(ConvertDocument.Build(weather, settings.Out), settings);
        return ExitCodes.Ok;
    }
}
