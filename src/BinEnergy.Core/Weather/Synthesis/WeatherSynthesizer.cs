using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// Builds an hourly weather year from monthly statistics (DESIGN 5.5; the method and its
/// choices are set out in docs/synthesis.md). Seeded and deterministic: the same climate,
/// seed and year give the same hours on every machine (<see cref="SeededGenerator"/>; no
/// clock or other hidden state).
/// <list type="number">
/// <item>Seasonal courses: the midpoint of the mean daily maximum and minimum, the mean daily
/// range and the mean dew point each follow a smooth periodic curve whose monthly means are
/// the inputs (<see cref="MonthlyMeanCurve.MeanPreserving"/>).</item>
/// <item>Daily weather: the daily mean departs from its course by a first-order autoregressive
/// process, AR(1), x(d) = phi x(d-1) + sqrt(1 - phi^2) e(d), with unit variance, scaled by the
/// month's day-to-day spread; the daily range is the course times a log-normal factor with its
/// own AR(1); the daily dew point departs from its course by a process correlated with the
/// dry-bulb's.</item>
/// <item>Hours: dry-bulb by the Handbook's fraction-of-daily-range profile
/// (<see cref="DiurnalProfile"/>), falling from each day's maximum to the next day's minimum so
/// that the hours join smoothly across midnight; dew point interpolated in a straight line
/// between daily values at noon, then bounded by the hour's dry-bulb with a smooth limit,
/// Td = T - s ln(1 + exp((T - Td0) / s)) with s = <see cref="SaturationSoftnessK"/>, which is
/// never above T.</item>
/// <item>Correction toward the targets: the sample is measured as a user would (daily maxima and
/// minima of the hourly values, the mean of the hourly dew points) and each month's error is
/// removed with a smooth correction curve of the same kind, repeated until every monthly error
/// is below <see cref="ToleranceK"/> (a handful of passes); the passes are counted in the result.</item>
/// <item>Pressure: the standard atmosphere at the site elevation (Handbook ch. 1, eq. 3), every hour.</item>
/// </list>
/// </summary>
public static class WeatherSynthesizer
{
    /// <summary>Lag-one autocorrelation of the daily mean dry-bulb's departures, 0.7 (a typical
    /// mid-latitude value, recalled from memory as 0.6 to 0.8).</summary>
    public const double DailyMeanPersistence = 0.7;

    /// <summary>Lag-one autocorrelation of the dew point's own departures, 0.6 (chosen, not fitted).</summary>
    public const double DewPointPersistence = 0.6;

    /// <summary>Correlation of the daily dew point's departure with the dry-bulb's, 0.6 (chosen: warm
    /// spells are usually humid ones).</summary>
    public const double DewPointDryBulbCorrelation = 0.6;

    /// <summary>Standard deviation of the logarithm of the daily range factor, 0.25 (chosen: about a
    /// quarter of the mean range from day to day).</summary>
    public const double DailyRangeVariation = 0.25;

    /// <summary>Lag-one autocorrelation of the daily range factor, 0.4 (chosen: cloudy spells last).</summary>
    public const double DailyRangePersistence = 0.4;

    /// <summary>Width of the smooth limit of dew point below dry-bulb, 0.5 K: at the limit the hour is
    /// near 97 % RH rather than exactly saturated.</summary>
    public const double SaturationSoftnessK = 0.5;

    /// <summary>Smallest daily range, 0.5 K; a day drawn below it is raised to it and counted.</summary>
    public const double MinDailyRangeK = 0.5;

    /// <summary>Monthly error at which correction stops, 0.005 K.</summary>
    public const double ToleranceK = 0.005;

    /// <summary>Most correction passes before giving up (the result then reports the error left).</summary>
    public const int MaxPasses = 200;

