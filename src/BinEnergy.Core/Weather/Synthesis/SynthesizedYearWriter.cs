using System.Globalization;

namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// Writes a synthesized year in the open CSV layout (<see cref="OpenLayoutWriter"/>) with two
/// metadata lines that say it is invented and how to make it again. Lines end in LF on every
/// system, so the same input and seed give the same bytes everywhere.
/// </summary>
public static class SynthesizedYearWriter
{
    /// <summary>Writes the year; <paramref name="monthlyFileName"/> (a file name, no folder) is recorded in the metadata.</summary>
    public static void Write(SynthesisResult result, string monthlyFileName, TextWriter writer)
    {
        writer.NewLine = "\n";
        OpenLayoutWriter.Write(result.Weather, writer, CommentLines(result, monthlyFileName));
    }

    /// <summary>The whole file as text.</summary>
    public static string ToText(SynthesisResult result, string monthlyFileName)
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        Write(result, monthlyFileName, writer);
        return writer.ToString();
    }

    /// <summary>The metadata lines (without the leading "# ") that mark the file as synthesized.</summary>
    public static IReadOnlyList<string> CommentLines(SynthesisResult result, string monthlyFileName) =>
    [
        "source: synthesized by binenergy synth from monthly statistics (invented weather, not measurements; method in docs/synthesis.md)",
        string.Create(CultureInfo.InvariantCulture,
            $"synthesis: monthly file {Path.GetFileName(monthlyFileName)}, seed {result.Seed}, year {result.Weather.Calendar.Year}"),
    ];
}
