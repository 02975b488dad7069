using BinEnergy.Core.Units;

namespace BinEnergy.Core.Plant;

/// <summary>
/// Conversions between the ways cooling efficiency is quoted. COP is dimensionless (W of
/// cooling per W of electricity); EER is Btu/h of cooling per W of electricity, so
/// COP = EER / 3.41214 (1 W = 3.41214 Btu/h, from 1 kWh = 3412.14 Btu); kW/ton is kW of
/// electricity per ton (12,000 Btu/h = 3.51685 kW) of cooling, so COP = 3.51685 / (kW/ton).
/// Sources: the unit definitions in DESIGN 3 and NIST SP 811; the relations are common practice.
/// </summary>
public static class CoolingRating
{
    /// <summary>Kilowatts of cooling in one ton of refrigeration (12,000 Btu/h).</summary>
    public const double KilowattsPerTon = Conversions.BtuPerTonHour / Conversions.BtuPerKilowattHour;

    /// <summary>COP from an energy efficiency ratio, Btu/(W h).</summary>
    public static double CopFromEer(double eer) => eer / (Conversions.BtuPerKilowattHour / 1000.0);

    /// <summary>COP from a kW/ton figure.</summary>
    public static double CopFromKilowattsPerTon(double kwPerTon) => KilowattsPerTon / kwPerTon;
}
