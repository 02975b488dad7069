using System.Globalization;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The reader's humidity step (DESIGN 5.1 and 5.4): the humidity ratio and dew point of every hour from the first
/// humidity measure the file has (dew point, humidity ratio, wet-bulb, RH, in that order), with the clamps of 5.4
/// counted; dew point and RH taken over liquid water at every temperature, or over ice below 0 C where the map or the
/// options say so (<see cref="HumidityOver"/>). The other measures the file has are checked against the one used:
/// disagreements are counted, not repaired.
/// </summary>
internal static class WeatherHumidity
{
    private const double DewPointClampToleranceK = 1.0;
    private const double RhDisagreementPoints = 5.0;
    private const double TemperatureDisagreementK = 1.0;

    /// <summary>The humidity measure used: the first the file has in the order of preference.</summary>
    public static WeatherQuantity Primary(HourlyGrid grid) =>
        WeatherQuantityFacts.All.Where(f => f.IsHumidity && grid.Columns.ContainsKey(f.Quantity)).MinBy(f => f.HumidityPreference)!.Quantity;

    /// <summary>Humidity ratio (kg/kg) and dew point (C, never above the dry-bulb) of every hour from the measure used.</summary>
    public static (double[] HumidityRatio, double[] DewPointC) Resolve(HourlyGrid grid, double[] pressure, HumidityOver over, RawWeatherTable raw, bool typical)
    {
        var primary = Primary(grid);
        var dryBulb = grid.Columns[WeatherQuantity.DryBulb];
        var given = grid.Columns[primary];
        int n = dryBulb.Length;
        var w = new double[n];
        var dewPoint = new double[n];
        var quality = raw.Quality;
        for (int i = 0; i < n; i++)
        {
            double t = dryBulb[i], p = pressure[i], v = given[i];
            switch (primary)
            {
                case WeatherQuantity.DewPoint:
                    if (v > t)
                    {
                        quality.Count(v - t > DewPointClampToleranceK ? QualityKeys.DewPointAboveDryBulbSuspect : QualityKeys.DewPointAboveDryBulbClamped,
                            Inv($"{grid.Where(i, typical)}: dew point {v:0.0##} C above dry-bulb {t:0.0##} C, set to the dry-bulb"));
                        v = t;
                    }

                    dewPoint[i] = v;
                    w[i] = MoistAir.HumidityRatioFromDewPoint(v, p, over);
                    break;
                case WeatherQuantity.HumidityRatio:
                    double ws = MoistAir.HumidityRatioFromDewPoint(t, p, over); // saturation at the dry-bulb
                    if (v > ws)
                    {
                        quality.Count(QualityKeys.HumidityRatioAboveSaturationClamped,
                            Inv($"{grid.Where(i, typical)}: humidity ratio {v:0.#####} above saturation {ws:0.#####} at {t:0.0#} C, set to saturation"));
                        v = ws;
                    }

                    w[i] = v;
                    dewPoint[i] = HourlyStateSolver.DewPoint(v, p, t, over);
                    break;
                case WeatherQuantity.WetBulb:
                    if (v > t)
                    {
                        quality.Count(QualityKeys.WetBulbAboveDryBulbClamped, Inv($"{grid.Where(i, typical)}: wet-bulb {v:0.0##} C above dry-bulb {t:0.0##} C, set to the dry-bulb"));
                        v = t;
                    }

                    w[i] = FromWetBulb(t, v, p, grid.Lines[i], raw);
                    dewPoint[i] = HourlyStateSolver.DewPoint(w[i], p, t, over);
                    break;
                default:
                    double pw = v / 100.0 * Saturation.VapourPressurePa(t, over);
                    w[i] = MoistAir.HumidityRatioFromVapourPressure(pw, p);
                    dewPoint[i] = pw > 0 ? Math.Min(HourlyStateSolver.DewPointFromVapourPressure(pw, over), t) : Saturation.MinTemperatureC;
                    break;
            }
        }

        return (w, dewPoint);
    }

