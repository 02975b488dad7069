namespace BinEnergy.Reporting;

/// <summary>Writes a file under a temporary name beside it, then moves it into place.</summary>
internal static class AtomicFile
{
    public static void Write(string path, byte[] content)
    {
        string temporary = path + ".tmp-" + Guid.NewGuid().ToString("N");
        try
        {
            File.WriteAllBytes(temporary, content);
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
