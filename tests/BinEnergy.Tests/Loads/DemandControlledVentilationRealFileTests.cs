using BinEnergy.Core.Binning;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Loads;

/// <summary>
/// Demand-controlled ventilation on the real check files: a people-only zone whose airflow
/// follows an office-like occupancy profile, against degree-hours weighted by the same profile
/// from the raw columns, and the bin method against the hourly sum.
/// </summary>
public class DemandControlledVentilationRealFileTests(ITestOutputHelper output)
{
    /// <summary>Invented office profile: empty at night, full in working hours, half at lunch, a quarter in the evening.</summary>
    private static readonly double[] Office =
        [0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 0.5, 0.5, 1, 1, 1, 1, 0.25, 0.25, 0.25, 0.25, 0, 0];

    /// <summary>100 people x 10 cfm, no area part: the airflow multiplier of each hour is its occupancy fraction.</summary>
    private static OutdoorAirSettings PeopleOnly(BinEvaluationPoint point)
    {
        var rate = VentilationRate.FromIp(100, 10, 0, 0);
        return OutdoorAirTestSettings.Typical() with
        {
            Airflow = null,
            Ventilation = rate,
            AirflowMultipliers = rate.DemandControlledMultipliers(Office),
            BinPoint = point,
        };
    }

    [Fact]
    public void PeopleOnlyProfile_MultipliesEachHourByItsOccupancy_AgainstRawDegreeHours()
    {
        var raw = RawSiteColumns.Read("725300TYA.CSV.gz", "tmy3");
        var weather = RealSiteLoadTests.Read("725300TYA.CSV.gz", "tmy3");
        var result = OutdoorAirCalculator.Compute(weather, PeopleOnly(BinEvaluationPoint.MeanDryBulb), DryBulbBinScale.Default(UnitSystem.IP));

        // Independent: the TMY3 rows are hour-ending from 01:00 on 1 January, so row i is the hour beginning at i mod 24.
        // Dry air at 70 F at the standard-atmosphere pressure of the header elevation (Handbook ch. 1 eq. 3), 1,000 cfm.
        double p = 101_325 * Math.Pow(1 - 2.25577e-5 * raw.ElevationM, 5.2559);
        double massFlow = p / (287.042 * 294.261) * 1000 * 0.3048 * 0.3048 * 0.3048 / 60;
        double th = (70 - 32) / 1.8;
        double weighted = 0, plain = 0;
        for (int i = 0; i < raw.DryBulbC.Length; i++)
        {
            double dh = (1006 + 1860 * raw.HumidityRatio[i]) * Math.Max(0, th - raw.DryBulbC[i]);
            weighted += Office[i % 24] * dh;
            plain += dh;
        }

        double expected = weighted * massFlow * 3600;
        output.WriteLine($"Chicago, 1,000 cfm people-only with the office profile: heating {result.Annual.Hourly.Loads.Heating.Kbtu:0} kBtu hourly, " +
            $"{result.Annual.Bin.Loads.Heating.Kbtu:0} by bins, raw {expected / 1055055.85:0}; {weighted / plain * 100:0.0} % of the constant-airflow degree-hours");
        Assert.Equal(1.0, result.Annual.Hourly.Loads.Heating.Joules / expected, 0.003); // same tolerance as the constant-airflow check
        Assert.Equal(8760, result.Annual.Hourly.Loads.HoursVentilated);

        // The profile weights the colder night hours by zero: the heating share is clearly below the mean fraction (11/24).
        Assert.True(weighted / plain < Office.Average() - 0.02, $"night-weighted share {weighted / plain:0.000} should be clearly below the mean fraction");
    }

    [Theory]
    [MemberData(nameof(RealSiteLoadTests.Sites), MemberType = typeof(RealSiteLoadTests))]
    public void BinMethodWithProfile_AgreesWithTheHourlySum(string file, string map, string place)
    {
        var weather = RealSiteLoadTests.Read(file, map);
        var result = OutdoorAirCalculator.Compute(weather, PeopleOnly(BinEvaluationPoint.MeanDryBulb), DryBulbBinScale.Default(UnitSystem.IP));
        double heating = result.DifferencePercent(IntegrationMethod.Bin, LoadFigure.Heating)!.Value;
        output.WriteLine($"{place}: bin vs hourly heating with the office profile {heating:+0.00;-0.00} %");

        // Each bin uses its hours' mean multiplier at its mean dry-bulb: the error is the within-bin covariance of
        // multiplier and temperature (the occupied hours are the warmer ones of a bin), small against the total.
        Assert.InRange(heating, -1.0, 1.0);
    }
}
