using BinEnergy.Core.Binning;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// Runs a single command's options as a one-case study: the options become study keys
/// (<see cref="StudyOptions"/>), read and checked like a study file, and run by the study runner,
/// so the options and the study file cannot drift apart.
/// </summary>
internal static class OneCaseStudy
{
    /// <summary>The source name study errors carry for option values.</summary>
    public const string Source = "the command line";

    /// <summary>Builds, reads and runs the study the options of <paramref name="settings"/> describe; returns its one case and headline method.</summary>
    /// <param name="settings">The command's options.</param>
    /// <param name="name">The study name (the command's).</param>
    public static (StudyCaseResult Case, Core.Loads.IntegrationMethod Headline) Run(WeatherFileSettings settings, string name)
    {
        var (study, input) = Read(settings, name);
        return (Explained(input, study.Climates[0].Name, () => StudyRunner.Run(study).Cases[0]), study.HeadlineMethod);
    }

    /// <summary>
    /// Reads the options through the study reader's checks, then the weather file they name, with the schedule and bin
    /// scale they give (for the commands that only read or bin weather).
    /// </summary>
    public static (StudyDefinition Study, HourlyWeather Weather, OccupancySchedule Schedule, DryBulbBinScale Scale) ReadWeather(WeatherFileSettings settings, string name)
    {
        var (study, input) = Read(settings, name);
        return Explained(input, study.Climates[0].Name, () =>
        {
            var (schedule, scale) = StudyCaseBuilder.Binning(study);
            return (study, StudyRunner.ReadWeather(study.Climates[0], settings.MaxBytes), schedule, scale);
        });
    }

    private static (StudyDefinition Study, StudyInput Input) Read(WeatherFileSettings settings, string name)
    {
        if (!File.Exists(settings.Weather))
        {
            // The reader's own message for a file that cannot be opened (exit 3, bad input).
            _ = WeatherReader.Read(settings.Weather, new WeatherReadOptions());
        }

        var u = settings.DisplayUnits;
        var input = new StudyInput()
            .Set("study", "name", name, "the command")
            .Set("study", "units", u.Name, "--units")
            .Set("climate", "name", ClimateName(settings.Weather), settings.Weather);
        StudyOptions.Add(input, settings, u);
        return (Explained(input, Source, () => StudyFileReader.FromInput(input, Source, Directory.GetCurrentDirectory())), input);
    }

    /// <summary>Runs <paramref name="work"/>; a study error about the options (or the <paramref name="climate"/> they make) becomes a usage error naming the option.</summary>
    private static T Explained<T>(StudyInput input, string climate, Func<T> work)
    {
        try
        {
            return work();
        }
        catch (StudyFileException e) when (e.File == Source || e.File == climate)
        {
            throw StudyOptions.Explain(input, e);
        }
    }

    /// <summary>A climate name from a file name: the name without extensions, with characters names may not hold replaced.</summary>
    private static string ClimateName(string path)
    {
        string name = Path.GetFileName(path);
        foreach (var ext in new[] { ".gz", ".csv", ".CSV" })
        {
            if (name.EndsWith(ext, StringComparison.OrdinalIgnoreCase))
            {
                name = name[..^ext.Length];
            }
        }

        var chars = name.Select(c => char.IsControl(c) || c is '/' or '\\' or '=' or '%' ? '-' : c).ToArray();
        string clean = new string(chars).Trim();
        return clean.Length == 0 ? "weather" : clean;
    }
}
