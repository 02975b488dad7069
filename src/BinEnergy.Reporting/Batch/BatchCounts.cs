namespace BinEnergy.Reporting.Batch;

/// <summary>What a batch shard has done so far, parts kept from an earlier run included.</summary>
/// <param name="Files">Inputs in this shard (station-list rows that could not be used included).</param>
/// <param name="Done">Inputs that ran.</param>
/// <param name="Failed">Inputs stopped by a problem.</param>
/// <param name="Warnings">Problems and cautions by kind (a caution once per climate).</param>
/// <param name="Rows">Rows written per table.</param>
/// <param name="Parts">Parts written.</param>
public sealed record BatchCounts(int Files, int Done, int Failed, IReadOnlyDictionary<string, int> Warnings, IReadOnlyDictionary<string, int> Rows, int Parts);
