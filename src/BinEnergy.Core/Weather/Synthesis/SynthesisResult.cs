namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>What <see cref="WeatherSynthesizer"/> made and how closely it meets its input.</summary>
/// <param name="Weather">The hourly year.</param>
/// <param name="Seed">The seed it was made from.</param>
/// <param name="Months">Each month as asked for and as measured on <paramref name="Weather"/>.</param>
/// <param name="TemperaturePasses">Correction passes applied to the daily maxima and minima.</param>
/// <param name="DewPointPasses">Correction passes applied to the daily dew points.</param>
/// <param name="RangeFlooredDays">Days whose daily range was raised to <see cref="WeatherSynthesizer.MinDailyRangeK"/>
/// (a repair; zero for ordinary inputs).</param>
public sealed record SynthesisResult(
    HourlyWeather Weather,
    ulong Seed,
    IReadOnlyList<MonthCheck> Months,
    int TemperaturePasses,
    int DewPointPasses,
    int RangeFlooredDays)
{
    /// <summary>Largest monthly error of the mean daily maximum or minimum, K.</summary>
    public double WorstExtremeErrorK => Months.Max(m => Math.Max(Math.Abs(m.MaxC - m.TargetMaxC), Math.Abs(m.MinC - m.TargetMinC)));

    /// <summary>Largest monthly error of the mean daily range, K.</summary>
    public double WorstRangeErrorK => Months.Max(m => Math.Abs(m.RangeK - m.TargetRangeK));

    /// <summary>Largest monthly error of the mean dew point, K.</summary>
    public double WorstDewPointErrorK => Months.Max(m => Math.Abs(m.DewPointC - m.TargetDewPointC));
}
