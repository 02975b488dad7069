namespace BinEnergy.Cli;

/// <summary>A command-line option is missing, contradictory or out of range: exit code 2, one line.</summary>
public sealed class UsageException(string message) : Exception(message);
