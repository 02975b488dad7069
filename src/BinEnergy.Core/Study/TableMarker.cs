namespace BinEnergy.Core.Study;

/// <summary>The value of the <see cref="TomlEntry"/> that records a table header (its line, with an empty key).</summary>
internal sealed class TableMarker
{
    public static TableMarker Instance { get; } = new();

    private TableMarker()
    {
    }
}
