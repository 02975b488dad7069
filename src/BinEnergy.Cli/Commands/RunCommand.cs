using System.ComponentModel;
using System.Globalization;
using BinEnergy.Core.Study;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Study;
using Spectre.Console;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy run STUDY.toml</c>: runs every climate x variant of a study file and writes
/// the result tables (Parquet and CSV) and <c>summary.json</c> into an output folder, atomically.
/// </summary>
public sealed class RunCommand : Command<RunCommand.Settings>
{
    public sealed class Settings : CommandSettings
    {
        [CommandArgument(0, "<STUDY>")]
        [Description("The study file (TOML). Its [study] units govern the outputs.")]
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

        [CommandOption("--json")]
        [Description("Write summary.json to standard output instead of the terminal table.")]
        public bool Json { get; init; }
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken) =>
        RunStudy((CommandOutput)context.Data!, settings.Study, settings.Out, settings.Hourly, settings.Force, settings.Json, cancellationToken);

    /// <summary>Runs a study file into a folder (tables, charts, report, summary); shared by <c>run</c> and <c>demo</c>.</summary>
    internal static int RunStudy(CommandOutput output, string studyPath, string? outDir, bool hourly, bool force, bool json, CancellationToken cancellationToken)
    {
        var settings = (Hourly: hourly, Force: force, Json: json);
        var study = StudyFileReader.Read(studyPath);
        string folder = outDir ?? Path.Combine("reports", FolderName(study.Name));
        if (!settings.Force && Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any())
        {
            throw new Reporting.Tables.OutputFolderException(
                $"{folder} already exists and is not empty: add --force to replace it, or choose another --out folder");
        }

        StudyRunResult run;
        int total = study.Climates.Count * study.Variants.Count;
        bool interactive = !settings.Json && output.Console.Profile.Capabilities.Interactive;
        if (interactive)
        {
            run = null!;
            output.Console.Progress().Start(ctx =>
            {
                var task = ctx.AddTask($"[bold]{Markup.Escape(study.Name)}[/]", maxValue: total);
                var progress = new SyncProgress(step =>
                {
                    task.Description = Markup.Escape(step);
                    if (!step.StartsWith("reading ", StringComparison.Ordinal))
                    {
                        task.Increment(1);
                    }
                });
                run = StudyRunner.Run(study, settings.Hourly, progress, cancellationToken);
                task.Description = "done";
            });
        }
        else
        {
            run = StudyRunner.Run(study, settings.Hourly, null, cancellationToken);
        }

        var runAt = DateTimeOffset.UtcNow;
        var tables = StudyOutputWriter.WriteAsync(run, folder, settings.Force, settings.Hourly,
            extra: o => Reporting.Study.StudyReport.WriteInto(o, run, runAt), ct: cancellationToken).GetAwaiter().GetResult();
        foreach (var w in run.Warnings)
        {
            output.Error.WriteLine("warning: " + w);
        }

        if (settings.Json)
        {
            output.Out.WriteLine(StudySummary.ToJson(run));
            return ExitCodes.Ok;
        }

        WriteSummary(output.Console, run, folder, tables.Select(t => (t.Name, t.RowCount)).ToList());
        return ExitCodes.Ok;
    }

    /// <summary>A folder name from the study name: lower case, spaces and punctuation to dashes.</summary>
    internal static string FolderName(string studyName) => Reporting.Study.StudyReport.Slug(studyName, "study");

    private static void WriteSummary(IAnsiConsole console, StudyRunResult run, string folder, List<(string Name, int Rows)> tables)
    {
        bool ip = run.Study.Units == UnitSystem.IP;
        string e = ip ? "kBtu" : "kWh";
        var table = new Table().Border(TableBorder.Rounded).Title($"[bold]{Markup.Escape(run.Study.Name)}[/] (bin method; hourly check in the tables)");
        table.AddColumn("climate").AddColumn("variant").AddColumn(new TableColumn(ip ? "airflow cfm" : "airflow L/s").RightAligned())
            .AddColumn(new TableColumn($"heating {e}").RightAligned()).AddColumn(new TableColumn($"cooling {e}").RightAligned())
            .AddColumn(new TableColumn($"recovered {e}").RightAligned()).AddColumn(new TableColumn("fan kWh").RightAligned())
            .AddColumn(new TableColumn($"cost {run.Study.Currency.ToUpperInvariant()}").RightAligned()).AddColumn(new TableColumn("carbon kg").RightAligned());
        foreach (var c in run.Cases)
        {
            var f = c.AnnualBin;
            double E(double j) => Energy.FromJoules(j).In(run.Study.Units);
            table.AddRow(
                Markup.Escape(c.Case.Climate.Name), Markup.Escape(c.Case.Variant.Name),
                N(ip ? c.Case.OutdoorAir.EffectiveAirflow.Cfm : c.Case.OutdoorAir.EffectiveAirflow.LitresPerSecond),
                N(E(f.HeatingJ)), N(E(f.CoolingSensibleJ + f.CoolingLatentJ)), N(E(f.RecoveredHeatingJ + f.RecoveredCoolingJ)),
                N(f.FanJ / 3.6e6), N(f.Total.Cost), N(f.Total.CarbonKg));
        }

        console.Write(table);
        console.MarkupLine($"Wrote [bold]{Markup.Escape(Path.GetFullPath(folder))}[/]: " +
            Markup.Escape(string.Join(", ", tables.Select(t => $"{t.Name} ({t.Rows} rows)"))) + " as Parquet and CSV in tables/, charts in charts/, and summary.json.");
        console.MarkupLine($"Report: [bold]{Markup.Escape(Path.GetFullPath(Path.Combine(folder, "report.html")))}[/]");
        if (run.Warnings.Count > 0)
        {
            console.MarkupLine($"[yellow]{run.Warnings.Count} warning(s)[/] (on standard error and in summary.json).");
        }

        console.MarkupLine(Markup.Escape(StudySummary.Caution));
    }

    private static string N(double v) => v.ToString("N0", CultureInfo.InvariantCulture);

    /// <summary>An <see cref="IProgress{T}"/> that reports on the calling thread (Spectre's display is refreshed by its own loop).</summary>
    private sealed class SyncProgress(Action<string> report) : IProgress<string>
    {
        public void Report(string value) => report(value);
    }
}
