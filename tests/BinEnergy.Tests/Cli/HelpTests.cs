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

    /// <summary>An option that sets a study key takes its help from the study schema: the key's description, its units in both systems, its default, and the key to write in a study file.</summary>
    [Fact]
    public void StudyKeyOptions_TakeTheirHelpFromTheStudySchema()
    {
        // Collapse the help's line wrapping so phrases can be searched whole.
        string help = string.Join(" ", AirCommandTests.Run("economizer", "--help").Out.Split((char[])['\n', ' '], StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("--supply-temp <T> Supply (coil-leaving) air temperature. In F (ip) or C (si). Required. Study file: [economizer] supply_temp_<unit>", help, StringComparison.Ordinal);
        Assert.Contains("--design-load <Q> Building sensible cooling load at the design outdoor temperature. In Btu/h (ip) or kW (si). Required.", help, StringComparison.Ordinal);
        Assert.Contains("--high-limit-drybulb <T> Dry-bulb high limit; the local energy code governs. In F (ip) or C (si). Default 75 F (23.9 C), recalled from memory.", help, StringComparison.Ordinal);
        string air = string.Join(" ", AirCommandTests.Run("outdoor-air", "--help").Out.Split((char[])['\n', ' '], StringSplitOptions.RemoveEmptyEntries));

        // The unit comes from the key's own spellings: per_area_cfm is cfm/ft2, not cfm.
        Assert.Contains("--per-area <RATE> Outdoor air per unit floor area, from the standard your code adopts. In cfm/ft2 (ip) or L/s per m2 (si).", air, StringComparison.Ordinal);
    }
}
