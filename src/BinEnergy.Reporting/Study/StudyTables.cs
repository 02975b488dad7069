using System.Globalization;
using BinEnergy.Core.Climate;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Lays a study run out as long-format result tables (DESIGN 11): <c>annual</c>, <c>bins</c>,
/// <c>monthly</c>, <c>economizer</c>, <c>peaks</c> and optionally <c>hourly</c>, one row per
/// climate x variant x (method | bin | month | control | condition | hour), with a unit suffix on
/// every numeric column in the study's display units. The figure columns are those of every other
/// output (<see cref="FigureColumns"/>); <c>method</c> is <c>hourly</c>, <c>joint-bin</c> or <c>bin</c>.
/// </summary>
public static class StudyTables
{
    /// <summary>The table names, in the order they are written.</summary>
    public static IReadOnlyList<string> Names { get; } = ["climates", "annual", "bins", "monthly", "economizer", "peaks", "hourly"];

    /// <summary>Builds the tables of a run (<c>hourly</c> only when the run kept its hours and <paramref name="hourly"/> is set).</summary>
    public static IReadOnlyList<ResultTable> Build(StudyRunResult run, bool hourly)
    {
        var u = Units(run);
        var show = Show(run);
        var tables = Build(run.Cases, u, show, run.Study.DegreeDayMethod).ToList();
        if (hourly)
        {
            tables.Add(Hourly(run.Cases, u, show));
        }

        return tables;
    }

    /// <summary>The tables but <c>hourly</c> of some cases, with given units and figures (a batch lays out one file's cases at a time, all with the same columns).</summary>
    public static IReadOnlyList<ResultTable> Build(IReadOnlyList<StudyCaseResult> cases, DisplayUnits u, FigureSet show, DegreeDayMethod degreeDays) =>
        [Climates(cases, u, degreeDays), Annual(cases, u, show), Bins(cases, u, show), Monthly(cases, u, show), Economizer(cases, u, show), Peaks(cases, u, show)];

    /// <summary>The display units of a run: the study's system, currency and oil heat content.</summary>
    public static DisplayUnits Units(StudyRunResult run) =>
        new(run.Study.Units, run.Study.Currency, run.Cases.Select(c => c.Case.Plant?.OilJoulesPerGallon).FirstOrDefault(o => o is not null));

    /// <summary>The figures any case of the run has.</summary>
    public static FigureSet Show(StudyRunResult run) => FigureSet.Any(run.Cases.Select(c => FigureSet.Of(c.OutdoorAir)));

    /// <summary>The climate and variant columns every study table starts with.</summary>
    public static ColumnSet<StudyCaseResult> CaseColumns { get; } = new ColumnSet<StudyCaseResult>()
        .Text("climate", "Climate", c => c.Case.Climate.Name)
        .Text("variant", "Variant", c => c.Case.Variant.Name);

    /// <summary>
    /// The years a case's annual and economizer rows are given for: its one year (<c>typical</c> or the
    /// calendar year), or each calendar year of a multi-year record and then their mean (<c>mean</c>).
    /// </summary>
    public static IEnumerable<(string Year, bool Complete, OutdoorAirResult OutdoorAir, EconomizerEvaluation? Economizer)> YearsOf(StudyCaseResult c) =>
        c.IsMultiYear
            ? [.. c.Years.Select(y => (y.Year.Label, y.Year.Complete, y.OutdoorAir, y.Economizer)), (RecordYear.MeanLabel, true, c.OutdoorAir, c.Economizer)]
            : [(c.Years[0].Year.Label, c.Years[0].Year.Complete, c.OutdoorAir, c.Economizer)];