    /// <summary>
    /// Synthesizes one non-leap calendar year of hours, hour-beginning local standard time.
    /// </summary>
    /// <param name="climate">The monthly statistics (as read by <see cref="MonthlyClimateReader"/>).</param>
    /// <param name="seed">Seed of the random sequence.</param>
    /// <param name="year">Calendar year of the dates and weekdays; must not be a leap year.</param>
    /// <exception cref="ArgumentException">The year is a leap year or outside 1900..2100, or the climate has not twelve months.</exception>
    public static SynthesisResult Synthesize(MonthlyClimate climate, ulong seed, int year = CalendarInfo.DefaultTypicalYear)
    {
        if (year < 1900 || year > 2100 || DateTime.IsLeapYear(year))
        {
            throw new ArgumentException($"year {year} must be a non-leap year from 1900 to 2100", nameof(year));
        }

        if (climate.Months.Count != 12 || climate.Months.Select((m, i) => m.Month == i + 1).Any(ok => !ok))
        {
            throw new ArgumentException("the climate must give months 1 to 12 in order", nameof(climate));
        }

        const int days = MonthlyMeanCurve.DaysInYear;
        var months = climate.Months;
        var rng = new SeededGenerator(seed);
        double[] temperatureNoise = Autoregressive(rng, days, DailyMeanPersistence);
        double[] dewPointOwnNoise = Autoregressive(rng, days, DewPointPersistence);
        double[] rangeNoise = Autoregressive(rng, days, DailyRangePersistence);

        // Seasonal courses and daily departures.
        double[] midCourse = MonthlyMeanCurve.MeanPreserving(months.Select(m => m.DailyMidpointC).ToArray());
        double[] rangeCourse = MonthlyMeanCurve.MeanPreserving(months.Select(m => m.DailyRangeK).ToArray());
        double[] dewCourse = MonthlyMeanCurve.MeanPreserving(months.Select(m => m.DewPointC).ToArray());
        double[] spread = MonthlyMeanCurve.Linear(months.Select(m => m.DailyMeanSpreadK).ToArray());
        double inflation = SpreadInflation(DailyMeanPersistence, 30);
        double rho = DewPointDryBulbCorrelation;
        var mid = new double[days];
        var range = new double[days];
        var dewDaily = new double[days];
        for (int d = 0; d < days; d++)
        {
            double s = spread[d] * inflation;
            mid[d] = midCourse[d] + s * temperatureNoise[d];
            double v = DailyRangeVariation;
            range[d] = rangeCourse[d] * Math.Exp(v * rangeNoise[d] - 0.5 * v * v);
            double u = rho * temperatureNoise[d] + Math.Sqrt(1 - rho * rho) * dewPointOwnNoise[d];
            dewDaily[d] = dewCourse[d] + s * u;
        }

        // Dry-bulb: correct the daily midpoints and ranges until the hourly output's monthly
        // mean daily maximum and minimum meet the targets.
        var targetMid = months.Select(m => m.DailyMidpointC).ToArray();
        var targetRange = months.Select(m => m.DailyRangeK).ToArray();
        var dryBulb = new double[days * 24];
        int temperaturePasses = 0;
        var floored = new bool[days];
        while (true)
        {
            for (int d = 0; d < days; d++)
            {
                if (range[d] < MinDailyRangeK)
                {
                    range[d] = MinDailyRangeK;
                    floored[d] = true;
                }
            }

            HourlyDryBulb(mid, range, dryBulb);
            var (dailyMax, dailyMin) = DailyExtremes(dryBulb);
            var maxMeans = MonthlyMeanCurve.MonthlyMeans(dailyMax);
            var minMeans = MonthlyMeanCurve.MonthlyMeans(dailyMin);
            var midError = new double[12];
            var rangeError = new double[12];
            for (int m = 0; m < 12; m++)
            {
                midError[m] = targetMid[m] - 0.5 * (maxMeans[m] + minMeans[m]);
                rangeError[m] = targetRange[m] - (maxMeans[m] - minMeans[m]);
            }

            bool done = midError.Concat(rangeError).All(e => Math.Abs(e) < ToleranceK);
            if (done || temperaturePasses == MaxPasses)
            {
                break;
            }

            Add(mid, MonthlyMeanCurve.MeanPreserving(midError));
            Add(range, MonthlyMeanCurve.MeanPreserving(rangeError));
            temperaturePasses++;
        }

        // Dew point: bound by the hour's dry-bulb, then correct the daily values until the
        // monthly mean of the hourly dew points meets the target.
        var targetDew = months.Select(m => m.DewPointC).ToArray();
        var dewPoint = new double[days * 24];
        int dewPointPasses = 0;
        while (true)
        {
            HourlyDewPoint(dewDaily, dryBulb, dewPoint);
            var means = MonthlyHourlyMeans(dewPoint);
            var error = targetDew.Select((t, m) => t - means[m]).ToArray();
            if (error.All(e => Math.Abs(e) < ToleranceK) || dewPointPasses == MaxPasses)
            {
                break;
            }

            Add(dewDaily, MonthlyMeanCurve.MeanPreserving(error));
            dewPointPasses++;
        }

        var weather = Assemble(climate, year, dryBulb, dewPoint);
        var checks = Measure(weather, months, midCourse);
        return new SynthesisResult(weather, seed, checks, temperaturePasses, dewPointPasses, floored.Count(f => f));
    }

