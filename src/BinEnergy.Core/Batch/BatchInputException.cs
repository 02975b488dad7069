using BinEnergy.Core.Errors;

namespace BinEnergy.Core.Batch;

/// <summary>A batch cannot start: its inputs name no weather file, a station list's header is unusable, or a resume does not match the earlier run. The message says why and how to fix it.</summary>
public sealed class BatchInputException(string message) : InputDataException(message);
