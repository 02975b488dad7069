using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>A validated study file: name, display units, currency, climates and variants (the run is their cross product).</summary>
/// <param name="File">The study file as the user named it.</param>
/// <param name="Name">The study name.</param>
/// <param name="Units">Display units of the outputs.</param>
/// <param name="Currency">Currency code used in cost column names (lower case).</param>
/// <param name="Hash">SHA-256 of the study file's text (line endings normalised), hex.</param>
/// <param name="Climates">The climates, in file order.</param>
/// <param name="Variants">The variants, in file order.</param>
public sealed record StudyDefinition(
    string File,
    string Name,
    UnitSystem Units,
    string Currency,
    string Hash,
    IReadOnlyList<StudyClimate> Climates,
    IReadOnlyList<StudyVariant> Variants)
{
    /// <summary>The method of the headline figures (<c>[study] headline_method</c>, default hourly).</summary>
    public Loads.IntegrationMethod HeadlineMethod { get; init; } = Loads.IntegrationMethod.Hourly;

    /// <summary>How each climate's degree-days are counted (<c>[study] degree_days</c>, default daily-mean).</summary>
    public Climate.DegreeDayMethod DegreeDayMethod { get; init; } = Climate.DegreeDayMethod.DailyMean;

    /// <summary>Every key the study's own tables set (not the climates' or variants'), as written, in file order.</summary>
    public IReadOnlyList<StudySetting> Settings { get; init; } = [];

    /// <summary>The variants the report shows in detail (charts, economizer and method-check rows) (<c>[report] detail_variants</c>; default every variant).</summary>
    public IReadOnlyList<string> DetailVariants { get; init; } = [];
}
