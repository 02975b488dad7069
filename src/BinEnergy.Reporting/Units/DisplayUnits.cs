using System.Globalization;
using BinEnergy.Core.Plant;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Reporting.Units;

/// <summary>
/// The display units of one output (DESIGN 3): every IP or SI choice of the outputs is made
/// here and nowhere else. IP: F, psia, gr/lb and lb/lb, Btu/lb (0 F datum), cfm, Btu/h, kBtu,
/// therm, gallons, ft; SI: C, kPa, g/kg and kg/kg, kJ/kg (0 C datum), L/s, kW, kWh, litres, m.
/// Enthalpy is converted through its datum (<see cref="SpecificEnthalpy"/>), never by a factor alone.
/// Each unit also says how many digits CSV tables keep (<see cref="FileDigits"/>): six significant digits,
/// and decimals down to a step finer than the data can resolve (0.001 F against weather read to 0.1 F;
/// 1e-7 lb/lb and 0.001 gr/lb; 0.001 Btu/lb; 1 Btu or 1 Wh of energy; 0.1 Btu/h; a cent).
/// </summary>
public sealed class DisplayUnits
{
    private readonly bool ip;

    /// <summary>Display units for <paramref name="units"/>, a currency code for cost columns and the oil's heat content.</summary>
    public DisplayUnits(UnitSystem units, string currency = "usd", double? oilJoulesPerGallon = null)
    {
        System = units;
        ip = units == UnitSystem.IP;
        double oil = oilJoulesPerGallon ?? FuelUnits.DefaultOilBtuPerGallon * Conversions.JoulesPerBtu;
        Temperature = ip ? new("f", "F", Conversions.CelsiusToFahrenheit, "0.0", FileDigits.Decimals(3)) : new("c", "C", c => c, "0.0", FileDigits.Decimals(3));
        TemperatureDifference = ip ? new("f", "F", k => k * 1.8, "0.##", FileDigits.Decimals(3)) : new("c", "K", k => k, "0.##", FileDigits.Decimals(3));
        DegreeDays = ip ? new("f_day", "F-day", k => k * 1.8, "N0", FileDigits.Decimals(1)) : new("k_day", "K-day", k => k, "N0", FileDigits.Decimals(1));
        HumidityRatio = ip ? new("lb_lb", "lb/lb", w => w, "0.00000", FileDigits.Decimals(7)) : new("kg_kg", "kg/kg", w => w, "0.00000", FileDigits.Decimals(7));
        Moisture = ip ? new("gr_lb", "gr/lb", w => w * Conversions.GrainsPerPound, "0.0", FileDigits.Decimals(3)) : new("g_kg", "g/kg", w => w * 1000.0, "0.00", FileDigits.Decimals(4));
        Enthalpy = ip
            ? new("btu_lb", "Btu/lb", h => SpecificEnthalpy.FromJoulesPerKilogram(h).BtuPerPound, "0.00", FileDigits.Decimals(3))
            : new("kj_kg", "kJ/kg", h => h / 1000.0, "0.00", FileDigits.Decimals(3));
        Energy = ip ? new("kbtu", "kBtu", j => j / Conversions.JoulesPerBtu / 1000.0, "N0", FileDigits.Decimals(3)) : new("kwh", "kWh", j => j / Conversions.JoulesPerKilowattHour, "N0", FileDigits.Decimals(3));
        Power = ip ? new("btuh", "Btu/h", w => w * 3600.0 / Conversions.JoulesPerBtu, "N0", FileDigits.Decimals(1)) : new("kw", "kW", w => w / 1000.0, "N2", FileDigits.Decimals(4));
        Airflow = ip ? new("cfm", "cfm", v => v / Conversions.CubicMetresPerSecondPerCfm, "N0", FileDigits.Decimals(2)) : new("ls", "L/s", v => v * 1000.0, "N0", FileDigits.Decimals(2));
        Pressure = ip ? new("psia", "psia", p => p / Conversions.PascalsPerPsi, "0.000", FileDigits.Decimals(4)) : new("kpa", "kPa", p => p / 1000.0, "0.000", FileDigits.Decimals(4));
        FanPowerPerFlow = ip ? new("w_per_cfm", "W/cfm", p => p * Conversions.CubicMetresPerSecondPerCfm, "0.###", FileDigits.Decimals(4)) : new("w_per_ls", "W per L/s", p => p / 1000.0, "0.###", FileDigits.Decimals(4));
        PressureDrop = ip ? new("inwc", "in. w.g.", p => p / Conversions.PascalsPerInchOfWater, "0.###", FileDigits.Decimals(4)) : new("pa", "Pa", p => p, "0.#", FileDigits.Decimals(2));
        Density = ip
            ? new("lb_ft3", "lb/ft3", r => r / Conversions.KilogramsPerPound * Conversions.CubicMetresPerCubicFoot, "0.0000", FileDigits.Decimals(6))
            : new("kg_m3", "kg/m3", r => r, "0.0000", FileDigits.Decimals(5));
        SpecificVolume = ip
            ? new("ft3_lb", "ft3/lb", v => v * Conversions.KilogramsPerPound / Conversions.CubicMetresPerCubicFoot, "0.0000", FileDigits.Decimals(4))
            : new("m3_kg", "m3/kg", v => v, "0.0000", FileDigits.Decimals(5));
        SensibleFactor = ip ? new("btuh_cfm_f", "Btu/(h cfm F)", f => f * AirflowFactors.IpSensiblePerSi, "0.000", FileDigits.Decimals(5)) : new("w_ls_k", "W/(L/s K)", f => f, "0.000", FileDigits.Decimals(5));
        LatentFactor = ip ? new("btuh_cfm", "Btu/(h cfm) per lb/lb", f => f * AirflowFactors.IpPowerPerFlowPerSi, "N0", FileDigits.Decimals(1)) : new("w_ls", "W/(L/s) per kg/kg", f => f, "N0", FileDigits.Decimals(1));
        TotalFactor = ip
            ? new("btuh_cfm_per_btu_lb", "Btu/(h cfm) per Btu/lb", f => f * AirflowFactors.IpPowerPerFlowPerSi * Conversions.KilojoulesPerKilogramPerBtuPerPound, "0.000", FileDigits.Decimals(5))
            : new("w_ls_per_kj_kg", "W/(L/s) per kJ/kg", f => f, "0.000", FileDigits.Decimals(5));
        Length = ip ? new("ft", "ft", m => m / Conversions.MetresPerFoot, "N0", FileDigits.Decimals(1)) : new("m", "m", m => m, "N0", FileDigits.Decimals(2));
        Area = ip ? new("ft2", "ft2", a => a / (Conversions.MetresPerFoot * Conversions.MetresPerFoot), "N0", FileDigits.Decimals(1)) : new("m2", "m2", a => a, "N0", FileDigits.Decimals(2));
        Gas = ip ? new("therm", "therm", j => j / FuelUnits.JoulesPerTherm, "N0", FileDigits.Decimals(3)) : new("kwh", "kWh", j => j / FuelUnits.JoulesPerKilowattHour, "N0", FileDigits.Decimals(3));
        Oil = ip ? new("gal", "gal", j => j / oil, "N0", FileDigits.Decimals(3)) : new("l", "L", j => j / oil * FuelUnits.LitresPerGallon, "N0", FileDigits.Decimals(3));
        Currency = currency;
        Cost = new("cost_" + currency, currency.ToUpperInvariant(), c => c, "N0", FileDigits.Decimals(2));
    }

