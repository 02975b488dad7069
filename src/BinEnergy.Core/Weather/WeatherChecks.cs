using System.Globalization;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Data-sanity checks of the reader: values that are physical one by one but not together. A dew point above the
/// dry-bulb in a large share of the hours is a unit slip (a column in the other unit) and stops the read; single-hour
/// spikes, hours far outside their month's own spread and an annual mean no place at the latitude has are warned about
/// and used as they are.
/// </summary>
internal static class WeatherChecks
{
    /// <summary>Share of hours with a dew point more than 1 K above the dry-bulb beyond which the columns cannot both be right.</summary>
    private const double SuspectShare = 0.05;

    /// <summary>A spike: the hour differs from both neighbours by more than this, in the same direction, K.</summary>
    private const double SpikeK = 10.0;

    /// <summary>An outlier: farther from its month's median than this many robust standard deviations (IQR / 1.349)...</summary>
    private const double OutlierSigmas = 6.0;

    /// <summary>... and than this, K (a coastal month's spread is narrow, and a warm day in it is weather, not an error).</summary>
    private const double OutlierMinimumK = 20.0;

    /// <summary>Stops the read where the dew points are above the dry-bulb in more than 5 % of the hours (before they are clamped).</summary>
    public static void DewPointsAgainstDryBulb(HourlyGrid grid, RawWeatherTable raw)
    {
        if (!grid.Columns.TryGetValue(WeatherQuantity.DewPoint, out var dewPoint))
        {
            return;
        }

        var dryBulb = grid.Columns[WeatherQuantity.DryBulb];
        int above = Enumerable.Range(0, dryBulb.Length).Count(i => dewPoint[i] - dryBulb[i] > 1.0);
        if (above > 24 && above > SuspectShare * dryBulb.Length)
        {
            string db = raw.ColumnNames[WeatherQuantity.DryBulb], dp = raw.ColumnNames[WeatherQuantity.DewPoint];
            throw new WeatherDataException(WeatherErrorKind.ValueOutOfRange, raw.File,
                Inv($"the dew point is more than 1 K above the dry-bulb in {above:N0} of {dryBulb.Length:N0} hours: the two columns cannot both be in the units the file says"),
                $"Check the units of '{FileExcerpt.Of(db)}' and '{FileExcerpt.Of(dp)}' (for example a column named _f that holds C, or a map with the wrong unit)",
                column: db);
        }
    }

    /// <summary>Warns about single-hour dry-bulb spikes and hours far outside their calendar month's spread.</summary>
    public static void DryBulbOutliers(HourlyGrid grid, QualityReport quality, bool typical)
    {
        var t = grid.Columns[WeatherQuantity.DryBulb];
        var spikes = Enumerable.Range(1, Math.Max(0, t.Length - 2))
            .Where(i => Math.Min(Math.Abs(t[i] - t[i - 1]), Math.Abs(t[i] - t[i + 1])) > SpikeK && Math.Sign(t[i] - t[i - 1]) == Math.Sign(t[i] - t[i + 1])).ToList();
        if (spikes.Count > 0)
        {
            quality.Warn(Inv($"{spikes.Count} single-hour dry-bulb spike(s), more than {SpikeK:0} K from both neighbouring hours: ") + Examples(spikes, grid, t, typical)
                + "; check the data (the values are used as they are)");
        }

        var outliers = new List<int>();
        foreach (var month in Enumerable.Range(0, t.Length).GroupBy(i => grid.Times[i].Month))
        {
            var sorted = month.Select(i => t[i]).ToArray();
            if (sorted.Length < 24 * 7)
            {
                continue;
            }

            Array.Sort(sorted);

            double Q(double p) => sorted[(int)Math.Round(p * (sorted.Length - 1))];
            double median = Q(0.5), sigma = Math.Max((Q(0.75) - Q(0.25)) / 1.349, 1.0);
            outliers.AddRange(month.Where(i => Math.Abs(t[i] - median) > Math.Max(OutlierSigmas * sigma, OutlierMinimumK)));
        }

        if (outliers.Count > 0)
        {
            outliers.Sort();
            quality.Warn(Inv($"{outliers.Count} hour(s) with a dry-bulb more than {OutlierSigmas:0} standard deviations and {OutlierMinimumK:0} K from their month's median: ") + Examples(outliers, grid, t, typical)
                + "; check the data (the values are used as they are)");
        }
    }

    /// <summary>
    /// Warns when a record of about a year or more has a mean dry-bulb no place at its latitude and elevation has: the
    /// usual sign of a dry-bulb column in the other unit (F read as C lands far above any annual mean; C read as F far
    /// below it). The band is wide on purpose, so it only catches slips; see <see cref="PlausibleAnnualMeanC"/>.
    /// </summary>
    public static void AnnualMeanForLatitude(HourlyGrid grid, double? latitude, double? elevationM, QualityReport quality)
    {
        var t = grid.Columns[WeatherQuantity.DryBulb];
        if (latitude is not double lat || t.Length < 360 * 24)
        {
            return;
        }

        double mean = t.Average();
        var (low, high) = PlausibleAnnualMeanC(lat, elevationM);
        if (mean >= low && mean <= high)
        {
            return;
        }

        // The mean read in the other unit: values written in F but labelled C are (x - 32) / 1.8 in C, and the reverse.
        double asF = (mean - 32) / 1.8, asC = mean * 1.8 + 32;
        string other = asF >= low && asF <= high ? Inv($"; read as F it would be {asF:0.#} C, which fits")
            : asC >= low && asC <= high ? Inv($"; if the values were C read as F it would be {asC:0.#} C, which fits") : string.Empty;
        quality.Warn(Inv($"the mean dry-bulb of the record is {mean:0.#} C, outside {low:0} to {high:0} C, the widest range of annual means at latitude {lat:0.#}")
            + (elevationM is double z ? Inv($" and {z:0} m") : " (elevation unknown)") + other
            + "; check the unit of the dry-bulb column (the values are used as they are)");
    }

    /// <summary>
    /// The widest plausible annual mean dry-bulb at a latitude and elevation, C (recalled from memory, no source: annual
    /// means at sea level are above about 18 C within 20 degrees of the equator and fall to about -20 C near 65 degrees and
    /// -35 C at the poles; no place's annual mean is above about 36 C (the hottest, in the Afar, are near 35 C); the lower
    /// bound falls with the standard lapse rate of 6.5 K/km, or by 26 K when the elevation is unknown).
    /// </summary>
    internal static (double Low, double High) PlausibleAnnualMeanC(double latitude, double? elevationM)
    {
        double a = Math.Abs(latitude);
        double seaLevelLow = a <= 20 ? 18 : a <= 65 ? 18 - (a - 20) * 38 / 45 : -20 - (a - 65) * 15 / 25;
        double high = a <= 30 ? 36 : 36 - (a - 30) * 0.6;
        double lapse = elevationM is double z ? 6.5 * Math.Max(z, 0) / 1000 : 26;
        return (seaLevelLow - lapse, high);
    }

    private static string Examples(List<int> hours, HourlyGrid grid, double[] t, bool typical) =>
        string.Join("; ", hours.Take(QualityReport.MaxExamples).Select(i => Inv($"{grid.Where(i, typical)} {t[i]:0.#} C")));

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
