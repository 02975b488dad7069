using BinEnergy.Core.Units;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Cli;

/// <summary>Options every command takes: the display units and the output format.</summary>
public class CommonSettings : OutputSettings
{
    [CommandOption("--units <UNITS>"), Description("Display units: ip (F, Btu, cfm) or si (C, kWh, L/s). Default ip."), TypeConverter(typeof(UnitSystemChoice))]
    public UnitSystem Units { get; init; } = UnitSystem.IP;

    /// <summary>The display units of the outputs.</summary>
    public DisplayUnits DisplayUnits => new(Units);
}

/// <summary>How a command writes its results: JSON, or text in a format.</summary>
public class OutputSettings : CommandSettings
{
    [CommandOption("--json"), Description("Write one JSON object to standard output instead of tables.")]
    public bool Json { get; init; }

    [CommandOption("--format <FORMAT>"), Description("Text output: table (default), tsv (pastes into a spreadsheet) or markdown."), TypeConverter(typeof(TextFormatChoice))]
    public TextFormat Format { get; init; } = TextFormat.Table;

    /// <summary>The message of the first broken rule as the validation error; when none is broken, <paramref name="otherwise"/> (the base class's checks).</summary>
    protected static Spectre.Console.ValidationResult FirstBroken(Func<Spectre.Console.ValidationResult> otherwise, params (bool Broken, string Message)[] rules) =>
        rules.FirstOrDefault(r => r.Broken) is { Broken: true } broken ? Spectre.Console.ValidationResult.Error(broken.Message) : otherwise();
}
