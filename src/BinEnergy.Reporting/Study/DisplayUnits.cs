using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Column-name suffixes and unit conversions of the study tables for one display system:
/// energy in kBtu (IP) or kWh (SI), temperatures in F or C, humidity ratio in lb/lb or kg/kg,
/// gas in therm or kWh, oil in US gallons or litres. Only unit changes here, no physics.
/// </summary>
internal sealed class DisplayUnits(UnitSystem units, string currency, double oilJoulesPerGallon)
{
    public UnitSystem Units { get; } = units;

    public bool Ip => Units == UnitSystem.IP;

    public string Energy => Ip ? "kbtu" : "kwh";

    public string Temp => Ip ? "f" : "c";

    public string Ratio => Ip ? "lb_lb" : "kg_kg";

    public string Gas => Ip ? "therm" : "kwh";

    public string Oil => Ip ? "gal" : "l";

    public string Power => Ip ? "btuh" : "kw";

    public string Cost => "cost_" + currency;

    public double E(double joules) => Core.Units.Energy.FromJoules(joules).In(Units);

    public double T(double celsius) => double.IsNaN(celsius) ? double.NaN : Temperature.FromCelsius(celsius).In(Units);

    public double P(double watts) => Core.Units.Power.FromWatts(watts).In(Units);

    public static double Kwh(double joules) => joules / FuelUnits.JoulesPerKilowattHour;

    public double GasUnits(double joules) => Ip ? joules / FuelUnits.JoulesPerTherm : Kwh(joules);

    public double OilUnits(double joules) => Ip ? joules / oilJoulesPerGallon : joules / oilJoulesPerGallon * FuelUnits.LitresPerGallon;
}
