using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// One calendar year of a weather record (DESIGN 15: multi-year records give per-year figures):
/// its label (<c>typical</c> for a typical-year file, else the year), its hours and whether it is a
/// complete year (every hour of its 365 or 366 days present; a typical year, 8,760 or 8,784 hours).
/// </summary>
/// <param name="Label">The year's label in tables: <c>typical</c>, or the calendar year.</param>
/// <param name="Start">Index of its first hour in the record.</param>
/// <param name="Hours">Its hours in the record.</param>
/// <param name="Complete">True when every hour of the calendar year is present (a typical year always is one year).</param>
public sealed record RecordYear(string Label, int Start, int Hours, bool Complete)
{
    /// <summary>The label of the mean of the complete years of a multi-year record.</summary>
    public const string MeanLabel = "mean";

    /// <summary>The calendar years of <paramref name="weather"/>: one for a typical year or a record within one year, else one per year.</summary>
    public static IReadOnlyList<RecordYear> Of(HourlyWeather weather)
    {
        ArgumentNullException.ThrowIfNull(weather);
        if (weather.Count == 0 || weather.Calendar.IsTypicalYear)
        {
            return [new RecordYear("typical", 0, weather.Count, weather.Count is 8760 or 8784)];
        }

        var years = new List<RecordYear>();
        var times = weather.Times;
        int start = 0;
        for (int i = 1; i <= times.Length; i++)
        {
            if (i == times.Length || times[i].Year != times[start].Year)
            {
                int year = times[start].Year;
                int expected = (DateTime.IsLeapYear(year) ? 366 : 365) * 24;
                years.Add(new RecordYear(year.ToString(System.Globalization.CultureInfo.InvariantCulture), start, i - start, i - start == expected));
                start = i;
            }
        }

        return years;
    }
}
