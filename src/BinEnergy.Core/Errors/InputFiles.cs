using System.Globalization;
using System.IO.Compression;

namespace BinEnergy.Core.Errors;

/// <summary>
/// Reads an input file (weather, column map, study, monthly statistics) whole, within bounds: only a regular file on
/// disk (a folder is refused by name; a pipe, socket or device such as <c>/dev/zero</c> reports no length and is
/// refused before it is opened, so it can neither hang nor fill the memory), no larger than a limit, and, for gzip
/// data, no larger than the limit once decompressed. Problems come back as words for the caller's own exception.
/// </summary>
public static class InputFiles
{
    /// <summary>The default limit on a file, and on a gzip file's decompressed data: 1 GiB (about 1,000 station-years in CSV).</summary>
    public const long DefaultMaxBytes = 1L << 30;

    /// <summary>What kind of problem stops reading a file.</summary>
    public enum ProblemKind
    {
        /// <summary>No file at the path, a folder, a bad path, or the file cannot be read.</summary>
        Path,

        /// <summary>The file has no bytes, or is not a regular file.</summary>
        Empty,

        /// <summary>The file, or its decompressed data, is above the limit.</summary>
        TooLarge,

        /// <summary>The gzip data are damaged or cut short.</summary>
        Damaged,
    }

    /// <summary>What is wrong with an input file and how to fix it.</summary>
    /// <param name="Text">What is wrong, e.g. "is a folder, not a file".</param>
    /// <param name="Fix">How to fix it.</param>
    /// <param name="Kind">What kind of problem it is.</param>
    public sealed record Problem(string Text, string Fix, ProblemKind Kind = ProblemKind.Path);

    /// <summary>The file's bytes, or the problem that stops reading them.</summary>
    /// <param name="path">The file as the user named it.</param>
    /// <param name="maxBytes">The largest file (and decompressed gzip data) read.</param>
    /// <param name="limitOption">The option or key that raises the limit, named in the message.</param>
    /// <param name="decompress">Un-gzip the data when it is gzip data (by its first two bytes); <c>WasGzip</c> says it was.</param>
    public static (byte[]? Data, Problem? Problem, bool WasGzip) Read(string path, long maxBytes, string limitOption, bool decompress)
    {
        if (path.Contains('\0', StringComparison.Ordinal))
        {
            return (null, new Problem("the path contains a NUL character", "Check the path; a NUL character cannot be part of a file name"), false);
        }

        if (Directory.Exists(path))
        {
            return (null, new Problem("is a folder, not a file", "Give the path of a file (inside the folder)"), false);
        }

        var info = new FileInfo(path);
        if (!info.Exists)
        {
            return (null, new Problem("no file is at this path", "Check the path"), false);
        }

        if (info.Length == 0)
        {
            return (null, new Problem("the file is empty, or is not a regular file (a pipe, a socket or a device reports no length and is not read)",
                "Give a file saved on disk (save a stream to a file first)", ProblemKind.Empty), false);
        }

        if (info.Length > maxBytes)
        {
            return (null, TooLarge($"the file is {Megabytes(info.Length)} MB, above the limit of {Megabytes(maxBytes)} MB", limitOption), false);
        }

        byte[] data;
        try
        {
            data = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return (null, new Problem("cannot be read: " + e.Message.TrimEnd('.'), "Check the path and that the file can be read"), false);
        }

        if (!decompress || data.Length < 2 || data[0] != 0x1f || data[1] != 0x8b)
        {
            return (data, null, false);
        }

        try
        {
            // The gzip trailer ends with the uncompressed size mod 2^32 (RFC 1952, ISIZE): the output is sized by it (within
            // the limit), so the data is decompressed once into its final array, and a file cut short fails the check below.
            uint size = data.Length >= 18 ? BitConverter.ToUInt32(data, data.Length - 4) : uint.MaxValue;
            using var gz = new GZipStream(new MemoryStream(data), CompressionMode.Decompress);
            using var output = new MemoryStream(size <= maxBytes && size <= Array.MaxLength ? (int)size : 0);
            var buffer = new byte[81920];
            for (int n; (n = gz.Read(buffer)) > 0;)
            {
                if (output.Length + n > maxBytes)
                {
                    return (null, TooLarge($"the gzip data decompress to more than the limit of {Megabytes(maxBytes)} MB", limitOption), false);
                }

                output.Write(buffer, 0, n);
            }

            if (size != (uint)output.Length)
            {
                throw new InvalidDataException("the size in the gzip trailer does not match the data");
            }

            return (output.Capacity == output.Length ? output.GetBuffer() : output.ToArray(), null, true);
        }
        catch (InvalidDataException e)
        {
            return (null, new Problem("the gzip data is damaged or truncated (" + e.Message.TrimEnd('.') + ")", "Download or compress the file again", ProblemKind.Damaged), false);
        }
    }

    /// <summary>The text of a file (UTF-8), or the problem that stops reading it.</summary>
    public static (string? Text, Problem? Problem) ReadText(string path, long maxBytes, string limitOption)
    {
        var (data, problem, _) = Read(path, maxBytes, limitOption, decompress: false);
        if (data is null)
        {
            return (null, problem);
        }

        using var reader = new StreamReader(new MemoryStream(data), detectEncodingFromByteOrderMarks: true);
        return (reader.ReadToEnd(), null);
    }

    private static Problem TooLarge(string text, string limitOption) => new(text, $"Raise the limit with {limitOption}, or split the file", ProblemKind.TooLarge);

    private static string Megabytes(long bytes) => (bytes / 1048576.0).ToString("#,0.#", CultureInfo.InvariantCulture);
}
