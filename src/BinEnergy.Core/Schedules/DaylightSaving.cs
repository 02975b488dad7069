namespace BinEnergy.Core.Schedules;

/// <summary>
/// Which daylight-saving rule the building's clocks follow. Weather records stay in local standard
/// time; the occupancy schedule (and an hourly occupancy profile) is read in clock time.
/// </summary>
public enum DaylightSaving
{
    /// <summary>Clocks stay on standard time all year (the default).</summary>
    None,

    /// <summary>
    /// United States and Canada since 2007: clocks one hour ahead from 02:00 standard time on the
    /// second Sunday in March to 02:00 daylight time (01:00 standard) on the first Sunday in
    /// November (US Energy Policy Act of 2005; recalled from memory).
    /// </summary>
    NorthAmerica,

    /// <summary>
    /// European Union: clocks one hour ahead from 01:00 UTC on the last Sunday in March to 01:00 UTC
    /// on the last Sunday in October (Directive 2000/84/EC; recalled from memory).
    /// </summary>
    Europe,
}
