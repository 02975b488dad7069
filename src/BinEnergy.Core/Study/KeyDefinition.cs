namespace BinEnergy.Core.Study;

/// <summary>
/// A key of a study table: its name without unit (<c>airflow</c>), its spellings with units,
/// its kind, the allowed range in SI (inclusive unless the bound is exclusive), the allowed
/// words for a choice, and a default (null when required or optional without one).
/// </summary>
internal sealed record KeyDefinition(
    string Name,
    ValueKind Kind,
    IReadOnlyList<KeyAlternative> Alternatives,
    string Description)
{
    public double? Min { get; init; }

    public double? Max { get; init; }

    public bool MinExclusive { get; init; }

    /// <summary>Range of the temperature in [temperature, value] pairs, C.</summary>
    public (double Min, double Max)? PointXRange { get; init; }

    public IReadOnlyList<string>? Choices { get; init; }

    /// <summary>The default as documented (display text), or null.</summary>
    public string? DefaultText { get; init; }

    /// <summary>A hint on what the range means, shown with a range error.</summary>
    public string? RangeHint { get; init; }

    public bool IsUnitless => Alternatives.Count == 1 && Alternatives[0].Key == Name;
}
