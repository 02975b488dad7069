using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;

namespace BinEnergy.Core.Study;

/// <summary>One calendar year of a case's weather record and its results.</summary>
/// <param name="Year">The year and whether it is complete.</param>
/// <param name="OutdoorAir">The outdoor-air results of the year's hours.</param>
/// <param name="Economizer">The economizer evaluation of the year's hours, or null without an economizer.</param>
public sealed record CaseYear(RecordYear Year, OutdoorAirResult OutdoorAir, EconomizerEvaluation? Economizer);
