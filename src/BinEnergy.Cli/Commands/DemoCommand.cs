namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy demo</c>: runs the bundled demo study (four invented climates x four
/// ventilation options, with an economizer comparison) into <c>reports/demo/</c>, replacing
/// an earlier demo there, and prints where the report is.
/// </summary>
public sealed class DemoCommand : Command<DemoCommand.Settings>
{
    public sealed class Settings : OutputSettings
    {
        [CommandOption("--out <DIR>"), Description("Output folder. Default reports/demo/ (an earlier demo there is replaced).")]
        public string? Out { get; init; }
    }

    /// <summary>Where the demo study lives, relative to the repository or the installed tool (which carries a copy).</summary>
    public const string StudyRelativePath = "weather-samples/demo/demo-study.toml";

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        string study = FindStudy();
        string folder = settings.Out ?? Path.Combine("reports", "demo");
        bool force = settings.Out is null;
        if (!force && Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any())
        {
            throw new Reporting.Tables.OutputFolderException($"{folder} already exists and is not empty: choose an empty --out folder (the default reports/demo/ is replaced on every demo)");
        }

        output.Error.WriteLine($"Running the demo study {study} (invented climates and building; see weather-samples/README.md).");
        return RunCommand.RunStudy(output, study, folder, hourly: false, force: force, settings, cancellationToken);
    }

    private static string FindStudy()
    {
        foreach (var root in new[] { Directory.GetCurrentDirectory(), AppContext.BaseDirectory })
        {
            for (var dir = new DirectoryInfo(root); dir is not null; dir = dir.Parent)
            {
                string candidate = Path.Combine(dir.FullName, StudyRelativePath);
                if (File.Exists(candidate))
                {
                    // Below the current folder (a clone), say the short path; else (the installed tool's copy) the full one.
                    string relative = Path.GetRelativePath(Directory.GetCurrentDirectory(), candidate);
                    return relative.StartsWith("..", StringComparison.Ordinal) ? candidate : relative;
                }
            }
        }

        throw new UsageException($"cannot find the demo study {StudyRelativePath}: run binenergy demo from the BinEnergy repository (or a folder below it), or install the tool (see the README)");
    }
}
