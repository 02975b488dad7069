using System.ComponentModel;
using System.Diagnostics;
using System.Globalization;
using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using Spectre.Console;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy batch STUDY --weather DIR|GLOB|STATIONS.csv</c>: the study's settings and variants on every weather file,
/// one file per core at a time, into Hive-partitioned Parquet tables with a manifest, resumable and splittable into shards.
/// </summary>
public sealed class BatchCommand : Command<BatchCommand.Settings>
{
    public sealed class Settings : OutputSettings
    {
        [CommandArgument(0, "<STUDY>")]
        [Description("The study file (TOML): its settings and variants run on every weather file; its own [[[[climate]]]] tables are not used (the weather files replace them).")]
        public string Study { get; init; } = string.Empty;

        [CommandOption("--weather <INPUTS>")]
        [Description("The weather files: a folder (its .csv/.txt files, gzipped or not), a quoted glob such as 'wx/**/*.csv', or a station list (CSV with a weather column, paths relative to it; optional name, map, elevation_m; other columns are carried into every table).")]
        public string? Weather { get; init; }

        [CommandOption("--out <DIR>")]
        [Description("Output folder. Default reports/<study name>-batch/.")]
        public string? Out { get; init; }

        [CommandOption("--partition-by <COLUMN>")]
        [Description("Partition the tables by a station-list column (tables/annual/state=CO/...) instead of by shard.")]
        public string? PartitionBy { get; init; }

        [CommandOption("--csv")]
        [Description("Also write every part as CSV beside its Parquet file.")]
        public bool Csv { get; init; }

        [CommandOption("--strict")]
        [Description("Stop at the first bad input (missing or unreadable file, bad data, bad station-list row, duplicate name), exit 3; by default such an input is skipped and listed in the warnings table.")]
        public bool Strict { get; init; }

        [CommandOption("--resume")]
        [Description("Finish a stopped batch: keep its finished parts, run the rest (refused when the study or the input list changed).")]
        public bool Resume { get; init; }

        [CommandOption("--force")]
        [Description("Start over: remove this shard's earlier parts in the output folder.")]
        public bool Force { get; init; }

        [CommandOption("--shard <I/N>")]
        [Description("Run the I-th (from 0) of N deterministic parts into its own partition. Default: a Slurm array task (SLURM_ARRAY_TASK_ID), a Kubernetes Indexed Job (JOB_COMPLETION_INDEX with --shards), else the whole batch.")]
        public string? Shard { get; init; }

        [CommandOption("--shards <N>")]
        [Description("The number of parts of a Kubernetes Indexed Job (its completions), read with JOB_COMPLETION_INDEX.")]
        public int? Shards { get; init; }

        [CommandOption("--workers <N>")]
        [Description("Weather files run at once. Default: one per core.")]
        public int? Workers { get; init; }

        [CommandOption("--rows-per-part <N>")]
        [Description("A part is written once one of its tables has this many rows. Default 100000.")]
        public int RowsPerPart { get; init; } = 100_000;
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        if (string.IsNullOrWhiteSpace(settings.Weather))
        {
            throw new UsageException("batch needs --weather: a folder of weather files, a quoted glob such as 'wx/*.csv', or a station list (CSV with a weather column)");
        }

        if (settings.Resume && settings.Force)
        {
            throw new UsageException("give --resume (finish the batch) or --force (start over), not both");
        }

        if (settings.RowsPerPart < 1 || settings.Workers is < 1)
        {
            throw new UsageException(settings.RowsPerPart < 1 ? "--rows-per-part must be a whole number of at least 1" : "--workers must be a whole number of at least 1");
        }

        var study = StudyFileReader.Read(settings.Study, climatesElsewhere: true);
        var inputs = BatchInputList.Read(settings.Weather);
        var shard = BatchShard.Choose(settings.Shard, settings.Shards, Environment.GetEnvironmentVariable);
        var stations = inputs.Stations.Select((s, i) => (Station: s, Position: i)).Where(s => shard.Holds(s.Position)).ToList();
        var listProblems = shard.Index == 0 ? inputs.Problems : [];
        int files = stations.Count + listProblems.Count;
        output.Error.WriteLine(PrintableText.Of(FormattableString.Invariant(
            $"binenergy: batch part {shard.Index} of {shard.Count} (from {shard.Origin}): {files:N0} of {inputs.Stations.Count + inputs.Problems.Count:N0} inputs x {study.Variants.Count} variants")));
        if (settings.Strict && listProblems.Count > 0)
        {
            throw new BatchInputException("--strict: " + listProblems[0].Message);
        }

