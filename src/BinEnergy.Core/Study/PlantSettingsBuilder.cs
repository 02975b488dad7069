using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Study;

/// <summary>Builds <see cref="PlantSettings"/> from a variant's [plant] table, with study-file errors for missing or contradictory keys.</summary>
internal static class PlantSettingsBuilder
{
    /// <summary>Default total fan efficiency when the study gives none (common practice for a small supply fan and motor).</summary>
    public const double DefaultFanEfficiency = 0.6;

    /// <summary>Default efficiency of a gas-fired steam humidifier (recalled from memory: about that of a non-condensing gas boiler).</summary>
    public const double DefaultGasSteamEfficiency = 0.8;

    /// <summary>Default COP lost while a heat pump defrosts, % (recalled from memory).</summary>
    public const double DefaultDefrostPenaltyPct = 10.0;

    /// <summary>Builds the plant of a variant.</summary>
    /// <param name="plant">The [plant] table.</param>
    /// <param name="assumptions">Where defaults taken are listed.</param>
    /// <param name="designAirflow">The design airflow a capacity per unit of airflow multiplies, m3/s, and where it comes from (for messages).</param>
    public static PlantSettings Build(StudySection plant, List<string> assumptions, (double CubicMetresPerSecond, string Source) designAirflow)
    {
        string fuel = plant.Text("heating_fuel") ?? "gas";
        var heating = fuel switch
        {
            "oil" => HeatingSource.Oil,
            "electric" => HeatingSource.Electric,
            "heat-pump" => HeatingSource.HeatPump,
            _ => HeatingSource.Gas,
        };
        if (!plant.Has("heating_fuel"))
        {
            assumptions.Add("heating by gas (plant.heating_fuel not given)");
        }

        double efficiency = plant.Number("heating_efficiency") ?? heating switch
        {
            HeatingSource.Electric or HeatingSource.HeatPump => 1.0,
            _ => throw new StudyFileException(plant.File, plant.Line, "plant.heating_efficiency",
                $"heating by {fuel} needs its seasonal efficiency, e.g. heating_efficiency = 0.85 (check the equipment's rating)"),
        };

        PerformanceCurve? heatPump = null;
        if (heating == HeatingSource.HeatPump)
        {
            heatPump = Curve(plant, "heating_cop") ?? throw new StudyFileException(plant.File, plant.Line, "plant.heating_cop",
                "a heat pump needs heating_cop: one number, or [outdoor temperature, COP] pairs such as [[17, 2.3], [47, 3.5]] with heating_cop_f");
        }
        else if (plant.Has("heating_cop"))
        {
            throw plant.ErrorAt("heating_cop", $"heating_cop applies to heating_fuel = \"heat-pump\" only, not \"{fuel}\"; remove it or change the fuel");
        }

        var cooling = Curve(plant, "cooling") ?? throw new StudyFileException(plant.File, plant.Line, "plant.cooling_cop",
            "[plant] needs the cooling efficiency: cooling_cop, cooling_eer or cooling_kw_per_ton (one number, or [outdoor temperature, value] pairs)");

        double fan = plant.Number("fan_efficiency") ?? DefaultFanEfficiency;
        if (!plant.Has("fan_efficiency"))
        {
            assumptions.Add($"fan efficiency {DefaultFanEfficiency} (plant.fan_efficiency not given; common practice)");
        }

        double oilJPerGallon = plant.Number("oil_heat_content") ?? FuelUnits.DefaultOilBtuPerGallon * Units.Conversions.JoulesPerBtu;
        var tariffs = new Dictionary<Fuel, FuelTariff>
        {
            [Fuel.Electricity] = new(plant.Number("price_electricity") ?? 0, plant.Number("carbon_electricity") ?? 0),
            [Fuel.Gas] = new(plant.Number("price_gas") ?? 0, plant.Number("carbon_gas") ?? 0),
            [Fuel.Oil] = new((plant.Number("price_oil") ?? 0) / oilJPerGallon, (plant.Number("carbon_oil") ?? 0) / oilJPerGallon),
        };
        var humidifier = plant.Text("humidifier") switch
        {
            "steam-gas" => HumidifierType.SteamGas,
            "adiabatic" => HumidifierType.Adiabatic,
            _ => HumidifierType.SteamElectric,
        };
        if (humidifier == HumidifierType.Adiabatic && plant.Has("humidifier_efficiency"))
        {
            throw plant.ErrorAt("humidifier_efficiency", "an adiabatic humidifier has no efficiency here (its load moves onto the heating source): remove humidifier_efficiency or choose a steam humidifier");
        }

        double humidifierEfficiency = plant.Number("humidifier_efficiency") ?? (humidifier == HumidifierType.SteamGas ? DefaultGasSteamEfficiency : 1.0);
        if (humidifier == HumidifierType.SteamGas && !plant.Has("humidifier_efficiency"))
        {
            assumptions.Add(FormattableString.Invariant($"gas steam humidifier efficiency {DefaultGasSteamEfficiency} (plant.humidifier_efficiency not given; recalled from memory)"));
        }

        string[] heatPumpKeys = ["heating_capacity", "heating_capacity_per_airflow", "heat_pump_lockout", "backup_fuel", "backup_efficiency", "defrost_below", "defrost_penalty_pct"];
        if (heating != HeatingSource.HeatPump && heatPumpKeys.FirstOrDefault(plant.Has) is string hpKey)
        {
            string written = plant.Get(hpKey)?.WrittenKey ?? hpKey;
            throw plant.ErrorAt(hpKey, $"{written} applies to heating_fuel = \"heat-pump\" only, not \"{fuel}\"; remove it or change the fuel");
        }

        var backup = plant.Text("backup_fuel") switch
        {
            "gas" => HeatingSource.Gas,
            "oil" => HeatingSource.Oil,
            _ => HeatingSource.Electric,
        };
        if (backup != HeatingSource.Electric && !plant.Has("backup_efficiency"))
        {
            throw new StudyFileException(plant.File, plant.Line, "plant.backup_efficiency", $"a {plant.Text("backup_fuel")} backup needs its efficiency: set backup_efficiency (e.g. 0.8)");
        }

        if (plant.Has("defrost_penalty_pct") && !plant.Has("defrost_below"))
        {
            throw plant.ErrorAt("defrost_penalty_pct", "a defrost penalty needs the temperature below which it applies: set defrost_below");
        }

        if (heating == HeatingSource.HeatPump && plant.Has("defrost_below") && !plant.Has("defrost_penalty_pct"))
        {
            assumptions.Add("heat-pump defrost penalty 10 % of the COP below defrost_below (recalled from memory; set defrost_penalty_pct)");
        }

        return new PlantSettings(heating, efficiency, heatPump, cooling, fan, humidifierEfficiency, tariffs)
        {
            Humidifier = humidifier,
            HeatPumpCapacity = Capacity(plant, assumptions, designAirflow),
            CoolingCopByWetBulb = WetBulbTable(plant, assumptions),
            HeatPumpLockout = plant.Number("heat_pump_lockout") is double lockout ? Units.Temperature.FromCelsius(lockout) : null,
            Backup = backup,
            BackupEfficiency = plant.Number("backup_efficiency") ?? 1.0,
            DefrostBelow = plant.Number("defrost_below") is double defrost ? Units.Temperature.FromCelsius(defrost) : null,
            DefrostPenalty = (plant.Number("defrost_penalty_pct") ?? DefaultDefrostPenaltyPct) / 100.0,
            OilJoulesPerGallon = oilJPerGallon,
        };
    }

