using System.Text.Json;
using System.Text.Json.Nodes;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// The <c>summary.json</c> of a run: study name, file, hash and units, the engine version, and
/// per climate x variant the headline numbers (bin method, with the hourly check beside them),
/// the assumptions and the warnings, plus the cautions every output carries.
/// </summary>
public static class StudySummary
{
    /// <summary>The caution every output carries (DESIGN 13).</summary>
    public const string Caution =
        "Results are estimates for comparing options. Ventilation rates must meet the code adopted locally and the judgement of the responsible licensed engineer; reducing outdoor air below the required minimum harms occupants.";

    /// <summary>The summary as a JSON object.</summary>
    public static JsonObject Build(StudyRunResult run)
    {
        var u = StudyTables.Units(run);
        var cases = new JsonArray();
        foreach (var c in run.Cases)
        {
            JsonObject Headline(Core.Study.Results.LoadFigures f)
            {
                var total = f.Total;
                return new JsonObject
                {
                    ["hours_ventilated"] = (int)Math.Round(f.HoursVentilated),
                    [$"heating_{u.Energy}"] = u.E(f.HeatingJ),
                    [$"cooling_sensible_{u.Energy}"] = u.E(f.CoolingSensibleJ),
                    [$"cooling_latent_{u.Energy}"] = u.E(f.CoolingLatentJ),
                    [$"humidification_{u.Energy}"] = u.E(f.HumidificationJ),
                    [$"recovered_heating_{u.Energy}"] = u.E(f.RecoveredHeatingJ),
                    [$"recovered_cooling_{u.Energy}"] = u.E(f.RecoveredCoolingJ),
                    ["fan_kwh"] = DisplayUnits.Kwh(f.FanJ),
                    ["electricity_kwh"] = DisplayUnits.Kwh(total.ElectricityJ),
                    [$"gas_{u.Gas}"] = u.GasUnits(total.GasJ),
                    [$"oil_{u.Oil}"] = u.OilUnits(total.OilJ),
                    [u.Cost] = total.Cost,
                    ["carbon_kg"] = total.CarbonKg,
                };
            }

            var economizer = new JsonObject();
            foreach (var x in c.Economizer.Where(x => x.Method == "bin"))
            {
                economizer[x.Control] = new JsonObject
                {
                    [$"coil_total_{u.Energy}"] = u.E(x.CoilTotalJ),
                    [$"savings_{u.Energy}"] = u.E(x.SavingsJ),
                    ["savings_compressor_kwh"] = DisplayUnits.Kwh(x.CompressorSavings.ElectricityJ),
                    [$"savings_{u.Cost}"] = x.CompressorSavings.Cost,
                };
            }

            cases.Add(new JsonObject
            {
                ["climate"] = c.Case.Climate.Name,
                ["variant"] = c.Case.Variant.Name,
                ["weather"] = c.Case.Climate.WeatherPath,
                ["hours_in_record"] = c.Weather.Count,
                ["airflow_" + (u.Ip ? "cfm" : "ls")] = u.Ip ? c.Case.OutdoorAir.EffectiveAirflow.Cfm : c.Case.OutdoorAir.EffectiveAirflow.LitresPerSecond,
                ["bin"] = Headline(c.AnnualBin),
                ["hourly"] = Headline(c.AnnualHourly),
                ["economizer"] = economizer,
                ["assumptions"] = new JsonArray([.. c.Case.Assumptions.Select(a => (JsonNode)a!),
                    (JsonNode)$"flow basis {c.OutdoorAir.Assumptions.FlowBasis.ToString().ToLowerInvariant()}, dry-air density {c.OutdoorAir.Assumptions.DryAirDensity:0.0000} kg/m3"!,
                    (JsonNode)$"schedule: {c.OutdoorAir.Assumptions.Schedule}"!,
                    (JsonNode)$"calendar: {c.OutdoorAir.Assumptions.Calendar}"!,
                    (JsonNode)$"bin method: loads and COP at each bin's {(c.OutdoorAir.Assumptions.BinPoint == BinEvaluationPoint.Midpoint ? "midpoint" : "mean dry-bulb of its ventilated hours")} and mean coincident humidity ratio; hourly plant energy uses each hour's outdoor temperature for the COP"!,
                    (JsonNode)"humidification is met by an electric humidifier"!]),
                ["warnings"] = new JsonArray([.. c.Warnings.Select(w => (JsonNode)w!)]),
            });
        }

        return new JsonObject
        {
            ["study"] = run.Study.Name,
            ["study_file"] = run.Study.File,
            ["study_sha256"] = run.Study.Hash,
            ["engine_version"] = run.EngineVersion,
            ["units"] = u.Ip ? "ip" : "si",
            ["currency"] = run.Study.Currency,
            ["climates"] = new JsonArray([.. run.Study.Climates.Select(c => (JsonNode)c.Name!)]),
            ["variants"] = new JsonArray([.. run.Study.Variants.Select(v => (JsonNode)v.Name!)]),
            ["cases"] = cases,
            ["warnings"] = new JsonArray([.. run.Warnings.Select(w => (JsonNode)w!)]),
            ["caution"] = Caution,
        };
    }

    /// <summary>The summary as indented JSON text.</summary>
    public static string ToJson(StudyRunResult run) =>
        Build(run).ToJsonString(new JsonSerializerOptions { WriteIndented = true, NumberHandling = System.Text.Json.Serialization.JsonNumberHandling.AllowNamedFloatingPointLiterals });
}
