using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using Spectre.Console;

namespace BinEnergy.Cli;

/// <summary>Where commands write: a Spectre console for tables, raw writers for JSON, CSV and diagnostics.</summary>
public sealed class CommandOutput(IAnsiConsole console, TextWriter stdout, TextWriter stderr)
{
    /// <summary>The console for tables and text (standard output).</summary>
    public IAnsiConsole Console { get; } = console;

    /// <summary>Standard output, for machine-readable data.</summary>
    public TextWriter Out { get; } = stdout;

    /// <summary>Standard error, for diagnostics and progress.</summary>
    public TextWriter Error { get; } = stderr;

    /// <summary>
    /// Writes a command's document in the format the options ask for: JSON, CSV of its main table,
    /// or text. With JSON or CSV, the warnings also go to standard error so a person sees them.
    /// </summary>
    public void Write(ResultDocument document, OutputSettings settings, bool csv = false)
    {
        if (settings.Json && csv)
        {
            throw new UsageException("give --csv or --json, not both");
        }

        if (settings.Json || csv)
        {
            foreach (var w in document.NotesOf(NoteKind.Warning))
            {
                Error.WriteLine("binenergy: warning: " + PrintableText.Of(w));
            }
        }

        if (settings.Json)
        {
            Out.WriteLine(JsonRenderer.Render(document));
        }
        else if (csv)
        {
            CsvTableWriter.Write(document.Table(document.CsvTable ?? throw new UsageException("this command has no CSV table; use --json")), Out);
        }
        else
        {
            TextRenderer.Render(document, settings.Format, Console, Out);
        }
    }
}