    /// <summary>
    /// The optional cooling COP table against outdoor dry-bulb and coil-entering wet-bulb: its two
    /// axes and its COPs row by row, all three or none.
    /// </summary>
    private static CoolingCopTable? WetBulbTable(StudySection plant, List<string> assumptions)
    {
        string[] keys = ["cooling_cop_table_outdoor", "cooling_cop_table_wetbulb", "cooling_cop_table"];
        string[] spellings = ["cooling_cop_table_outdoor_f (or _c)", "cooling_cop_table_wetbulb_f (or _c)", "cooling_cop_table"];
        var given = keys.Where(plant.Has).ToList();
        if (given.Count == 0)
        {
            return null;
        }

        if (given.Count < keys.Length)
        {
            string missing = string.Join(" and ", keys.Select((k, i) => (k, i)).Where(p => !plant.Has(p.k)).Select(p => spellings[p.i]));
            throw plant.ErrorAt(given[0], $"the cooling COP table needs its outdoor temperatures, its wet-bulbs and its COPs: {missing} is missing");
        }

        try
        {
            var table = CoolingCopTable.Create(plant.NumberList(keys[0])!, plant.NumberList(keys[1])!, plant.NumberList(keys[2])!);
            assumptions.Add("the economizer's coil buys its compressor energy at the COP of the wet-bulb table, at the outdoor dry-bulb and the coil-entering (mixed) wet-bulb; the outdoor-air loads use cooling_cop at the outdoor temperature");
            return table;
        }
        catch (ArgumentException e)
        {
            string key = e.Message.Contains("outdoor temperatures", StringComparison.Ordinal) ? keys[0]
                : e.Message.Contains("wet-bulb temperatures", StringComparison.Ordinal) ? keys[1] : keys[2];
            throw plant.ErrorAt(key, e.Message);
        }
    }

    /// <summary>
    /// The heat pump's capacity curve, W: <c>heating_capacity</c> as written, or
    /// <c>heating_capacity_per_airflow</c> (W per m3/s) times the design airflow; not both.
    /// </summary>
    private static PerformanceCurve? Capacity(StudySection plant, List<string> assumptions, (double CubicMetresPerSecond, string Source) designAirflow)
    {
        const string perAirflow = "heating_capacity_per_airflow";
        if (!plant.Has(perAirflow))
        {
            return Curve(plant, "heating_capacity");
        }

        if (plant.Has("heating_capacity"))
        {
            throw plant.ErrorAt(perAirflow, $"give the heat pump's capacity once: either as heating_capacity (absolute) or per unit of airflow ({plant.Get(perAirflow)!.WrittenKey}), not both");
        }

        double v = designAirflow.CubicMetresPerSecond;
        if (!(v > 0))
        {
            throw plant.ErrorAt(perAirflow, $"a capacity per unit of airflow needs a design airflow above zero, but {designAirflow.Source} is zero: give heating_capacity (absolute) instead");
        }

        assumptions.Add(FormattableString.Invariant(
            $"heat-pump heating capacity per unit of airflow times {designAirflow.Source}, {v / Units.Conversions.CubicMetresPerSecondPerCfm:N0} cfm ({v * 1000:N0} L/s)"));
        return Curve(plant, perAirflow, v);
    }

    private static PerformanceCurve? Curve(StudySection plant, string name, double scale = 1.0)
    {
        var v = plant.Get(name);
        return v?.Value switch
        {
            null => null,
            double cop => PerformanceCurve.Constant(cop * scale),
            List<(double OutdoorC, double Value)> points => PerformanceCurve.Create(points.Select(p => (p.OutdoorC, p.Value * scale))),
            _ => throw new InvalidOperationException("unexpected curve value"),
        };
    }
}
