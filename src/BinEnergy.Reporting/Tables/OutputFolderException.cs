using BinEnergy.Core.Errors;

namespace BinEnergy.Reporting.Tables;

/// <summary>The output folder cannot be used as asked (exists and is not empty without --force, or is a file).</summary>
public sealed class OutputFolderException(string message) : InputDataException(message);
