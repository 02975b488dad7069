using BinEnergy.Core.Binning;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Binning;

public class BinTableTests
{
    [Fact]
    public void TenCelsius_LandsInTheFiftyToFiftyFiveFahrenheitBin()
    {
        // 10 C is exactly 50 F (definition of the scales); in floating point 10 x 1.8 + 32 is 49.99999999999999.
        var ip = DryBulbBinScale.Default(UnitSystem.IP);
        Assert.Equal(10, ip.IndexOf(10.0));
        Assert.Equal(50.0, ip.Low(10).Fahrenheit, 9);
        Assert.Equal(9, ip.IndexOf(9.999));
        Assert.Equal(-1, ip.IndexOf(Conversions.FahrenheitToCelsius(-0.01)));
        Assert.Equal(-1, ip.IndexOf(Conversions.FahrenheitToCelsius(-5.0)));
        Assert.Equal(-2, ip.IndexOf(Conversions.FahrenheitToCelsius(-5.0001)));

        // Every whole F from -40 to 120, stored in C and converted back (some come back just below, e.g. 2 F as 1.9999999999999964).
        var one = new DryBulbBinScale(1.0, UnitSystem.IP);
        for (int f = -40; f <= 120; f++)
        {
            Assert.Equal(f, one.IndexOf(Conversions.FahrenheitToCelsius(f)));
        }

        var si = DryBulbBinScale.Default(UnitSystem.SI);
        Assert.Equal(5, si.IndexOf(10.0));
        Assert.Equal(4, si.IndexOf(9.999999));
        Assert.Equal(5, si.IndexOf(9.9999996)); // within the 1e-6 rounding: counts as 10.0
        Assert.Equal(3, new DryBulbBinScale(0.1, UnitSystem.SI).IndexOf(0.3)); // 0.3 / 0.1 is 2.9999999999999996 in floating point
    }

    [Fact]
    public void Table_CountsHoursAndMeansOfAHandMadeRecord()
    {
        // Four hours: two in the 50-55 F bin (10 C = 50 F, 12 C = 53.6 F), one at 55 F exactly (12.7778 C), one at 40 F.
        double w1 = 0.006, w2 = 0.008;
        var weather = SyntheticWeather.FromColumns(
            [10.0, 12.0, Conversions.FahrenheitToCelsius(55.0), Conversions.FahrenheitToCelsius(40.0)], [w1, w2, 0.007, 0.004]);
        var table = BinTable.Build(weather, 5.0, UnitSystem.IP, [true, false, true, true]);

        Assert.Equal(8, table.FirstIndex);
        Assert.Equal(4, table.Rows.Count); // 40-45, 45-50 (empty), 50-55, 55-60
        Assert.Equal(0, table.Rows[1].All.Hours);
        Assert.True(double.IsNaN(table.Rows[1].All.MeanDryBulb.Celsius));
        var b50 = table.RowOf(10)!;
        Assert.Equal(2, b50.All.Hours);
        Assert.Equal(1, b50.Occupied.Hours);
        Assert.Equal(1, b50.Unoccupied.Hours);
        Assert.Equal(11.0, b50.All.MeanDryBulb.Celsius, 12);
        Assert.Equal((w1 + w2) / 2, b50.All.MeanHumidityRatio.KilogramsPerKilogram, 15);
        Assert.Equal((weather.WetBulbC[0] + weather.WetBulbC[1]) / 2, b50.All.MeanWetBulb.Celsius, 12);
        Assert.Equal(MoistAir.Enthalpy(10.0, w1), b50.Occupied.MeanEnthalpy.JoulesPerKilogram, 9);
        Assert.Equal(52.5, b50.Mid.Fahrenheit, 9);
        Assert.Equal(1, table.RowOf(11)!.All.Hours); // 55 F exactly is the lower edge of 55-60
    }

    [Theory]
    [InlineData(5.0, UnitSystem.IP)]
    [InlineData(2.0, UnitSystem.SI)]
    [InlineData(1.0, UnitSystem.IP)]
    [InlineData(3.0, UnitSystem.SI)]
    public void Invariants_HoursSumAndClassesAddUp(double width, UnitSystem units)
    {
        var weather = SyntheticWeather.Year();
        var flags = OccupancySchedule.Parse("Mon-Fri 07:00-19:00; Sat 08:00-13:00").Flags(weather);
        var table = BinTable.Build(weather, width, units, flags);

        Assert.Equal(weather.Count, table.Rows.Sum(r => r.All.Hours));
        Assert.Equal(flags.Count(f => f), table.Rows.Sum(r => r.Occupied.Hours));
        Assert.All(table.Rows, r => Assert.Equal(r.All.Hours, r.Occupied.Hours + r.Unoccupied.Hours));
        Assert.All(table.Rows, r => Assert.True(r.All.IsEmpty
            || (r.All.MeanDryBulb >= r.Low && r.All.MeanDryBulb < r.High)));
        Assert.Equal(weather.DryBulbC.Average(), table.Rows.Where(r => !r.All.IsEmpty).Sum(r => r.All.Hours * r.All.MeanDryBulb.Celsius) / weather.Count, 9);

        var months = table.Split(BinSplit.Month);
        Assert.Equal(12, months.Count);
        Assert.Equal(744, months[0].Table.Hours); // 31 days x 24 h in January (calendar fact)
        Assert.Equal("Feb", months[1].Label);
        for (int b = 0; b < table.Rows.Count; b++)
        {
            Assert.Equal(table.Rows[b].All.Hours, months.Sum(m => m.Table.Rows[b].All.Hours));
            Assert.Equal(table.Rows[b].Occupied.Hours, months.Sum(m => m.Table.Rows[b].Occupied.Hours));
        }

        var blocks = table.Split(BinSplit.TimeOfDayBlock);
        Assert.Equal(["00-08", "08-16", "16-24"], blocks.Select(g => g.Label));
        Assert.All(blocks, g => Assert.Equal(weather.Count / 3, g.Table.Hours));
    }

    [Fact]
    public void JointBins_SumToTheDryBulbBins()
    {
        var weather = SyntheticWeather.Year();
        var table = BinTable.Build(weather, 5.0, UnitSystem.IP);
        var joint = table.Joint(10.0);

        Assert.Equal(weather.Count, joint.Hours);
        foreach (var row in table.Rows)
        {
            var cells = joint.Cells.Where(c => c.DryBulbIndex == row.Index).ToList();
            Assert.Equal(row.All.Hours, cells.Sum(c => c.All.Hours));
            if (!row.All.IsEmpty)
            {
                Assert.Equal(row.All.MeanHumidityRatio.KilogramsPerKilogram,
                    cells.Sum(c => c.All.Hours * c.All.MeanHumidityRatio.KilogramsPerKilogram) / row.All.Hours, 12);
            }
        }

        Assert.All(joint.Cells, c => Assert.InRange(c.All.MeanHumidityRatio.KilogramsPerKilogram,
            c.HumidityLow.KilogramsPerKilogram - 1e-9, c.HumidityHigh.KilogramsPerKilogram));
    }

    [Fact]
    public void EmptyRecord_GivesAnEmptyTable()
    {
        var table = BinTable.Build(SyntheticWeather.FromColumns([], []), 5.0, UnitSystem.IP);
        Assert.Empty(table.Rows);
        Assert.Equal(0, table.Hours);
    }
}
