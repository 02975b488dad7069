namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// A moist-air state or property was asked for outside the range where the published
/// equations hold, or the inputs describe no physical state (a dew point above the
/// dry-bulb, a relative humidity above 100 %). The message says which input and why.
/// </summary>
public sealed class PsychrometricException : ArgumentOutOfRangeException
{
    public PsychrometricException(string parameterName, object? actualValue, string message)
        : base(parameterName, actualValue, message)
    {
        Reason = message;
    }

    /// <summary>The reason alone, without the parameter name and value the base class appends.</summary>
    public string Reason { get; }
}
