using BinEnergy.Core.Study;

namespace BinEnergy.Tests.Study;

/// <summary>Every number a study file (and so every option that sets a study key) can give is bounded below and above.</summary>
public sealed class StudySchemaBoundsTests
{
    [Fact]
    public void EveryNumberKey_HasALowerAndAnUpperBound()
    {
        var numbers = StudySchema.Sections.SelectMany(s => s.Keys.Select(k => (Section: s.Name, Key: k)))
            .Where(x => x.Key.Kind is ValueKind.Number or ValueKind.NumberList or ValueKind.NumberOrPoints).ToList();
        Assert.True(numbers.Count > 60, $"only {numbers.Count} number keys found");
        var unbounded = numbers.Where(x => x.Key.Min is null || x.Key.Max is null || !double.IsFinite(x.Key.Max.Value)).Select(x => $"[{x.Section}] {x.Key.Name}").ToList();
        Assert.True(unbounded.Count == 0, "keys without a plausible range: " + string.Join(", ", unbounded));
    }
}