    /// <summary>The unit system.</summary>
    public UnitSystem System { get; }

    /// <summary>True for IP.</summary>
    public bool IsIp => ip;

    /// <summary>The currency code of cost columns.</summary>
    public string Currency { get; }

    /// <summary>Dry-bulb, wet-bulb, dew point: F or C.</summary>
    public DisplayUnit Temperature { get; }

    /// <summary>A temperature difference (a bin width): F or K.</summary>
    public DisplayUnit TemperatureDifference { get; }

    /// <summary>Degree-days: F-day or K-day.</summary>
    public DisplayUnit DegreeDays { get; }

    /// <summary>Humidity ratio as a ratio: lb/lb or kg/kg (the same number).</summary>
    public DisplayUnit HumidityRatio { get; }

    /// <summary>Humidity ratio as people read it: gr/lb or g/kg.</summary>
    public DisplayUnit Moisture { get; }

    /// <summary>Moist-air enthalpy per mass of dry air: Btu/lb (0 F datum) or kJ/kg (0 C datum).</summary>
    public DisplayUnit Enthalpy { get; }

    /// <summary>Thermal energy: kBtu or kWh.</summary>
    public DisplayUnit Energy { get; }

    /// <summary>Load rates: Btu/h or kW.</summary>
    public DisplayUnit Power { get; }

    /// <summary>Volume flow: cfm or L/s.</summary>
    public DisplayUnit Airflow { get; }

    /// <summary>Total pressure: psia or kPa.</summary>
    public DisplayUnit Pressure { get; }

    /// <summary>A fan or device pressure drop: in. w.g. or Pa.</summary>
    public DisplayUnit PressureDrop { get; }

    /// <summary>Fan power per unit airflow (specific fan power): W/cfm or W per L/s.</summary>
    public DisplayUnit FanPowerPerFlow { get; }

    /// <summary>Air density: lb/ft3 or kg/m3.</summary>
    public DisplayUnit Density { get; }

    /// <summary>Specific volume of dry air: ft3/lb or m3/kg.</summary>
    public DisplayUnit SpecificVolume { get; }

    /// <summary>The sensible airflow factor (SI value in W/(L/s K)).</summary>
    public DisplayUnit SensibleFactor { get; }

    /// <summary>The latent airflow factor (SI value in W/(L/s) per kg/kg).</summary>
    public DisplayUnit LatentFactor { get; }

    /// <summary>The total airflow factor (SI value in W/(L/s) per kJ/kg).</summary>
    public DisplayUnit TotalFactor { get; }

