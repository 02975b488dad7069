using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Charts.Data;

namespace BinEnergy.Tests.Reporting;

/// <summary>
/// Chart inputs made from invented climates, in IP display units, as the study runner would
/// hand them over. The numbers only need a plausible shape; the tests check that the charts
/// draw exactly what they are given.
/// </summary>
internal static class ReportingSamples
{
    public const double BinWidthF = 5;

    public static BinChartData Bins(InventedClimate climate)
    {
        var rows = new List<BinHoursRow>();
        foreach (var group in HoursByBin(climate))
        {
            double occupied = group.Count(h => climate.Occupied[h]);
            double wetBulb = group.Average(h => Temperature.FromCelsius(MoistAir.WetBulb(climate.DryBulbC[h], climate.HumidityRatio[h], climate.PressurePa)).Fahrenheit);
            rows.Add(new BinHoursRow(group.Key * BinWidthF, (group.Key + 1) * BinWidthF, occupied, group.Count() - occupied, wetBulb));
        }

        return new BinChartData { Subject = climate.Name, TemperatureUnit = "F", Bins = rows };
    }

    /// <summary>Invented per-bin energies for a 1,000 cfm ventilation rate (shape only).</summary>
    public static LoadByBinData Loads(InventedClimate climate)
    {
        var rows = new List<LoadByBinRow>();
        foreach (var group in HoursByBin(climate))
        {
            double mid = (group.Key + 0.5) * BinWidthF;
            int occupied = group.Count(h => climate.Occupied[h]);
            double grains = group.Average(h => climate.HumidityRatio[h]) * 7000;
            double heating = occupied * 1.08 * 1000 * Math.Max(0, 70 - mid) / 1000;   // kBtu
            double sensible = occupied * 1.08 * 1000 * Math.Max(0, mid - 75) / 1000;
            double latent = occupied * 0.68 * 1000 * Math.Max(0, grains - 64) / 1000;
            rows.Add(new LoadByBinRow(group.Key * BinWidthF, (group.Key + 1) * BinWidthF, heating, sensible, latent));
        }

        return new LoadByBinData { Subject = climate.Name + ", 1,000 cfm", TemperatureUnit = "F", EnergyUnit = "kBtu", Bins = rows };
    }

    /// <summary>Invented split of occupied hours into economizer modes by bin.</summary>
    public static EconomizerModesData Modes(InventedClimate climate)
    {
        var rows = new List<EconomizerModesRow>();
        foreach (var group in HoursByBin(climate))
        {
            double mid = (group.Key + 0.5) * BinWidthF;
            double occupied = group.Count(h => climate.Occupied[h]);
            double none = mid < 50 ? occupied : mid < 60 ? occupied * 0.4 : 0;
            double free = mid < 50 ? 0 : mid < 60 ? occupied - none : mid < 65 ? occupied * 0.5 : 0;
            double integrated = mid >= 60 && mid < 65 ? occupied - free : 0;
            double minimum = occupied - none - free - integrated;
            rows.Add(new EconomizerModesRow(group.Key * BinWidthF, (group.Key + 1) * BinWidthF, none, free, integrated, minimum));
        }

        return new EconomizerModesData { Subject = climate.Name, ControlName = "fixed dry-bulb 65 F", TemperatureUnit = "F", Bins = rows };
    }

    public static SavingsByControlData Savings(string subject) => new()
    {
        Subject = subject,
        Quantity = "Cooling coil energy saved",
        EnergyUnit = "kBtu",
        CostUnit = "USD",
        Controls =
        [
            new ControlSavingsRow("Fixed dry-bulb", 41_250, 1_210),
            new ControlSavingsRow("Differential dry-bulb", 44_900, 1_318),
            new ControlSavingsRow("Fixed enthalpy", 47_300, 1_388),
            new ControlSavingsRow("Differential enthalpy", 49_800, 1_461),
            new ControlSavingsRow("Fixed dew point", 38_600, 1_133),
        ],
    };

    public static ComparisonData Comparison(int climates)
    {
        string[] variants = ["Minimum rate", "Minimum +30 %", "Dedicated unit with recovery", "Demand-controlled"];
        double[] factor = [1.0, 1.3, 0.45, 0.72];
        var cells = new List<ComparisonCell>();
        for (int c = 0; c < climates; c++)
        {
            for (int v = 0; v < variants.Length; v++)
            {
                double energy = Math.Round((180 + 35 * c) * factor[v], 1);   // MBtu
                cells.Add(new ComparisonCell(InventedClimate.Names[c], variants[v], energy, Math.Round(energy * 14.5)));
            }
        }

        return new ComparisonData { Subject = "Invented study", EnergyUnit = "MBtu", CostUnit = "USD", Cells = cells };
    }

    public static MonthlyEnergyData Monthly(InventedClimate climate)
    {
        var heating = new double[12];
        var cooling = new double[12];
        var latent = new double[12];
        for (int h = 0; h < climate.Hours; h++)
        {
            if (!climate.Occupied[h])
            {
                continue;
            }

            double f = Temperature.FromCelsius(climate.DryBulbC[h]).Fahrenheit;
            heating[climate.Month[h]] += 1.08 * Math.Max(0, 70 - f);
            cooling[climate.Month[h]] += 1.08 * Math.Max(0, f - 75);
            latent[climate.Month[h]] += 0.68 * Math.Max(0, climate.HumidityRatio[h] * 7000 - 64);
        }

        return new MonthlyEnergyData
        {
            Subject = climate.Name + ", 1,000 cfm",
            EnergyUnit = "kBtu",
            Series =
            [
                new MonthlyEnergySeries("Heating", heating, ChartPalette.Heating),
                new MonthlyEnergySeries("Sensible cooling", cooling, ChartPalette.SensibleCooling),
                new MonthlyEnergySeries("Latent cooling", latent, ChartPalette.LatentCooling),
            ],
        };
    }

    public static MethodCheckData MethodCheck(string subject) => new()
    {
        Subject = subject,
        EnergyUnit = "kBtu",
        Rows =
        [
            new MethodCheckRow("Heating", 183_100, 183_400, 184_300),
            new MethodCheckRow("Sensible cooling", 22_650, 22_500, 21_900),
            new MethodCheckRow("Latent cooling", 27_800, 27_100, 30_400),
        ],
    };

    public static PsychroChartData Psychro(InventedClimate climate) =>
        PsychroChartData.FromSi(climate.Name, climate.DryBulbC, climate.HumidityRatio, climate.PressurePa, UnitSystem.IP,
            new EconomizerRegionLimits("Economizer enabled (fixed dry-bulb 65 F)", Temperature.FromFahrenheit(65).Celsius));

    private static IEnumerable<IGrouping<int, int>> HoursByBin(InventedClimate climate) =>
        Enumerable.Range(0, climate.Hours)
            .GroupBy(h => (int)Math.Floor(Math.Round(Temperature.FromCelsius(climate.DryBulbC[h]).Fahrenheit, 6) / BinWidthF))
            .OrderBy(g => g.Key);
}
