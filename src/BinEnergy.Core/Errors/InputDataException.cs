namespace BinEnergy.Core.Errors;

/// <summary>
/// Base of the errors caused by the user's input data (a weather file, a study file, a
/// column map): the message names the file and, where it can, the line, column or key,
/// says what is wrong and how to fix it. The command line turns these into exit code 3
/// and one paragraph on standard error, never a stack trace.
/// </summary>
public abstract class InputDataException : Exception
{
    protected InputDataException(string message, Exception? inner = null)
        : base(message, inner)
    {
    }
}
