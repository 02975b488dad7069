using BinEnergy.Core.Units;

namespace BinEnergy.Core.Plant;

/// <summary>
/// Billing units of the fuels, as joules of heat content (or of electricity) per unit.
/// Sources: 1 therm = 100,000 Btu and 1 kWh = 3412.14 Btu (DESIGN 3, NIST SP 811 appendix B);
/// the heat content of No. 2 heating oil, 138,500 Btu per US gallon, is the figure commonly
/// used in US energy statistics (recalled from memory; a study can set its own).
/// </summary>
public static class FuelUnits
{
    /// <summary>Joules in one therm (100,000 Btu).</summary>
    public const double JoulesPerTherm = Conversions.BtuPerTherm * Conversions.JoulesPerBtu;

    /// <summary>Joules in one kilowatt-hour.</summary>
    public const double JoulesPerKilowattHour = Conversions.JoulesPerKilowattHour;

    /// <summary>Litres in one US gallon (exact: 231 cubic inches).</summary>
    public const double LitresPerGallon = 3.785411784;

    /// <summary>Default heat content of No. 2 heating oil, Btu per US gallon (recalled from memory).</summary>
    public const double DefaultOilBtuPerGallon = 138_500.0;
}
