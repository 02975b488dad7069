namespace BinEnergy.Core.Weather;

/// <summary>The stable names of the repairs and checks counted in a <see cref="QualityReport"/>.</summary>
public static class QualityKeys
{
    /// <summary>RH values between 100 and 103 % set to 100 %.</summary>
    public const string RhClamped = "rh_clamped";

    /// <summary>Dew points above the dry-bulb by at most 1 K, set to the dry-bulb.</summary>
    public const string DewPointAboveDryBulbClamped = "dewpoint_above_drybulb_clamped";

    /// <summary>Dew points above the dry-bulb by more than 1 K: set to the dry-bulb and flagged as suspect values.</summary>
    public const string DewPointAboveDryBulbSuspect = "dewpoint_above_drybulb_suspect";

    /// <summary>Wet-bulbs above the dry-bulb, set to the dry-bulb.</summary>
    public const string WetBulbAboveDryBulbClamped = "wetbulb_above_drybulb_clamped";

    /// <summary>Humidity ratios above saturation at the dry-bulb, set to saturation.</summary>
    public const string HumidityRatioAboveSaturationClamped = "humidity_ratio_above_saturation_clamped";

    /// <summary>Hours dropped because they sat in a gap longer than the fill limit (only when dropping is allowed).</summary>
    public const string LongGapHoursDropped = "long_gap_hours_dropped";

    /// <summary>Hours of one column filled by linear interpolation: the key is this prefix plus the column's role, e.g. <c>gap_filled_drybulb</c>.</summary>
    public const string GapFilledPrefix = "gap_filled_";

    /// <summary>Hours where a second humidity measure disagrees with the one used: the key is this prefix plus the measure, e.g. <c>disagrees_rh</c>.</summary>
    public const string DisagreesPrefix = "disagrees_";

    /// <summary>The short role name of a quantity in keys and messages (its <see cref="WeatherQuantityFacts.Key"/>).</summary>
    public static string Role(WeatherQuantity q) => WeatherQuantityFacts.Of(q).Key;

    /// <summary>
    /// A count of one kind as people read it, with its key after it for <c>binenergy inspect</c>: "2 dry-bulb hours filled
    /// by linear interpolation (gap_filled_drybulb)". A key this class does not know is written as its key and count.
    /// </summary>
    public static string Describe(string key, int count)
    {
        ArgumentNullException.ThrowIfNull(key);
        string Name(string prefix) => WeatherQuantityFacts.ByKey(key[prefix.Length..])?.Name ?? key[prefix.Length..];
        string N(string one, string many) => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{count:N0} {(count == 1 ? one : many)}");
        string? text = key switch
        {
            RhClamped => N("RH value", "RH values") + " between 100 and 103 % set to 100 %",
            DewPointAboveDryBulbClamped => N("dew point", "dew points") + " up to 1 K above the dry-bulb set to the dry-bulb",
            DewPointAboveDryBulbSuspect => N("dew point", "dew points") + " more than 1 K above the dry-bulb set to the dry-bulb (suspect values)",
            WetBulbAboveDryBulbClamped => N("wet-bulb", "wet-bulbs") + " above the dry-bulb set to the dry-bulb",
            HumidityRatioAboveSaturationClamped => N("humidity ratio", "humidity ratios") + " above saturation set to saturation",
            LongGapHoursDropped => N("hour", "hours") + " in gaps longer than the fill limit dropped",
            _ when key.StartsWith(GapFilledPrefix, StringComparison.Ordinal) => N($"{Name(GapFilledPrefix)} hour", $"{Name(GapFilledPrefix)} hours") + " filled by linear interpolation",
            _ when key.StartsWith(DisagreesPrefix, StringComparison.Ordinal) => N("hour", "hours") + $" where the file's {Name(DisagreesPrefix)} disagrees with the humidity used (checked, not changed)",
            _ => null,
        };
        return text is null ? N(key, key) : $"{text} ({key})";
    }
}
