namespace BinEnergy.Reporting.Tables;

/// <summary>
/// An output folder written atomically: everything goes into a temporary folder beside the
/// target (same parent, so the final move is a rename on the same volume), and only
/// <see cref="Commit"/> puts it in place. A run that fails before then (or disposes without
/// committing) leaves the target as it was. A target that exists and is not empty is refused
/// unless <c>force</c> is set; with force, the old folder is replaced as a whole on commit, but
/// only if it carries <see cref="MarkerName"/> (written in every folder this class makes), so a
/// project folder, the current folder or one of its parents, or a folder holding one of the
/// run's inputs, is never deleted.
/// <para>
/// Crash safety: a lock file beside the target (<c>.NAME.lock</c>, held open exclusively for the
/// life of this object) stops a second run into the same place. <see cref="Commit"/> flushes
/// every file to disk, then renames the old folder aside (<c>.NAME.partial-ID.old</c>), renames
/// the new one into place and only then deletes the old one. A run killed at any point leaves
/// either the old or the new folder in place, or (killed between the two renames) the old one
/// aside: the next run into the same place, holding the lock, moves such an old folder back and
/// removes the leftover partial folders, and says so in <see cref="Recovered"/>.
/// </para>
/// </summary>
public sealed class OutputFolder : IDisposable
{
    /// <summary>The file that marks a folder as one of our output folders (tool version and time inside).</summary>
    public const string MarkerName = ".binenergy-output";

    private readonly FileStream lockFile;
    private bool committed;

    private OutputFolder(string target, string staging, FileStream lockFile, IReadOnlyList<string> recovered)
    {
        TargetPath = target;
        StagingPath = staging;
        this.lockFile = lockFile;
        Recovered = recovered;
    }

    /// <summary>What was recovered or cleaned up from an earlier run that was killed (empty when nothing was).</summary>
    public IReadOnlyList<string> Recovered { get; }

    /// <summary>Where the results end up.</summary>
    public string TargetPath { get; }

    /// <summary>The temporary folder being written (write all files here).</summary>
    public string StagingPath { get; }

    /// <summary>
    /// Starts writing into <paramref name="target"/>.
    /// </summary>
    /// <param name="target">The output folder.</param>
    /// <param name="force">Replace a non-empty target (only one an earlier run made).</param>
    /// <param name="inputs">The run's input files (study, weather, maps): a target holding any of them is refused.</param>
    /// <exception cref="OutputFolderException">The target is a file, holds an input, is a non-empty folder and <paramref name="force"/> is false, or another run holds its lock.</exception>
    public static OutputFolder Begin(string target, bool force, IEnumerable<string>? inputs = null)
    {
        string full = Path.GetFullPath(target).TrimEnd(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar);
        if (File.Exists(full))
        {
            throw new OutputFolderException($"{target} is a file, not a folder: choose another --out folder");
        }

        foreach (string input in inputs ?? [])
        {
            if (Path.GetFullPath(input).StartsWith(full + Path.DirectorySeparatorChar, StringComparison.Ordinal))
            {
                throw new OutputFolderException(
                    $"{target} holds an input of this run ({input}): the output folder would replace it, so nothing was deleted; choose an --out folder outside the study's files, such as reports/run");
            }
        }

        string parent = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(parent);
        var lockFile = Lock(target, Path.Combine(parent, "." + Path.GetFileName(full) + ".lock"));
        try
        {
            var recovered = Recover(full, parent);
            return Start(target, full, parent, force, lockFile, recovered);
        }
        catch
        {
            lockFile.Dispose();
            throw;
        }
    }