    /// <summary>
    /// The factor that makes the within-month standard deviation of an AR(1) sample about its
    /// month's mean equal the process's own: the variance of a month's mean of n values of a
    /// unit AR(1) is about (1 + phi) / ((1 - phi) n), and removing it leaves
    /// 1 - (1 + phi) / ((1 - phi) n) of the variance (a standard large-n approximation).
    /// </summary>
    internal static double SpreadInflation(double phi, int n) =>
        1.0 / Math.Sqrt(1.0 - (1.0 + phi) / ((1.0 - phi) * n));

    /// <summary>A unit-variance AR(1) sequence started from its stationary distribution.</summary>
    internal static double[] Autoregressive(SeededGenerator rng, int n, double phi)
    {
        var x = new double[n];
        double innovation = Math.Sqrt(1.0 - phi * phi);
        x[0] = rng.NextNormal();
        for (int i = 1; i < n; i++)
        {
            x[i] = phi * x[i - 1] + innovation * rng.NextNormal();
        }

        return x;
    }

    /// <summary>
    /// Hourly dry-bulb from daily midpoints and ranges by the Handbook profile: from the day's
    /// minimum at 05:00 up to its maximum at 14:00, T = Tmax(d) - f (Tmax(d) - Tmin(d)); from
    /// 15:00 down toward the next day's minimum, T = Tmax(d) - f (Tmax(d) - Tmin(d+1)); before
    /// 05:00, the previous evening's fall, T = Tmax(d-1) - f (Tmax(d-1) - Tmin(d)). The year
    /// wraps (the day before 1 January is 31 December), so the hours join everywhere.
    /// </summary>
    private static void HourlyDryBulb(double[] mid, double[] range, double[] hourly)
    {
        int days = mid.Length;
        for (int d = 0; d < days; d++)
        {
            int previous = (d + days - 1) % days;
            int next = (d + 1) % days;
            double max = mid[d] + 0.5 * range[d];
            double min = mid[d] - 0.5 * range[d];
            double previousMax = mid[previous] + 0.5 * range[previous];
            double nextMin = mid[next] - 0.5 * range[next];
            for (int h = 0; h < 24; h++)
            {
                double f = DiurnalProfile.FractionAt(h);
                hourly[d * 24 + h] = h < DiurnalProfile.MinimumHour ? previousMax - f * (previousMax - min)
                    : h <= DiurnalProfile.MaximumHour ? max - f * (max - min)
                    : max - f * (max - nextMin);
            }
        }
    }

    /// <summary>
    /// Hourly dew point: straight-line interpolation between daily values placed at noon (the
    /// year wrapping), bounded by the hour's dry-bulb T with the smooth limit
    /// T - s ln(1 + exp((T - Td0) / s)), which is at most T and approaches Td0 when Td0 is well below T.
    /// </summary>
    private static void HourlyDewPoint(double[] daily, double[] dryBulb, double[] hourly)
    {
        int days = daily.Length;
        for (int d = 0; d < days; d++)
        {
            for (int h = 0; h < 24; h++)
            {
                double raw = h >= 12
                    ? daily[d] + (daily[(d + 1) % days] - daily[d]) * (h - 12) / 24.0
                    : daily[(d + days - 1) % days] + (daily[d] - daily[(d + days - 1) % days]) * (h + 12) / 24.0;
                double t = dryBulb[d * 24 + h];
                hourly[d * 24 + h] = t - SoftPlus(t - raw, SaturationSoftnessK);
            }
        }
    }

