using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Climate;

/// <summary>
/// The temperatures degree-days are counted from, each with the days it stands for. Degree-days
/// at a base b are heating = sum of days x max(0, b - T) and cooling = sum of days x max(0, T - b),
/// in kelvin-days (x 1.8 for F-days). By <see cref="DegreeDayMethod.DailyMean"/> (the default)
/// T is the mean of each calendar day's hours and counts one day; by
/// <see cref="DegreeDayMethod.MaxMin"/> T is (max + min) / 2 of the day; by
/// <see cref="DegreeDayMethod.Hourly"/> every hour counts 1/24 day (degree-hours / 24).
/// ASHRAE Handbook—Fundamentals (2017), ch. 14 ("Degree-days and climatic normals") counts
/// heating and cooling degree-days from daily mean temperatures; the weather services take the
/// daily mean as (max + min) / 2 (recalled from memory). A day the record holds only part of
/// (a record's first or last day, or hours left out of a long gap) counts its share of 24 hours.
/// </summary>
public sealed class DegreeDaySeries
{
    private DegreeDaySeries(DegreeDayMethod method, double[] temperaturesC, double[] days)
    {
        Method = method;
        TemperaturesC = temperaturesC;
        Days = days;
    }

    /// <summary>How the temperatures were taken.</summary>
    public DegreeDayMethod Method { get; }

    /// <summary>One temperature per day (or per hour for <see cref="DegreeDayMethod.Hourly"/>), C.</summary>
    public double[] TemperaturesC { get; }

    /// <summary>The days each temperature stands for (1 for a whole day, 1/24 for an hour).</summary>
    public double[] Days { get; }

    /// <summary>The series of a weather record.</summary>
    public static DegreeDaySeries Of(HourlyWeather weather, DegreeDayMethod method)
    {
        ArgumentNullException.ThrowIfNull(weather);
        return Of(weather.Times, weather.DryBulbC, method);
    }

    /// <summary>The series of hourly dry-bulbs (C) at hour-beginning times in local standard time, in time order.</summary>
    public static DegreeDaySeries Of(IReadOnlyList<DateTime> times, IReadOnlyList<double> dryBulbC, DegreeDayMethod method)
    {
        ArgumentNullException.ThrowIfNull(times);
        ArgumentNullException.ThrowIfNull(dryBulbC);
        if (times.Count != dryBulbC.Count)
        {
            throw new ArgumentException("times and dry-bulbs must be of equal length");
        }

        if (method == DegreeDayMethod.Hourly)
        {
            return new DegreeDaySeries(method, dryBulbC.ToArray(), Enumerable.Repeat(1.0 / 24.0, dryBulbC.Count).ToArray());
        }

        var temperatures = new List<double>(dryBulbC.Count / 24 + 1);
        var days = new List<double>(dryBulbC.Count / 24 + 1);
        int start = 0;
        for (int i = 1; i <= times.Count; i++)
        {
            if (i == times.Count || times[i].Date != times[start].Date)
            {
                temperatures.Add(DayTemperature(dryBulbC, start, i, method));
                days.Add((i - start) / 24.0);
                start = i;
            }
        }

        return new DegreeDaySeries(method, [.. temperatures], [.. days]);
    }

    /// <summary>Heating degree-days at <paramref name="baseC"/>, K-day.</summary>
    public double Heating(double baseC)
    {
        double sum = 0;
        for (int i = 0; i < TemperaturesC.Length; i++)
        {
            sum += Days[i] * Math.Max(0.0, baseC - TemperaturesC[i]);
        }

        return sum;
    }

    /// <summary>Cooling degree-days at <paramref name="baseC"/>, K-day.</summary>
    public double Cooling(double baseC)
    {
        double sum = 0;
        for (int i = 0; i < TemperaturesC.Length; i++)
        {
            sum += Days[i] * Math.Max(0.0, TemperaturesC[i] - baseC);
        }

        return sum;
    }

    private static double DayTemperature(IReadOnlyList<double> t, int start, int end, DegreeDayMethod method)
    {
        double sum = 0, min = double.PositiveInfinity, max = double.NegativeInfinity;
        for (int i = start; i < end; i++)
        {
            sum += t[i];
            min = Math.Min(min, t[i]);
            max = Math.Max(max, t[i]);
        }

        return method == DegreeDayMethod.MaxMin ? (max + min) / 2 : sum / (end - start);
    }
}
