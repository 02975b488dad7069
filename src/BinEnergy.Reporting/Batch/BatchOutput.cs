using System.Globalization;
using BinEnergy.Core.Batch;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Batch;

/// <summary>
/// Writes a batch's rows as they come, file by file, into Hive-style partitioned tables:
/// <c>tables/TABLE/shard=I/part-NNNN.parquet</c> (or <c>tables/TABLE/COLUMN=VALUE/part-NNNN.parquet</c> with a
/// station-list column), never one file per climate. Rows are gathered per partition until one table holds
/// <see cref="BatchOutputSettings.RowsPerPart"/> rows; then every table of the partition is written as one part
/// (whole climates only), each file atomically (a temporary name, flushed to disk, then renamed), and the part is
/// added to the manifest (<see cref="BatchManifest"/>), which is itself replaced atomically. A run killed at any
/// moment leaves finished parts listed and nothing half-written listed; <c>--resume</c> keeps the listed parts,
/// removes files no manifest lists and runs the inputs no part holds.
/// </summary>
public sealed class BatchOutput : IDisposable
{
    private readonly BatchOutputSettings settings;
    private readonly string root;
    private readonly string manifestPath;
    private readonly BatchManifest manifest;
    private readonly FileStream lockFile;
    private readonly Dictionary<string, PartBuffer> buffers = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> names = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> metadata;
    private readonly StudyDefinition oneClimate;
    private DisplayUnits? units;
    private FigureSet? show;

    private BatchOutput(BatchOutputSettings settings, string root, string manifestPath, BatchManifest manifest, FileStream lockFile, List<string> notes)
    {
        this.settings = settings;
        this.root = root;
        this.manifestPath = manifestPath;
        this.manifest = manifest;
        this.lockFile = lockFile;
        Notes = notes;
        Finished = manifest.Parts.SelectMany(p => p.Inputs).ToHashSet(StringComparer.Ordinal);
        foreach (string name in manifest.Parts.SelectMany(p => p.Climates))
        {
            names[name] = "a part written before";
        }

        metadata = new Dictionary<string, string>
        {
            ["binenergy.study"] = settings.Study.Name,
            ["binenergy.engine_version"] = StudyRunner.EngineVersion,
            ["binenergy.study_sha256"] = settings.Study.Hash,
            ["binenergy.inputs_sha256"] = settings.Inputs.Hash,
            ["binenergy.currency"] = settings.Study.Currency,
            ["binenergy.shard"] = FormattableString.Invariant($"{settings.Shard.Index}/{settings.Shard.Count}"),
        };
        oneClimate = settings.Study with { Climates = [] };
    }

    /// <summary>The keys of the inputs the kept parts hold (run them no more).</summary>
    public IReadOnlySet<string> Finished { get; }

    /// <summary>What opening the folder kept, removed or refused to keep, for the log.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>The path of the summary this shard writes.</summary>
    public string SummaryPath => Path.Combine(root, settings.Shard.Count == 1 ? "summary.json" : FormattableString.Invariant($"summary-shard-{settings.Shard.Index}-of-{settings.Shard.Count}.json"));

    /// <summary>Opens (or creates) the output folder for this shard: takes its lock, then starts over, resumes or refuses.</summary>
    /// <exception cref="BatchInputException">The folder holds another batch or other files, or a resume does not match the earlier run.</exception>
    public static BatchOutput Open(BatchOutputSettings settings)
    {
        string root = Path.GetFullPath(settings.Folder);
        if (File.Exists(root))
        {
            throw new BatchInputException($"{settings.Folder} is a file, not a folder: choose another --out folder");
        }

        if (settings.PartitionBy is string column && !settings.Inputs.AttributeColumns.Contains(column, StringComparer.Ordinal))
        {
            throw new BatchInputException(settings.Inputs.AttributeColumns.Count == 0
                ? $"--partition-by {column}: only a station list's own columns can partition the tables, and these inputs have none; give --weather a station list with a {column} column"
                : $"--partition-by {column}: the station list has no such column (it has {string.Join(", ", settings.Inputs.AttributeColumns)})");
        }

        bool existed = Directory.Exists(root) && Directory.EnumerateFileSystemEntries(root).Any();
        Directory.CreateDirectory(root);
        var shard = settings.Shard;
        string lockPath = Path.Combine(root, FormattableString.Invariant($".lock-shard-{shard.Index}-of-{shard.Count}"));
        FileStream lockFile;
        try
        {
            lockFile = new FileStream(lockPath, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None, 1, FileOptions.DeleteOnClose);
        }
        catch (IOException)
        {
            throw new BatchInputException($"another binenergy batch is writing this shard into {settings.Folder} (it holds {lockPath}): wait for it to finish, or choose another --out folder");
        }

        try
        {
            string manifestPath = Path.Combine(root, BatchManifest.FileName(shard.Index, shard.Count));
            var notes = new List<string>();
            var fresh = new BatchManifest
            {
                Study = settings.Study.Name,
                StudyHash = settings.Study.Hash,
                InputsHash = settings.Inputs.Hash,
                Shard = shard.Index,
                Shards = shard.Count,
                PartitionBy = settings.PartitionBy,
                EngineVersion = StudyRunner.EngineVersion,
            };
            var earlier = BatchManifest.Load(manifestPath);
            var manifest = Choose(settings, root, earlier, fresh, existed, notes);
            RemoveUnlisted(root, settings, manifest, notes);
            manifest.Save(manifestPath);
            return new BatchOutput(settings, root, manifestPath, manifest, lockFile, notes);
        }
        catch
        {
            lockFile.Dispose();
            throw;
        }
    }

