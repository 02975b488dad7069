namespace BinEnergy.Core.Weather;

/// <summary>
/// How to read a weather file. The defaults follow DESIGN 5.3 and 5.4: the open layout,
/// gaps of up to 6 hours filled, longer gaps an error, typical years placed on 2018.
/// </summary>
public sealed record WeatherReadOptions
{
    /// <summary>The default fill limit, hours.</summary>
    public const int DefaultMaxGapHours = 6;

    /// <summary>The column map for a layout other than the open one; null reads the open layout.</summary>
    public ColumnMap? Map { get; init; }

    /// <summary>Site elevation in metres, overriding the file's metadata.</summary>
    public double? ElevationM { get; init; }

    /// <summary>The longest run of missing hours filled by linear interpolation (0 fills nothing).</summary>
    public int MaxGapHours { get; init; } = DefaultMaxGapHours;

    /// <summary>When true, hours in longer gaps are dropped (and counted) instead of being an error.</summary>
    public bool AllowDroppingLongGaps { get; init; }

    /// <summary>The year whose weekdays a typical-year record uses (default 2018, a non-leap year starting on a Monday).</summary>
    public int CalendarYear { get; init; } = CalendarInfo.DefaultTypicalYear;

    /// <summary>
    /// What the file's dew points and RH are relative to below 0 C, overriding the file's own statement (open-layout
    /// metadata <c>humidity_over</c> or the map's key); null: the file's, else liquid water (the weather convention).
    /// </summary>
    public Psychrometrics.HumidityOver? HumidityOver { get; init; }

    /// <summary>The largest weather file read, and the largest its gzip data may decompress to, bytes (default 1 GiB).</summary>
    public long MaxBytes { get; init; } = Errors.InputFiles.DefaultMaxBytes;

    /// <summary>The option that raises <see cref="MaxBytes"/>, named in the message.</summary>
    internal const string LimitOption = "--max-input-mb";

    /// <summary>Options for the open layout with the defaults.</summary>
    public static WeatherReadOptions Default { get; } = new();

    /// <summary>Checks the options once at the public boundary.</summary>
    internal void Validate()
    {
        if (MaxGapHours < 0 || MaxGapHours > 24 * 31)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxGapHours), MaxGapHours, "the gap limit must be 0 to 744 hours");
        }

        if (CalendarYear < 1900 || CalendarYear > 2200)
        {
            throw new ArgumentOutOfRangeException(nameof(CalendarYear), CalendarYear, "the calendar year must be between 1900 and 2200");
        }

        if (MaxBytes < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxBytes), MaxBytes, "the size limit must be at least one byte");
        }

        if (ElevationM is double z && !(z >= -500 && z <= 9000))
        {
            throw new ArgumentOutOfRangeException(nameof(ElevationM), z, "the elevation must be between -500 and 9,000 m");
        }
    }
}