    /// <summary>The humidity ratio from a wet-bulb (the handbook's eqs. 33 and 35), or an error where no air has that wet-bulb.</summary>
    private static double FromWetBulb(double t, double wetBulb, double p, int line, RawWeatherTable raw)
    {
        try
        {
            return MoistAir.HumidityRatioFromWetBulb(t, wetBulb, p);
        }
        catch (PsychrometricException)
        {
            throw new WeatherDataException(WeatherErrorKind.ValueOutOfRange, raw.File,
                Inv($"the wet-bulb {wetBulb:0.0#} C is too low for the dry-bulb {t:0.0#} C: even perfectly dry air has a higher wet-bulb"),
                "Check the wet-bulb and dry-bulb columns (units, order)", line: line > 0 ? line : null, column: raw.ColumnNames[WeatherQuantity.WetBulb]);
        }
    }

    /// <summary>
    /// Where the file gives both a dew point and an RH, the convention is checked against the file itself: over the hours
    /// with a dew point below 0 C, the RH each reading (over water, over ice) gives from the dew point is compared with
    /// the file's RH column. When the other reading fits clearly better (mean |difference| at least 0.5 points smaller,
    /// and under 1 point), a warning names both figures and the setting; nothing is changed.
    /// </summary>
    public static void CheckConvention(HourlyGrid grid, HumidityOver over, QualityReport quality)
    {
        if (!grid.Columns.TryGetValue(WeatherQuantity.DewPoint, out var dewPoint) || !grid.Columns.TryGetValue(WeatherQuantity.RelativeHumidity, out var rh))
        {
            return;
        }

        var dryBulb = grid.Columns[WeatherQuantity.DryBulb];
        var hours = Enumerable.Range(0, dryBulb.Length).Where(i => dewPoint[i] < 0).ToArray();
        if (hours.Length < 24)
        {
            return;
        }

        double Misfit(HumidityOver reading) => hours.Average(i =>
            Math.Abs(Saturation.VapourPressurePa(Math.Min(dewPoint[i], dryBulb[i]), reading) / Saturation.VapourPressurePa(dryBulb[i], reading) * 100 - rh[i]));
        var other = over == HumidityOver.Water ? HumidityOver.Ice : HumidityOver.Water;
        double used = Misfit(over), alternative = Misfit(other);
        if (alternative <= used - 0.5 && alternative < 1.0)
        {
            quality.Warn(Inv($"the file's RH column fits its dew points better read {HumidityConventions.Words(other)} than {HumidityConventions.Words(over)}, the reading used (mean |difference| {alternative:0.00} vs {used:0.00} RH points over {hours.Length:N0} hours with a dew point below 0 C): if the source reports them {HumidityConventions.Words(other)}, set humidity_over = \"{other.ToString().ToLowerInvariant()}\" (column map, study climate or --humidity-over)"));
        }
    }

    /// <summary>The other humidity measures, checked against the record's states (DESIGN 5.1): disagreements are counted, not repaired.</summary>
    public static void CheckOtherMeasures(HourlyWeather weather, HourlyGrid grid, RawWeatherTable raw, bool typical)
    {
        var primary = Primary(grid);
        foreach (var (q, column) in grid.Columns)
        {
            var facts = WeatherQuantityFacts.Of(q);
            if (q == primary || !facts.IsHumidity)
            {
                continue;
            }

            Func<int, double> expected = q switch
            {
                WeatherQuantity.RelativeHumidity => i => 100.0 * MoistAir.VapourPressureFromHumidityRatio(weather.HumidityRatio[i], weather.PressurePa[i])
                    / Saturation.VapourPressurePa(weather.DryBulbC[i], weather.HumidityOver),
                WeatherQuantity.WetBulb => i => weather.WetBulbC[i],
                WeatherQuantity.DewPoint => i => weather.DewPointC[i],
                _ => i => weather.HumidityRatio[i],
            };
            var (fixedTolerance, relativeTolerance) = q == WeatherQuantity.RelativeHumidity ? (RhDisagreementPoints, 0.0)
                : q == WeatherQuantity.HumidityRatio ? (0.0005, 0.05) : (TemperatureDisagreementK, 0.0);
            string against = WeatherQuantityFacts.Of(primary).Name;
            for (int i = 0; i < column.Length; i++)
            {
                double e = expected(i);
                if (Math.Abs(column[i] - e) > Math.Max(fixedTolerance, relativeTolerance * e))
                {
                    raw.Quality.Count(QualityKeys.DisagreesPrefix + facts.Key,
                        Inv($"{grid.Where(i, typical)}: {facts.Name} {column[i]:0.###} {facts.InternalUnit} in the file, {e:0.###} {facts.InternalUnit} from the {against}"));
                }
            }
        }
    }

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