    /// <summary>The manifest to go on with: the earlier one (resume), a fresh one (new folder or --force), or a refusal.</summary>
    private static BatchManifest Choose(BatchOutputSettings s, string root, BatchManifest? earlier, BatchManifest fresh, bool existed, List<string> notes)
    {
        if (earlier is null)
        {
            bool ours = !existed || Directory.EnumerateFileSystemEntries(root).All(e => Path.GetFileName(e) is "tables" || Path.GetFileName(e).StartsWith("manifest", StringComparison.Ordinal)
                || Path.GetFileName(e).StartsWith("summary", StringComparison.Ordinal) || Path.GetFileName(e).StartsWith(".lock-shard-", StringComparison.Ordinal)
                || Path.GetFileName(e) is "report.html" or "charts");
            if (!ours)
            {
                throw new BatchInputException($"{s.Folder} already holds files that are not a batch's: choose a new or empty --out folder");
            }

            if (s.Resume)
            {
                notes.Add("nothing to resume in " + s.Folder + " for this shard: starting from the beginning");
            }

            return fresh;
        }

        if (!s.Resume)
        {
            if (!s.Force)
            {
                throw new BatchInputException($"{s.Folder} already holds this shard's batch ({earlier.Parts.Count} parts listed in {BatchManifest.FileName(earlier.Shard, earlier.Shards)}): add --resume to finish it, or --force to start over");
            }

            notes.Add(FormattableString.Invariant($"--force: removed the {earlier.Parts.Count} parts of the earlier batch"));
            return fresh;
        }

        string? reason = earlier.StudyHash != fresh.StudyHash ? $"the study file changed since the batch began (SHA-256 {earlier.StudyHash[..12]}... then, {fresh.StudyHash[..12]}... now)"
            : earlier.InputsHash != fresh.InputsHash ? "the list of weather files changed since the batch began (files added, removed, renamed or resized, or the station list edited)"
            : earlier.PartitionBy != fresh.PartitionBy ? $"the batch was partitioned by {earlier.PartitionBy ?? "shard"}, not {fresh.PartitionBy ?? "shard"}"
            : null;
        if (reason is not null)
        {
            throw new BatchInputException($"--resume refused: {reason}; its parts would not match. Restore what changed and resume, or start over with --force instead of --resume");
        }

        var kept = earlier.Parts.Where(p => p.Files.All(f => File.Exists(Path.Combine(root, f)))).ToList();
        if (kept.Count < earlier.Parts.Count)
        {
            notes.Add(FormattableString.Invariant($"{earlier.Parts.Count - kept.Count} listed parts had lost a file: their inputs are run again"));
        }

        notes.Add(FormattableString.Invariant($"resuming: kept {kept.Count} finished parts holding {kept.Sum(p => p.Inputs.Count)} inputs"));
        return earlier with { Parts = kept };
    }

    /// <summary>This shard's files that the manifest does not list (unfinished parts of a killed run, leftovers of --force): removed.</summary>
    private static void RemoveUnlisted(string root, BatchOutputSettings s, BatchManifest manifest, List<string> notes)
    {
        string tables = Path.Combine(root, "tables");
        if (!Directory.Exists(tables))
        {
            return;
        }

        var listed = manifest.Parts.SelectMany(p => p.Files).ToHashSet(StringComparer.Ordinal);
        string shardFolder = HivePartition.FolderName("shard", s.Shard.Index.ToString(CultureInfo.InvariantCulture));
        string prefix = PartPrefix(s);
        int removed = 0;
        foreach (string file in Directory.EnumerateFiles(tables, "*", SearchOption.AllDirectories))
        {
            string rel = Path.GetRelativePath(root, file).Replace(Path.DirectorySeparatorChar, '/');
            var parts = rel.Split('/');
            bool mine = parts.Length == 4 && (s.PartitionBy is null ? parts[2] == shardFolder : !parts[2].StartsWith("shard=", StringComparison.Ordinal))
                && parts[3].StartsWith(prefix, StringComparison.Ordinal) && (s.Shard.Count > 1 || !parts[3].StartsWith("part-s", StringComparison.Ordinal));
            if (mine && !listed.Contains(rel))
            {
                File.Delete(file);
                removed++;
            }
        }

        if (removed > 0)
        {
            notes.Add(FormattableString.Invariant($"removed {removed} unfinished or earlier part files that no manifest lists"));
        }
    }

