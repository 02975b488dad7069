using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Batch;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy batch STUDY --weather DIR|GLOB|STATIONS.csv</c>: the study's settings and variants on every weather file,
/// one file per core at a time, into Hive-partitioned Parquet tables with a manifest, resumable and splittable into shards.
/// </summary>
public sealed class BatchCommand : Command<BatchCommand.Settings>
{
    public sealed class Settings : OutputSettings
    {
        [CommandArgument(0, "<STUDY>"), Description("The study file (TOML): its settings and variants run on every weather file; its own [[[[climate]]]] tables are not used (the weather files replace them).")]
        public string Study { get; init; } = string.Empty;

        [CommandOption("--weather <INPUTS>"), Description("The weather files: a folder (its .csv/.txt files, gzipped or not), a quoted glob such as 'wx/**/*.csv', or a station list (CSV with a weather column, paths relative to it; optional name, map, elevation_m; other columns are carried into every table).")]
        public string? Weather { get; init; }

        [CommandOption("--map <MAP>"), Description("The column map of every weather file that does not name its own (a station list's map column wins): a shipped map (tmy3, pvgis) or the path of a TOML map file. Default: the open layout.")]
        public string? Map { get; init; }

        [CommandOption("--out <DIR>"), Description("Output folder. Default reports/<study name>-batch/.")]
        public string? Out { get; init; }

        [CommandOption("--partition-by <COLUMN>"), Description("Partition the tables by a station-list column (tables/annual/state=CO/...) instead of by shard.")]
        public string? PartitionBy { get; init; }

        [CommandOption("--csv"), Description("Also write every part as CSV beside its Parquet file.")]
        public bool Csv { get; init; }

        [CommandOption("--strict"), Description("Stop at the first bad input (missing or unreadable file, bad data, bad station-list row, duplicate name), exit 3; by default such an input is skipped and listed in the warnings table.")]
        public bool Strict { get; init; }

        [CommandOption("--resume"), Description("Finish a stopped batch: keep its finished parts, run the rest (refused when the study or the input list changed).")]
        public bool Resume { get; init; }

        [CommandOption("--force"), Description("Start over: remove this shard's earlier parts in the output folder.")]
        public bool Force { get; init; }

        [CommandOption("--shard <I/N>"), Description("Run the I-th (from 0) of N deterministic parts into its own partition. Default: a Slurm array task (SLURM_ARRAY_TASK_ID), a Kubernetes Indexed Job (JOB_COMPLETION_INDEX with --shards), else the whole batch.")]
        public string? Shard { get; init; }

        [CommandOption("--shards <N>"), Description("The number of parts of a Kubernetes Indexed Job (its completions), read with JOB_COMPLETION_INDEX.")]
        public int? Shards { get; init; }

        [CommandOption("--charts-for <NAMES>"), Description("Draw the per-climate charts of `run` (bin hours, load by bin, psychrometric chart, economizer, monthly, method check; per variant the study details) for these climates only, comma-separated: the station list's names or the files' ids. Written into OUT/charts/ and shown in report.html.")]
        public string? ChartsFor { get; init; }

        [CommandOption("--workers <N>"), Description("Weather files run at once. Default: one per core.")]
        public int? Workers { get; init; }

        [CommandOption("--rows-per-part <N>"), Description("A part is written once one of its tables has this many rows. Default 100000.")]
        public int RowsPerPart { get; init; } = 100_000;

        public override Spectre.Console.ValidationResult Validate() => FirstBroken(
            base.Validate,
            (string.IsNullOrWhiteSpace(Weather), "batch needs --weather: a folder of weather files, a quoted glob such as 'wx/*.csv', or a station list (CSV with a weather column)"),
            (Resume && Force, "give --resume (finish the batch) or --force (start over), not both"),
            (RowsPerPart < 1, "--rows-per-part must be a whole number of at least 1"),
            (Workers is < 1, "--workers must be a whole number of at least 1"));
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var study = StudyFileReader.Read(settings.Study, climatesElsewhere: true);
        var inputs = BatchInputList.Read(settings.Weather!, settings.Map);
        string folder = settings.Out ?? Path.Combine("reports", RunCommand.FolderName(study.Name) + "-batch");
        using var session = BatchSession.Plan(new BatchSessionSettings
        {
            Output = new BatchOutputSettings
            {
                Folder = folder,
                Study = study,
                Inputs = inputs,
                Shard = BatchShard.Choose(settings.Shard, settings.Shards, Environment.GetEnvironmentVariable),
                PartitionBy = settings.PartitionBy,
                Csv = settings.Csv,
                Resume = settings.Resume,
                Force = settings.Force,
                RowsPerPart = settings.RowsPerPart,
            },
            Strict = settings.Strict,
            Workers = settings.Workers,
            ChartsFor = BatchClimateSelection.Choose(settings.ChartsFor, inputs),
        });
        output.Error.WriteLine("binenergy: " + PrintableText.Of(session.Description));
        foreach (string note in session.Open())
        {
            output.Error.WriteLine("binenergy: note: " + PrintableText.Of(note));
        }

        BatchOutcome outcome = null!;
        ProgressDisplay.Run(output, settings, study.Name, session.ToRun, "files", step => outcome = session.Run(() => step(null), cancellationToken));
        foreach (var group in outcome.Warnings)
        {
            output.Error.WriteLine("binenergy: warning: " + PrintableText.Of(group.Text));
        }

        output.Write(BatchSession.Document(study.Name, outcome), settings);
        if (outcome.Counts.Done == 0 && outcome.Counts.Failed > 0)
        {
            // Nothing ran: that is a failed batch, whatever was recorded.
            output.Error.WriteLine(PrintableText.Of(FormattableString.Invariant(
                $"binenergy: error: no input ran: all {outcome.Counts.Failed:N0} were stopped by a problem (the kinds above; each file's message in tables/warnings, or with --csv in tables/warnings/**/*.csv). Files in another layout need --map (e.g. --map tmy3) or a station list with a map column.")));
            return ExitCodes.BadInput;
        }

        return ExitCodes.Ok;
    }
}
