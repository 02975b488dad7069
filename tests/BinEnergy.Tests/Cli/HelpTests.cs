namespace BinEnergy.Tests.Cli;

/// <summary>Every command's help is printed (help text is rendered as markup, so a stray bracket would crash it).</summary>
public sealed class HelpTests
{
    [Fact]
    public void EveryCommandsHelp_ExitsZero_AndNamesTheCommand()
    {
        var (code, top, _) = AirCommandTests.Run("--help");
        Assert.Equal(0, code);
        var commands = top[(top.IndexOf("COMMANDS:", StringComparison.Ordinal) + "COMMANDS:".Length)..]
            .Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Select(l => l.Split(' ')[0])
            .Where(w => w.Length > 0)
            .ToList();
        Assert.Contains("run", commands);
        Assert.Contains("inspect", commands);
        foreach (string command in commands)
        {
            var (c, help, err) = AirCommandTests.Run(command, "--help");
            Assert.True(c == 0, $"{command} --help exited {c}: {err}");
            Assert.Contains("binenergy " + command, help, StringComparison.Ordinal);
        }

        Assert.Contains("[study] units", AirCommandTests.Run("run", "--help").Out, StringComparison.Ordinal);
    }
}