    /// <summary>s ln(1 + exp(x / s)), evaluated without overflow; never negative.</summary>
    internal static double SoftPlus(double x, double s) =>
        x > 0 ? x + s * Math.Log(1.0 + Math.Exp(-x / s)) : s * Math.Log(1.0 + Math.Exp(x / s));

    private static (double[] Max, double[] Min) DailyExtremes(double[] hourly)
    {
        int days = hourly.Length / 24;
        var max = new double[days];
        var min = new double[days];
        for (int d = 0; d < days; d++)
        {
            var day = hourly.AsSpan(d * 24, 24);
            double hi = double.NegativeInfinity, lo = double.PositiveInfinity;
            foreach (double t in day)
            {
                hi = Math.Max(hi, t);
                lo = Math.Min(lo, t);
            }

            max[d] = hi;
            min[d] = lo;
        }

        return (max, min);
    }

    private static double[] MonthlyHourlyMeans(double[] hourly)
    {
        int days = hourly.Length / 24;
        var daily = new double[days];
        for (int d = 0; d < days; d++)
        {
            double sum = 0;
            for (int h = 0; h < 24; h++)
            {
                sum += hourly[d * 24 + h];
            }

            daily[d] = sum / 24.0;
        }

        return MonthlyMeanCurve.MonthlyMeans(daily);
    }

    private static void Add(double[] values, double[] correction)
    {
        for (int i = 0; i < values.Length; i++)
        {
            values[i] += correction[i];
        }
    }

    private static HourlyWeather Assemble(MonthlyClimate climate, int year, double[] dryBulb, double[] dewPoint)
    {
        int n = dryBulb.Length;
        double pressure = Atmosphere.PressureAtElevationPa(climate.ElevationM);
        var times = new DateTime[n];
        var w = new double[n];
        var p = new double[n];
        var start = new DateTime(year, 1, 1, 0, 0, 0, DateTimeKind.Unspecified);
        for (int i = 0; i < n; i++)
        {
            times[i] = start.AddHours(i);
            w[i] = MoistAir.HumidityRatioFromDewPoint(dewPoint[i], pressure, HumidityOver.Water);
            p[i] = pressure;
        }

        var site = new SiteInfo(climate.Name, climate.ElevationM, climate.Latitude, climate.Longitude,
            climate.UtcOffsetHours, pressure, SitePressureSource.StandardAtmosphereAtElevation);
        var quality = new QualityReport();
        var calendar = new CalendarInfo(year, IsTypicalYear: false,
            $"synthesized year; dates and weekdays of {year}, a non-leap year");
        // The dew points are known exactly here, so they are passed in rather than solved back
        // from the humidity ratios: the written file then depends on no iterative solver.
        var columns = new HourlyColumns { Times = times, DryBulbC = dryBulb, HumidityRatio = w, PressurePa = p, DewPointC = dewPoint, HumidityOver = HumidityOver.Water };
        return new HourlyWeather(site, columns, quality, calendar);
    }

    private static MonthCheck[] Measure(HourlyWeather weather, IReadOnlyList<MonthStatistics> months, double[] midCourse)
    {
        var (dailyMax, dailyMin) = DailyExtremes(weather.DryBulbC);
        var maxMeans = MonthlyMeanCurve.MonthlyMeans(dailyMax);
        var minMeans = MonthlyMeanCurve.MonthlyMeans(dailyMin);
        var dewMeans = MonthlyHourlyMeans(weather.DewPointC);
        var squares = new double[MonthlyMeanCurve.DaysInYear];
        for (int d = 0; d < squares.Length; d++)
        {
            double departure = 0.5 * (dailyMax[d] + dailyMin[d]) - midCourse[d];
            squares[d] = departure * departure;
        }

        var spread = MonthlyMeanCurve.MonthlyMeans(squares).Select(Math.Sqrt).ToArray();
        return months.Select((s, m) => new MonthCheck(s.Month, s.DryBulbMaxC, maxMeans[m], s.DryBulbMinC, minMeans[m],
            s.DewPointC, dewMeans[m], s.DailyMeanSpreadK, spread[m])).ToArray();
    }
}