    private static string PartPrefix(BatchOutputSettings s) =>
        s.PartitionBy is not null && s.Shard.Count > 1 ? FormattableString.Invariant($"part-s{s.Shard.Index}-") : "part-";

    /// <summary>Adds a station-list row that could not be used (it becomes a row of the warnings table).</summary>
    public void Add(BatchProblem problem)
    {
        var buffer = BufferFor(HivePartition.FolderName(settings.PartitionBy ?? "shard", settings.PartitionBy is null ? settings.Shard.Index.ToString(CultureInfo.InvariantCulture) : string.Empty));
        var attributes = settings.Inputs.AttributeColumns.Where(c => c != settings.PartitionBy).Select(c => new KeyValuePair<string, string>(c, string.Empty)).ToList();
        buffer.AddWarnings([problem], attributes, settings.PartitionBy);
        buffer.Inputs.Add(problem.Climate);
        buffer.Failed++;
        WriteIfFull(buffer);
    }

    /// <summary>Adds one file's rows (or its problem); writes the partition's part when it is full.</summary>
    /// <returns>The result as recorded: a file whose name another file already has is recorded as stopped by a duplicate name.</returns>
    public BatchFileResult Add(BatchFileResult result)
    {
        if (!result.Failed && names.TryGetValue(result.Name, out string? other))
        {
            result = result with
            {
                Cases = [],
                Problems = [new BatchProblem(result.Name, result.Station.WeatherPath, result.Station.Line, BatchProblemKinds.DuplicateName,
                    $"{result.Station.Where}: the name '{result.Name}' is already the name of {other}; names must be unique (give the files names in a station list)", true)],
            };
        }
        else if (!result.Failed)
        {
            names[result.Name] = result.Station.Where;
        }

        var attributes = result.Station.Attributes.Where(a => a.Key != settings.PartitionBy).ToList();
        var buffer = BufferFor(PartitionOf(result.Station));
        if (!result.Failed)
        {
            var run = new StudyRunResult(oneClimate, result.Cases, StudyRunner.EngineVersion);
            units ??= StudyTables.Units(run);
            var mine = StudyTables.Show(run);
            if (show is FigureSet current && FigureSet.Any([current, mine]) != current)
            {
                // A figure this file has and the earlier ones had not (fans that ran only here): later parts carry its columns.
                WriteAll();
                show = FigureSet.Any([current, mine]);
            }

            show ??= mine;
            foreach (var table in StudyTables.Build(result.Cases, units, show.Value, oneClimate.DegreeDayMethod))
            {
                buffer.Append(attributes.Count == 0 ? table : table.WithConstantText(attributes));
            }

            buffer.Climates.Add(result.Name);
        }
        else
        {
            buffer.Failed++;
        }

        buffer.AddWarnings(result.Problems, attributes, settings.PartitionBy);
        buffer.Inputs.Add(result.Station.Key);
        WriteIfFull(buffer);
        return result;
    }

    private string PartitionOf(BatchStation station) => settings.PartitionBy is string column
        ? HivePartition.FolderName(column, station.Attributes.FirstOrDefault(a => a.Key == column).Value ?? string.Empty)
        : HivePartition.FolderName("shard", settings.Shard.Index.ToString(CultureInfo.InvariantCulture));

    private PartBuffer BufferFor(string partition)
    {
        if (!buffers.TryGetValue(partition, out var buffer))
        {
            buffer = new PartBuffer(partition);
            buffers[partition] = buffer;
        }

        return buffer;
    }

    private void WriteIfFull(PartBuffer buffer)
    {
        if (buffer.MaxRows >= settings.RowsPerPart)
        {
            Write(buffer);
        }
    }

    /// <summary>Writes every partition's gathered rows as parts (at the end, or before stopping).</summary>
    public void WriteAll()
    {
        foreach (var buffer in buffers.Values.ToList())
        {
            Write(buffer);
        }
    }

