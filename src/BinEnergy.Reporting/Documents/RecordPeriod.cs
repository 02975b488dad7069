using System.Globalization;
using BinEnergy.Core.Weather;

namespace BinEnergy.Reporting.Documents;

/// <summary>How a command names the period its totals cover: a year, or the hours of a record shorter than a year.</summary>
public static class RecordPeriod
{
    /// <summary>"Annual ..." for a record of a year or more; "... over the record's N hours (not a full year)" for a shorter one.</summary>
    public static string Title(HourlyWeather weather, string what) => weather.Count >= 8760
        ? "Annual " + what
        : char.ToUpperInvariant(what[0]) + what[1..] + string.Create(CultureInfo.InvariantCulture, $" over the record's {weather.Count:N0} hours (not a full year)");

    /// <summary>The warning a shorter record gets, or null for a year or more.</summary>
    public static string? Warning(HourlyWeather weather) => weather.Count >= 8760 ? null
        : string.Create(CultureInfo.InvariantCulture, $"The record has {weather.Count:N0} hours, not a full year: the totals are for these hours only and are not annual figures (a year has 8,760).");
}
