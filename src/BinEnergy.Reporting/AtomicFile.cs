namespace BinEnergy.Reporting;

/// <summary>Writes a file under a temporary name beside it, then moves it into place.</summary>
internal static class AtomicFile
{
    public static void Write(string path, byte[] content) => Write(path, temporary => File.WriteAllBytes(temporary, content), flushToDisk: false);

    /// <summary>
    /// Lets <paramref name="write"/> fill a temporary file beside <paramref name="path"/>, optionally flushes it to disk, then
    /// renames it into place: a process killed at any moment leaves the old file or the new one, never half of one.
    /// </summary>
    public static void Write(string path, Action<string> write, bool flushToDisk)
    {
        string temporary = path + ".tmp-" + Guid.NewGuid().ToString("N");
        try
        {
            write(temporary);
            if (flushToDisk)
            {
                using var stream = new FileStream(temporary, FileMode.Open, FileAccess.ReadWrite, FileShare.Read);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temporary, path, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary))
            {
                File.Delete(temporary);
            }
        }
    }
}
