namespace BinEnergy.Core.Weather;

/// <summary>
/// How a weather file writes the time of each row: one column, or a date column and a time
/// column, each with a .NET custom format string (invariant culture; "24:00" is accepted and
/// means midnight at the end of the day); whether a row is the hour that begins or ends at
/// that time; local standard time or UTC.
/// </summary>
/// <param name="Column">The time (or date) column.</param>
/// <param name="Format">Its format, e.g. <c>yyyyMMdd:HHmm</c>; <c>iso</c> means ISO 8601 (<c>2026-01-01T00:00</c>).</param>
/// <param name="TimeColumn">A separate time-of-day column, if any.</param>
/// <param name="TimeFormat">Its format, e.g. <c>HH:mm</c>.</param>
/// <param name="HourEnding">True when each row is the hour ending at its time (shifted back one hour on read).</param>
/// <param name="Utc">True when times are UTC (converted to local standard time with the site's UTC offset).</param>
public sealed record TimeLayout(string Column, string Format, string? TimeColumn, string? TimeFormat, bool HourEnding, bool Utc);