    /// <summary>
    /// One row per climate: the weather file and its site (name, station id, latitude, longitude, elevation,
    /// site pressure), the record (hours, period, humidity convention), the annual mean dry-bulb, heating and
    /// cooling degree-days at the display base (65 F or 18.3 C) by the study's method (daily means by
    /// default; per complete year for a multi-year record) and the 99.6 % heating and 0.4 % cooling design
    /// dry-bulbs, all from <c>Core/Climate</c> as <c>inspect</c> gives them.
    /// </summary>
    public static ResultTable Climates(IReadOnlyList<StudyCaseResult> cases, DisplayUnits u, DegreeDayMethod method)
    {
        var first = cases.GroupBy(c => c.Case.Climate.Name).Select(g => g.First()).ToList();
        string baseText = u.Temperature.FromSi(u.DegreeDayBaseC).ToString("0.#", CultureInfo.InvariantCulture);
        return new ColumnSet<(StudyCaseResult Case, (double Heating, double Cooling) DegreeDays)>()
            .Text("climate", "Climate", x => x.Case.Case.Climate.Name)
            .Text("weather", "Weather file", x => x.Case.Case.Climate.WeatherPath)
            .Text("site", "Site in the file", x => x.Case.Weather.Site.Name)
            .Text("station_id", "Station id", x => x.Case.Weather.Site.StationId ?? string.Empty)
            .Number("latitude", DisplayUnit.Degrees, "Latitude", x => x.Case.Weather.Site.Latitude ?? double.NaN)
            .Number("longitude", DisplayUnit.Degrees, "Longitude", x => x.Case.Weather.Site.Longitude ?? double.NaN)
            .Number("elevation", u.Length, "Elevation", x => x.Case.Weather.Site.ElevationM ?? double.NaN)
            .Number("site_pressure", u.Pressure, "Site pressure", x => x.Case.Weather.Site.SitePressurePa)
            .Integer("hours_in_record", "Hours", x => x.Case.Weather.Count)
            .Text("period", "Period", x => Period(x.Case.Weather))
            .Text("humidity_over", "Dew points over", x => x.Case.Weather.HumidityOver == Core.Psychrometrics.HumidityOver.Water ? "water" : "ice")
            .Number("mean_drybulb", u.Temperature, "Mean dry-bulb", x => x.Case.Weather.DryBulbC.Average())
            .Text("degree_day_method", "Degree-days", _ => DegreeDayMethods.Name(method))
            .Number("heating_degree_days", u.DegreeDays, "HDD " + baseText, x => x.DegreeDays.Heating)
            .Number("cooling_degree_days", u.DegreeDays, "CDD " + baseText, x => x.DegreeDays.Cooling)
            .Number("heating_99_6_drybulb", u.Temperature, "Heating 99.6 %", x => x.Case.OutdoorAir.Design!.Heating996DryBulbC)
            .Number("cooling_0_4_drybulb", u.Temperature, "Cooling 0.4 %", x => x.Case.OutdoorAir.Design!.Cooling[0].DryBulbC)
            .Fill(new ResultTable("climates") { Title = "Climates: the site, degree-days and design dry-bulbs of each record" },
                first.Select(c => (c, DegreeDaysPerYear(c, method, u.DegreeDayBaseC))));
    }

    /// <summary>A record's period: <c>typical year</c>, or its first and last dates (<c>2005-01-01 to 2023-12-31</c>).</summary>
    public static string Period(Core.Weather.HourlyWeather weather) => weather.Calendar.IsTypicalYear
        ? "typical year"
        : weather.Times[0].ToString("yyyy-MM-dd", CultureInfo.InvariantCulture) + " to " + weather.Times[^1].ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    /// <summary>Heating and cooling degree-days of a case's record at a base, K-day: of the record, or the mean of a multi-year record's complete years.</summary>
    public static (double Heating, double Cooling) DegreeDaysPerYear(StudyCaseResult c, DegreeDayMethod method, double baseC)
    {
        var complete = c.Years.Where(y => y.Year.Complete).ToList();
        var spans = c.IsMultiYear && complete.Count > 0 ? complete.Select(y => c.Weather.Slice(y.Year.Start, y.Year.Hours)).ToList() : [c.Weather];
        var series = spans.Select(w => DegreeDaySeries.Of(w, method)).ToList();
        return (series.Average(d => d.Heating(baseC)), series.Average(d => d.Cooling(baseC)));
    }

