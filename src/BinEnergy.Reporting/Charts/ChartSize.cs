namespace BinEnergy.Reporting.Charts;

/// <summary>Image size in pixels. <see cref="Report"/> (900 x 500) is the size charts are
/// designed and checked at.</summary>
public readonly record struct ChartSize(int Width, int Height)
{
    /// <summary>The report size, 900 x 500 px.</summary>
    public static ChartSize Report { get; } = new(900, 500);
}
