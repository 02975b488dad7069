using BinEnergy.Core.Batch;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// One run of <c>binenergy batch</c> for one shard, from the plan to the final counts: takes the shard's inputs in their
/// stable order, opens the output folder (<see cref="BatchOutput"/>: start, resume or refuse), runs the inputs no kept part
/// holds through <see cref="BatchRunner"/>, hands each result to the output as it finishes, groups the problems and
/// cautions by kind, and writes the summary. A stop (Ctrl-C) or a <c>--strict</c> failure first writes what finished, so
/// <c>--resume</c> goes on from there. The command line only shows progress and the outcome.
/// </summary>
public sealed class BatchSession : IDisposable
{
    /// <summary>How many climates a warning group names.</summary>
    public const int FirstClimatesShown = 3;

    private readonly BatchSessionSettings settings;
    private readonly List<(BatchStation Station, int Position)> stations;
    private readonly IReadOnlyList<BatchProblem> listProblems;
    private readonly Dictionary<string, (int Count, List<string> First)> seen = new(StringComparer.Ordinal);
    private readonly IReadOnlyDictionary<string, string> slugs;
    private readonly HashSet<string> charted = new(StringComparer.Ordinal);
    private BatchOutput? writer;
    private List<(BatchStation Station, int Position)> todo = [];
    private int done;

    private BatchSession(BatchSessionSettings settings)
    {
        this.settings = settings;
        var o = settings.Output;
        stations = o.Inputs.Stations.Select((s, i) => (Station: s, Position: i)).Where(s => o.Shard.Holds(s.Position)).ToList();
        listProblems = o.Shard.Index == 0 ? o.Inputs.Problems : [];
        slugs = Study.StudyReport.UniqueSlugs(settings.ChartsFor.Names);
    }

    /// <summary>The shard this session runs.</summary>
    public BatchShard Shard => settings.Output.Shard;

    /// <summary>Inputs in this shard (station-list rows that cannot be used included).</summary>
    public int Inputs => stations.Count + listProblems.Count;

    /// <summary>What the session is about to do, for the log: the shard, where it came from, its inputs of all, and the variants.</summary>
    public string Description
    {
        get
        {
            var o = settings.Output;
            return FormattableString.Invariant(
                $"batch part {Shard.Index} of {Shard.Count} (from {Shard.Origin}): {Inputs:N0} of {o.Inputs.Stations.Count + o.Inputs.Problems.Count:N0} inputs x {o.Study.Variants.Count} variants");
        }
    }

    /// <summary>The files <see cref="Run"/> will run (those no kept part holds); known after <see cref="Open"/>.</summary>
    public int ToRun => todo.Count;

    /// <summary>Plans the shard's inputs; nothing is read or written yet.</summary>
    public static BatchSession Plan(BatchSessionSettings settings) => new(settings);

    /// <summary>Opens the output folder (a fresh start, a resume or a refusal); returns what opening it kept or removed, for the log.</summary>
    /// <exception cref="BatchInputException">With <c>--strict</c>, a station-list row that cannot be used; or the folder refuses (see <see cref="BatchOutput.Open"/>).</exception>
    public IReadOnlyList<string> Open()
    {
        if (settings.Strict && listProblems.Count > 0)
        {
            throw new BatchInputException("--strict: " + listProblems[0].Message);
        }

        // A variant the study cannot build is refused before the output folder is touched.
        BatchRunner.Variants(settings.Output.Study);
        writer = BatchOutput.Open(settings.Output);
        if (!settings.Output.Resume)
        {
            BatchClimateCharts.RemoveShard(settings.Output.Folder, Shard);
        }

        todo = stations.Where(s => !writer.Finished.Contains(s.Station.Key)).ToList();
        return writer.Notes;
    }

