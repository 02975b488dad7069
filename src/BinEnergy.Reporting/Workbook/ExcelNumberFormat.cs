using System.Text.RegularExpressions;

namespace BinEnergy.Reporting.Workbook;

/// <summary>
/// The Excel number format (ECMA-376 part 1, 18.8.31 numFmt) that shows a number as the terminal and the report do with a
/// .NET format: <c>N0</c> is <c>#,##0</c>, <c>N2</c> is <c>#,##0.00</c>; fixed decimals (<c>0.00</c>) and sections
/// (<c>+0.0;-0.0;0.0</c>) are the same in both; optional decimals (<c>0.###</c>), which Excel would end with a bare point
/// on whole numbers, are <c>General</c>.
/// </summary>
public static partial class ExcelNumberFormat
{
    /// <summary>Excel's General format: as many digits as fit.</summary>
    public const string General = "General";

    /// <summary>A whole number with thousands separators (hours, as the terminal shows them).</summary>
    public const string WholeNumber = "#,##0";

    /// <summary>A whole number that is a label (a year, a line), without separators.</summary>
    public const string PlainWholeNumber = "0";

    /// <summary>The Excel format for the .NET format <paramref name="dotnet"/> (General when null).</summary>
    public static string From(string? dotnet)
    {
        if (string.IsNullOrEmpty(dotnet) || OptionalDecimals().IsMatch(dotnet))
        {
            return General;
        }

        var n = GroupedDecimals().Match(dotnet);
        if (n.Success)
        {
            int decimals = n.Groups[1].Length == 0 ? 2 : int.Parse(n.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
            return decimals == 0 ? "#,##0" : "#,##0." + new string('0', decimals);
        }

        return dotnet;
    }

    [GeneratedRegex(@"^0\.#+$")]
    private static partial Regex OptionalDecimals();

    [GeneratedRegex(@"^[Nn](\d*)$")]
    private static partial Regex GroupedDecimals();
}
