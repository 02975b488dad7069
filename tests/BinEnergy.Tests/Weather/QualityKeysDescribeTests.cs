using BinEnergy.Core.Weather;

namespace BinEnergy.Tests.Weather;

/// <summary>
/// Repairs and checks are named in words where people read them (the run's warnings, the report's inputs), with the
/// key `binenergy inspect` lists after them; a key nobody described is still shown, as count and key.
/// </summary>
public sealed class QualityKeysDescribeTests
{
    [Theory]
    [InlineData(QualityKeys.RhClamped, 3, "3 RH values between 100 and 103 % set to 100 % (rh_clamped)")]
    [InlineData(QualityKeys.DewPointAboveDryBulbSuspect, 1, "1 dew point more than 1 K above the dry-bulb set to the dry-bulb (suspect values) (dewpoint_above_drybulb_suspect)")]
    [InlineData(QualityKeys.LongGapHoursDropped, 1200, "1,200 hours in gaps longer than the fill limit dropped (long_gap_hours_dropped)")]
    [InlineData("gap_filled_drybulb", 2, "2 dry-bulb hours filled by linear interpolation (gap_filled_drybulb)")]
    [InlineData("disagrees_rh", 29, "29 hours where the file's relative humidity disagrees with the humidity used (checked, not changed) (disagrees_rh)")]
    [InlineData("something_new", 4, "4 something_new")]
    public void Describe_NamesTheRepairInWords_WithItsKey(string key, int count, string expected) =>
        Assert.Equal(expected, QualityKeys.Describe(key, count));
}