    /// <summary>One row per climate x variant x year x method (the year is <c>mean</c> for the mean of a multi-year record's complete years).</summary>
    public static ResultTable Annual(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show) =>
        new ColumnSet<(StudyCaseResult Case, string Year, bool Complete, OutdoorAirResult OutdoorAir, IntegrationMethod Method)>()
            .Add(CaseColumns, x => x.Case)
            .Text("year", "Year", x => x.Year)
            .Integer("complete_year", "Complete year", x => x.Complete ? 1 : 0, detail: true)
            .Text("method", "Method", x => IntegrationMethods.Name(x.Method))
            .Number("airflow", u.Airflow, "Airflow", x => x.Case.Case.OutdoorAir.EffectiveAirflow.CubicMetresPerSecond)
            .Add(FigureColumns.Loads(u, show), x => x.OutdoorAir.Annual[x.Method])
            .Fill(new ResultTable("annual") { Title = "Annual outdoor-air loads by method" },
                cases.SelectMany(c => YearsOf(c).SelectMany(y => IntegrationMethods.All.Select(m => (c, y.Year, y.Complete, y.OutdoorAir, m)))));

    /// <summary>The columns of one dry-bulb bin: edges, hours and means, the method's figures and the exact figures of its own hours.</summary>
    public static ColumnSet<(OutdoorAirBinRow Bin, IntegrationMethod Method)> BinColumns(DisplayUnits u, FigureSet show) =>
        new ColumnSet<(OutdoorAirBinRow Bin, IntegrationMethod Method)>()
            .Number("bin_low", u.Temperature, "Bin from", x => x.Bin.Bin.Low.Celsius)
            .Number("bin_high", u.Temperature, "Bin to", x => x.Bin.Bin.High.Celsius)
            .Number("bin_mid", u.Temperature, "Bin midpoint", x => x.Bin.Bin.Mid.Celsius, detail: true)
            .Number("evaluated_drybulb", u.Temperature, "Evaluated at", x => x.Bin.EvaluatedAt.Celsius)
            .Integer("hours", "Hours", x => (int)Math.Round((double)x.Bin.Bin.All.Hours / x.Bin.YearsAveraged), detail: true)
            .Integer("hours_occupied", "Hours occupied", x => (int)Math.Round((double)x.Bin.Bin.Occupied.Hours / x.Bin.YearsAveraged), detail: true)
            .Number("mean_humidity_ratio", u.Moisture, "Mean coincident humidity ratio", x => x.Bin.MeanHumidityRatio.KilogramsPerKilogram)
            .Number("mean_coincident_wetbulb", u.Temperature, "Mean coincident wet-bulb", x => x.Bin.Bin.All.MeanWetBulb.Celsius, detail: true)
            .Add(FigureColumns.Loads(u, show), x => x.Bin.Figures[x.Method])
            .Add(FigureColumns.Loads(u, show with { Plant = false }, hours: false).Prefixed("hourly_", "Hourly ", detail: true), x => x.Bin.Figures.Hourly);

    private static ResultTable Bins(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show) =>
        new ColumnSet<(StudyCaseResult Case, OutdoorAirBinRow Bin, IntegrationMethod Method)>()
            .Add(CaseColumns, x => x.Case)
            .Text("method", "Method", x => IntegrationMethods.Name(x.Method))
            .Add(BinColumns(u, show), x => (x.Bin, x.Method))
            .Fill(new ResultTable("bins") { Title = "Outdoor-air loads by dry-bulb bin and method" },
                cases.SelectMany(c => IntegrationMethods.All.SelectMany(m => c.OutdoorAir.Bins.Select(b => (c, b, m)))));

