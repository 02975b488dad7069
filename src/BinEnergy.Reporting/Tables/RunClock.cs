using System.Globalization;
using BinEnergy.Core.Errors;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// The time a run records in its outputs: now, or, when the environment variable <c>SOURCE_DATE_EPOCH</c> is set, that
/// many seconds after 1970-01-01 UTC, so that a rerun of the same study writes the same bytes (the reproducible-builds
/// convention, recalled from memory: an integer count of seconds; anything else is an error).
/// </summary>
public static class RunClock
{
    /// <summary>The run's time.</summary>
    /// <exception cref="RunClockException">SOURCE_DATE_EPOCH is set but not a whole number of seconds in range.</exception>
    public static DateTimeOffset Now()
    {
        string? epoch = Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH");
        if (string.IsNullOrWhiteSpace(epoch))
        {
            return DateTimeOffset.UtcNow;
        }

        if (!long.TryParse(epoch.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out long seconds) || seconds > 253_402_300_799)
        {
            throw new RunClockException($"SOURCE_DATE_EPOCH is '{epoch}': it must be a whole number of seconds since 1970-01-01 UTC (e.g. 1767225600), or unset");
        }

        return DateTimeOffset.FromUnixTimeSeconds(seconds);
    }
}

/// <summary>SOURCE_DATE_EPOCH holds something other than a count of seconds.</summary>
public sealed class RunClockException(string message) : InputDataException(message);
