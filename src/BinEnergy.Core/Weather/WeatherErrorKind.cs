namespace BinEnergy.Core.Weather;

/// <summary>What is wrong with a weather file or a column map; tests assert on it, users read the message.</summary>
public enum WeatherErrorKind
{
    /// <summary>The weather file does not exist or cannot be opened.</summary>
    FileNotFound,

    /// <summary>The file, or its decompressed data, is above the size limit.</summary>
    FileTooLarge,

    /// <summary>The file has no bytes (or only blank lines).</summary>
    EmptyFile,

    /// <summary>A <c>.gz</c> file that is not valid gzip data.</summary>
    BadCompression,

    /// <summary>The column-name line is missing or not where the map says.</summary>
    MissingHeader,

    /// <summary>The header is there but no data row follows.</summary>
    NoData,

    /// <summary>The fields are separated by something other than the expected separator (e.g. semicolons).</summary>
    WrongSeparator,

    /// <summary>No time column (or date/time columns) was found.</summary>
    MissingTimeColumn,

    /// <summary>No dry-bulb column was found.</summary>
    MissingDryBulb,

    /// <summary>No humidity column (dew point, wet-bulb, RH or humidity ratio) was found.</summary>
    MissingHumidity,

    /// <summary>Two columns have the same meaning (e.g. drybulb_c and drybulb_f).</summary>
    DuplicateColumn,

    /// <summary>A row has more or fewer fields than the header (a truncated line, a comma used as decimal separator).</summary>
    WrongFieldCount,

    /// <summary>A field that should be a number is not one.</summary>
    NotANumber,

    /// <summary>A timestamp does not parse in the expected format.</summary>
    BadTimestamp,

    /// <summary>The same hour appears twice.</summary>
    DuplicateTime,

    /// <summary>An hour comes before the one on the previous row.</summary>
    TimeOutOfOrder,

    /// <summary>Two rows are not a whole number of hours apart (e.g. 30-minute data).</summary>
    NonHourlyStep,

    /// <summary>A run of missing values longer than the fill limit.</summary>
    LongGap,

    /// <summary>A value outside its physical range (dry-bulb, RH, pressure, ...).</summary>
    ValueOutOfRange,

    /// <summary>A metadata value (elevation, latitude, UTC offset, ...) is missing or invalid where it is needed.</summary>
    BadMetadata,

    /// <summary>The column map itself is invalid (TOML syntax, unknown key, unknown unit).</summary>
    BadMap,

    /// <summary>No shipped map has that name and no file has that path.</summary>
    MapNotFound,
}
