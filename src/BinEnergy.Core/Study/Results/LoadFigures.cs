using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Study.Results;

/// <summary>
/// Outdoor-air loads over a span (a year, a month, a bin, an hour) by one method, in SI (J),
/// with the energy the plant buys to meet them.
/// </summary>
/// <param name="HoursVentilated">Hours with outdoor air supplied.</param>
/// <param name="HeatingJ">Heating of the outdoor air, J.</param>
/// <param name="CoolingSensibleJ">Sensible cooling, J.</param>
/// <param name="CoolingLatentJ">Latent cooling (dehumidification), J.</param>
/// <param name="HumidificationJ">Humidification, J.</param>
/// <param name="RecoveredHeatingJ">Heating recovered from the exhaust, J.</param>
/// <param name="RecoveredCoolingJ">Cooling recovered from the exhaust, J.</param>
/// <param name="FanJ">Fan electricity of the recovery pressure drop, J.</param>
/// <param name="HeatingSite">Energy bought for heating.</param>
/// <param name="CoolingSite">Electricity bought for cooling (sensible plus latent through the cooling COP).</param>
/// <param name="OtherSite">Electricity bought for fans and humidification.</param>
public sealed record LoadFigures(
    double HoursVentilated,
    double HeatingJ,
    double CoolingSensibleJ,
    double CoolingLatentJ,
    double HumidificationJ,
    double RecoveredHeatingJ,
    double RecoveredCoolingJ,
    double FanJ,
    SiteEnergy HeatingSite,
    SiteEnergy CoolingSite,
    SiteEnergy OtherSite)
{
    /// <summary>All energy bought.</summary>
    public SiteEnergy Total => HeatingSite + CoolingSite + OtherSite;
}
