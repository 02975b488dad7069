using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>
/// Every table and key a study file may contain (docs/study.md is the reference for users).
/// Each dimensional key carries its unit in its name; IP and SI spellings are both accepted and
/// converted to SI here, once. Ranges are physical plausibility limits, in SI.
/// </summary>
internal static class StudySchema
{
    public static IReadOnlyList<SectionDefinition> Sections { get; } = Build();

    /// <summary>Tables a variant may override.</summary>
    public static IEnumerable<SectionDefinition> Overridable => Sections.Where(s => s.Overridable);

    public static SectionDefinition? Find(string name) => Sections.FirstOrDefault(s => s.Name == name);

    public static SectionDefinition Get(string name) => Find(name) ?? throw new KeyNotFoundException(name);

    private static List<SectionDefinition> Build() =>
    [
        new("study", false,
        [
            Text("name", "Name of the study (used for the default output folder)."),
            Choice("units", ["ip", "si"], "ip", "Units of the tables, charts and report."),
            new KeyDefinition("bin_width", ValueKind.Number, TemperatureDifference("bin_width"), "Width of the dry-bulb bins; bins sit on multiples of the width, lower edge inclusive.")
            { Min = 0.1 / 1.8, Max = 20.0, DefaultText = "5 F (ip) or 2 C (si)", RangeHint = "bins between 0.1 F and 20 K wide" },
            Choice("bin_point", ["mean", "midpoint", "mid"], "mean",
                "Where the bin method evaluates each bin: the mean dry-bulb of its ventilated hours, or its midpoint (midpoint or mid: the classic method)."),
            Choice("headline_method", [.. Loads.IntegrationMethods.All.Select(Loads.IntegrationMethods.Name)], Loads.IntegrationMethods.Name(Loads.IntegrationMethod.Hourly),
                "The method of the headline figures (summary, report, cost and carbon, comparison charts); the others are shown beside it."),
            Choice("degree_days", [.. Climate.DegreeDayMethods.All.Select(Climate.DegreeDayMethods.Name)], Climate.DegreeDayMethods.Name(Climate.DegreeDayMethod.DailyMean),
                "How each climate's degree-days are counted: from daily mean temperatures (as published), degree-hours / 24, or daily (max + min) / 2."),
            Text("currency", "Currency code of the prices, used in the cost column names (cost_usd).", "usd"),
        ], false, "The study's name, display units, bin width and bin evaluation point."),

        new("climate", true,
        [
            Text("name", "Name of the climate (a column of every table)."),
            Text("weather", "Weather file, relative to the study file."),
            Text("map", "Column map for a layout other than the open one: a shipped map (tmy3, pvgis) or the path of a TOML map file (in a study, relative to the study file)."),
            new KeyDefinition("elevation", ValueKind.Number, Length("elevation"), "Site elevation, overriding the file's metadata; it sets the site pressure.")
            { Min = -500, Max = 6000, RangeHint = "elevations between -500 m and 6,000 m" },
            Bool("drop_long_gaps", "Leave hours in gaps longer than 6 h out (counted and reported) instead of stopping with an error.", "false"),
            new KeyDefinition("calendar_year", ValueKind.Number, Unitless("calendar_year"), "Year whose weekdays a typical-year file uses.")
            { Min = 1900, Max = 2200, DefaultText = "2018 (a non-leap year starting on a Monday)", RangeHint = "a year from 1900 to 2200" },
            Choice("humidity_over", ["water", "ice"], "the file's (water unless its map or metadata says ice)",
                "What the file's dew points and RH are relative to below 0 C: liquid water (the usual weather convention) or ice (frost points)."),
        ], false, "One climate (weather file); repeat [[climate]] for several."),

        new("schedule", false,
        [
            Text("occupied", "Occupied hours, e.g. \"Mon-Fri 07:00-19:00; Sat 08:00-13:00\", \"always\" or \"never\" (whole hours; 'Hol' for holidays).", "always"),
            new KeyDefinition("holidays", ValueKind.TextList, Unitless("holidays"), "Holiday dates (YYYY-MM-DD, in the record's calendar year), unoccupied unless the schedule has a 'Hol' clause."),
            Choice("daylight_saving", ["none", "north-america", "europe"], "none",
                "The building's clocks: none (the schedule is in standard time), north-america or europe (the schedule is in clock time; the weather stays in standard time)."),
        ], true, "The occupancy schedule."),

        new("ventilation", false,
        [
            new KeyDefinition("airflow", ValueKind.Number, Flow("airflow"), "Outdoor airflow.") { Min = 0, Max = 1000, RangeHint = "an airflow of zero or more (up to 1,000 m3/s)" },
            new KeyDefinition("people", ValueKind.Number, Unitless("people"), "Zone population, for the people-and-area minimum of the ventilation rate procedure (ASHRAE 62.1; you supply the rates).") { Min = 0, Max = 1e6 },
            new KeyDefinition("area", ValueKind.Number, Area("area"), "Zone floor area, for the people-and-area minimum.") { Min = 0, Max = 1e7 },
            new KeyDefinition("per_person", ValueKind.Number, Flow("per_person"), "Outdoor air per person, from the standard your code adopts.") { Min = 0, Max = 0.1 },
            new KeyDefinition("per_area", ValueKind.Number, PerArea("per_area"), "Outdoor air per unit floor area, from the standard your code adopts.") { Min = 0, Max = 0.02 },
            new KeyDefinition("zone_effectiveness", ValueKind.Number, Unitless("zone_effectiveness"), "Zone air-distribution effectiveness E_z.")
            { Min = 0, MinExclusive = true, Max = 1.5, DefaultText = "1.0" },
            Choice("flow_basis", ["site", "standard", "actual"], "site", FlowBasisHelp),
            Choice("operation", ["occupied", "always"], "occupied", "When outdoor air is supplied: occupied (the occupied hours of the schedule) or always."),
            new KeyDefinition("heat_to", ValueKind.Number, Temperature("heat_to"), "Heating setpoint, to which the outdoor air is heated.") { Min = 0, Max = 40, RangeHint = "0 to 40 C (32 to 104 F)" },
            new KeyDefinition("cool_to", ValueKind.Number, Temperature("cool_to"), "Cooling setpoint, to which the outdoor air is cooled.") { Min = 5, Max = 45, RangeHint = "5 to 45 C (41 to 113 F)" },
            new KeyDefinition("max_rh_pct", ValueKind.Number, Unitless("max_rh_pct"), "Maximum indoor relative humidity at the cooling setpoint, %.")
            { Min = 1, Max = 100, RangeHint = "a percentage from 1 to 100 (RH is in percent: 50 for 50 %, not 0.5)" },
            new KeyDefinition("min_rh_pct", ValueKind.Number, Unitless("min_rh_pct"), "Minimum indoor relative humidity at the heating setpoint, %; the outdoor air is humidified to it.")
            { Min = 0, Max = 100, DefaultText = "none (no humidification)", RangeHint = "a percentage from 0 to 100" },
            new KeyDefinition("fan_power", ValueKind.Number, FanPowerPerFlow("fan_power"), "Power of the fan that moves the outdoor air, per unit of outdoor airflow; 0 for none (or give the fan pressure).")
            { Min = 0, Max = 5000, DefaultText = "from fan_pressure", RangeHint = "0 to 2.4 W/cfm (5 W per L/s)" },
            new KeyDefinition("fan_pressure", ValueKind.Number, PressureDrop("fan_pressure"), "Total pressure the ventilation fan works against, at plant.fan_efficiency.")
            { Min = 0, Max = 2500, DefaultText = "1 in. w.g. (250 Pa), recalled from memory", RangeHint = "0 to 2,500 Pa (10 in. w.g.)" },
            new KeyDefinition("occupancy_profile", ValueKind.NumberList, Unitless("occupancy_profile"),
                "24 fractions (0..1) of the design airflow by hour of the day, for demand-controlled ventilation.") { Min = 0, Max = 1 },
        ], true, "The outdoor air and the indoor targets."),

        new("recovery", false,
        [
            Bool("enabled", "Set false to turn energy recovery off (e.g. in a variant).", "true"),
            new KeyDefinition("sensible_effectiveness", ValueKind.Number, Unitless("sensible_effectiveness"), "Sensible effectiveness of the energy recovery device, 0 to 1 (e.g. 0.75).") { Min = 0, Max = 1 },
            new KeyDefinition("latent_effectiveness", ValueKind.Number, Unitless("latent_effectiveness"), "Latent effectiveness of the device, 0 to 1 (0: sensible only).") { Min = 0, Max = 1, DefaultText = "0" },
            new KeyDefinition("frost_limit", ValueKind.Number, Temperature("frost_limit"), "Outdoor dry-bulb below which the device defrosts and runs at the frost effectiveness (give both).") { Min = -50, Max = 20 },
            new KeyDefinition("frost_effectiveness", ValueKind.Number, Unitless("frost_effectiveness"), "Sensible effectiveness below the frost limit (0: no recovery while defrosting).") { Min = 0, Max = 1 },
            new KeyDefinition("pressure_drop", ValueKind.Number, PressureDrop("pressure_drop"), "Pressure drop the device adds on each air stream.")
            { Min = 0, Max = 2500, DefaultText = "0", RangeHint = "0 to 2,500 Pa (10 in. w.g.)" },
            Bool("bypass_when_idle", "The air bypasses the device when it does not recover (no fan penalty in those hours).", "false"),
            new KeyDefinition("fan_efficiency", ValueKind.Number, Unitless("fan_efficiency"), "Fan efficiency for the device's pressure drop (overrides plant.fan_efficiency).")
            { Min = 0, MinExclusive = true, Max = 1, DefaultText = "plant.fan_efficiency, else 0.6" },
        ], true, "Energy recovery between exhaust and outdoor air; leave the table out for none."),

        new("economizer", false,
        [
            Bool("enabled", "Set false to evaluate no economizer (e.g. in a variant).", "true"),
            Choice("system", [.. Economizer.AirSystemTypes.All.Select(Economizer.AirSystemTypes.Name)], Economizer.AirSystemTypes.Name(Economizer.AirSystemType.VariableVolume),
                "How the air system meets the load: single-zone (constant airflow, supply temperature follows the load), variable-volume (airflow follows the load, reheat at minimum airflow) or constant-volume-reheat."),
            new KeyDefinition("supply_airflow", ValueKind.Number, Flow("supply_airflow"), "Supply airflow: the constant flow, or the maximum of a variable-volume system.") { Min = 0, MinExclusive = true, Max = 1000 },
            new KeyDefinition("supply_airflow_min", ValueKind.Number, Flow("supply_airflow_min"), "Minimum supply airflow of a variable-volume system.")
            { Min = 0, MinExclusive = true, Max = 1000, DefaultText = "30 % of supply_airflow, not below min_outdoor_airflow (recalled from memory)" },
            new KeyDefinition("supply_temp_reset_max", ValueKind.Number, Temperature("supply_temp_reset_max"), "Variable volume: the warmest supply temperature of an outdoor reset (give it with the reset's two outdoor temperatures).")
            { Min = 0, Max = 30, DefaultText = "no reset" },
            new KeyDefinition("supply_temp_reset_outdoor_low", ValueKind.Number, Temperature("supply_temp_reset_outdoor_low"), "Outdoor dry-bulb at and below which the reset supply is at its warmest.") { Min = -40, Max = 50 },
            new KeyDefinition("supply_temp_reset_outdoor_high", ValueKind.Number, Temperature("supply_temp_reset_outdoor_high"), "Outdoor dry-bulb at and above which the supply is at the supply temperature.") { Min = -40, Max = 50 },
            new KeyDefinition("min_outdoor_airflow", ValueKind.Number, Flow("min_outdoor_airflow"), "Minimum outdoor airflow; it must meet the ventilation code.") { Min = 0, Max = 1000, DefaultText = "the variant's ventilation airflow" },
            Choice("flow_basis", ["site", "standard", "actual"], "the ventilation flow basis", FlowBasisHelp),
            new KeyDefinition("supply_temp", ValueKind.Number, Temperature("supply_temp"), "Supply (coil-leaving) air temperature.") { Min = 0, Max = 30 },
            new KeyDefinition("return_temp", ValueKind.Number, Temperature("return_temp"), "Return air temperature.") { Min = 10, Max = 40 },
            new KeyDefinition("return_rh_pct", ValueKind.Number, Unitless("return_rh_pct"), "Return air relative humidity, %.") { Min = 0, MinExclusive = true, Max = 100 },
            new KeyDefinition("design_load", ValueKind.Number, PowerAlternatives("design_load"), "Building sensible cooling load at the design outdoor temperature.") { Min = 0, MinExclusive = true, Max = 1e8 },
            new KeyDefinition("design_outdoor", ValueKind.Number, Temperature("design_outdoor"), "Design outdoor dry-bulb of the design load.") { Min = 10, Max = 60 },
            new KeyDefinition("balance_point", ValueKind.Number, Temperature("balance_point"), "Outdoor dry-bulb below which the building needs no cooling.") { Min = -20, Max = 40 },
            new KeyDefinition("controls", ValueKind.TextList, Unitless("controls"), "High-limit controls compared with the baseline: fixed-drybulb, differential-drybulb, fixed-enthalpy, differential-enthalpy, fixed-dewpoint (or none).")
            {
                Choices = ["none", "fixed-drybulb", "differential-drybulb", "fixed-enthalpy", "differential-enthalpy", "fixed-dewpoint"],
                DefaultText = "all five",
            },
            Bool("integrated", "true: the economizer keeps running while the coil trims; false: it locks out.", "true"),
            new KeyDefinition("high_limit_drybulb", ValueKind.Number, Temperature("high_limit_drybulb"), "Dry-bulb high limit; the local energy code governs.") { Min = 0, Max = 40, DefaultText = "75 F (23.9 C), recalled from memory" },
            new KeyDefinition("high_limit_enthalpy", ValueKind.Number, Enthalpy("high_limit_enthalpy"), "Enthalpy high limit (0 F datum in Btu/lb, 0 C datum in kJ/kg); the local energy code governs.") { Min = 0, Max = 150e3, DefaultText = "28 Btu/lb (47.2 kJ/kg), recalled from memory" },
            new KeyDefinition("high_limit_dewpoint", ValueKind.Number, Temperature("high_limit_dewpoint"), "Dew-point high limit; the local energy code governs.") { Min = -20, Max = 35, DefaultText = "55 F (12.8 C), recalled from memory" },
            new KeyDefinition("coil_leaving_rh_pct", ValueKind.Number, Unitless("coil_leaving_rh_pct"), "Relative humidity of the air leaving the cooling coil at its wettest, %.")
            { Min = 50, Max = 100, DefaultText = "90" },
            new KeyDefinition("supply_fan_pressure", ValueKind.Number, PressureDrop("supply_fan_pressure"), "Total pressure of the supply fan at the supply airflow; 0 for no supply fan energy.")
            { Min = 0, Max = 5000, DefaultText = "3 in. w.g. (750 Pa), recalled from memory", RangeHint = "0 to 5,000 Pa (20 in. w.g.)" },
            new KeyDefinition("supply_fan_efficiency", ValueKind.Number, Unitless("supply_fan_efficiency"), "Total (fan, motor, drive) efficiency of the supply fan.")
            { Min = 0, MinExclusive = true, Max = 1, DefaultText = "plant.fan_efficiency, else 0.6" },
            new KeyDefinition("return_fan_pressure", ValueKind.Number, PressureDrop("return_fan_pressure"), "Total pressure of a return fan at the supply airflow.")
            { Min = 0, Max = 5000, DefaultText = "no return fan", RangeHint = "0 to 5,000 Pa (20 in. w.g.)" },
            new KeyDefinition("return_fan_efficiency", ValueKind.Number, Unitless("return_fan_efficiency"), "Total efficiency of the return fan.")
            { Min = 0, MinExclusive = true, Max = 1, DefaultText = "plant.fan_efficiency, else 0.6" },
            new KeyDefinition("fan_curve", ValueKind.NumberList, Unitless("fan_curve"), "Variable volume: fan power fraction c0 + c1 f + c2 f^2 + c3 f^3 of the flow fraction f, as [c0, c1, c2, c3].")
            { Min = -10, Max = 10, DefaultText = "[0.0013, 0.1470, 0.9506, -0.0998] (energy-code baseline curve, recalled from memory)" },
        ], true, "The air system and its economizer controls; leave the table out for none."),

        new("plant", false,
        [
            Choice("heating_fuel", ["gas", "oil", "electric", "heat-pump"], "gas", "What heats (the outdoor air, reheat and preheat): gas, oil, electric or heat-pump."),
            new KeyDefinition("heating_efficiency", ValueKind.Number, Unitless("heating_efficiency"), "Seasonal efficiency of a gas, oil or electric heater.")
            { Min = 0, MinExclusive = true, Max = 1.2, DefaultText = "1.0 for electric; required for gas and oil", RangeHint = "an efficiency above 0 and at most 1.2" },
            new KeyDefinition("heating_cop", ValueKind.NumberOrPoints, Rating("heating_cop", (v, _) => v), "Heat-pump COP: one number, or [outdoor temperature, COP] pairs.")
            { Min = 0, MinExclusive = true, Max = 15, PointXRange = (-50, 40) },
            new KeyDefinition("heating_capacity", ValueKind.NumberOrPoints,
            [
                new("heating_capacity_btuh", "Btu/h", (v, _) => Units.Power.FromBtuPerHour(v).Watts, (t, u) => u == UnitSystem.IP ? Conversions.FahrenheitToCelsius(t) : t),
                new("heating_capacity_btuh_f", "Btu/h", (v, _) => Units.Power.FromBtuPerHour(v).Watts, (t, _) => Conversions.FahrenheitToCelsius(t)),
                new("heating_capacity_kw", "kW", (v, _) => v * 1000.0, (t, u) => u == UnitSystem.IP ? Conversions.FahrenheitToCelsius(t) : t),
                new("heating_capacity_kw_c", "kW", (v, _) => v * 1000.0, (t, _) => t),
            ], "Heat-pump heating capacity: one number, or [outdoor temperature, capacity] pairs; the backup carries the rest.")
            { Min = 0, Max = 1e8, PointXRange = (-50, 40), DefaultText = "no limit" },
            new KeyDefinition("heating_capacity_per_airflow", ValueKind.NumberOrPoints,
            [
                new("heating_capacity_btuh_per_cfm", "Btu/h per cfm", (v, _) => Units.Power.FromBtuPerHour(v).Watts / Conversions.CubicMetresPerSecondPerCfm, (t, u) => u == UnitSystem.IP ? Conversions.FahrenheitToCelsius(t) : t),
                new("heating_capacity_btuh_per_cfm_f", "Btu/h per cfm", (v, _) => Units.Power.FromBtuPerHour(v).Watts / Conversions.CubicMetresPerSecondPerCfm, (t, _) => Conversions.FahrenheitToCelsius(t)),
                new("heating_capacity_w_per_ls", "W per L/s", (v, _) => v * 1000.0, (t, u) => u == UnitSystem.IP ? Conversions.FahrenheitToCelsius(t) : t),
                new("heating_capacity_w_per_ls_c", "W per L/s", (v, _) => v * 1000.0, (t, _) => t),
            ], "Heat-pump heating capacity per unit of design airflow (the economizer's supply_airflow, else the ventilation airflow), instead of heating_capacity: one number, or [outdoor temperature, capacity] pairs.")
            { Min = 0, Max = 1e6, PointXRange = (-50, 40), DefaultText = "no limit", RangeHint = "0 to 1,600 Btu/h per cfm (1,000 W per L/s)" },
            new KeyDefinition("heat_pump_lockout", ValueKind.Number, Temperature("heat_pump_lockout"), "Below this outdoor temperature the heat pump is off and the backup heats.")
            { Min = -50, Max = 20, DefaultText = "none" },
            Choice("backup_fuel", ["electric", "gas", "oil"], "electric", "The heat pump's backup heat: electric resistance, gas or oil."),
            new KeyDefinition("backup_efficiency", ValueKind.Number, Unitless("backup_efficiency"), "Efficiency of the backup heat.")
            { Min = 0, MinExclusive = true, Max = 1.2, DefaultText = "1.0 (electric); required for gas and oil" },
            new KeyDefinition("defrost_below", ValueKind.Number, Temperature("defrost_below"), "Below this outdoor temperature the heat pump defrosts and its COP drops by defrost_penalty_pct.")
            { Min = -30, Max = 15, DefaultText = "no defrost penalty" },
            new KeyDefinition("defrost_penalty_pct", ValueKind.Number, Unitless("defrost_penalty_pct"), "COP lost while defrosting, %.")
            { Min = 0, Max = 50, DefaultText = "10 (recalled from memory)" },
            new KeyDefinition("cooling", ValueKind.NumberOrPoints,
            [
                .. Rating("cooling_cop", (v, _) => v),
                .. Rating("cooling_eer", (v, _) => CoolingRating.CopFromEer(v)),
                .. Rating("cooling_kw_per_ton", (v, _) => CoolingRating.CopFromKilowattsPerTon(v)),
            ], "Cooling efficiency: COP, EER or kW/ton; one number, or [outdoor temperature, value] pairs.")
            { Min = 0, MinExclusive = true, Max = 15, PointXRange = (-10, 60), RangeHint = "a COP above 0 and at most 15" },
            new KeyDefinition("cooling_cop_table_outdoor", ValueKind.NumberList, Temperature("cooling_cop_table_outdoor"), "Optional COP table: the outdoor dry-bulbs of its rows, ascending.")
            { Min = -10, Max = 60, DefaultText = "no table", RangeHint = "-10 to 60 C (14 to 140 F)" },
            new KeyDefinition("cooling_cop_table_wetbulb", ValueKind.NumberList, Temperature("cooling_cop_table_wetbulb"), "Optional COP table: the coil-entering wet-bulbs of its columns, ascending.")
            { Min = -10, Max = 40, DefaultText = "no table", RangeHint = "-10 to 40 C (14 to 104 F)" },
            new KeyDefinition("cooling_cop_table", ValueKind.NumberList, Unitless("cooling_cop_table"),
                "Optional cooling COPs row by row (one row per outdoor temperature, one value per wet-bulb), interpolated bilinearly; used for the economizer's coil at its entering (mixed) state.")
            { Min = 0, MinExclusive = true, Max = 15, DefaultText = "no table: cooling_cop at the outdoor temperature", RangeHint = "a COP above 0 and at most 15" },
            new KeyDefinition("fan_efficiency", ValueKind.Number, Unitless("fan_efficiency"), "Total fan efficiency for the fan energy of pressure drops.")
            { Min = 0, MinExclusive = true, Max = 1, DefaultText = "0.6" },
            Choice("humidifier", ["steam-electric", "steam-gas", "adiabatic"], "steam-electric",
                "How the outdoor air is humidified: steam from supply water (about 2,630 kJ/kg) by electricity or gas, or adiabatic (the heating source reheats the air)."),
            new KeyDefinition("humidifier_efficiency", ValueKind.Number, Unitless("humidifier_efficiency"), "Steam humidifier efficiency.")
            { Min = 0, MinExclusive = true, Max = 1, DefaultText = "1.0 for steam-electric, 0.8 for steam-gas (recalled from memory)" },
            // Upper bounds (SI: per joule; oil per gallon) only stop nonsense such as 1e308 that would make a cost infinite: a
            // million currency units per kWh is above any market in any currency, and 10 kg CO2 per kWh above any fuel or grid
            // (coal-fired electricity is about 1 kg/kWh; recalled from memory). A gallon of oil holds about 40 kWh.
            Money("price_electricity", [("per_kwh", (v, _) => v / FuelUnits.JoulesPerKilowattHour)], "Electricity price.", 1e6 / FuelUnits.JoulesPerKilowattHour),
            Money("price_gas", [("per_therm", (v, _) => v / FuelUnits.JoulesPerTherm), ("per_kwh", (v, _) => v / FuelUnits.JoulesPerKilowattHour)], "Gas price.", 1e6 / FuelUnits.JoulesPerKilowattHour),
            Money("price_oil", [("per_gal", (v, _) => v), ("per_l", (v, _) => v * FuelUnits.LitresPerGallon)], "Oil price.", 4e7),
            Money("carbon_electricity", [("kg_per_kwh", (v, _) => v / FuelUnits.JoulesPerKilowattHour)], "Carbon factor of electricity.", 10 / FuelUnits.JoulesPerKilowattHour),
            Money("carbon_gas", [("kg_per_therm", (v, _) => v / FuelUnits.JoulesPerTherm), ("kg_per_kwh", (v, _) => v / FuelUnits.JoulesPerKilowattHour)], "Carbon factor of gas.", 10 / FuelUnits.JoulesPerKilowattHour),
            Money("carbon_oil", [("kg_per_gal", (v, _) => v), ("kg_per_l", (v, _) => v * FuelUnits.LitresPerGallon)], "Carbon factor of oil.", 400),
            new KeyDefinition("oil_heat_content", ValueKind.Number,
            [
                new("oil_heat_content_btu_gal", "Btu/gal", (v, _) => v * Conversions.JoulesPerBtu),
                new("oil_heat_content_kwh_l", "kWh/L", (v, _) => v * FuelUnits.JoulesPerKilowattHour * FuelUnits.LitresPerGallon),
            ], "Heat content of the oil.") { Min = 50e6, Max = 250e6, DefaultText = "138,500 Btu/gal (recalled from memory)" },
        ], true, "Heating and cooling plant, fans, prices and carbon factors."),

        new("report", false,
        [
            new KeyDefinition("detail_variants", ValueKind.TextList, Unitless("detail_variants"),
                "Variants the report shows in detail: their charts (load by bin, economizer, monthly, method check) and their rows of the economizer and method-check tables. The headline, peaks and comparisons, and every table file, hold every variant.")
            { DefaultText = "every variant" },
        ], false, "What the report shows."),

        new("variant", true,
        [
            Text("name", "Name of the variant (a column of every table)."),
        ], false, "One variant: a name and overrides of any key, e.g. ventilation.airflow_cfm = 2600."),
    ];