    /// <summary>Runs the files; <paramref name="step"/> is called on the calling thread after each file's rows are handed on.</summary>
    /// <exception cref="OperationCanceledException">Stopped: the finished files were written as parts and the summary written first.</exception>
    /// <exception cref="BatchInputException">With <c>--strict</c>, the first file stopped by a problem (what finished before it is written and kept).</exception>
    public BatchOutcome Run(Action step, CancellationToken ct = default)
    {
        var output = writer ?? throw new InvalidOperationException("Open the session before running it");
        foreach (var p in listProblems.Where(p => !output.Finished.Contains(p.Climate)))
        {
            output.Add(p);
            Record([p]);
        }

        try
        {
            BatchRunner.Run(settings.Output.Study, todo, result =>
            {
                if (settings.Strict && result.Failed)
                {
                    Finish(output);
                    throw new BatchInputException("--strict: " + result.Problems[0].Message + FormattableString.Invariant($" ({done} files finished before it are kept; fix it and add --resume)"));
                }

                var recorded = output.Add(result);
                Record(recorded.Problems);
                if (!recorded.Failed && settings.ChartsFor.NameOf(recorded.Station) is string name)
                {
                    var study = settings.Output.Study with { Climates = [recorded.Cases[0].Case.Climate] };
                    BatchClimateCharts.Write(settings.Output.Folder, new Core.Study.StudyRunResult(study, recorded.Cases, Core.Study.StudyRunner.EngineVersion), slugs[name], Shard);
                    charted.Add(name);
                }

                done++;
                step();
            }, settings.Workers, ct);
        }
        catch (OperationCanceledException)
        {
            // Stopped (Ctrl-C): the finished files are written as parts, so --resume goes on from here.
            Finish(output);
            throw;
        }

        var counts = Finish(output);
        var groups = counts.Warnings.Select(kv => new BatchWarningGroup(kv.Key, kv.Value,
            seen.TryGetValue(kv.Key, out var k) ? k.First : [])).ToList();
        var notes = todo.Where(s => settings.ChartsFor.NameOf(s.Station) is string n && !charted.Contains(n))
            .Select(s => $"--charts-for '{settings.ChartsFor.NameOf(s.Station)}': the input was stopped by a problem (see tables/warnings), so it has no charts").ToList();
        var report = Report(counts, notes, ct);
        return new BatchOutcome(Path.GetFullPath(settings.Output.Folder), counts, groups, output.SummaryPath, report, notes);
    }

    /// <summary>
    /// After the last part of an unsharded batch: the cross-climate report and the one summary.json. A shard of several
    /// leaves it to <c>batch-report OUT</c> once every shard has finished; a batch where no climate ran has nothing to report.
    /// </summary>
    private BatchReport? Report(BatchCounts counts, List<string> notes, CancellationToken ct)
    {
        if (Shard.Count > 1)
        {
            return null;
        }

        if (counts.Done == 0)
        {
            notes.Add("no climate ran, so there is no cross-climate report: fix the inputs listed in tables/warnings and run the batch again with --force");
            return null;
        }

        return BatchReport.WriteAsync(settings.Output.Folder, RunClock.Now(), ct).GetAwaiter().GetResult();
    }

    private BatchCounts Finish(BatchOutput output)
    {
        output.WriteAll();
        var counts = output.Counts(Inputs);
        output.WriteSummary(counts);
        return counts;
    }

    private void Record(IEnumerable<BatchProblem> problems)
    {
        foreach (var p in problems)
        {
            var (count, first) = seen.TryGetValue(p.Kind, out var k) ? k : (0, new List<string>());
            if (first.Count < FirstClimatesShown && !first.Contains(p.Climate))
            {
                first.Add(p.Climate);
            }

            seen[p.Kind] = (count + 1, first);
        }
    }

    /// <summary>The outcome as the command's result document: the counts, and where the tables, summary and report are.</summary>
    public static ResultDocument Document(string studyName, BatchOutcome outcome)
    {
        var counts = outcome.Counts;
        var document = new ResultDocument("Batch: " + studyName);
        var table = new ResultTable("batch") { Title = "Batch", Layout = TableLayout.Record }
            .Text("output", "Output").Integer("files", "Files").Integer("done", "Done").Integer("failed", "Failed").Integer("parts", "Parts").Integer("annual_rows", "Annual rows");
        table.AddRow(outcome.Folder, counts.Files, counts.Done, counts.Failed, counts.Parts, counts.Rows.GetValueOrDefault("annual"));
        document.Add(table);
        if (counts.Failed > 0)
        {
            document.Note(NoteKind.Warning, FormattableString.Invariant($"{counts.Failed:N0} inputs were stopped by a problem: see tables/warnings (file, line, kind, message)."));
        }

        document.NoteAll(NoteKind.Warning, outcome.Notes);
        document.Note(NoteKind.Note, "Tables: " + Path.Combine(outcome.Folder, "tables") + " (read tables/annual/**/*.parquet with hive partitioning); counts in " + outcome.SummaryPath + ".");
        if (outcome.Report is BatchReport report)
        {
            document.Add(report.National());
            document.NoteAll(NoteKind.Warning, report.Warnings);
            document.NoteAll(NoteKind.Caution, Text.Cautions.OutdoorAir);
            document.Note(NoteKind.Note, "Report: " + Path.Combine(outcome.Folder, "report.html") + " (figures across climates; the figures and these counts are in summary.json).");
        }
        else if (outcome.Counts.Done > 0)
        {
            document.Note(NoteKind.Note, "Once every shard has finished, `binenergy batch-report " + outcome.Folder + "` writes the cross-climate report.html and summary.json.");
        }

        return document;
    }

    /// <summary>Releases the shard's lock.</summary>
    public void Dispose() => writer?.Dispose();
}
