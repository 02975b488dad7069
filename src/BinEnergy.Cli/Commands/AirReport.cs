using System.Globalization;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using Spectre.Console;

namespace BinEnergy.Cli.Commands;

/// <summary>The values <c>binenergy air</c> shows, in display units, and their two renderings.</summary>
internal sealed record AirReport(AirState State, UnitSystem Units, string PressureSource)
{
    public static AirReport From(AirState state, UnitSystem units, string pressureSource) => new(state, units, pressureSource);

    private bool Ip => Units == UnitSystem.IP;

    public double DryBulb => State.DryBulb.In(Units);

    public double WetBulb => State.WetBulb.In(Units);

    public double? DewPoint => double.IsFinite(State.DewPoint.Celsius) ? State.DewPoint.In(Units) : null;

    public double Enthalpy => State.Enthalpy.In(Units);

    /// <summary>ft3/lb or m3/kg of dry air.</summary>
    public double SpecificVolume => Ip
        ? State.SpecificVolume * Conversions.KilogramsPerPound / Conversions.CubicMetresPerCubicFoot
        : State.SpecificVolume;

    /// <summary>lb/ft3 or kg/m3 of moist air.</summary>
    public double Density => Ip
        ? State.Density / Conversions.KilogramsPerPound * Conversions.CubicMetresPerCubicFoot
        : State.Density;

    public double Pressure => State.Pressure.In(Units);

    public IReadOnlyDictionary<string, string> UnitNames => Ip
        ? new Dictionary<string, string>
        {
            ["drybulb"] = "F",
            ["wetbulb"] = "F",
            ["dewpoint"] = "F",
            ["rh_pct"] = "%",
            ["humidity_ratio"] = "lb/lb",
            ["enthalpy"] = "Btu/lb (dry air, 0 F datum)",
            ["specific_volume"] = "ft3/lb (dry air)",
            ["density"] = "lb/ft3",
            ["pressure"] = "psia",
            ["sensible_factor"] = "Btu/(h cfm F)",
            ["latent_factor"] = "Btu/(h cfm) per lb/lb",
            ["total_factor"] = "Btu/(h cfm) per Btu/lb",
        }
        : new Dictionary<string, string>
        {
            ["drybulb"] = "C",
            ["wetbulb"] = "C",
            ["dewpoint"] = "C",
            ["rh_pct"] = "%",
            ["humidity_ratio"] = "kg/kg",
            ["enthalpy"] = "kJ/kg (dry air, 0 C datum)",
            ["specific_volume"] = "m3/kg (dry air)",
            ["density"] = "kg/m3",
            ["pressure"] = "kPa",
            ["sensible_factor"] = "W/(L/s K)",
            ["latent_factor"] = "W/(L/s) per kg/kg",
            ["total_factor"] = "W/(L/s) per kJ/kg",
        };

    public Dictionary<string, object?> ToJson()
    {
        var f = State.Factors;
        return new Dictionary<string, object?>
        {
            ["drybulb"] = DryBulb,
            ["wetbulb"] = WetBulb,
            ["dewpoint"] = DewPoint,
            ["rh_pct"] = State.RelativeHumidity * 100.0,
            ["humidity_ratio"] = State.HumidityRatio.KilogramsPerKilogram,
            ["enthalpy"] = Enthalpy,
            ["specific_volume"] = SpecificVolume,
            ["density"] = Density,
            ["pressure"] = Pressure,
            ["sensible_factor"] = f.Sensible(Units),
            ["latent_factor"] = f.Latent(Units),
            ["total_factor"] = f.Total(Units),
            ["units"] = UnitNames,
        };
    }