        string folder = settings.Out ?? Path.Combine("reports", RunCommand.FolderName(study.Name) + "-batch");
        using var writer = BatchOutput.Open(new BatchOutputSettings
        {
            Folder = folder,
            Study = study,
            Inputs = inputs,
            Shard = shard,
            PartitionBy = settings.PartitionBy,
            Csv = settings.Csv,
            Resume = settings.Resume,
            Force = settings.Force,
            RowsPerPart = settings.RowsPerPart,
        });
        foreach (string note in writer.Notes)
        {
            output.Error.WriteLine("binenergy: note: " + PrintableText.Of(note));
        }

        var todo = stations.Where(s => !writer.Finished.Contains(s.Station.Key)).ToList();
        var seen = new Dictionary<string, (int Count, List<string> First)>(StringComparer.Ordinal);
        void Record(IEnumerable<BatchProblem> problems)
        {
            foreach (var p in problems)
            {
                var (count, first) = seen.TryGetValue(p.Kind, out var k) ? k : (0, new List<string>());
                if (first.Count < 3 && !first.Contains(p.Climate))
                {
                    first.Add(p.Climate);
                }

                seen[p.Kind] = (count + 1, first);
            }
        }

        foreach (var p in listProblems.Where(p => !writer.Finished.Contains(p.Climate)))
        {
            writer.Add(p);
            Record([p]);
        }

        int total = todo.Count, done = 0;
        var clock = Stopwatch.StartNew();
        void Handle(BatchFileResult result, Action tick)
        {
            if (settings.Strict && result.Failed)
            {
                writer.WriteAll();
                writer.WriteSummary(writer.Counts(files));
                throw new BatchInputException("--strict: " + result.Problems[0].Message + FormattableString.Invariant($" ({done} files finished before it are kept; fix it and add --resume)"));
            }

            var recorded = writer.Add(result);
            Record(recorded.Problems);
            done++;
            tick();
        }

        try
        {
            if (!settings.Json && output.Console.Profile.Capabilities.Interactive && total > 0)
            {
                output.Console.Progress()
                    .Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new RemainingTimeColumn(), new ElapsedTimeColumn())
                    .Start(ctx =>
                    {
                        var task = ctx.AddTask(Markup.Escape(PrintableText.Of(study.Name)), maxValue: total);
                        BatchRunner.Run(study, todo, r => Handle(r, () =>
                        {
                            task.Increment(1);
                            task.Description = Markup.Escape(FormattableString.Invariant($"{done:N0}/{total:N0} files, {done / Math.Max(clock.Elapsed.TotalSeconds, 1e-3):0.0}/s"));
                        }), settings.Workers, cancellationToken);
                    });
            }
            else
            {
                int nextTenth = 1;
                BatchRunner.Run(study, todo, r => Handle(r, () =>
                {
                    int tenth = done * 10 / total;
                    if (tenth >= nextTenth)
                    {
                        double rate = done / Math.Max(clock.Elapsed.TotalSeconds, 1e-3);
                        output.Error.WriteLine(FormattableString.Invariant(
                            $"binenergy: {tenth * 10,3} % ({done:N0}/{total:N0} files, {rate:0.0} files/s, {(total - done) / Math.Max(rate, 1e-9):0} s left)"));
                        nextTenth = tenth + 1;
                    }
                }), settings.Workers, cancellationToken);
            }
        }
        catch (OperationCanceledException)
        {
            // Stopped (Ctrl-C): the finished files are written as parts, so --resume goes on from here.
            writer.WriteAll();
            writer.WriteSummary(writer.Counts(files));
            throw;
        }

        writer.WriteAll();
        var counts = writer.Counts(files);
        writer.WriteSummary(counts);
        foreach (var (kind, n) in counts.Warnings)
        {
            string first = seen.TryGetValue(kind, out var k) ? " (" + string.Join(", ", k.First) + (n > k.First.Count ? ", ..." : string.Empty) + ")" : string.Empty;
            output.Error.WriteLine("binenergy: warning: " + PrintableText.Of(FormattableString.Invariant($"{kind}: {n:N0}{first}")));
        }

        var document = new ResultDocument("Batch: " + study.Name);
        var table = new ResultTable("batch") { Title = "Batch", Layout = TableLayout.Record }
            .Text("output", "Output").Integer("files", "Files").Integer("done", "Done").Integer("failed", "Failed").Integer("parts", "Parts").Integer("annual_rows", "Annual rows");
        table.AddRow(Path.GetFullPath(folder), counts.Files, counts.Done, counts.Failed, counts.Parts, counts.Rows.GetValueOrDefault("annual"));
        document.Add(table);
        if (counts.Failed > 0)
        {
            document.Note(NoteKind.Warning, FormattableString.Invariant($"{counts.Failed:N0} inputs were stopped by a problem: see tables/warnings (file, line, kind, message)."));
        }

        document.Note(NoteKind.Note, "Tables: " + Path.Combine(Path.GetFullPath(folder), "tables") + " (read tables/annual/**/*.parquet with hive partitioning); counts in " + writer.SummaryPath + ".");
        output.Write(document, settings);
        return ExitCodes.Ok;
    }
}
