using BinEnergy.Reporting.Tables;
using Spectre.Console;

namespace BinEnergy.Cli;

/// <summary>Where commands write: a Spectre console for tables, raw writers for JSON, CSV and diagnostics.</summary>
/// <param name="Console">The console for tables and text (standard output).</param>
/// <param name="Out">Standard output, for machine-readable data.</param>
/// <param name="Error">Standard error, for diagnostics and progress.</param>
public sealed record CommandOutput(IAnsiConsole Console, TextWriter Out, TextWriter Error)
{
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

    /// <summary>
    /// The full path of the file a command writes (<c>--out</c>), after the checks every such command makes: it is given,
    /// differs from the input (named <paramref name="inputName"/> in the message), its folder exists, and it does not exist unless <paramref name="force"/> (exit 3 then).
    /// </summary>
    public static string TargetFile(string? outPath, string input, bool force, string what, string inputName = "input")
    {
        if (string.IsNullOrWhiteSpace(outPath))
        {
            throw new UsageException($"--out FILE.csv is required: {what}");
        }

        string target = Path.GetFullPath(outPath);
        if (string.Equals(target, Path.GetFullPath(input), StringComparison.Ordinal))
        {
            throw new UsageException($"--out must differ from the {inputName} file (it would be overwritten)");
        }

        if (Path.GetDirectoryName(target) is not { } folder || !Directory.Exists(folder))
        {
            throw new UsageException($"the folder of --out {outPath} does not exist; create it first");
        }

        return File.Exists(target) && !force ? throw InTheWay(outPath) : target;
    }

    /// <summary>The error for an output file that exists without <c>--force</c>.</summary>
    public static OutputFolderException InTheWay(string outPath) => new($"{outPath} exists; add --force to replace it, or choose another --out");
}
