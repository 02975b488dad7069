namespace BinEnergy.Core.Economizer;

/// <summary>Names of the air-system types as study files, options and tables write them.</summary>
public static class AirSystemTypes
{
    /// <summary>Every type, in the order outputs list them.</summary>
    public static IReadOnlyList<AirSystemType> All { get; } = [AirSystemType.SingleZone, AirSystemType.VariableVolume, AirSystemType.ConstantVolumeReheat];

    /// <summary>The name: <c>single-zone</c>, <c>variable-volume</c>, <c>constant-volume-reheat</c>.</summary>
    public static string Name(AirSystemType type) => type switch
    {
        AirSystemType.SingleZone => "single-zone",
        AirSystemType.VariableVolume => "variable-volume",
        AirSystemType.ConstantVolumeReheat => "constant-volume-reheat",
        _ => throw new ArgumentOutOfRangeException(nameof(type), type, "unknown air-system type"),
    };

    /// <summary>Reads a type name; false for anything else.</summary>
    public static bool TryParse(string? text, out AirSystemType type)
    {
        foreach (var t in All)
        {
            if (string.Equals(text?.Trim(), Name(t), StringComparison.OrdinalIgnoreCase))
            {
                type = t;
                return true;
            }
        }

        type = AirSystemType.VariableVolume;
        return false;
    }
}
