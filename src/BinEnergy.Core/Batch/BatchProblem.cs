namespace BinEnergy.Core.Batch;

/// <summary>
/// Something that stopped one input of a batch (a station-list row, a weather file), or a caution about one climate:
/// what the warnings table holds.
/// </summary>
/// <param name="Climate">The climate's name, or the input's key when it has no name yet.</param>
/// <param name="File">The file concerned (weather file or station list).</param>
/// <param name="Line">The line of that file, when known.</param>
/// <param name="Kind">A short kind (<see cref="BatchProblemKinds"/>), for counting and grouping.</param>
/// <param name="Message">What is wrong and how to fix it.</param>
/// <param name="Stopped">True when the problem stopped the input (it has no results); false for a caution.</param>
public sealed record BatchProblem(string Climate, string File, int? Line, string Kind, string Message, bool Stopped);
