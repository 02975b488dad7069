namespace BinEnergy.Reporting.Tables;

/// <summary>
/// An output folder written atomically: everything goes into a temporary folder beside the
/// target (same parent, so the final move is a rename on the same volume), and only
/// <see cref="Commit"/> puts it in place. A run that fails before then (or disposes without
/// committing) leaves the target as it was. A target that exists and is not empty is refused
/// unless <c>force</c> is set; with force, the old folder is replaced as a whole on commit, but
/// only if it carries <see cref="MarkerName"/> (written in every folder this class makes), so a
/// project folder, the current folder or one of its parents is never deleted.
/// </summary>
public sealed class OutputFolder : IDisposable
{
    /// <summary>The file that marks a folder as one of our output folders (tool version and time inside).</summary>
    public const string MarkerName = ".binenergy-output";

    private bool committed;

    private OutputFolder(string target, string staging)
    {
        TargetPath = target;
        StagingPath = staging;
    }

    /// <summary>Where the results end up.</summary>
    public string TargetPath { get; }

    /// <summary>The temporary folder being written (write all files here).</summary>
    public string StagingPath { get; }

    /// <summary>
    /// Starts writing into <paramref name="target"/>.
    /// </summary>
    /// <exception cref="OutputFolderException">The target is a file, or a non-empty folder and <paramref name="force"/> is false.</exception>
    public static OutputFolder Begin(string target, bool force)
    {
        string full = Path.GetFullPath(target).TrimEnd(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar);
        if (File.Exists(full))
        {
            throw new OutputFolderException($"{target} is a file, not a folder: choose another --out folder");
        }

        if (Directory.Exists(full) && Directory.EnumerateFileSystemEntries(full).Any() && !force)
        {
            throw new OutputFolderException(
                $"{target} already exists and is not empty: add --force to replace it, or choose another --out folder");
        }

        if (Directory.Exists(full) && Directory.EnumerateFileSystemEntries(full).Any())
        {
            RefuseUnmarked(target, full);
        }

        string parent = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(parent);
        string staging = Path.Combine(parent, "." + Path.GetFileName(full) + ".partial-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(staging);
        string version = typeof(OutputFolder).Assembly.GetName().Version?.ToString() ?? "unknown";
        File.WriteAllText(Path.Combine(staging, MarkerName),
            string.Create(System.Globalization.CultureInfo.InvariantCulture, $"binenergy output folder\nversion {version}\nwritten {DateTime.UtcNow:yyyy-MM-ddTHH:mm:ssZ}\n"));
        return new OutputFolder(full, staging);
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

    /// <summary>Moves the finished folder into place, replacing the old one (which is removed after the move).</summary>
    public void Commit()
    {
        if (committed)
        {
            throw new InvalidOperationException("output folder already committed");
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

    /// <summary>Removes the staging folder if the run did not commit.</summary>
    public void Dispose()
    {
        if (!committed && Directory.Exists(StagingPath))
        {
            Directory.Delete(StagingPath, recursive: true);
        }
    }
}
