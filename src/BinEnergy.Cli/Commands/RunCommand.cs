using BinEnergy.Core.Study;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy run STUDY.toml</c>: runs every climate x variant of a study file and writes the
/// result tables (Parquet and CSV), charts, <c>report.html</c> and <c>summary.json</c> into an
/// output folder, atomically; prints the summary.
/// </summary>
public sealed class RunCommand : Command<RunCommand.Settings>
{
    public sealed class Settings : OutputSettings
    {
        [CommandArgument(0, "<STUDY>"), Description("The study file (TOML). Its [[study]] units govern the outputs.")]
        public string Study { get; init; } = string.Empty;

        [CommandOption("--out <DIR>"), Description("Output folder. Default reports/<study name>/.")]
        public string? Out { get; init; }

        [CommandOption("--hourly"), Description("Also write the hourly table (one row per hour per climate x variant).")]
        public bool Hourly { get; init; }

        [CommandOption("--force"), Description("Replace the output folder if it exists and is not empty.")]
        public bool Force { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken) =>
        RunStudy((CommandOutput)context.Data!, settings.Study, settings.Out, settings.Hourly, settings.Force, settings, cancellationToken);

    /// <summary>Runs a study file into a folder (tables, charts, report, summary); shared by <c>run</c> and <c>demo</c>.</summary>
    internal static int RunStudy(CommandOutput output, string studyPath, string? outDir, bool hourly, bool force, OutputSettings format, CancellationToken cancellationToken)
    {
        var study = StudyFileReader.Read(studyPath);
        string folder = outDir ?? Path.Combine("reports", FolderName(study.Name));
        if (!force && Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any())
        {
            throw new Reporting.Tables.OutputFolderException(
                $"{folder} already exists and is not empty: add --force to replace it, or choose another --out folder");
        }

        StudyRunResult run = null!;
        ProgressDisplay.Run(output, format, study.Name, study.Climates.Count * study.Variants.Count, "cases", step =>
            run = StudyRunner.Run(study, hourly, new StepProgress(step), cancellationToken));

        var runAt = RunClock.Now();
        var tables = StudyOutputWriter.WriteAsync(run, folder, force, hourly,
            extra: o => StudyReport.WriteInto(o, run, runAt), ct: cancellationToken,
            recovered: note => output.Error.WriteLine("binenergy: note: " + PrintableText.Of(note))).GetAwaiter().GetResult();
        // The summary lists the warnings; they go to standard error too when it does not share the terminal with the
        // summary (a log, a pipe), so a warning is never missed and never said twice on screen. With --json the summary's
        // writer puts them there.
        if (!format.Json && !output.Console.Profile.Capabilities.Interactive)
        {
            foreach (var w in run.Warnings)
            {
                output.Error.WriteLine("warning: " + PrintableText.Of(w));
            }
        }

        var summary = StudySummary.Build(run);
        if (!format.Json)
        {
            summary.Note(NoteKind.Note, $"Wrote {Path.GetFullPath(folder)}: " + string.Join(", ", tables.Select(t => $"{t.Name} ({t.RowCount} rows)"))
                + " as Parquet and CSV in tables/, charts in charts/, summary.xlsx (a sheet per table and the inputs) and summary.json.");
            summary.Note(NoteKind.Note, "Report: " + Path.GetFullPath(Path.Combine(folder, "report.html")));
        }

        output.Write(summary, format);
        return ExitCodes.Ok;
    }

    /// <summary>A folder name from the study name: lower case, spaces and punctuation to dashes.</summary>
    internal static string FolderName(string studyName) => StudyReport.Slug(studyName, "study");

    /// <summary>The study runner's steps as progress: a finished case is a step ("climate / variant"); reading a climate is not.</summary>
    private sealed class StepProgress(Action<string?> step) : IProgress<string>
    {
        public void Report(string value)
        {
            if (!value.StartsWith("reading ", StringComparison.Ordinal))
            {
                step(value);
            }
        }
    }
}
