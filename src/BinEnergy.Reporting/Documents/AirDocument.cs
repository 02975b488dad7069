using System.Globalization;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Documents;

/// <summary>What <c>binenergy air</c> shows: one moist-air state and its airflow factors beside standard air's.</summary>
public static class AirDocument
{
    /// <summary>The handbook's definitions the command uses.</summary>
    public const string HumidityDefinition =
        "ASHRAE Handbook—Fundamentals 2017, ch. 1: saturation over liquid water at and above 0 C and over ice below 0 C (a dew point below 0 C is a frost point here; weather files are read over liquid water at every temperature unless humidity_over = \"ice\")";

    /// <summary>The document of one state; <paramref name="pressureSource"/> says where the pressure came from.</summary>
    public static ResultDocument Build(AirState state, DisplayUnits u, string pressureSource)
    {
        var doc = new ResultDocument("Moist-air state");
        doc.Add(new ColumnSet<AirState>()
            .Number("drybulb", u.Temperature, "Dry-bulb", s => s.DryBulb.Celsius)
            .Number("wetbulb", u.Temperature, "Wet-bulb (thermodynamic)", s => s.WetBulb.Celsius)
            .Number("dewpoint", u.Temperature, "Dew point", s => s.DewPoint.Celsius)
            .Number("rh", u.RelativeHumidity, "Relative humidity", s => s.RelativeHumidity)
            .Number("humidity_ratio", u.HumidityRatio, "Humidity ratio", s => s.HumidityRatio.KilogramsPerKilogram)
            .Number("humidity_ratio", u.Moisture, "Humidity ratio", s => s.HumidityRatio.KilogramsPerKilogram)
            .Number("enthalpy", u.Enthalpy, $"Enthalpy (dry air, {u.EnthalpyDatum} datum)", s => s.Enthalpy.JoulesPerKilogram)
            .Number("specific_volume", u.SpecificVolume, "Specific volume (dry air)", s => s.SpecificVolume)
            .Number("density", u.Density, "Density (moist air)", s => s.Density)
            .Number("pressure", u.Pressure, "Pressure", s => s.Pressure.Pascals)
            .Text("pressure_source", "Pressure from", _ => pressureSource)
            .Number("vapour_pressure", u.Pressure.WithFormat("0.0000"), "Vapour pressure", s => s.VapourPressure.Pascals)
            .Text("humidity_definition", "Humidity definitions", _ => HumidityDefinition)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record }, [state]));

        doc.Add(new ColumnSet<(string Basis, AirflowFactors Factors)>()
            .Text("basis", "Basis", x => x.Basis)
            .Number("sensible_factor", u.SensibleFactor.WithFormat("0.0000"), "Sensible factor", x => x.Factors.SensibleSi)
            .Number("latent_factor", u.LatentFactor, "Latent factor", x => x.Factors.LatentSi)
            .Number("latent_factor", u.LatentFactorPerMoisture, "Latent factor", x => x.Factors.LatentSi)
            .Number("total_factor", u.TotalFactor.WithFormat("0.0000"), "Total factor", x => x.Factors.TotalSi)
            .Fill(new ResultTable("factors") { Title = "Airflow factors: q = factor x flow x difference", Layout = TableLayout.Keyed, KeyColumn = "basis", Transpose = true },
                [("this state", state.Factors), ("standard air", AirflowFactors.StandardAir)]));

        if (state.RelativeHumidity is > 0 and < 0.01)
        {
            doc.Note(NoteKind.Warning, FormattableString.Invariant($"The relative humidity is {state.RelativeHumidity * 100:0.###} %: RH is given in percent, so --rh 0.5 means 0.5 %; for 50 % write 50."));
        }

        doc.Note(NoteKind.Note, Departure(state, u));
        doc.Note(NoteKind.Note, "Standard air: 0.075 lb/ft3 of dry air (1.2014 kg/m3), W = 0; the factors use this state's dry-air density (1 / specific volume).");
        return doc;
    }

    /// <summary>One sentence on how far the state's sensible factor is from the trade's 1.08 and why (<see cref="SensibleFactorBreakdown"/>).</summary>
    public static string Departure(AirState state, DisplayUnits u)
    {
        var b = SensibleFactorBreakdown.Of(state);
        double total = b.Ratio - 1.0;
        string site = DisplayUnits.Text(u.SensibleFactor, state.Factors.SensibleSi, "0.000");
        string standardTemp = DisplayUnits.Text(u.Temperature, b.StandardAirTemperatureC, "0.0");
        return string.Create(CultureInfo.InvariantCulture,
            $"Sensible factor {site} is {Math.Abs(total) * 100:0.0} % {(total < 0 ? "below" : "above")} the trade's 1.08 Btu/(h cfm F): " +
            $"pressure {Pct(b.Pressure)} ({DisplayUnits.Text(u.Pressure, state.Pressure.Pascals)} vs {DisplayUnits.Text(u.Pressure, Core.Psychrometrics.Atmosphere.SeaLevelPressurePa)} at sea level), " +
            $"temperature {Pct(b.Temperature)} ({DisplayUnits.Text(u.Temperature, state.DryBulb.Celsius, "0.0")} vs the {standardTemp} at which dry sea-level air weighs 0.075 lb/ft3), " +
            $"moisture {Pct(b.Moisture)} (W = {state.HumidityRatio.KilogramsPerKilogram:0.0000}), rounding of 1.08 {Pct(b.Rounding)}.");
    }

    private static string Pct(double ratio) => string.Create(CultureInfo.InvariantCulture, $"{(ratio - 1) * 100:+0.0;-0.0;0.0} %");
}
