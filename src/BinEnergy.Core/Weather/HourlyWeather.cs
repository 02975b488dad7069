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
    /// Builds a record from its named columns; the dew point, wet-bulb and enthalpy are derived where not given.
    /// </summary>
    /// <param name="site">Site metadata, including the site pressure.</param>
    /// <param name="columns">The hourly columns, all of the same length.</param>
    /// <param name="quality">What the reader repaired or noticed.</param>
    /// <param name="calendar">The year whose weekdays the record uses, and whether the file was a typical year.</param>
    public HourlyWeather(SiteInfo site, HourlyColumns columns, QualityReport quality, CalendarInfo calendar)
    {
        int n = columns.Times.Length;
        if (new[] { columns.DryBulbC, columns.HumidityRatio, columns.PressurePa, columns.DewPointC, columns.WetBulbC, columns.EnthalpyJPerKg }
            .Any(c => c is not null && c.Length != n))
        {
            throw new ArgumentException("all hourly columns must have the same length", nameof(columns));
        }

        Site = site;
        Times = columns.Times;
        DryBulbC = columns.DryBulbC;
        HumidityRatio = columns.HumidityRatio;
        PressurePa = columns.PressurePa;
        HumidityOver = columns.HumidityOver;
        Quality = quality;
        Calendar = calendar;
        DewPointC = columns.DewPointC ?? Hours(n, i => HourlyStateSolver.DewPoint(HumidityRatio[i], PressurePa[i], DryBulbC[i], HumidityOver));
        WetBulbC = columns.WetBulbC ?? Hours(n, i => HourlyStateSolver.WetBulb(DryBulbC[i], HumidityRatio[i], PressurePa[i], DewPointC[i]));
        EnthalpyJPerKg = columns.EnthalpyJPerKg ?? Hours(n, i => MoistAir.Enthalpy(DryBulbC[i], HumidityRatio[i]));
    }

    private static double[] Hours(int n, Func<int, double> value)
    {
        var result = new double[n];
        for (int i = 0; i < n; i++)
        {
            result[i] = value(i);
        }

        return result;
    }

    /// <summary>The record's columns, to build a changed copy from (<c>weather.Columns with { ... }</c>; clear a derived column to have it solved again).</summary>
    public HourlyColumns Columns => new()
    {
        Times = Times,
        DryBulbC = DryBulbC,
        HumidityRatio = HumidityRatio,
        PressurePa = PressurePa,
        DewPointC = DewPointC,
        WetBulbC = WetBulbC,
        EnthalpyJPerKg = EnthalpyJPerKg,
        HumidityOver = HumidityOver,
    };

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

    /// <summary>What the dew points are relative to below 0 C (liquid water, the weather convention, unless the file said ice).</summary>
    public HumidityOver HumidityOver { get; }

    /// <summary>Dew point per hour, C (eqs. 5, 6 and 20 inverted), over <see cref="HumidityOver"/> below 0 C.</summary>
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
        var columns = Columns with
        {
            Times = Times.AsSpan(start, count).ToArray(),
            DryBulbC = Cut(DryBulbC),
            HumidityRatio = Cut(HumidityRatio),
            PressurePa = Cut(PressurePa),
            DewPointC = Cut(DewPointC),
            WetBulbC = Cut(WetBulbC),
            EnthalpyJPerKg = Cut(EnthalpyJPerKg),
        };
        return new HourlyWeather(Site, columns, Quality, Calendar)
        {
            HourlyPressureFromRecord = HourlyPressureFromRecord,
        };
    }
}
