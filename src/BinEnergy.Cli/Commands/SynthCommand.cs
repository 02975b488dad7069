using System.ComponentModel;
using System.Globalization;
using System.IO.Compression;
using System.Text;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather.Synthesis;
using Spectre.Console;
using Spectre.Console.Cli;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy synth</c>: an hourly weather year in the open layout, synthesized from a
/// monthly-statistics file with a seed (<see cref="WeatherSynthesizer"/>). Refuses to replace
/// an existing file unless <c>--force</c>; writes to a temporary name and moves it into place,
/// so a failure never leaves a half-written file.
/// </summary>
public sealed class SynthCommand : Command<SynthCommand.Settings>
{
    public sealed class Settings : CommonSettings
    {
        [CommandOption("--monthly <FILE>")]
        [Description("Monthly statistics (CSV: month, drybulb_max_c|f, drybulb_min_c|f, dewpoint_c|f, daily_mean_sd_k|f; see docs/synthesis.md). Required.")]
        public string? Monthly { get; init; }

        [CommandOption("--seed <N>")]
        [Description("Seed of the random sequence (a whole number, 0 or more); the same seed gives the same file. Required.")]
        public ulong? Seed { get; init; }

        [CommandOption("--out <FILE>")]
        [Description("The hourly file to write (open layout; .csv, or .csv.gz for gzip). Required.")]
        public string? Out { get; init; }

        [CommandOption("--year <Y>")]
        [Description("Calendar year of the dates and weekdays: a non-leap year from 1900 to 2100. Default 2018 (it starts on a Monday).")]
        [DefaultValue(Core.Weather.CalendarInfo.DefaultTypicalYear)]
        public int Year { get; init; } = Core.Weather.CalendarInfo.DefaultTypicalYear;

        [CommandOption("--force")]
        [Description("Replace --out if it exists.")]
        public bool Force { get; init; }
    }

    /// <summary>Monthly errors above these are shown as warnings (the synthesizer normally meets them by far).</summary>
    private const double ExtremeToleranceK = 0.5, RangeToleranceK = 1.0, DewPointToleranceK = 0.5;

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        var units = settings.UnitSystem;
        string monthly = settings.Monthly ?? throw new UsageException("--monthly FILE is required (the monthly statistics to synthesize from)");
        ulong seed = settings.Seed ?? throw new UsageException("--seed N is required (any whole number; the same seed gives the same weather)");
        string outPath = settings.Out ?? throw new UsageException("--out FILE.csv is required (where to write the hourly year)");
        if (settings.Year < 1900 || settings.Year > 2100 || DateTime.IsLeapYear(settings.Year))
        {
            throw new UsageException($"--year {settings.Year} must be a non-leap year from 1900 to 2100 (the synthesized year has 365 days)");
        }

        string fullOut = Path.GetFullPath(outPath);
        string? folder = Path.GetDirectoryName(fullOut);
        if (folder is null || !Directory.Exists(folder))
        {
            throw new UsageException($"the folder of --out {outPath} does not exist; create it first");
        }

        if (File.Exists(fullOut) && !settings.Force)
        {
            throw new UsageException($"{outPath} exists; add --force to replace it, or choose another --out");
        }

        var climate = MonthlyClimateReader.Read(monthly);
        var result = WeatherSynthesizer.Synthesize(climate, seed, settings.Year);
        WriteAtomically(result, monthly, fullOut, settings.Force, outPath);

        if (settings.Json)
        {
            output.WriteJson(ToJson(result, outPath, units));
        }
        else
        {
            Render(output.Console, result, climate, outPath, units);
        }

