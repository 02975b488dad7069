namespace BinEnergy.Cli;

/// <summary>The process exit codes of <c>binenergy</c> (DESIGN 12).</summary>
public static class ExitCodes
{
    public const int Ok = 0;
    public const int Unexpected = 1;
    public const int Usage = 2;
    public const int BadInput = 3;

    /// <summary>Stopped by Ctrl-C (128 + SIGINT, the shell's convention).</summary>
    public const int Interrupted = 130;
}
