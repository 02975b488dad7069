using BinEnergy.Reporting.Charts;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Reporting;

/// <summary>Saves chart images for a person to review, under tests/BinEnergy.Tests/artifacts/
/// (git-ignored).</summary>
internal static class ChartReview
{
    public static string Folder { get; } = Path.Combine(RepoPaths.Root, "tests", "BinEnergy.Tests", "artifacts", "charts");

    public static void Save(RenderedChart chart, string caseName)
    {
        Directory.CreateDirectory(Folder);
        File.WriteAllBytes(Path.Combine(Folder, $"{chart.FileStem}--{caseName}.png"), chart.Png);
        File.WriteAllText(Path.Combine(Folder, $"{chart.FileStem}--{caseName}.svg"), chart.Svg);
    }
}
