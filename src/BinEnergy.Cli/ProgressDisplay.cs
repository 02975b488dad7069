using System.Diagnostics;
using Spectre.Console;

namespace BinEnergy.Cli;

/// <summary>
/// How far a long command is: a Spectre progress bar on a terminal; otherwise (a log, a pipe, a cluster job) a line
/// on standard error at every tenth after the first two seconds, with the rate and the time left. Nothing with <c>--json</c> on a terminal, where
/// the bar would mix with the data.
/// </summary>
internal static class ProgressDisplay
{
    /// <summary>Without a terminal, nothing is said in the first seconds: a short command needs no progress lines in its log.</summary>
    private static readonly TimeSpan DefaultQuiet = TimeSpan.FromSeconds(2);

    /// <summary>Runs <paramref name="work"/>, which calls the step it is given once per finished item (with a description for the bar, or null).</summary>
    /// <param name="output">Where the command writes.</param>
    /// <param name="settings">The command's output settings.</param>
    /// <param name="title">What is being done (the study's name).</param>
    /// <param name="total">How many items.</param>
    /// <param name="items">What an item is, plural ("files", "cases").</param>
    /// <param name="work">The work.</param>
    /// <param name="quiet">How long nothing is said without a terminal (two seconds unless given).</param>
    public static void Run(CommandOutput output, OutputSettings settings, string title, int total, string items, Action<Action<string?>> work, TimeSpan? quiet = null)
    {
        var clock = Stopwatch.StartNew();
        int done = 0;
        double Rate() => done / Math.Max(clock.Elapsed.TotalSeconds, 1e-3);
        if (output.Console.Profile.Capabilities.Interactive)
        {
            if (settings.Json || total == 0)
            {
                work(_ => done++);
                return;
            }

            output.Console.Progress()
                .Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new RemainingTimeColumn(), new ElapsedTimeColumn())
                .Start(ctx =>
                {
                    var task = ctx.AddTask(Markup.Escape(PrintableText.Of(title)), maxValue: total);
                    work(step =>
                    {
                        done++;
                        task.Increment(1);
                        task.Description = Markup.Escape(PrintableText.Of(step ?? FormattableString.Invariant($"{done:N0}/{total:N0} {items}, {Rate():0.0}/s")));
                    });
                });
            return;
        }

        int nextTenth = 1;
        work(_ =>
        {
            done++;
            int tenth = total == 0 ? 10 : done * 10 / total;
            if (tenth >= nextTenth && clock.Elapsed >= (quiet ?? DefaultQuiet))
            {
                output.Error.WriteLine(FormattableString.Invariant(
                    $"binenergy: {tenth * 10,3} % ({done:N0}/{total:N0} {items}, {Rate():0.0} {items}/s, {(total - done) / Math.Max(Rate(), 1e-9):0} s left)"));
                nextTenth = tenth + 1;
            }
        });
    }
}
