using BinEnergy.Core.Weather.Synthesis;

namespace BinEnergy.Tests.Synthesis;

/// <summary>The fraction-of-daily-range profile (ASHRAE Handbook—Fundamentals ch. 14; values recalled from memory).</summary>
public class DiurnalProfileTests
{
    [Fact]
    public void Profile_HasItsMinimumAtDawnAndItsMaximumMidAfternoon()
    {
        var f = Enumerable.Range(0, 24).Select(DiurnalProfile.FractionAt).ToArray();
        Assert.All(f, v => Assert.InRange(v, 0.0, 1.0));
        Assert.Equal(1.0, f[5]); // coldest at 05:00 (Handbook profile, recalled from memory)
        Assert.Equal(0.0, f[14]); // warmest at 14:00 and 15:00 (same)
        Assert.Equal(0.0, f[15]);
        Assert.Equal(0.82, f[0]); // Handbook hour 24 (midnight), recalled from memory
        for (int h = 6; h <= 14; h++)
        {
            Assert.True(f[h] < f[h - 1], $"rising from 05:00 to 14:00 ({h})");
        }

        for (int h = 16; h <= 28; h++)
        {
            Assert.True(f[h % 24] > f[(h - 1) % 24], $"falling from 15:00 to 05:00 ({h % 24})");
        }

        // The hourly mean lies below the midpoint of max and min: mean fraction 0.536 (sum 12.87 of the table).
        Assert.Equal(0.536, f.Average(), 0.001);
    }

    [Fact]
    public void HourOutsideTheDay_IsRejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => DiurnalProfile.FractionAt(24));
    }
}
