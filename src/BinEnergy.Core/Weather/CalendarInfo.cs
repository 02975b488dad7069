namespace BinEnergy.Core.Weather;

/// <summary>
/// How the record's hours are placed on a calendar (DESIGN 5.3).
/// </summary>
/// <param name="Year">The year whose weekdays the hours use.</param>
/// <param name="IsTypicalYear">True when the source mixed years month by month (a typical year): the
/// dates keep month, day and hour, and weekdays come from <paramref name="Year"/>.</param>
/// <param name="Note">One sentence for reports, e.g. "typical year; weekdays from 2018, a non-leap year starting on a Monday".</param>
public sealed record CalendarInfo(int Year, bool IsTypicalYear, string Note)
{
    /// <summary>The default year for weekdays of typical-year files: 2018, a non-leap year that starts on a Monday.</summary>
    public const int DefaultTypicalYear = 2018;
}
