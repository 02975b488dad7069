using System.ComponentModel;
using BinEnergy.Core.Units;
using Spectre.Console.Cli;

namespace BinEnergy.Cli;

/// <summary>Options every command takes: the display units and machine-readable output.</summary>
public class CommonSettings : CommandSettings
{
    [CommandOption("--units <UNITS>")]
    [Description("Display units: ip (F, Btu, cfm) or si (C, kWh, L/s). Default ip.")]
    [DefaultValue("ip")]
    public string Units { get; init; } = "ip";

    [CommandOption("--json")]
    [Description("Write one JSON object to standard output instead of tables.")]
    public bool Json { get; init; }

    /// <summary>The parsed unit system.</summary>
    public UnitSystem UnitSystem => Units.ToLowerInvariant() switch
    {
        "ip" => UnitSystem.IP,
        "si" => UnitSystem.SI,
        _ => throw new UsageException($"--units must be ip or si, not '{Units}'"),
    };
}
