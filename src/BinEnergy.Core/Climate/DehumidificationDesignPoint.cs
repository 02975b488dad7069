namespace BinEnergy.Core.Climate;

/// <summary>A dehumidification design condition: the dew point exceeded in a given share of the hours, with its mean coincident dry-bulb.</summary>
/// <param name="AnnualPercent">Share of the hours above the design dew point, percent (0.4 or 1).</param>
/// <param name="DewPointC">The design dew point, C.</param>
/// <param name="HumidityRatio">Mean humidity ratio of the coincident hours, kg/kg (the moisture a load calculation needs).</param>
/// <param name="MeanCoincidentDryBulbC">Mean dry-bulb of the hours whose dew point lies within the coincidence window of the design value, C.</param>
/// <param name="CoincidentHours">How many hours those means are taken over.</param>
public sealed record DehumidificationDesignPoint(double AnnualPercent, double DewPointC, double HumidityRatio, double MeanCoincidentDryBulbC, int CoincidentHours);