    /// <summary>Elevation: ft or m.</summary>
    public DisplayUnit Length { get; }

    /// <summary>Floor area: ft2 or m2.</summary>
    public DisplayUnit Area { get; }

    /// <summary>Gas bought: therm or kWh.</summary>
    public DisplayUnit Gas { get; }

    /// <summary>Oil bought: US gallons or litres.</summary>
    public DisplayUnit Oil { get; }

    /// <summary>Money in the study's currency.</summary>
    public DisplayUnit Cost { get; }

    /// <summary>Electricity: kWh in both systems.</summary>
    public DisplayUnit Electricity { get; } = new("kwh", "kWh", j => j / FuelUnits.JoulesPerKilowattHour, "N0", FileDigits.Decimals(3));

    /// <summary>Carbon: kg CO2-equivalent in both systems.</summary>
    public DisplayUnit Carbon { get; } = new("kg", "kg CO2e", c => c, "N0", FileDigits.Decimals(3));

    /// <summary>A percentage (the SI value is already in percent).</summary>
    public DisplayUnit Percent { get; } = new("pct", "%", p => p, "+0.0;-0.0;0.0", FileDigits.Decimals(2));

    /// <summary>A relative humidity (the SI value is a fraction 0 to 1).</summary>
    public DisplayUnit RelativeHumidity { get; } = new("pct", "%", f => f * 100.0, "0.#", FileDigits.Decimals(2));

    /// <summary>Hours (fractional in some bin methods).</summary>
    public DisplayUnit Hours { get; } = new(string.Empty, "h", h => h, "N0", FileDigits.Decimals(3));

    /// <summary>A heating capacity per unit of design airflow (the SI value is W per m3/s): Btu/h per cfm, or W per L/s.</summary>
    public DisplayUnit CapacityPerAirflow => ip
        ? new("btuh_per_cfm", "Btu/h per cfm", w => w * 3600.0 / Conversions.JoulesPerBtu * Conversions.CubicMetresPerSecondPerCfm, "0.00", FileDigits.Decimals(4))
        : new("w_per_ls", "W per L/s", w => w / 1000.0, "0.00", FileDigits.Decimals(4));

    /// <summary>A gas price (the SI value is per joule): per therm, or per kWh.</summary>
    public DisplayUnit GasPrice => ip
        ? new("per_therm", "per therm", p => p * FuelUnits.JoulesPerTherm, "0.000", FileDigits.Decimals(5))
        : new("per_kwh", "per kWh", p => p * FuelUnits.JoulesPerKilowattHour, "0.000", FileDigits.Decimals(6));

    /// <summary>The enthalpy datum of these units, in words: "0 F" or "0 C".</summary>
    public string EnthalpyDatum => ip ? "0 F" : "0 C";

    /// <summary>The latent airflow factor per unit of the humidity ratio people read: per gr/lb or per g/kg.</summary>
    public DisplayUnit LatentFactorPerMoisture => ip
        ? new("btuh_cfm_per_gr_lb", "Btu/(h cfm) per gr/lb", f => f * AirflowFactors.IpPowerPerFlowPerSi / Conversions.GrainsPerPound, "0.0000", FileDigits.Decimals(6))
        : new("w_ls_per_g_kg", "W/(L/s) per g/kg", f => f / 1000.0, "0.0000", FileDigits.Decimals(6));

    /// <summary>Every how many rows the terminal shows of the degree-day curve: every 5 F or every 2 K.</summary>
    public int DegreeDayCurveTerminalStep => ip ? 5 : 2;

    /// <summary>The degree-day base people quote in these units: 65 F, or 18.3 C (common practice).</summary>
    public double DegreeDayBaseC => ip ? Conversions.FahrenheitToCelsius(65.0) : 18.3;

    /// <summary>The bases of the degree-day curve: every whole F from 40 to 80 F, or every whole C from 4 to 27 C.</summary>
    public double[] DegreeDayCurveBasesC => ip ? Core.Climate.DegreeDayCurve.StandardBasesC() : Enumerable.Range(4, 24).Select(c => (double)c).ToArray();

    /// <summary>The unit system's name in outputs: <c>ip</c> or <c>si</c>.</summary>
    public string Name => ip ? "ip" : "si";

    /// <summary>What the unit system means, for reports: "IP (F, kBtu, cfm)" or "SI (C, kWh, L/s)".</summary>
    public string Description => ip ? "IP (F, kBtu, cfm)" : "SI (C, kWh, L/s)";

    /// <summary>A temperature in display units, for prose.</summary>
    public string Show(Temperature t) => Text(Temperature, t.Celsius);

    /// <summary>A value in a unit, formatted with its symbol, for prose ("1,000 cfm").</summary>
    public static string Text(DisplayUnit unit, double si, string? format = null)
    {
        double v = unit.FromSi(si);
        string number = double.IsFinite(v) ? v.ToString(format ?? unit.Format, CultureInfo.InvariantCulture) : "n/a";
        return unit.Symbol.Length == 0 ? number : number + " " + unit.Symbol;
    }
}
