using BinEnergy.Core.Units;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The units a weather column may be in and their linear conversion to the reader's internal
/// units: C for temperatures, percent for RH, kg/kg for humidity ratio, Pa for pressure.
/// </summary>
internal static class WeatherUnits
{
    private static readonly Dictionary<string, (double Factor, double Offset)> Temperature = new(StringComparer.Ordinal)
    {
        ["c"] = (1.0, 0.0),
        ["f"] = (1.0 / 1.8, -32.0 / 1.8),
        ["k"] = (1.0, -273.15),
    };

    private static readonly Dictionary<string, (double Factor, double Offset)> Rh = new(StringComparer.Ordinal)
    {
        ["pct"] = (1.0, 0.0),
        ["fraction"] = (100.0, 0.0),
    };

    private static readonly Dictionary<string, (double Factor, double Offset)> Ratio = new(StringComparer.Ordinal)
    {
        ["kg/kg"] = (1.0, 0.0),
        ["lb/lb"] = (1.0, 0.0),
        ["g/kg"] = (0.001, 0.0),
        ["gr/lb"] = (1.0 / Conversions.GrainsPerPound, 0.0),
    };

    private static readonly Dictionary<string, (double Factor, double Offset)> PressureUnits = new(StringComparer.Ordinal)
    {
        ["pa"] = (1.0, 0.0),
        ["hpa"] = (100.0, 0.0),
        ["mbar"] = (100.0, 0.0),
        ["kpa"] = (1000.0, 0.0),
        ["psia"] = (Conversions.PascalsPerPsi, 0.0),
        ["inhg"] = (Conversions.PascalsPerInchOfMercury, 0.0),
    };

    private static Dictionary<string, (double Factor, double Offset)> Table(WeatherQuantity q) => q switch
    {
        WeatherQuantity.DryBulb or WeatherQuantity.DewPoint or WeatherQuantity.WetBulb => Temperature,
        WeatherQuantity.RelativeHumidity => Rh,
        WeatherQuantity.HumidityRatio => Ratio,
        _ => PressureUnits,
    };

    public static bool IsKnown(WeatherQuantity q, string unit) => Table(q).ContainsKey(unit);

    public static IEnumerable<string> Names(WeatherQuantity q) => Table(q).Keys;

    /// <summary>The linear map raw -> internal unit, folding in the column's own scale and offset.</summary>
    public static (double Factor, double Offset) ToInternal(WeatherQuantity q, ColumnSpec spec)
    {
        var (f, o) = Table(q)[spec.Unit];
        return (spec.Scale * f, spec.Offset * f + o);
    }

    /// <summary>Pressure units under which a raw number would be a plausible station pressure (50..110 kPa).</summary>
    public static IEnumerable<string> PlausiblePressureUnits(double raw) =>
        PressureUnits.Where(u => raw * u.Value.Factor is >= 50_000 and <= 110_000).Select(u => u.Key);

    /// <summary>The internal unit's name, for messages.</summary>
    public static string InternalUnit(WeatherQuantity q) => q switch
    {
        WeatherQuantity.DryBulb or WeatherQuantity.DewPoint or WeatherQuantity.WetBulb => "C",
        WeatherQuantity.RelativeHumidity => "%",
        WeatherQuantity.HumidityRatio => "kg/kg",
        _ => "Pa",
    };
}
