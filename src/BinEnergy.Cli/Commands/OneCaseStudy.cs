using BinEnergy.Cli.Options;
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

    /// <summary>Builds, reads and runs the study the options of <paramref name="settings"/> describe.</summary>
    /// <param name="settings">The command's options.</param>
    /// <param name="name">The study name (the command's).</param>
    /// <param name="extra">Keys the command sets beyond its options.</param>
    public static StudyCaseResult Run(BinOptions settings, string name, Action<StudyInput>? extra = null)
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
        extra?.Invoke(input);
        var study = StudyOptions.Read(input, Source);
        try
        {
            var run = StudyRunner.Run(study);
            return run.Cases[0];
        }
        catch (StudyFileException e) when (e.File == Source || e.File == study.Climates[0].Name)
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
