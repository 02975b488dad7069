using System.IO.Compression;
using System.Text;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// Writes a text file atomically: under a temporary name beside it, gzip-compressed when the name
/// ends in <c>.gz</c>, UTF-8 without a byte-order mark and with <c>\n</c> line ends, then moved into
/// place, so a failure leaves no half-written file.
/// </summary>
public static class TextFile
{
    /// <summary>Writes <paramref name="path"/> with <paramref name="write"/>; an existing file is replaced only when <paramref name="replace"/> is set.</summary>
    /// <returns>False when the file exists (or appeared while writing) and <paramref name="replace"/> is not set; nothing is written then.</returns>
    public static bool WriteAtomically(string path, bool replace, Action<TextWriter> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        string full = Path.GetFullPath(path);
        if (File.Exists(full) && !replace)
        {
            return false;
        }

        string temp = Path.Combine(Path.GetDirectoryName(full)!, "." + Path.GetFileName(full) + ".tmp-" + Guid.NewGuid().ToString("N")[..8]);
        try
        {
            using (var file = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            using (Stream body = full.EndsWith(".gz", StringComparison.OrdinalIgnoreCase) ? new GZipStream(file, CompressionLevel.Optimal) : file)
            using (var writer = new StreamWriter(body, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false)) { NewLine = "\n" })
            {
                write(writer);
            }

            File.Move(temp, full, overwrite: replace);
            return true;
        }
        catch (IOException) when (!replace && File.Exists(full))
        {
            return false;
        }
        finally
        {
            if (File.Exists(temp))
            {
                File.Delete(temp);
            }
        }
    }
}
