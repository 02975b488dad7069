namespace BinEnergy.Cli;

/// <summary>The process exit codes of <c>binenergy</c> (DESIGN 12).</summary>
public static class ExitCodes
{
    public const int Ok = 0;
    public const int Unexpected = 1;
    public const int Usage = 2;
    public const int BadInput = 3;
}
