namespace BinEnergy.Core.Climate;

/// <summary>Names of the degree-day methods as outputs and study files write them.</summary>
public static class DegreeDayMethods
{
    /// <summary>Every method.</summary>
    public static IReadOnlyList<DegreeDayMethod> All { get; } = [DegreeDayMethod.DailyMean, DegreeDayMethod.Hourly, DegreeDayMethod.MaxMin];

    /// <summary>The name in outputs and study files: <c>daily-mean</c>, <c>hourly</c>, <c>max-min</c>.</summary>
    public static string Name(DegreeDayMethod method) => method switch
    {
        DegreeDayMethod.Hourly => "hourly",
        DegreeDayMethod.MaxMin => "max-min",
        _ => "daily-mean",
    };

    /// <summary>The method in words, for every output that shows degree-days.</summary>
    public static string Describe(DegreeDayMethod method) => method switch
    {
        DegreeDayMethod.Hourly => "degree-hours / 24 (each hour on its own)",
        DegreeDayMethod.MaxMin => "from daily (max + min) / 2 temperatures",
        _ => "from daily mean temperatures (the mean of each day's hours)",
    };

    /// <summary>Reads a method name; false for anything else.</summary>
    public static bool TryParse(string? text, out DegreeDayMethod method)
    {
        var found = All.Where(m => Name(m) == text?.Trim().ToLowerInvariant()).ToList();
        method = found.Count == 1 ? found[0] : DegreeDayMethod.DailyMean;
        return found.Count == 1;
    }
}