    /// <summary>Takes the lock file of a target, or explains who holds it.</summary>
    private static FileStream Lock(string target, string path)
    {
        try
        {
            var stream = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None, 1, FileOptions.DeleteOnClose);
            stream.SetLength(0);
            var text = System.Text.Encoding.UTF8.GetBytes(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"binenergy run, process {Environment.ProcessId}, started {DateTime.UtcNow:yyyy-MM-ddTHH:mm:ssZ}\n"));
            stream.Write(text);
            stream.Flush();
            return stream;
        }
        catch (IOException)
        {
            throw new OutputFolderException(
                $"another binenergy run is writing into {target} (it holds {path}): wait for it to finish, or choose another --out folder");
        }
    }

    /// <summary>Under the lock: puts back an old folder a killed run left aside, and removes leftover partial folders.</summary>
    private static List<string> Recover(string full, string parent)
    {
        var recovered = new List<string>();
        string prefix = "." + Path.GetFileName(full) + ".partial-";
        var leftovers = Directory.EnumerateDirectories(parent, prefix + "*").ToList();
        var aside = leftovers.Where(d => d.EndsWith(".old", StringComparison.Ordinal)).OrderByDescending(Directory.GetLastWriteTimeUtc).ToList();
        if (!Directory.Exists(full) && aside.Count > 0)
        {
            Directory.Move(aside[0], full);
            leftovers.Remove(aside[0]);
            recovered.Add($"an earlier run was stopped while replacing {full}: its previous output was put back");
        }

        foreach (string dir in leftovers)
        {
            Directory.Delete(dir, recursive: true);
        }

        if (leftovers.Count > 0)
        {
            recovered.Add($"removed {leftovers.Count} unfinished output folder(s) that stopped runs left beside {full}");
        }

        return recovered;
    }

    private static OutputFolder Start(string target, string full, string parent, bool force, FileStream lockFile, List<string> recovered)
    {
        if (Directory.Exists(full) && Directory.EnumerateFileSystemEntries(full).Any() && !force)
        {
            throw new OutputFolderException(
                $"{target} already exists and is not empty: add --force to replace it, or choose another --out folder");
        }

        if (Directory.Exists(full) && Directory.EnumerateFileSystemEntries(full).Any())
        {
            RefuseUnmarked(target, full);
        }

        string staging = Path.Combine(parent, "." + Path.GetFileName(full) + ".partial-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(staging);
        string version = typeof(OutputFolder).Assembly.GetName().Version?.ToString() ?? "unknown";
        File.WriteAllText(Path.Combine(staging, MarkerName),
            string.Create(System.Globalization.CultureInfo.InvariantCulture, $"binenergy output folder\nversion {version}\nwritten {RunClock.Now().UtcDateTime:yyyy-MM-ddTHH:mm:ssZ}\n"));
        return new OutputFolder(full, staging, lockFile, recovered);
    }

    /// <summary>With --force, refuses a folder that holds the current folder or that an earlier run of ours did not make.</summary>
    private static void RefuseUnmarked(string target, string full)
    {
        string cwd = Path.GetFullPath(Directory.GetCurrentDirectory()).TrimEnd(Path.DirectorySeparatorChar) + Path.DirectorySeparatorChar;
        if (cwd.StartsWith(full + Path.DirectorySeparatorChar, StringComparison.Ordinal))
        {
            throw new OutputFolderException(
                $"--force would delete {target}, which is the current folder or holds it: nothing was deleted; choose a new --out folder such as reports/run");
        }

        if (!File.Exists(Path.Combine(full, MarkerName)))
        {
            throw new OutputFolderException(
                $"--force replaces only an output folder of an earlier run (one holding {MarkerName}), and {target} has none: nothing was deleted; choose a new or empty --out folder");
        }
    }

    /// <summary>A path inside the staging folder, creating its folder.</summary>
    public string PathFor(params string[] parts)
    {
        string path = Path.Combine([StagingPath, .. parts]);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        return path;
    }

    /// <summary>Flushes every file to disk, then moves the finished folder into place, replacing the old one (which is removed after the move).</summary>
    public void Commit()
    {
        if (committed)
        {
            throw new InvalidOperationException("output folder already committed");
        }

        foreach (string file in Directory.EnumerateFiles(StagingPath, "*", SearchOption.AllDirectories))
        {
            using var stream = new FileStream(file, FileMode.Open, FileAccess.ReadWrite, FileShare.Read);
            stream.Flush(flushToDisk: true);
        }

        string? old = null;
        if (Directory.Exists(TargetPath))
        {
            old = StagingPath + ".old";
            Directory.Move(TargetPath, old);
        }

        try
        {
            Directory.Move(StagingPath, TargetPath);
        }
        catch
        {
            if (old is not null)
            {
                Directory.Move(old, TargetPath);
            }

            throw;
        }

        committed = true;
        if (old is not null)
        {
            Directory.Delete(old, recursive: true);
        }
    }

    /// <summary>Removes the staging folder if the run did not commit, and releases the lock.</summary>
    public void Dispose()
    {
        if (!committed && Directory.Exists(StagingPath))
        {
            Directory.Delete(StagingPath, recursive: true);
        }

        lockFile.Dispose();
    }
}
