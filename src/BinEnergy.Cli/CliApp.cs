using System.Reflection;
using BinEnergy.Core.Errors;
using BinEnergy.Core.Psychrometrics;
using Spectre.Console;

namespace BinEnergy.Cli;

/// <summary>
/// The <c>binenergy</c> command line: registers the commands and maps failures to exit
/// codes (0 ok, 2 usage, 3 bad input data, 1 unexpected). Data goes to standard output,
/// diagnostics to standard error.
/// </summary>
public static class CliApp
{
    /// <summary>The version of the <c>binenergy</c> tool (its package version).</summary>
    public static string ToolVersion { get; } =
        typeof(CliApp).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0.0.0";

    /// <summary>What <c>--version</c> prints: the tool's version and the engine version every output records.</summary>
    public static string VersionLine => $"binenergy {ToolVersion} (engine {Core.Study.StudyRunner.EngineVersion})";

    /// <summary>Runs the command line with the given writers (tests pass their own).</summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        bool terminal = stdout == Console.Out && !Console.IsOutputRedirected;
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(stdout),
            Ansi = terminal ? AnsiSupport.Detect : AnsiSupport.No,
            ColorSystem = terminal ? ColorSystemSupport.Detect : ColorSystemSupport.NoColors,
        });
        if (!terminal)
        {
            console.Profile.Width = 160;
        }

        var app = new CommandApp();
        app.Configure(config =>
        {
            config.SetApplicationName("binenergy");
            config.SetApplicationVersion(VersionLine);
            config.ConfigureConsole(console);
            config.PropagateExceptions();
            config.Settings.StrictParsing = true;
            CommandRegistry.Register(config, new CommandOutput(console, stdout, stderr));
        });

        string? command = args.FirstOrDefault(a => CommandRegistry.SettingsTypes.ContainsKey(a));

        // Ctrl-C asks the command to stop between steps (a batch writes what it finished, so --resume goes on); a second Ctrl-C ends the process.
        using var stop = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) => e.Cancel = !stop.IsCancellationRequested && StopRequested(stop, stderr);
        Console.CancelKeyPress += onCancel;
        try
        {
            if (Array.IndexOf(args, "-") >= 0)
            {
                throw new UsageException("'-' (standard input) is not read: give the path of a file (save a stream to a file first)");
            }

            return app.Run(args, stop.Token);
        }
        catch (Exception e)
        {
            var (code, message) = e switch
            {
                OperationCanceledException when stop.IsCancellationRequested => (ExitCodes.Interrupted, "stopped (Ctrl-C); no output was left half-written"),
                CommandParseException or CommandRuntimeException => (ExitCodes.Usage, Inner<UsageException>(e)?.Message ?? UsageMessages.Explain(e.Message, command, args)),
                UsageException => (ExitCodes.Usage, e.Message),
                PsychrometricException p => (ExitCodes.Usage, p.Reason),
                InputDataException => (ExitCodes.BadInput, e.Message),
                _ => (ExitCodes.Unexpected, $"unexpected failure ({e.GetType().Name}): {e.Message}"),
            };
            Fail(stderr, message);
            if (code == ExitCodes.Unexpected)
            {
                stderr.WriteLine("This is a bug in binenergy, not in your input; please report it with the command you ran.");
            }

            return code;
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
    }

    private static bool StopRequested(CancellationTokenSource stop, TextWriter stderr)
    {
        stderr.WriteLine("binenergy: stopping after the current step (Ctrl-C again to end at once)");
        stop.Cancel();
        return true;
    }

    /// <summary>Writes an error line, with any control character from the user's files or arguments escaped (<see cref="PrintableText"/>).</summary>
    private static void Fail(TextWriter stderr, string message) => stderr.WriteLine("binenergy: " + PrintableText.Of(message));

    /// <summary>The first exception of type <typeparamref name="T"/> in the chain of <paramref name="e"/>.</summary>
    private static T? Inner<T>(Exception? e)
        where T : Exception => e as T ?? (e is null ? null : Inner<T>(e.InnerException));
}
