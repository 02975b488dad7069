using BinEnergy.Core.Study;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Study;

public class StudyDocsTests
{
    [Fact]
    public void StudyReference_NamesEveryKeyTheReaderAccepts()
    {
        string doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "study.md"));
        var missing = StudySchema.Sections
            .SelectMany(s => s.Keys.SelectMany(k => k.Alternatives.Select(a => (s.Name, a.Key))))
            .Where(p => !doc.Contains(p.Key, StringComparison.Ordinal)
                && !doc.Contains(p.Key[(p.Key.LastIndexOf('_') + 1)..], StringComparison.Ordinal))
            .Select(p => p.Name + "." + p.Key)
            .ToList();
        Assert.Empty(missing);
    }

    [Fact]
    public void StudyReference_ExampleIsTheContractExample()
    {
        string doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "study.md"));
        foreach (var line in ExampleStudy.Text.Split('\n').Where(l => l.Length > 0))
        {
            Assert.Contains(line, doc, StringComparison.Ordinal);
        }
    }
}
