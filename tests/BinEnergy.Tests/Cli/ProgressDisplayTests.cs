using BinEnergy.Cli;
using Spectre.Console;

namespace BinEnergy.Tests.Cli;

/// <summary>Without a terminal a long command says how far it is on standard error, once per tenth, so a log or a cluster job shows it is alive.</summary>
public sealed class ProgressDisplayTests
{
    [Fact]
    public void WithoutATerminal_OneLinePerTenth_WithCountRateAndTimeLeft()
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(stdout), Ansi = AnsiSupport.No, Interactive = InteractionSupport.No });
        ProgressDisplay.Run(new CommandOutput(console, stdout, stderr), new BinEnergy.Cli.Commands.RunCommand.Settings(), "a study", 200, "cases", step =>
            {
                for (int i = 0; i < 200; i++)
                {
                    step(null);
                }
            }, quiet: TimeSpan.Zero);

        var lines = stderr.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(10, lines.Length);
        Assert.StartsWith("binenergy:  10 % (20/200 cases, ", lines[0], StringComparison.Ordinal);
        Assert.StartsWith("binenergy: 100 % (200/200 cases, ", lines[^1], StringComparison.Ordinal);
        Assert.EndsWith(" 0 s left)", lines[^1], StringComparison.Ordinal);
        Assert.Equal(string.Empty, stdout.ToString());
    }
}