    private const string FlowBasisHelp =
        "How volume flow turns into mass of dry air: site (dry air at 70 F and the site pressure), standard (0.075 lb/ft3) or actual (the air's own state each hour).";

    private static KeyDefinition Text(string name, string description, string? defaultText = null) =>
        new(name, ValueKind.Text, Unitless(name), description) { DefaultText = defaultText };

    private static KeyDefinition Bool(string name, string description, string defaultText) =>
        new(name, ValueKind.Bool, Unitless(name), description) { DefaultText = defaultText };

    private static KeyDefinition Choice(string name, string[] choices, string defaultText, string description) =>
        new(name, ValueKind.Choice, Unitless(name), description) { Choices = choices, DefaultText = defaultText };

    private static KeyDefinition Money(string name, (string Suffix, Func<double, UnitSystem, double> ToSi)[] units, string description, double maxSi) =>
        new(name, ValueKind.Number, units.Select(u => new KeyAlternative(name + "_" + u.Suffix, u.Suffix.Replace('_', ' '), u.ToSi)).ToArray(), description)
        { Min = 0, Max = maxSi, DefaultText = "0" };

    private static KeyAlternative[] Unitless(string name) => [new(name, string.Empty, (v, _) => v)];

    private static KeyAlternative[] Temperature(string b) =>
    [
        new(b + "_f", "F", (v, _) => Conversions.FahrenheitToCelsius(v)),
        new(b + "_c", "C", (v, _) => v),
    ];

