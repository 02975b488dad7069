using System.Text.Json;
using Spectre.Console;

namespace BinEnergy.Cli;

/// <summary>Where commands write: a Spectre console for tables, raw writers for JSON and diagnostics.</summary>
public sealed class CommandOutput(IAnsiConsole console, TextWriter stdout, TextWriter stderr)
{
    private static readonly JsonSerializerOptions JsonOptions = new() { WriteIndented = true };

    /// <summary>The console for tables and text (standard output).</summary>
    public IAnsiConsole Console { get; } = console;

    /// <summary>Standard output, for machine-readable data.</summary>
    public TextWriter Out { get; } = stdout;

    /// <summary>Standard error, for diagnostics and progress.</summary>
    public TextWriter Error { get; } = stderr;

    /// <summary>Writes one JSON document to standard output.</summary>
    public void WriteJson(object value)
    {
        Out.WriteLine(JsonSerializer.Serialize(value, JsonOptions));
    }
}
