using BinEnergy.Core.Study;

namespace BinEnergy.Tests.Cli;

/// <summary><c>binenergy --version</c>: the same engine version every output records.</summary>
public sealed class VersionTests
{
    [Theory]
    [InlineData("--version")]
    [InlineData("-v")]
    public void Version_PrintsTheEngineVersion(string option)
    {
        var (code, stdout, stderr) = AirCommandTests.Run(option);
        Assert.Equal(0, code);
        Assert.Equal("", stderr);
        Assert.Equal(StudyRunner.EngineVersion, stdout.Trim());
        Assert.Matches(@"^\d+\.\d+\.\d+", stdout.Trim()); // a semantic version (common practice)
    }
}