    private static ResultTable Monthly(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show) =>
        new ColumnSet<(StudyCaseResult Case, OutdoorAirMonth Month, IntegrationMethod Method)>()
            .Add(CaseColumns, x => x.Case)
            .Text("method", "Method", x => IntegrationMethods.Name(x.Method))
            .Integer("month", "Month", x => x.Month.Month)
            .Add(FigureColumns.Loads(u, show), x => x.Month.Figures[x.Method])
            .Fill(new ResultTable("monthly") { Title = "Outdoor-air loads by month and method" },
                cases.SelectMany(c => IntegrationMethods.All.SelectMany(m => c.OutdoorAir.Months.Select(mo => (c, mo, m)))));

    private static ResultTable Economizer(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show) =>
        new ColumnSet<(StudyCaseResult Case, string Year, EconomizerControlResult Control, IntegrationMethod Method)>()
            .Add(CaseColumns, x => x.Case)
            .Text("year", "Year", x => x.Year)
            .Text("system", "Air system", x => AirSystemTypes.Name(x.Case.Economizer!.Settings.System))
            .Text("method", "Method", x => IntegrationMethods.Name(x.Method))
            .Text("control", "Control", x => FigureColumns.ControlName(x.Control))
            .Text("integration", "Integration", x => FigureColumns.Integration(x.Control))
            .Add(FigureColumns.Economizer(u, show.Plant), x => (x.Control, x.Method))
            .Fill(new ResultTable("economizer") { Title = "Economizer controls against the baseline, by method" },
                cases.SelectMany(c => YearsOf(c).Where(y => y.Economizer is not null)
                    .SelectMany(y => IntegrationMethods.All.SelectMany(m => y.Economizer!.BaselineAndControls.Select(x => (c, y.Year, x, m))))));

    /// <summary>The peak outdoor-air loads at each case's design conditions.</summary>
    public static ResultTable Peaks(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show, bool showInTerminal = true) =>
        new ColumnSet<(StudyCaseResult Case, OutdoorAirPeak Peak)>()
            .Add(CaseColumns, x => x.Case)
            .Text("condition", "Condition", x => x.Peak.Key)
            .Add(FigureColumns.Peaks(u, show.Recovery), x => x.Peak)
            .Fill(new ResultTable("peaks") { Title = "Peak outdoor-air loads at the design conditions", ShowInTerminal = showInTerminal },
                cases.SelectMany(c => c.OutdoorAir.Peaks?.All.Select(p => (c, p)) ?? []));

    private static ResultTable Hourly(IEnumerable<StudyCaseResult> cases, DisplayUnits u, FigureSet show) =>
        new ColumnSet<(StudyCaseResult Case, int Hour)>()
            .Add(CaseColumns, x => x.Case)
            .Text("method", "Method", _ => IntegrationMethods.Name(IntegrationMethod.Hourly))
            .Text("time", "Time", x => x.Case.Weather.Times[x.Hour].ToString("yyyy-MM-dd'T'HH:mm", CultureInfo.InvariantCulture))
            .Integer("month", "Month", x => x.Case.Weather.Times[x.Hour].Month)
            .Integer("hour", "Hour", x => x.Case.Weather.Times[x.Hour].Hour)
            .Integer("occupied", "Occupied", x => x.Case.Occupied[x.Hour] ? 1 : 0)
            .Number("drybulb", u.Temperature, "Dry-bulb", x => x.Case.Weather.DryBulbC[x.Hour])
            .Number("humidity_ratio", u.Moisture, "Humidity ratio", x => x.Case.Weather.HumidityRatio[x.Hour])
            .Add(FigureColumns.Loads(u, show), x => x.Case.HourlyFigures![x.Hour])
            .Fill(new ResultTable("hourly") { Title = "Outdoor-air loads hour by hour" },
                cases.SelectMany(c => c.HourlyFigures is null
                    ? throw new InvalidOperationException("the run did not keep its hours; run with --hourly")
                    : Enumerable.Range(0, c.Weather.Count).Select(i => (c, i))));
}