    private void Write(PartBuffer buffer)
    {
        buffers.Remove(buffer.Partition);
        if (buffer.Inputs.Count == 0)
        {
            return;
        }

        int number = manifest.Parts.Where(p => p.Partition == buffer.Partition).Select(p => p.Number + 1).DefaultIfEmpty(0).Max();
        string fileName = PartPrefix(settings) + number.ToString("D4", CultureInfo.InvariantCulture);
        var files = new List<string>();
        var rows = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var table in buffer.Tables.Where(t => t.RowCount > 0))
        {
            string folder = Path.Combine(root, "tables", table.Name, buffer.Partition);
            Directory.CreateDirectory(folder);
            var meta = new Dictionary<string, string>(metadata) { ["binenergy.table"] = table.Name, ["binenergy.units"] = (units ?? new DisplayUnits(settings.Study.Units, settings.Study.Currency)).Name };
            string path = Path.Combine(folder, fileName + ".parquet");
            AtomicFile.Write(path, temporary => ParquetTableWriter.WriteAsync(table, temporary, meta).GetAwaiter().GetResult(), flushToDisk: true);
            files.Add(Path.GetRelativePath(root, path).Replace(Path.DirectorySeparatorChar, '/'));
            if (settings.Csv)
            {
                string csv = Path.Combine(folder, fileName + ".csv");
                AtomicFile.Write(csv, temporary => CsvTableWriter.Write(table, temporary), flushToDisk: true);
                files.Add(Path.GetRelativePath(root, csv).Replace(Path.DirectorySeparatorChar, '/'));
            }

            rows[table.Name] = table.RowCount;
        }

        manifest.Parts.Add(new BatchPart
        {
            Partition = buffer.Partition,
            Number = number,
            Files = files,
            Rows = rows,
            Inputs = buffer.Inputs,
            Climates = buffer.Climates,
            Failed = buffer.Failed,
            Warnings = buffer.Kinds,
        });
        manifest.Save(manifestPath);
    }

    /// <summary>The counts of the written parts (call after <see cref="WriteAll"/> for the whole run).</summary>
    public BatchCounts Counts(int files)
    {
        var parts = manifest.Parts;
        int inputs = parts.Sum(p => p.Inputs.Count), failed = parts.Sum(p => p.Failed);
        return new BatchCounts(files, inputs - failed, failed,
            Sum(parts.Select(p => p.Warnings)), Sum(parts.Select(p => p.Rows)), parts.Count);
    }

    private static SortedDictionary<string, int> Sum(IEnumerable<IReadOnlyDictionary<string, int>> counts)
    {
        var sum = new SortedDictionary<string, int>(StringComparer.Ordinal);
        foreach (var (k, v) in counts.SelectMany(c => c))
        {
            sum[k] = sum.GetValueOrDefault(k) + v;
        }

        return sum;
    }

    /// <summary>Writes <c>summary.json</c> (or the shard's summary) atomically: the counts, the hashes and the shard, under <c>batch</c> (<see cref="BatchSummary"/>).</summary>
    public void WriteSummary(BatchCounts counts) => BatchSummary.Write(SummaryPath, null, BatchSummary.Counts(settings, counts));

    /// <summary>Releases the shard's lock (gathered rows not yet written are dropped: call <see cref="WriteAll"/> first).</summary>
    public void Dispose() => lockFile.Dispose();

    /// <summary>The rows of one partition gathered for its next part.</summary>
    private sealed class PartBuffer(string partition)
    {
        public string Partition { get; } = partition;

        public List<ResultTable> Tables { get; } = [];

        public List<string> Inputs { get; } = [];

        public List<string> Climates { get; } = [];

        public int Failed { get; set; }

        public SortedDictionary<string, int> Kinds { get; } = new(StringComparer.Ordinal);

        public int MaxRows => Tables.Count == 0 ? 0 : Tables.Max(t => t.RowCount);

        public void Append(ResultTable table)
        {
            var mine = Tables.FirstOrDefault(t => t.Name == table.Name);
            if (mine is null)
            {
                Tables.Add(table);
            }
            else
            {
                mine.Append(table);
            }
        }

        public void AddWarnings(IReadOnlyList<BatchProblem> problems, IReadOnlyList<KeyValuePair<string, string>> attributes, string? partitionBy)
        {
            if (problems.Count == 0)
            {
                return;
            }

            var table = new ResultTable("warnings") { Title = "Problems and cautions by climate" }
                .Text("climate", "Climate").Text("file", "File").Integer("line", "Line (0 when not known)").Text("kind", "Kind").Text("message", "Message");
            foreach (var p in problems)
            {
                table.AddRow(p.Climate, p.File, p.Line ?? 0, p.Kind, p.Message);
                Kinds[p.Kind] = Kinds.GetValueOrDefault(p.Kind) + 1;
            }

            Append(attributes.Count == 0 ? table : table.WithConstantText(attributes));
        }
    }
}
