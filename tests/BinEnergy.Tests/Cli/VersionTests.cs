using BinEnergy.Core.Study;

namespace BinEnergy.Tests.Cli;

/// <summary><c>binenergy --version</c>: the tool's version and the same engine version every output records.</summary>
public sealed class VersionTests
{
    [Theory]
    [InlineData("--version")]
    [InlineData("-v")]
    public void Version_PrintsTheToolAndEngineVersions(string option)
    {
        var (code, stdout, stderr) = AirCommandTests.Run(option);
        Assert.Equal(0, code);
        Assert.Equal("", stderr);
        Assert.Equal($"binenergy {BinEnergy.Cli.CliApp.ToolVersion} (engine {StudyRunner.EngineVersion})", stdout.Trim());
        Assert.Matches(@"^binenergy \d+\.\d+\.\d+ \(engine \d+\.\d+\.\d+\)$", stdout.Trim()); // semantic versions (common practice)
    }
}