    private static KeyAlternative[] TemperatureDifference(string b) =>
    [
        new(b + "_f", "F", (v, _) => v / 1.8),
        new(b + "_c", "C", (v, _) => v),
    ];

    private static KeyAlternative[] Flow(string b) =>
    [
        new(b + "_cfm", "cfm", (v, _) => v * Conversions.CubicMetresPerSecondPerCfm),
        new(b + "_ls", "L/s", (v, _) => v / 1000.0),
        new(b + "_m3h", "m3/h", (v, _) => v / 3600.0),
    ];

    private static KeyAlternative[] PerArea(string b) =>
    [
        new(b + "_cfm", "cfm/ft2", (v, _) => v * Conversions.CubicMetresPerSecondPerCfm / (Conversions.MetresPerFoot * Conversions.MetresPerFoot)),
        new(b + "_ls", "L/s per m2", (v, _) => v / 1000.0),
    ];

    private static KeyAlternative[] Length(string b) =>
    [
        new(b + "_ft", "ft", (v, _) => v * Conversions.MetresPerFoot),
        new(b + "_m", "m", (v, _) => v),
    ];

    private static KeyAlternative[] Area(string b) =>
    [
        new(b + "_ft2", "ft2", (v, _) => v * Conversions.MetresPerFoot * Conversions.MetresPerFoot),
        new(b + "_m2", "m2", (v, _) => v),
    ];

