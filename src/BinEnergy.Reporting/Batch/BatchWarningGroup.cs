namespace BinEnergy.Reporting.Batch;

/// <summary>
/// One kind of problem or caution of a batch, as the end of a run reports it: the kind, how many (parts kept from an
/// earlier run included) and the first few climates this run saw it in. The full list is the <c>warnings</c> table.
/// </summary>
/// <param name="Kind">The kind (<see cref="Core.Batch.BatchProblemKinds"/>).</param>
/// <param name="Count">How many inputs or climates had it.</param>
/// <param name="FirstClimates">The first climates this run saw it in, at most <see cref="BatchSession.FirstClimatesShown"/>.</param>
public sealed record BatchWarningGroup(string Kind, int Count, IReadOnlyList<string> FirstClimates)
{
    /// <summary>The group as one line: <c>missing-file: 2 (wx/a, wx/b)</c>, with <c>...</c> when there are more climates than named.</summary>
    public string Text => FirstClimates.Count == 0
        ? FormattableString.Invariant($"{Kind}: {Count:N0}")
        : FormattableString.Invariant($"{Kind}: {Count:N0} ({string.Join(", ", FirstClimates)}{(Count > FirstClimates.Count ? ", ..." : string.Empty)})");
}
