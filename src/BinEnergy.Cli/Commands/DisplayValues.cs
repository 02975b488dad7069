using System.Globalization;
using BinEnergy.Core.Units;

namespace BinEnergy.Cli.Commands;

/// <summary>Turns SI values into the display units of the bin and load commands, and formats numbers invariantly.</summary>
internal sealed class DisplayValues(UnitSystem units)
{
    public UnitSystem Units { get; } = units;

    public bool Ip => Units == UnitSystem.IP;

    public string TemperatureUnit => Ip ? "F" : "C";

    public string HumidityRatioUnit => Ip ? "lb/lb" : "kg/kg";

    /// <summary>The humidity unit people read: gr/lb or g/kg.</summary>
    public string HumidityReadableUnit => Ip ? "gr/lb" : "g/kg";

    public string EnthalpyUnit => Ip ? "Btu/lb" : "kJ/kg";

    public string EnergyUnit => Ip ? "kBtu" : "kWh";

    public string PowerUnit => Ip ? "Btu/h" : "kW";

    public string FlowUnit => Ip ? "cfm" : "L/s";

    /// <summary>A temperature in F or C; null for NaN (an empty bin).</summary>
    public double? T(Temperature t) => Nullable(t.In(Units));

    public double? W(HumidityRatio w) => Nullable(w.KilogramsPerKilogram);

    /// <summary>gr/lb or g/kg.</summary>
    public double WReadable(HumidityRatio w) => Ip ? w.GrainsPerPound : w.GramsPerKilogram;

    public double? H(SpecificEnthalpy h) => Nullable(h.In(Units));

    public double E(Energy e) => e.In(Units);

    public double P(Power p) => p.In(Units);

    public static double? Nullable(double v) => double.IsFinite(v) ? v : null;

    public static string F(double v, string format) => v.ToString(format, CultureInfo.InvariantCulture);

    public static string F(double? v, string format) => v is double d ? F(d, format) : "";

    public static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
