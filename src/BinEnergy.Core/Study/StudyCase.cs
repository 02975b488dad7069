using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Study;

/// <summary>
/// One climate x variant of a study, with the engine settings its tables resolve to (the
/// same settings types the <c>outdoor-air</c> and <c>economizer</c> commands use).
/// </summary>
/// <param name="Climate">The climate.</param>
/// <param name="Variant">The variant.</param>
/// <param name="OutdoorAir">Outdoor-air settings.</param>
/// <param name="BinScale">Dry-bulb bins in the study's display unit.</param>
/// <param name="Plant">The plant, or null when the study has no [plant] table (loads only).</param>
/// <param name="Assumptions">Defaults taken for keys the study leaves out.</param>
public sealed record StudyCase(
    StudyClimate Climate,
    StudyVariant Variant,
    OutdoorAirSettings OutdoorAir,
    DryBulbBinScale BinScale,
    PlantSettings? Plant,
    IReadOnlyList<string> Assumptions)
{
    /// <summary>The economizer system, or null when the study (or this variant) has none.</summary>
    public Economizer.EconomizerSettings? Economizer { get; init; }
}
