using BinEnergy.Reporting.Batch;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Cli.Commands;

/// <summary>
/// <c>binenergy batch-report OUT</c>: reads every shard's <c>tables/annual</c> and
/// <c>tables/climates</c> parts of a batch output folder and writes the cross-climate
/// <c>report.html</c> and <c>summary.json</c> into it; prints the national table.
/// </summary>
public sealed class BatchReportCommand : Command<BatchReportCommand.Settings>
{
    public sealed class Settings : OutputSettings
    {
        [CommandArgument(0, "<OUT>"), Description("The batch output folder (the --out of `binenergy batch`, holding tables/annual/ and tables/climates/ from every shard).")]
        public string Out { get; init; } = string.Empty;
    }

    public override int Execute(CommandContext context, Settings settings, CancellationToken cancellationToken)
    {
        var output = (CommandOutput)context.Data!;
        if (!Directory.Exists(settings.Out))
        {
            throw new BatchReportException($"{settings.Out}: no such folder; give the --out folder of a `binenergy batch` run");
        }

        var report = BatchReport.WriteAsync(settings.Out, RunClock.Now(), cancellationToken).GetAwaiter().GetResult();
        var summary = report.Summary();
        if (!settings.Json)
        {
            summary.Note(NoteKind.Note, $"Read {report.Annual.Parts.Count} annual and {report.Climates.Parts.Count} climates part file(s); wrote "
                + Path.GetFullPath(Path.Combine(settings.Out, "report.html")) + " and summary.json.");
        }

        output.Write(summary, settings);
        return ExitCodes.Ok;
    }
}
