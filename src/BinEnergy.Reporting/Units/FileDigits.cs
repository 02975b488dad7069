using System.Globalization;

namespace BinEnergy.Reporting.Units;

/// <summary>
/// How many digits a CSV table keeps of a quantity (Parquet keeps every bit): at most
/// <paramref name="Significant"/> significant digits, and no decimal places beyond
/// <paramref name="MaxDecimals"/>, the finest step that means something for the quantity (0.001 F,
/// 0.001 gr/lb, 1 Btu). The integer part is never cut. So the float noise of a sum
/// (<c>-5.980000000000004</c>) is written <c>-5.98</c>, and a difference that should be zero
/// (<c>1.4e-12</c> kBtu) is written <c>0</c>.
/// </summary>
/// <param name="Significant">Significant digits kept (the figures are estimates: six are more than they warrant, common practice for result tables).</param>
/// <param name="MaxDecimals">Decimal places kept at most.</param>
public readonly record struct FileDigits(int Significant, int MaxDecimals)
{
    /// <summary>Six significant digits, six decimals at most: for pure numbers and columns without a unit.</summary>
    public static FileDigits Default { get; } = new(6, 6);

    /// <summary>Six significant digits with at most <paramref name="maxDecimals"/> decimals.</summary>
    public static FileDigits Decimals(int maxDecimals) => new(6, maxDecimals);

    /// <summary><paramref name="value"/> rounded (half away from zero) to these digits; not-finite values as they are, negative zero as zero.</summary>
    public double Round(double value)
    {
        if (!double.IsFinite(value) || value == 0)
        {
            return value == 0 ? 0.0 : value;
        }

        int magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        int decimals = Math.Clamp(Significant - 1 - magnitude, 0, Math.Min(MaxDecimals, 15));
        double rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        return rounded == 0 ? 0.0 : rounded;
    }

    /// <summary><paramref name="value"/> rounded and written in the shortest invariant form that reads back to the rounded value; empty when not finite.</summary>
    public string Text(double value) => double.IsFinite(value) ? Round(value).ToString("R", CultureInfo.InvariantCulture) : string.Empty;
}
