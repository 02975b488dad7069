namespace BinEnergy.Core.Climate;

/// <summary>A dehumidification design condition: the dew point exceeded in a given share of the hours, with its mean coincident dry-bulb.</summary>
/// <param name="AnnualPercent">Share of the hours above the design dew point, percent (0.4 or 1).</param>
/// <param name="DewPointC">The design dew point, C.</param>
/// <param name="HumidityRatio">Humidity ratio at the design dew point and the site pressure, kg/kg (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 20 with eq. 5/6).</param>
/// <param name="MeanCoincidentDryBulbC">Mean dry-bulb of the hours at the data level nearest the design dew point (<see cref="BinEnergy.Core.Climate.CoincidentHours"/>), C.</param>
/// <param name="CoincidentHours">How many hours those means are taken over.</param>
public sealed record DehumidificationDesignPoint(double AnnualPercent, double DewPointC, double HumidityRatio, double MeanCoincidentDryBulbC, int CoincidentHours);
