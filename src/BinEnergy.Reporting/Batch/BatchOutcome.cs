namespace BinEnergy.Reporting.Batch;

/// <summary>What a finished batch shard did: its counts, its warnings grouped by kind, and the report when it built one.</summary>
/// <param name="Folder">The output folder, full path.</param>
/// <param name="Counts">The counts of every part of this shard (kept ones included).</param>
/// <param name="Warnings">One group per kind of problem or caution, in kind order.</param>
/// <param name="SummaryPath">The summary this shard wrote.</param>
/// <param name="Report">The cross-climate report, built after the last part of an unsharded batch; null for a shard of several or when no climate ran.</param>
/// <param name="Notes">What else the user should know (charts asked for that no climate gave, why no report was built).</param>
public sealed record BatchOutcome(string Folder, BatchCounts Counts, IReadOnlyList<BatchWarningGroup> Warnings, string SummaryPath, BatchReport? Report, IReadOnlyList<string> Notes);
