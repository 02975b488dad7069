using System.Globalization;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Data-sanity checks of the reader: values that are physical one by one but not together. A dew point above the
/// dry-bulb in a large share of the hours is a unit slip (a column in the other unit) and stops the read; single-hour
/// spikes and hours far outside their month's own spread are warned about with examples and used as they are.
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
            var sorted = month.Select(i => t[i]).Order().ToArray();
            if (sorted.Length < 24 * 7)
            {
                continue;
            }

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

    private static string Examples(List<int> hours, HourlyGrid grid, double[] t, bool typical) =>
        string.Join("; ", hours.Take(QualityReport.MaxExamples).Select(i => Inv($"{grid.Where(i, typical)} {t[i]:0.#} C")));

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