        return ExitCodes.Ok;
    }

    private static void WriteAtomically(SynthesisResult result, string monthly, string fullOut, bool force, string shownOut)
    {
        string temp = Path.Combine(Path.GetDirectoryName(fullOut)!,
            string.Create(CultureInfo.InvariantCulture, $".{Path.GetFileName(fullOut)}.{Environment.ProcessId}.tmp"));
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            using (Stream body = fullOut.EndsWith(".gz", StringComparison.OrdinalIgnoreCase)
                ? new GZipStream(stream, CompressionLevel.Optimal)
                : stream)
            using (var writer = new StreamWriter(body, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false)))
            {
                SynthesizedYearWriter.Write(result, monthly, writer);
            }

            File.Move(temp, fullOut, overwrite: force);
        }
        catch (IOException) when (!force && File.Exists(fullOut))
        {
            throw new UsageException($"{shownOut} appeared while writing; add --force to replace it, or choose another --out");
        }
        finally
        {
            if (File.Exists(temp))
            {
                File.Delete(temp);
            }
        }
    }

    private static double Temp(double c, UnitSystem u) => Temperature.FromCelsius(c).In(u);

    private static double Diff(double k, UnitSystem u) => TemperatureDifference.FromKelvin(k).In(u);

    private static Dictionary<string, object?> ToJson(SynthesisResult r, string outPath, UnitSystem u) => new()
    {
        ["out"] = outPath,
        ["hours"] = r.Weather.Count,
        ["seed"] = r.Seed,
        ["year"] = r.Weather.Calendar.Year,
        ["temperature_passes"] = r.TemperaturePasses,
        ["dewpoint_passes"] = r.DewPointPasses,
        ["range_floored_days"] = r.RangeFlooredDays,
        ["months"] = r.Months.Select(m => new Dictionary<string, object?>
        {
            ["month"] = m.Month,
            ["drybulb_max_target"] = Temp(m.TargetMaxC, u),
            ["drybulb_max"] = Temp(m.MaxC, u),
            ["drybulb_min_target"] = Temp(m.TargetMinC, u),
            ["drybulb_min"] = Temp(m.MinC, u),
            ["dewpoint_target"] = Temp(m.TargetDewPointC, u),
            ["dewpoint"] = Temp(m.DewPointC, u),
            ["spread_target"] = Diff(m.TargetSpreadK, u),
            ["spread"] = Diff(m.SpreadK, u),
        }).ToArray(),
        ["units"] = u == UnitSystem.IP ? "F (spreads in F degrees)" : "C (spreads in K)",
    };

    private static void Render(IAnsiConsole console, SynthesisResult r, MonthlyClimate climate, string outPath, UnitSystem u)
    {
        string t = u == UnitSystem.IP ? "F" : "C";
        string d = u == UnitSystem.IP ? "F" : "K";
        var table = new Table().Border(TableBorder.Rounded)
            .Title(Markup.Escape($"{climate.Name}: monthly statistics asked for / made"));
        table.AddColumn("Month");
        foreach (var head in new[] { $"Max {t}", $"Min {t}", $"Range {d}", $"Dew point {t}", $"Spread {d}" })
        {
            table.AddColumn(new TableColumn(head).RightAligned());
        }

        string Pair(double target, double made) => string.Create(CultureInfo.InvariantCulture, $"{target:0.0} / {made:0.0}");
        foreach (var m in r.Months)
        {
            table.AddRow(
                CultureInfo.InvariantCulture.DateTimeFormat.GetAbbreviatedMonthName(m.Month),
                Pair(Temp(m.TargetMaxC, u), Temp(m.MaxC, u)),
                Pair(Temp(m.TargetMinC, u), Temp(m.MinC, u)),
                Pair(Diff(m.TargetRangeK, u), Diff(m.RangeK, u)),
                Pair(Temp(m.TargetDewPointC, u), Temp(m.DewPointC, u)),
                Pair(Diff(m.TargetSpreadK, u), Diff(m.SpreadK, u)));
        }

        console.Write(table);
        string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
        string pressure = u == UnitSystem.IP
            ? Inv($"{Pressure.FromPascals(r.Weather.Site.SitePressurePa).In(u):0.000} psia (standard atmosphere at {Length.FromMetres(climate.ElevationM).Feet:0} ft)")
            : Inv($"{r.Weather.Site.SitePressurePa / 1000.0:0.00} kPa (standard atmosphere at {climate.ElevationM:0} m)");
        console.WriteLine(Inv($"Wrote {outPath}: {r.Weather.Count:N0} hours of {r.Weather.Calendar.Year}, seed {r.Seed}, station pressure {pressure}."));
        console.WriteLine(Inv($"The sample was corrected toward the monthly targets: {r.TemperaturePasses} passes for the daily maxima and minima, {r.DewPointPasses} for the dew points; largest monthly errors {Diff(r.WorstExtremeErrorK, u):0.000} {d} (max/min), {Diff(r.WorstRangeErrorK, u):0.000} {d} (range), {Diff(r.WorstDewPointErrorK, u):0.000} {d} (dew point). The spread is not corrected."));
        if (r.RangeFlooredDays > 0)
        {
            console.WriteLine(Inv($"Repaired: {r.RangeFlooredDays} days drawn with a daily range under {WeatherSynthesizer.MinDailyRangeK} K were raised to it."));
        }

        if (r.WorstExtremeErrorK > ExtremeToleranceK || r.WorstRangeErrorK > RangeToleranceK || r.WorstDewPointErrorK > DewPointToleranceK)
        {
            console.MarkupLine("[yellow]Warning:[/] the synthesized year misses its monthly targets by more than 0.5 K (max, min, dew point) or 1 K (range); check the monthly file (a dew point close to the daily minimum cannot always be met).");
        }

        console.WriteLine("Caution: this is invented weather that imitates monthly statistics, not a measured or typical year. Use it to explore and compare options; size equipment and show compliance with measured design data for the site, under the codes in force there and the judgement of a licensed engineer.");
    }
}