    private static KeyAlternative[] PowerAlternatives(string b) =>
    [
        new(b + "_btuh", "Btu/h", (v, _) => Units.Power.FromBtuPerHour(v).Watts),
        new(b + "_kw", "kW", (v, _) => v * 1000.0),
    ];

    private static KeyAlternative[] FanPowerPerFlow(string b) =>
    [
        new(b + "_w_per_cfm", "W/cfm", (v, _) => v / Conversions.CubicMetresPerSecondPerCfm),
        new(b + "_w_per_ls", "W per L/s", (v, _) => v * 1000.0),
    ];

    private static KeyAlternative[] PressureDrop(string b) =>
    [
        new(b + "_inwc", "in. w.g.", (v, _) => v * Conversions.PascalsPerInchOfWater),
        new(b + "_pa", "Pa", (v, _) => v),
    ];

    private static KeyAlternative[] Enthalpy(string b) =>
    [
        new(b + "_btu_lb", "Btu/lb", (v, _) => SpecificEnthalpy.FromBtuPerPound(v).JoulesPerKilogram),
        new(b + "_kj_kg", "kJ/kg", (v, _) => v * 1000.0),
    ];

    /// <summary>
    /// A rating that is one number or [temperature, value] pairs: the plain key reads the
    /// temperatures in the study's display unit; <c>_f</c> and <c>_c</c> say the unit.
    /// </summary>
    private static KeyAlternative[] Rating(string b, Func<double, UnitSystem, double> toCop) =>
    [
        new(b, string.Empty, toCop, (t, u) => u == UnitSystem.IP ? Conversions.FahrenheitToCelsius(t) : t),
        new(b + "_f", "F", toCop, (t, _) => Conversions.FahrenheitToCelsius(t)),
        new(b + "_c", "C", toCop, (t, _) => t),
    ];
}
