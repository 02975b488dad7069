namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// The shape of a day's dry-bulb: the fraction of the daily range by which each hour lies
/// below the day's maximum, T(h) = Tmax - f(h) (Tmax - Tmin), from the table "Fraction of
/// Daily Temperature Range" in ASHRAE Handbook—Fundamentals, chapter 14 (Climatic Design
/// Information, 2009 and later editions), the profile the Handbook gives for building
/// hourly dry-bulbs of a design day from its maximum and daily range. The 24 values below
/// are recalled from memory. The minimum (f = 1) falls at 05:00 and the maximum (f = 0)
/// at 14:00 and 15:00; the mean of the 24 fractions is 0.536, so a day's hourly mean lies
/// a little below the midpoint of its maximum and minimum.
/// </summary>
public static class DiurnalProfile
{
    // Handbook hours 1..24 (hour 24 = midnight), recalled from memory.
    private static readonly double[] HandbookHours =
    [
        0.88, 0.92, 0.95, 0.98, 1.00, 0.98, 0.91, 0.74, 0.55, 0.38, 0.23, 0.13,
        0.05, 0.00, 0.00, 0.06, 0.14, 0.24, 0.39, 0.50, 0.59, 0.68, 0.75, 0.82,
    ];

    /// <summary>Clock hour (0..23) at which the profile reaches the day's minimum.</summary>
    public const int MinimumHour = 5;

    /// <summary>First clock hour (0..23) at which the profile reaches the day's maximum (it stays there at 15:00).</summary>
    public const int MaximumHour = 14;

    /// <summary>
    /// The fraction for the hourly value at clock time <paramref name="hour"/>:00 (0..23):
    /// Handbook hour <paramref name="hour"/>, with 00:00 taking hour 24. The Handbook's hours
    /// are solar time; the synthesizer uses them as local standard time.
    /// </summary>
    public static double FractionAt(int hour)
    {
        if (hour < 0 || hour > 23)
        {
            throw new ArgumentOutOfRangeException(nameof(hour), hour, "clock hour must be 0..23");
        }

        return HandbookHours[hour == 0 ? 23 : hour - 1];
    }
}
