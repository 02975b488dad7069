using System.Text.RegularExpressions;
using BinEnergy.Cli;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Cli;

/// <summary>
/// Every <c>binenergy</c> command and option that README.md and docs/*.md show exists, on the command it is shown
/// with: the docs are read for code (inline spans and fenced blocks), the commands and options from the command
/// line's own registry and settings types, so a renamed or removed option fails here instead of misleading a reader.
/// </summary>
public sealed partial class DocsMentionRealOptionsTests
{
    /// <summary>Programs other than binenergy whose options the docs show (build, test, cluster and browser tools).</summary>
    private static readonly string[] OtherPrograms = ["dotnet", "npm", "sbatch", "srun", "squeue", "kubectl", "chromium", "pdftotext", "node", "git", "duplicates", "hyperfine", "apt-get"];

    /// <summary>Options of those programs that the docs name on their own, in prose or on a continued line.</summary>
    private static readonly HashSet<string> OtherOptions =
    [
        "--array", "--parsable", "--export", "--dependency", "--job-name", "--wrap", "--cpus-per-task", // Slurm's sbatch
        "--for", // kubectl wait
        "--job", // BenchmarkDotNet
        "--print-to-pdf", // Chromium
    ];

    private static IEnumerable<string> Documents() =>
        new[] { Path.Combine(RepoPaths.Root, "README.md"), Path.Combine(RepoPaths.Root, "DEVELOPERS.md") }
            .Concat(Directory.EnumerateFiles(Path.Combine(RepoPaths.Root, "docs"), "*.md"));

    /// <summary>The commands and the long options each takes (from its settings type and the types it derives from).</summary>
    private static Dictionary<string, HashSet<string>> Commands()
    {
        AirCommandTests.Run("--help"); // registers the commands
        var commands = CommandRegistry.SettingsTypes.ToDictionary(kv => kv.Key, kv => Options(kv.Value), StringComparer.Ordinal);
        Assert.True(commands.Count >= 11, "the registry lists " + commands.Count + " commands");
        return commands;
    }

    private static HashSet<string> Options(Type settings) =>
        UsageMessages.OptionNames(settings).Select(n => "--" + n).Append("--help").ToHashSet(StringComparer.Ordinal);

    /// <summary>Each piece of code in a Markdown file (an inline span, or a line of a fenced block) with its line number.</summary>
    private static IEnumerable<(int Line, string Code)> CodeOf(string file)
    {
        bool fenced = false;
        int n = 0;
        foreach (string line in File.ReadLines(file))
        {
            n++;
            if (line.TrimStart().StartsWith("```", StringComparison.Ordinal))
            {
                fenced = !fenced;
                continue;
            }

            if (fenced)
            {
                yield return (n, line);
                continue;
            }

            foreach (Match m in InlineCode().Matches(line))
            {
                yield return (n, m.Groups[1].Value);
            }
        }
    }

    [Fact]
    public void EveryCommandAndOptionInTheDocs_Exists()
    {
        var commands = Commands();
        var every = commands.Values.SelectMany(o => o).Append("--version").ToHashSet(StringComparer.Ordinal);
        Assert.Empty(OtherOptions.Intersect(every)); // none of them is also ours, so none hides a mistake
        var wrong = new List<string>();
        int checkedOptions = 0;
        foreach (string file in Documents())
        {
            string name = Path.GetRelativePath(RepoPaths.Root, file);
            foreach (var (line, raw) in CodeOf(file))
            {
                // "dotnet run --project src/BinEnergy.Cli -- demo" runs binenergy too.
                string code = DotnetRun().Replace(raw, "binenergy ");
                bool ours = code.Contains("binenergy", StringComparison.Ordinal);
                if (!ours && OtherPrograms.Any(p => Regex.IsMatch(code, $@"(^|[\s/]){Regex.Escape(p)}(\s|$)")))
                {
                    continue;
                }

                foreach (Match command in CommandWord().Matches(code))
                {
                    string word = command.Groups[1].Value;
                    if (!commands.ContainsKey(word))
                    {
                        wrong.Add($"{name}:{line}: binenergy has no command '{word}' ({code.Trim()})");
                    }
                }

                // Options after "binenergy COMMAND" belong to that command; options on their own to some command.
                var segments = Segment().Matches(code).Select(m => (Command: m.Groups[1].Value, Text: m.Groups[2].Value)).ToList();
                var loose = segments.Count == 0 ? code : code[..code.IndexOf("binenergy", StringComparison.Ordinal)];
                foreach (Match o in OptionWord().Matches(loose))
                {
                    checkedOptions++;
                    if (!every.Contains(o.Value) && !OtherOptions.Contains(o.Value))
                    {
                        wrong.Add($"{name}:{line}: no binenergy command takes {o.Value} ({code.Trim()})");
                    }
                }

                foreach (var (command, text) in segments.Where(s => commands.ContainsKey(s.Command)))
                {
                    foreach (Match o in OptionWord().Matches(text))
                    {
                        checkedOptions++;
                        if (!commands[command].Contains(o.Value) && !(command.Length == 0 && o.Value == "--version"))
                        {
                            wrong.Add($"{name}:{line}: binenergy {command} has no option {o.Value} ({code.Trim()})");
                        }
                    }
                }
            }
        }

        Assert.True(wrong.Count == 0, string.Join("\n", wrong));
        Assert.True(checkedOptions > 150, $"only {checkedOptions} options were found in the docs: the reader of the docs is broken");
    }

    [Fact]
    public void TheChecker_CatchesAnOptionThatDoesNotExist()
    {
        var commands = Commands();
        Assert.Contains("--airflow", commands["outdoor-air"]);
        Assert.DoesNotContain("--airflow", commands["inspect"]);
        Assert.DoesNotContain("--charts-for-everything", commands.Values.SelectMany(o => o));
        var segments = Segment().Matches("binenergy inspect weather.csv --airflow 100").Select(m => (m.Groups[1].Value, m.Groups[2].Value)).ToList();
        Assert.Equal([("inspect", " weather.csv --airflow 100")], segments);
    }

    [GeneratedRegex(@"`([^`]+)`")]
    private static partial Regex InlineCode();

    [GeneratedRegex(@"dotnet run (--project \S+ )?(--no-build )?(-c \S+ )?--project \S+ (--no-build )?-- |dotnet run (--no-build )?--project \S+ (--no-build )?-- ")]
    private static partial Regex DotnetRun();

    [GeneratedRegex(@"\bbinenergy ([a-z][a-z-]*)\b")]
    private static partial Regex CommandWord();

    [GeneratedRegex(@"\bbinenergy ([a-z][a-z-]*)?((?:(?!\bbinenergy\b).)*)")]
    private static partial Regex Segment();

    [GeneratedRegex(@"(?<![\w-])--[a-z][a-z0-9-]*")]
    private static partial Regex OptionWord();
}
