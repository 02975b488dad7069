using System.Globalization;
using BinEnergy.Cli;
using BinEnergy.Reporting.Workbook;
using BinEnergy.Tests.Study;
using BinEnergy.Tests.Support;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using DocumentFormat.OpenXml.Validation;

namespace BinEnergy.Tests.Output;

/// <summary>
/// <c>summary.xlsx</c> of a run, read back as a spreadsheet would read it (the Open XML SDK, and its schema validator):
/// a sheet per table with the Parquet tables' rows and values, units in the headings, number formats, a frozen heading row.
/// </summary>
public sealed class SummaryWorkbookTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("binenergy-workbook-").FullName;

    public SummaryWorkbookTests() => ExampleStudy.WriteWeather(folder);

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void Workbook_HasASheetPerTable_WithTheParquetValues_UnitsInHeadings_AndAFrozenHeadingRow()
    {
        string study = Path.Combine(folder, "harbor-study.toml");
        File.WriteAllText(study, ExampleStudy.Text);
        string output = Path.Combine(folder, "out");
        int code = CliApp.Run(["run", study, "--out", output], new StringWriter(), new StringWriter());
        Assert.Equal(0, code);

        string path = Path.Combine(output, "summary.xlsx");
        using var document = SpreadsheetDocument.Open(path, isEditable: false);
        Assert.Empty(new OpenXmlValidator().Validate(document).Select(e => e.Description)); // ECMA-376 schema and semantics

        var workbook = document.WorkbookPart!;
        var sheets = workbook.Workbook.Sheets!.Elements<Sheet>().ToList();
        Assert.Equal(["annual", "monthly", "bins", "economizer", "peaks", "inputs"], sheets.Select(s => s.Name!.Value));
        var formats = workbook.WorkbookStylesPart!.Stylesheet.NumberingFormats!.Elements<NumberingFormat>().ToDictionary(f => f.NumberFormatId!.Value, f => f.FormatCode!.Value!);
        var cellFormats = workbook.WorkbookStylesPart.Stylesheet.CellFormats!.Elements<CellFormat>().ToList();

        foreach (var table in SummaryWorkbook.TableSheets)
        {
            var grid = Read(workbook, sheets.Single(s => s.Name == table));
            var parquet = ParquetRows.Read(output, table);
            var columns = parquet[0].Keys.ToList();
            Assert.Equal(parquet.Count, grid.Rows.Count);
            Assert.Equal(columns.Count, grid.Headings.Count);
            for (int r = 0; r < parquet.Count; r++)
            {
                for (int c = 0; c < columns.Count; c++)
                {
                    // Text is text; numbers are numbers at full precision (the same double as the Parquet file), NaN an empty cell.
                    string expected = parquet[r][columns[c]];
                    string? actual = grid.Rows[r][c];
                    Assert.True(expected == actual || (expected == "NaN" && actual is null), $"{table} row {r + 2}, {columns[c]}: {actual} in the workbook, {expected} in Parquet");
                }
            }

            // The heading row stays in view: frozen below row 1.
            var pane = grid.Worksheet.SheetViews!.Elements<SheetView>().Single().Elements<Pane>().Single();
            Assert.Equal(PaneStateValues.Frozen, pane.State!.Value);
            Assert.Equal(1.0, pane.VerticalSplit!.Value);
            Assert.Equal("A2", pane.TopLeftCell!.Value);
        }

        // Units in the headings; energy shown whole with thousands separators (as the terminal's N0), temperatures to 0.1.
        var annual = Read(workbook, sheets.Single(s => s.Name == "annual"));
        int heating = annual.Headings.IndexOf("Heating, kBtu");
        Assert.True(heating >= 0, string.Join(" | ", annual.Headings));
        Assert.Equal("#,##0", FormatOf(annual.Cells[0][heating]));
        Assert.Equal("#,##0", FormatOf(annual.Cells[0][annual.Headings.IndexOf("Hours ventilated")])); // 3,392 h
        var bins = Read(workbook, sheets.Single(s => s.Name == "bins"));
        Assert.Equal("0.0", FormatOf(bins.Cells[0][bins.Headings.IndexOf("Bin from, F")]));
        Assert.Contains("Mean coincident humidity ratio, gr/lb", bins.Headings);

        // The inputs: the study's hash, the climate's weather file and elevation, each variant's changes against the base.
        var inputs = Read(workbook, sheets.Single(s => s.Name == "inputs"));
        Assert.Equal(["Section", "Name", "Item", "Value", "Unit"], inputs.Headings);
        string? Input(string section, string name, string item) => inputs.Rows.Single(r => r[0] == section && r[1] == name && r[2] == item)[3];
        using var summary = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Path.Combine(output, "summary.json")));
        Assert.Equal(summary.RootElement.GetProperty("study_sha256").GetString(), Input("study", "Harbor office ventilation options", "Study SHA-256"));
        var climate = ParquetRows.Read(output, "climates").Single();
        Assert.Equal(climate["weather"], Input("climate", climate["climate"], "Weather file"));
        Assert.Equal(climate["hours_in_record"], Input("climate", climate["climate"], "Hours"));
        Assert.Equal("none (the base)", Input("variant", "minimum", "Changes against the base"));
        Assert.Contains("airflow", Input("variant", "plus-30", "Changes against the base"), StringComparison.Ordinal);
        Assert.Equal(2600.0, double.Parse(Input("variant", "plus-30", "Outdoor airflow")!, CultureInfo.InvariantCulture), 6); // the example's 2,000 cfm plus 30 %

        string FormatOf(Cell cell)
        {
            uint id = cellFormats[(int)cell.StyleIndex!.Value].NumberFormatId!.Value;
            return id == 0 ? "General" : formats[id];
        }
    }

    /// <summary>A sheet's heading texts, its cells, and each data row's values as text (numbers in round-trip form, empty cells null).</summary>
    private static (Worksheet Worksheet, List<string> Headings, List<List<Cell>> Cells, List<List<string?>> Rows) Read(WorkbookPart workbook, Sheet sheet)
    {
        var worksheet = ((WorksheetPart)workbook.GetPartById(sheet.Id!.Value!)).Worksheet;
        var rows = worksheet.GetFirstChild<SheetData>()!.Elements<Row>().ToList();
        var headings = rows[0].Elements<Cell>().Select(c => c.InnerText).ToList();
        var cells = new List<List<Cell>>();
        var values = new List<List<string?>>();
        foreach (var row in rows.Skip(1))
        {
            var byColumn = row.Elements<Cell>().ToDictionary(c => new string(c.CellReference!.Value!.TakeWhile(char.IsLetter).ToArray()));
            var line = new List<string?>();
            for (int c = 0; c < headings.Count; c++)
            {
                line.Add(byColumn.TryGetValue(WorkbookWriter.ColumnName(c), out var cell) ? Value(cell) : null);
            }

            cells.Add(row.Elements<Cell>().ToList());
            values.Add(line);
        }

        return (worksheet, headings, cells, values);
    }

    private static string Value(Cell cell) => cell.DataType?.Value == CellValues.InlineString
        ? cell.InlineString!.InnerText
        : double.Parse(cell.CellValue!.Text, CultureInfo.InvariantCulture).ToString("R", CultureInfo.InvariantCulture);
}
