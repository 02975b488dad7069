namespace BinEnergy.Tests.Study;

/// <summary>The example study of the study-file contract (its key names are the contract), with invented data.</summary>
internal static class ExampleStudy
{
    /// <summary>Writes the study's invented mild coastal climate, "harbor" (8,760 hours from the test synthesizer), as harbor.csv in <paramref name="folder"/>.</summary>
    public static void WriteWeather(string folder)
    {
        var weather = Support.SyntheticWeather.Year(meanC: 11, annualSwingK: 13, dailySwingK: 5, spreadK: 3, name: "Harbor (invented)");
        using var writer = new StreamWriter(Path.Combine(folder, "harbor.csv"));
        Core.Weather.OpenLayoutWriter.Write(weather, writer);
    }

    public const string Text = """
        [study]
        name = "Harbor office ventilation options"
        units = "ip"                      # ip | si: units of the tables, charts and report
        bin_width_f = 5                   # or bin_width_c

        [[climate]]
        name = "harbor"
        weather = "harbor.csv"            # relative to this file; open layout, or give map = "tmy3"
        # elevation_ft = 40               # overrides the file's metadata

        [schedule]
        occupied = "Mon-Fri 07:00-19:00; Sat 08:00-13:00"
        # holidays = ["2026-01-01", "2026-12-25"]

        [ventilation]
        airflow_cfm = 2000                # or people, area_ft2, per_person_cfm, per_area_cfm, zone_effectiveness
        flow_basis = "site"               # site | standard | actual
        operation = "occupied"            # occupied | always
        heat_to_f = 70
        cool_to_f = 75
        max_rh_pct = 50
        fan_pressure_inwc = 1.0           # ventilation fan at plant.fan_efficiency; or fan_power_w_per_cfm, 0 for none
        # min_rh_pct = 30                 # humidify below this

        [recovery]                        # leave the table out for none
        sensible_effectiveness = 0.70
        latent_effectiveness = 0.55
        frost_limit_f = 10
        frost_effectiveness = 0.35
        pressure_drop_inwc = 0.8

        [economizer]                      # leave the table out for none
        system = "variable-volume"        # or "single-zone", "constant-volume-reheat"
        supply_airflow_cfm = 10000
        supply_airflow_min_cfm = 3000     # variable volume only
        min_outdoor_airflow_cfm = 2000
        supply_temp_f = 55
        return_temp_f = 75
        return_rh_pct = 50
        design_load_btuh = 300000
        design_outdoor_f = 95
        balance_point_f = 55
        controls = ["fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"]
        integrated = true
        high_limit_drybulb_f = 75
        high_limit_enthalpy_btu_lb = 28
        high_limit_dewpoint_f = 55

        [plant]
        heating_fuel = "gas"              # gas | oil | electric | heat-pump
        heating_efficiency = 0.85
        cooling_cop = [[65, 4.2], [95, 3.2], [110, 2.6]]   # pairs of (outdoor F, COP)
        fan_efficiency = 0.6
        price_gas_per_therm = 1.10
        price_electricity_per_kwh = 0.14
        carbon_gas_kg_per_therm = 5.3
        carbon_electricity_kg_per_kwh = 0.40

        [[variant]]
        name = "minimum"

        [[variant]]
        name = "plus-30"
        ventilation.airflow_cfm = 2600

        [[variant]]
        name = "no-recovery"
        recovery.enabled = false

        """;

    /// <summary>The example with the first line containing <paramref name="find"/> replaced; returns the text and that 1-based line.</summary>
    public static (string Text, int Line) ReplaceLine(string find, string replacement)
    {
        var lines = Text.Split('\n').ToList();
        int i = lines.FindIndex(l => l.Contains(find, StringComparison.Ordinal));
        if (i < 0)
        {
            throw new ArgumentException($"'{find}' is not in the example study");
        }

        lines[i] = replacement;
        return (string.Join('\n', lines), i + 1);
    }

    /// <summary>1-based line of the first line containing <paramref name="find"/>.</summary>
    public static int LineOf(string text, string find) =>
        text.Split('\n').ToList().FindIndex(l => l.Contains(find, StringComparison.Ordinal)) + 1;
}
