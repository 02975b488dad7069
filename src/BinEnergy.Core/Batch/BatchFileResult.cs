using BinEnergy.Core.Study;

namespace BinEnergy.Core.Batch;

/// <summary>
/// What one input of a batch gave: its results per variant (in the study's variant order), or the problem that
/// stopped it, and the cautions its cases gave (each distinct caution of the climate once).
/// </summary>
/// <param name="Station">The input.</param>
/// <param name="Position">Its position in the sorted inputs.</param>
/// <param name="Name">The climate's name in the tables (see <see cref="BatchStation.NameFor"/>).</param>
/// <param name="Cases">The results, one per variant; empty when the input was stopped.</param>
/// <param name="Problems">What stopped it (one problem) or the cautions of its cases.</param>
public sealed record BatchFileResult(BatchStation Station, int Position, string Name, IReadOnlyList<StudyCaseResult> Cases, IReadOnlyList<BatchProblem> Problems)
{
    /// <summary>True when the input was stopped by a problem and has no results.</summary>
    public bool Failed => Cases.Count == 0;
}
