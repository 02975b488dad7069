using System.ComponentModel;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;
using Spectre.Console;
using Spectre.Console.Cli;

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
        [CommandArgument(0, "<STUDY>")]
        [Description("The study file (TOML). Its [[study]] units govern the outputs.")]
        public string Study { get; init; } = string.Empty;

        [CommandOption("--out <DIR>")]
        [Description("Output folder. Default reports/<study name>/.")]
        public string? Out { get; init; }

        [CommandOption("--hourly")]
        [Description("Also write the hourly table (one row per hour per climate x variant).")]
        public bool Hourly { get; init; }

        [CommandOption("--force")]
        [Description("Replace the output folder if it exists and is not empty.")]
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

        StudyRunResult run;
        int total = study.Climates.Count * study.Variants.Count;
        if (!format.Json && output.Console.Profile.Capabilities.Interactive)
        {
            run = null!;
            output.Console.Progress().Start(ctx =>
            {
                var task = ctx.AddTask($"[bold]{Markup.Escape(PrintableText.Of(study.Name))}[/]", maxValue: total);
                var progress = new SyncProgress(step =>
                {
                    task.Description = Markup.Escape(PrintableText.Of(step));
                    if (!step.StartsWith("reading ", StringComparison.Ordinal))
                    {
                        task.Increment(1);
                    }
                });
                run = StudyRunner.Run(study, hourly, progress, cancellationToken);
                task.Description = "done";
            });
        }
        else
        {
            run = StudyRunner.Run(study, hourly, null, cancellationToken);
        }

        var runAt = RunClock.Now();
        var tables = StudyOutputWriter.WriteAsync(run, folder, force, hourly,
            extra: o => StudyReport.WriteInto(o, run, runAt), ct: cancellationToken,
            recovered: note => output.Error.WriteLine("binenergy: note: " + PrintableText.Of(note))).GetAwaiter().GetResult();
        foreach (var w in run.Warnings)
        {
            output.Error.WriteLine("warning: " + PrintableText.Of(w));
        }

        var summary = StudySummary.Build(run);
        if (!format.Json)
        {
            summary.Note(NoteKind.Note, $"Wrote {Path.GetFullPath(folder)}: " + string.Join(", ", tables.Select(t => $"{t.Name} ({t.RowCount} rows)"))
                + " as Parquet and CSV in tables/, charts in charts/, and summary.json.");
            summary.Note(NoteKind.Note, "Report: " + Path.GetFullPath(Path.Combine(folder, "report.html")));
        }

        output.Write(summary, format);
        return ExitCodes.Ok;
    }

    /// <summary>A folder name from the study name: lower case, spaces and punctuation to dashes.</summary>
    internal static string FolderName(string studyName) => StudyReport.Slug(studyName, "study");

    /// <summary>An <see cref="IProgress{T}"/> that reports on the calling thread (Spectre's display is refreshed by its own loop).</summary>
    private sealed class SyncProgress(Action<string> report) : IProgress<string>
    {
        public void Report(string value) => report(value);
    }
}
