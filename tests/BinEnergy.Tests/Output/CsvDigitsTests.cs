using System.Globalization;
using System.Text.RegularExpressions;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;
using BinEnergy.Tests.Cli;

namespace BinEnergy.Tests.Output;

/// <summary>CSV tables keep the digits a quantity warrants (FileDigits), not the float noise of a sum; Parquet keeps every bit.</summary>
public partial class CsvDigitsTests
{
    private static readonly DisplayUnits Ip = new(UnitSystem.IP);
    private static readonly DisplayUnits Si = new(UnitSystem.SI);

    [Theory]
    [InlineData(-5.980000000000004, "-5.98")] // the noise the issue quoted: a dry-bulb kept to 0.001 F
    [InlineData(28.62416923076923, "28.624")]
    [InlineData(-0.0000001, "0")] // below 0.001 F is zero, and never "-0"
    [InlineData(double.NaN, "")]
    public void Temperature_KeepsAThousandthOfADegree(double value, string expected) =>
        Assert.Equal(expected, Ip.Temperature.FileDigits.Text(value));

    [Theory]
    [InlineData(171_505.43219, "171505")] // six significant digits (common practice for estimates); the integer part is never cut
    [InlineData(12_345_678.9, "12345679")]
    [InlineData(1.2345678, "1.235")] // at most 0.001 kBtu = 1 Btu
    [InlineData(1.4e-12, "0")] // a savings difference that is zero but for rounding
    public void Energy_KeepsSixSignificantDigitsAndOneBtu(double kbtu, string expected) =>
        Assert.Equal(expected, Ip.Energy.FileDigits.Text(kbtu));

    [Fact]
    public void HumidityAndCost_KeepTheirOwnSteps()
    {
        Assert.Equal("0.0179512", Ip.HumidityRatio.FileDigits.Text(0.017951234567)); // lb/lb to 1e-7
        Assert.Equal("125.659", Ip.Moisture.FileDigits.Text(125.65871234)); // gr/lb to 0.001
        Assert.Equal("8.9764", Si.Moisture.FileDigits.Text(8.976412)); // g/kg to 0.0001
        Assert.Equal("42.626", Ip.Enthalpy.FileDigits.Text(42.62551)); // Btu/lb to 0.001, half away from zero
        Assert.Equal("1234.57", Ip.Cost.FileDigits.Text(1234.5678)); // a cent
        Assert.Equal("14.6959", Ip.Pressure.FileDigits.Text(14.695948775513449)); // psia to 0.0001 (0.7 Pa)
    }

    [Fact]
    public void CsvTableWriter_RoundsEachColumnByItsUnit()
    {
        var table = new ColumnSet<int>()
            .Number("drybulb", Ip.Temperature, "Dry-bulb", _ => Conversions.FahrenheitToCelsius(-5.980000000000004))
            .Number("heating", Ip.Energy, "Heating", _ => Energy.FromKbtu(171_505.43219).Joules)
            .Number("ratio", DisplayUnit.Number, "Ratio", _ => 1.0 / 3.0)
            .Integer("hours", "Hours", _ => 8760)
            .Fill(new ResultTable("sample"), [0]);
        var writer = new StringWriter();
        CsvTableWriter.Write(table, writer);
        var lines = writer.ToString().Split('\n');
        Assert.Equal("drybulb_f,heating_kbtu,ratio,hours", lines[0]);
        Assert.Equal("-5.98,171505,0.333333,8760", lines[1]);
    }

    [Fact]
    public void BinsCsv_ShowsNoFloatNoise_AndTheSameGrainsAsTheTable()
    {
        var (code, csv, err) = AirCommandTests.Run("bins", BinsCommandTests.InventedFile(), "--csv");
        Assert.True(code == 0, err);
        var (code2, tsv, err2) = AirCommandTests.Run("bins", BinsCommandTests.InventedFile(), "--format", "tsv");
        Assert.True(code2 == 0, err2);
        var lines = csv.TrimEnd('\n').Split('\n');
        var header = lines[0].Split(',');
        int w = Array.IndexOf(header, "mean_humidity_ratio_gr_lb");
        Assert.True(w > 0, lines[0]);
        foreach (var field in lines.Skip(1).SelectMany(l => l.Split(',')))
        {
            Assert.DoesNotMatch(Noise(), field);
        }

        // The terminal's "Mean W, gr/lb" column and the CSV's gr/lb column are the same number, to the table's 0.1 gr/lb.
        var tsvLines = tsv.Split('\n');
        int headingAt = Array.FindIndex(tsvLines, l => l.StartsWith("Bin from, F\t", StringComparison.Ordinal));
        var headings = tsvLines[headingAt].Split('\t');
        int shownW = Array.IndexOf(headings, "Mean W, gr/lb");
        var firstShown = tsvLines[headingAt + 1].Split('\t');
        var firstCsv = lines[1].Split(',');
        Assert.Equal(double.Parse(firstCsv[0], CultureInfo.InvariantCulture), double.Parse(firstShown[0], CultureInfo.InvariantCulture));
        Assert.Equal(double.Parse(firstShown[shownW], CultureInfo.InvariantCulture), double.Parse(firstCsv[w], CultureInfo.InvariantCulture), 0.05);
    }

    /// <summary>A number with the tell-tale runs of a binary fraction: ten or more decimals, or 0000x / 9999x inside the decimals.</summary>
    [GeneratedRegex(@"\.\d{10,}|\.\d*0000\d|\.\d*9999\d")]
    internal static partial Regex Noise();
}
