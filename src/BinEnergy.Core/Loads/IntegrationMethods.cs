namespace BinEnergy.Core.Loads;

/// <summary>Names of the integration methods as tables, JSON and study files write them.</summary>
public static class IntegrationMethods
{
    /// <summary>Every method, in the order outputs list them.</summary>
    public static IReadOnlyList<IntegrationMethod> All { get; } = [IntegrationMethod.Hourly, IntegrationMethod.JointBin, IntegrationMethod.Bin];

    /// <summary>The name in tables and study files: <c>hourly</c>, <c>joint-bin</c>, <c>bin</c>.</summary>
    public static string Name(IntegrationMethod method) => method switch
    {
        IntegrationMethod.Hourly => "hourly",
        IntegrationMethod.JointBin => "joint-bin",
        IntegrationMethod.Bin => "bin",
        _ => throw new ArgumentOutOfRangeException(nameof(method), method, "unknown method"),
    };

    /// <summary>The JSON key: <c>hourly</c>, <c>joint_bin</c>, <c>bin</c>.</summary>
    public static string Key(IntegrationMethod method) => Name(method).Replace('-', '_');

    /// <summary>A short label for people: "hourly", "joint bins", "bin method".</summary>
    public static string Label(IntegrationMethod method) => method switch
    {
        IntegrationMethod.Hourly => "hourly",
        IntegrationMethod.JointBin => "joint bins",
        _ => "bin method",
    };

    /// <summary>Reads a method name (<c>hourly</c>, <c>joint-bin</c> or <c>joint_bin</c>, <c>bin</c>); false for anything else.</summary>
    public static bool TryParse(string? text, out IntegrationMethod method)
    {
        switch (text?.Trim().ToLowerInvariant())
        {
            case "hourly":
                method = IntegrationMethod.Hourly;
                return true;
            case "joint-bin" or "joint_bin" or "joint":
                method = IntegrationMethod.JointBin;
                return true;
            case "bin":
                method = IntegrationMethod.Bin;
                return true;
            default:
                method = IntegrationMethod.Hourly;
                return false;
        }
    }
}
