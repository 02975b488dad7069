namespace BinEnergy.Core.Batch;

/// <summary>The inputs of a batch: the stations in their stable order, the rows that could not be used, the attribute columns and a hash of the list.</summary>
/// <param name="Stations">The stations, sorted (by the weather file's path for a folder or glob; by name, then path, for a station list).</param>
/// <param name="Problems">Station-list rows that cannot be run (a bad value, a duplicate name), each naming its line.</param>
/// <param name="AttributeColumns">The station list's attribute columns, in its order (empty for a folder or glob).</param>
/// <param name="Hash">SHA-256 of the list as run (every station's key, file, size, map, elevation and attributes), hex.</param>
public sealed record BatchInputs(
    IReadOnlyList<BatchStation> Stations,
    IReadOnlyList<BatchProblem> Problems,
    IReadOnlyList<string> AttributeColumns,
    string Hash);
