namespace BinEnergy.Reporting.Workbook;

/// <summary>A workbook cell holding a number with its own Excel number format (a column of mixed quantities, such as the inputs).</summary>
/// <param name="Value">The number.</param>
/// <param name="Format">Its Excel number format (<see cref="ExcelNumberFormat"/>).</param>
public sealed record WorkbookNumber(double Value, string Format);
