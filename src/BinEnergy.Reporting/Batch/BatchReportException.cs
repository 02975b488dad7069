using BinEnergy.Core.Errors;

namespace BinEnergy.Reporting.Batch;

/// <summary>A batch output folder cannot be reported on: no tables, a missing climates table, parts of different studies, a part that cannot be read.</summary>
public sealed class BatchReportException(string message) : InputDataException(message);