    public void Render(IAnsiConsole console)
    {
        var u = UnitNames;
        var table = new Table().Border(TableBorder.Rounded).Title("Moist-air state");
        table.AddColumn("Property");
        table.AddColumn(new TableColumn("Value").RightAligned());
        table.AddColumn("Unit");
        void Row(string name, string value, string unit) => table.AddRow(Markup.Escape(name), value, Markup.Escape(unit));
        Row("Dry-bulb", F(DryBulb, 2), u["drybulb"]);
        Row("Wet-bulb (thermodynamic)", F(WetBulb, 2), u["wetbulb"]);
        Row("Dew point", DewPoint is double dp ? F(dp, 2) : "none (dry air)", u["dewpoint"]);
        Row("Relative humidity", F(State.RelativeHumidity * 100, 1), "%");
        Row("Humidity ratio", F(State.HumidityRatio.KilogramsPerKilogram, 5), u["humidity_ratio"]);
        Row("Humidity ratio", Ip ? F(State.HumidityRatio.GrainsPerPound, 1) : F(State.HumidityRatio.GramsPerKilogram, 2), Ip ? "gr/lb" : "g/kg");
        Row("Enthalpy", F(Enthalpy, 2), u["enthalpy"]);
        Row("Specific volume", F(SpecificVolume, 4), u["specific_volume"]);
        Row("Density (moist air)", F(Density, 4), u["density"]);
        Row("Pressure", F(Pressure, 3), u["pressure"] + " (" + PressureSource + ")");
        Row("Vapour pressure", Ip ? F(State.VapourPressure.Psia, 4) : F(State.VapourPressure.Kilopascals, 4), Ip ? "psia" : "kPa");
        console.Write(table);

        var site = State.Factors;
        var std = AirflowFactors.StandardAir;
        var factors = new Table().Border(TableBorder.Rounded).Title("Airflow factors: q = factor x flow x difference");
        factors.AddColumn("Factor");
        factors.AddColumn(new TableColumn("This state").RightAligned());
        factors.AddColumn(new TableColumn("Standard air").RightAligned());
        factors.AddColumn("Unit");
        factors.AddRow("Sensible", F(site.Sensible(Units), 4), F(std.Sensible(Units), 4), Markup.Escape(u["sensible_factor"]));
        factors.AddRow("Latent", F(site.Latent(Units), 0), F(std.Latent(Units), 0), Markup.Escape(u["latent_factor"]));
        if (Ip)
        {
            factors.AddRow("Latent per grain", F(site.LatentIpPerGrain, 4), F(std.LatentIpPerGrain, 4), Markup.Escape("Btu/(h cfm) per gr/lb"));
        }

        factors.AddRow("Total", F(site.Total(Units), 4), F(std.Total(Units), 4), Markup.Escape(u["total_factor"]));
        console.Write(factors);
        console.WriteLine(SensibleDeparture());
        console.WriteLine("Standard air: 0.075 lb/ft3 of dry air (1.2014 kg/m3), W = 0; the factors use this state's dry-air density (1 / specific volume).");
    }

    /// <summary>
    /// One sentence on how far this state's sensible factor is from the trade's 1.08 and why,
    /// splitting the ratio into pressure, temperature and moisture parts (each a factor of
    /// eq. 26 and eq. 32, so the parts multiply to the whole).
    /// </summary>
    public string SensibleDeparture()
    {
        double site = State.Factors.SensibleIp;
        double total = site / 1.08 - 1.0;
        double p = State.Pressure.Pascals / Atmosphere.SeaLevelPressurePa;
        double standardAirKelvin = Atmosphere.SeaLevelPressurePa / (MoistAir.DryAirGasConstant * FlowBasisDensity.StandardAirDensity);
        double t = standardAirKelvin / State.DryBulb.Kelvin;
        double w = State.HumidityRatio.KilogramsPerKilogram;
        double m = MoistAir.HumidSpecificHeat(w) / MoistAir.DryAirSpecificHeat / (1.0 + 1.607858 * w);
        string standardTemp = Ip
            ? F(Conversions.CelsiusToFahrenheit(standardAirKelvin - 273.15), 1) + " F"
            : F(standardAirKelvin - 273.15, 1) + " C";
        string siteText = Ip ? F(site, 3) + " Btu/(h cfm F)" : F(State.Factors.SensibleSi, 3) + " W/(L/s K) = " + F(site, 3) + " Btu/(h cfm F)";
        return string.Create(CultureInfo.InvariantCulture,
            $"Sensible factor {siteText} is {Math.Abs(total) * 100:0.0} % {(total < 0 ? "below" : "above")} 1.08: " +
            $"pressure {Pct(p)} ({F(State.Pressure.Kilopascals, 2)} kPa vs 101.325), " +
            $"temperature {Pct(t)} ({F(DryBulb, 1)} vs the {standardTemp} at which dry sea-level air weighs 0.075 lb/ft3), " +
            $"moisture {Pct(m)} (W = {w:0.0000}), rounding of 1.08 {Pct(AirflowFactors.StandardAir.SensibleIp / 1.08)}.");
    }

    private static string Pct(double ratio) => string.Create(CultureInfo.InvariantCulture, $"{(ratio - 1) * 100:+0.0;-0.0;0.0} %");

    private static string F(double v, int digits) => v.ToString("N" + digits, CultureInfo.InvariantCulture);
}
