using System.Globalization;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Everything the reader knows about one weather quantity, in one place: the parser, the column maps, the quality
/// report and the documentation (docs/weather.md, checked by a test) all read <see cref="WeatherQuantityFacts.All"/>.
/// Adding a quantity means adding a row there (and its <see cref="WeatherQuantity"/> name).
/// </summary>
/// <param name="Quantity">The quantity.</param>
/// <param name="Key">Its key in column maps, quality keys and messages' roles (e.g. <c>drybulb</c>).</param>
/// <param name="Name">Its name in messages (e.g. "dry-bulb").</param>
/// <param name="InternalUnit">The unit the reader holds it in (the SI unit, or percent for RH).</param>
/// <param name="Units">The units a column may be in, each with its linear map to the internal unit (value x factor + offset).</param>
/// <param name="OpenColumns">The open layout's column names for it, each with its unit.</param>
/// <param name="Low">Lowest physical value, internal unit (DESIGN 5.4).</param>
/// <param name="High">Highest physical value, internal unit (DESIGN 5.4).</param>
/// <param name="MissingColumnError">The error kind when a map names a column for it the file does not have.</param>
/// <param name="HumidityPreference">For a humidity measure, its place in the order of preference (DESIGN 5.1: 1 is used first); null otherwise.</param>
/// <param name="Description">One line for the documentation.</param>
public sealed record WeatherQuantityFacts(
    WeatherQuantity Quantity,
    string Key,
    string Name,
    string InternalUnit,
    IReadOnlyDictionary<string, (double Factor, double Offset)> Units,
    IReadOnlyList<(string Column, string Unit)> OpenColumns,
    double Low,
    double High,
    WeatherErrorKind MissingColumnError,
    int? HumidityPreference,
    string Description)
{
    private static readonly Dictionary<string, (double, double)> Temperature = new(StringComparer.Ordinal)
    {
        ["c"] = (1.0, 0.0),
        ["f"] = (1.0 / 1.8, -32.0 / 1.8),
        ["k"] = (1.0, -273.15),
    };

    /// <summary>The quantities, in the order of <see cref="WeatherQuantity"/>. Ranges: DESIGN 5.4 (dew point and humidity ratio in the same spirit).</summary>
    public static IReadOnlyList<WeatherQuantityFacts> All { get; } =
    [
        new(WeatherQuantity.DryBulb, "drybulb", "dry-bulb", "C", Temperature, [("drybulb_c", "c"), ("drybulb_f", "f")],
            -70.0, 60.0, WeatherErrorKind.MissingDryBulb, null, "Dry-bulb temperature (required)."),
        new(WeatherQuantity.DewPoint, "dewpoint", "dew point", "C", Temperature, [("dewpoint_c", "c"), ("dewpoint_f", "f")],
            -90.0, 60.0, WeatherErrorKind.MissingHumidity, 1, "Dew-point temperature, over liquid water unless the map says humidity_over = \"ice\"."),
        new(WeatherQuantity.HumidityRatio, "humidity_ratio", "humidity ratio", "kg/kg",
            new Dictionary<string, (double, double)>(StringComparer.Ordinal)
            {
                ["kg/kg"] = (1.0, 0.0),
                ["lb/lb"] = (1.0, 0.0),
                ["g/kg"] = (0.001, 0.0),
                ["gr/lb"] = (1.0 / Conversions.GrainsPerPound, 0.0),
            },
            [("humidity_ratio", "kg/kg")], 0.0, 0.05, WeatherErrorKind.MissingHumidity, 2, "Humidity ratio, mass of water per mass of dry air."),
        new(WeatherQuantity.WetBulb, "wetbulb", "wet-bulb", "C", Temperature, [("wetbulb_c", "c"), ("wetbulb_f", "f")],
            -70.0, 60.0, WeatherErrorKind.MissingHumidity, 3, "Thermodynamic wet-bulb temperature (ice bulb below 0 C)."),
        new(WeatherQuantity.RelativeHumidity, "rh", "relative humidity", "%",
            new Dictionary<string, (double, double)>(StringComparer.Ordinal) { ["pct"] = (1.0, 0.0), ["fraction"] = (100.0, 0.0) },
            [("rh_pct", "pct")], 0.0, 103.0, WeatherErrorKind.MissingHumidity, 4,
            "Relative humidity, over liquid water unless the map says humidity_over = \"ice\"; 100 to 103 % is set to 100 % and counted."),
        new(WeatherQuantity.Pressure, "pressure", "pressure", "Pa",
            new Dictionary<string, (double, double)>(StringComparer.Ordinal)
            {
                ["pa"] = (1.0, 0.0),
                ["hpa"] = (100.0, 0.0),
                ["mbar"] = (100.0, 0.0),
                ["kpa"] = (1000.0, 0.0),
                ["psia"] = (Conversions.PascalsPerPsi, 0.0),
                ["inhg"] = (Conversions.PascalsPerInchOfMercury, 0.0),
            },
            [("pressure_kpa", "kpa"), ("pressure_pa", "pa"), ("pressure_hpa", "hpa"), ("pressure_psia", "psia"), ("pressure_inhg", "inhg")],
            50_000.0, 110_000.0, WeatherErrorKind.MissingHeader, null, "Station pressure (optional; else from the elevation)."),
    ];

    /// <summary>The facts of a quantity.</summary>
    public static WeatherQuantityFacts Of(WeatherQuantity q) => All[(int)q];

    /// <summary>The quantity a column-map key names, if any.</summary>
    public static WeatherQuantityFacts? ByKey(string key) => All.FirstOrDefault(f => f.Key == key);

    /// <summary>Whether this is a humidity measure.</summary>
    public bool IsHumidity => HumidityPreference is not null;

    /// <summary>The linear map raw -> internal unit, folding in a column's own scale and offset.</summary>
    internal (double Factor, double Offset) ToInternal(ColumnSpec spec)
    {
        var (f, o) = Units[spec.Unit];
        return (spec.Scale * f, spec.Offset * f + o);
    }

    /// <summary>A value in the internal unit, for messages (pressure in kPa).</summary>
    internal string Show(double value) => Quantity == WeatherQuantity.Pressure
        ? (value / 1000).ToString("0.###", CultureInfo.InvariantCulture) + " kPa"
        : value.ToString("0.####", CultureInfo.InvariantCulture) + " " + InternalUnit;

    /// <summary>The physical range, for messages.</summary>
    internal string ShowRange() => Quantity == WeatherQuantity.Pressure
        ? string.Create(CultureInfo.InvariantCulture, $"{Low / 1000:0} to {High / 1000:0} kPa")
        : string.Create(CultureInfo.InvariantCulture, $"{Low:0.###} to {High:0.###} {InternalUnit}");

    /// <summary>The quantities as a Markdown table, as docs/weather.md shows them.</summary>
    public static string MarkdownTable()
    {
        var lines = new List<string>
        {
            "| map key | quantity | open-layout columns | map units | physical range | description |",
            "|---|---|---|---|---|---|",
        };
        foreach (var f in All)
        {
            lines.Add($"| `{f.Key}` | {f.Name} | {string.Join(", ", f.OpenColumns.Select(c => "`" + c.Column + "`"))} | {string.Join(", ", f.Units.Keys)} | {f.ShowRange()} | {f.Description} |");
        }

        return string.Join('\n', lines);
    }
}
