using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// An hourly weather record in SI, one entry per hour, hour-beginning, local standard
/// time, with the full moist-air state of each hour computed once on construction
/// (ASHRAE Handbook—Fundamentals 2017, ch. 1, through <see cref="MoistAir"/>).
/// Arrays are laid out column-wise for fast binning and integration; index i is hour i.
/// </summary>
public sealed class HourlyWeather
{
    /// <summary>
    /// Builds a record from its primary columns; dew point, wet-bulb and enthalpy are derived.
    /// </summary>
    /// <param name="site">Site metadata, including the site pressure.</param>
    /// <param name="times">Start of each hour in local standard time. For a typical-year file these carry
    /// the calendar year chosen for weekdays (<paramref name="calendarYear"/>), not the source years.</param>
    /// <param name="dryBulbC">Dry-bulb per hour, C.</param>
    /// <param name="humidityRatio">Humidity ratio per hour, kg/kg.</param>
    /// <param name="pressurePa">Station pressure per hour, Pa (the site pressure where the file has none).</param>
    /// <param name="quality">What the reader repaired or noticed.</param>
    /// <param name="calendarYear">The year whose weekdays the record uses, and whether the file was a typical year.</param>
    public HourlyWeather(
        SiteInfo site,
        DateTime[] times,
        double[] dryBulbC,
        double[] humidityRatio,
        double[] pressurePa,
        QualityReport quality,
        CalendarInfo calendarYear)
        : this(site, times, dryBulbC, humidityRatio, pressurePa, DewPoints(times.Length, dryBulbC, humidityRatio, pressurePa), null, null, quality, calendarYear)
    {
    }

    /// <summary>
    /// Builds a record whose dew points are already known, and perhaps its wet-bulbs and enthalpies (the reader solves
    /// them with its other per-hour work): where null, the wet-bulb is solved from eqs. 33 and 35 and the enthalpy
    /// computed from eq. 32.
    /// </summary>
    internal HourlyWeather(
        SiteInfo site,
        DateTime[] times,
        double[] dryBulbC,
        double[] humidityRatio,
        double[] pressurePa,
        double[] dewPointC,
        double[]? wetBulbC,
        double[]? enthalpyJPerKg,
        QualityReport quality,
        CalendarInfo calendarYear)
    {
        int n = times.Length;
        if (dryBulbC.Length != n || humidityRatio.Length != n || pressurePa.Length != n || dewPointC.Length != n
            || (wetBulbC is not null && wetBulbC.Length != n) || (enthalpyJPerKg is not null && enthalpyJPerKg.Length != n))
        {
            throw new ArgumentException("all hourly columns must have the same length");
        }

        Site = site;
        Times = times;
        DryBulbC = dryBulbC;
        HumidityRatio = humidityRatio;
        PressurePa = pressurePa;
        DewPointC = dewPointC;
        Quality = quality;
        Calendar = calendarYear;
        if (wetBulbC is null)
        {
            wetBulbC = new double[n];
            HourlyStateBatchSolver.WetBulbsOfRecord(dryBulbC, humidityRatio, pressurePa, dewPointC, wetBulbC);
        }

        WetBulbC = wetBulbC;
        if (enthalpyJPerKg is null)
        {
            enthalpyJPerKg = new double[n];
            HourlyStateBatchSolver.Enthalpies(dryBulbC, humidityRatio, enthalpyJPerKg);
        }

        EnthalpyJPerKg = enthalpyJPerKg;
    }

    /// <summary>Dew point of every hour from its humidity ratio (eq. 20 inverted, then eqs. 5 and 6), never above the dry-bulb.</summary>
    private static double[] DewPoints(int n, double[] dryBulbC, double[] humidityRatio, double[] pressurePa)
    {
        if (dryBulbC.Length != n || humidityRatio.Length != n || pressurePa.Length != n)
        {
            throw new ArgumentException("all hourly columns must have the same length");
        }

        var dewPoint = new double[n];
        for (int i = 0; i < n; i++)
        {
            dewPoint[i] = HourlyStateSolver.DewPoint(humidityRatio[i], pressurePa[i], dryBulbC[i]);
        }

        return dewPoint;
    }

    public SiteInfo Site { get; }

    /// <summary>Number of hours in the record.</summary>
    public int Count => Times.Length;

    /// <summary>Start of each hour, local standard time (see the constructor for typical years).</summary>
    public DateTime[] Times { get; }

    /// <summary>Dry-bulb per hour, C.</summary>
    public double[] DryBulbC { get; }

    /// <summary>Humidity ratio per hour, kg/kg.</summary>
    public double[] HumidityRatio { get; }

    /// <summary>True when <see cref="PressurePa"/> is the file's own pressure column; false when every hour carries the site pressure.</summary>
    public bool HourlyPressureFromRecord { get; init; }

    /// <summary>Station pressure per hour, Pa.</summary>
    public double[] PressurePa { get; }

    /// <summary>Dew point per hour, C (eqs. 5, 6 and 20 inverted).</summary>
    public double[] DewPointC { get; }

    /// <summary>Thermodynamic wet-bulb per hour, C (eqs. 33 and 35 solved).</summary>
    public double[] WetBulbC { get; }

    /// <summary>Moist-air enthalpy per hour, J/kg dry air, 0 C datum (eq. 32).</summary>
    public double[] EnthalpyJPerKg { get; }

    /// <summary>Repairs and notices from reading.</summary>
    public QualityReport Quality { get; }

    /// <summary>The calendar the hours are placed in.</summary>
    public CalendarInfo Calendar { get; }

    /// <summary>
    /// The hours [<paramref name="start"/>, <paramref name="start"/> + <paramref name="count"/>) as a record of their own
    /// (one calendar year of a multi-year record), with the same site, quality report and calendar.
    /// </summary>
    public HourlyWeather Slice(int start, int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(start);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(start + count, Count);
        double[] Cut(double[] column) => column.AsSpan(start, count).ToArray();
        return new HourlyWeather(Site, Times.AsSpan(start, count).ToArray(), Cut(DryBulbC), Cut(HumidityRatio), Cut(PressurePa), Cut(DewPointC),
            Cut(WetBulbC), Cut(EnthalpyJPerKg), Quality, Calendar)
        {
            HourlyPressureFromRecord = HourlyPressureFromRecord,
        };
    }
}
