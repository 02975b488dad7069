using System.Globalization;
using System.IO.Compression;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;

namespace BinEnergy.Reporting.Workbook;

/// <summary>
/// Writes sheets as one Office Open XML workbook (<c>.xlsx</c>, ECMA-376, with the Open XML SDK): per sheet a bold heading
/// row, frozen so it stays in view, with a filter on it; numbers as numbers (full precision) in their column's number
/// format; text as inline strings; columns wide enough for their headings.
/// </summary>
public static class WorkbookWriter
{
    /// <summary>Writes <paramref name="sheets"/> to <paramref name="path"/>, replacing any file there.</summary>
    /// <param name="sheets">The sheets, in order (the first is shown on opening).</param>
    /// <param name="path">The file.</param>
    /// <param name="writtenAt">The time every part of the package is stamped with (the run's time), so that the same sheets
    /// give the same bytes; part relationship ids are numbered, not random, for the same reason.</param>
    public static void Write(IReadOnlyList<WorkbookSheet> sheets, string path, DateTimeOffset writtenAt)
    {
        WritePackage(sheets, path);
        using var zip = ZipFile.Open(path, ZipArchiveMode.Update);
        foreach (var entry in zip.Entries)
        {
            entry.LastWriteTime = writtenAt;
        }
    }

    private static void WritePackage(IReadOnlyList<WorkbookSheet> sheets, string path)
    {
        if (sheets.Count == 0 || sheets.Select(s => s.Name).Distinct(StringComparer.OrdinalIgnoreCase).Count() != sheets.Count)
        {
            throw new ArgumentException("a workbook needs one sheet or more, with different names", nameof(sheets));
        }

        var styles = new StyleTable(sheets.SelectMany(s => s.Formats.OfType<string>().Concat(s.Rows.SelectMany(r => r.OfType<WorkbookNumber>().Select(n => n.Format)))));
        using var document = SpreadsheetDocument.Create(path, SpreadsheetDocumentType.Workbook);
        var workbookPart = document.AddWorkbookPart();
        document.ChangeIdOfPart(workbookPart, "rIdWorkbook");
        workbookPart.Workbook = new DocumentFormat.OpenXml.Spreadsheet.Workbook();
        var stylesPart = workbookPart.AddNewPart<WorkbookStylesPart>("rIdStyles");
        stylesPart.Stylesheet = styles.Stylesheet();
        var sheetList = workbookPart.Workbook.AppendChild(new Sheets());
        for (int i = 0; i < sheets.Count; i++)
        {
            var part = workbookPart.AddNewPart<WorksheetPart>("rIdSheet" + (i + 1).ToString(CultureInfo.InvariantCulture));
            part.Worksheet = Worksheet(sheets[i], styles, selected: i == 0);
            sheetList.Append(new Sheet { Id = workbookPart.GetIdOfPart(part), SheetId = (uint)(i + 1), Name = sheets[i].Name });
        }

        // A filter on the heading row: Excel needs its range named once per sheet (the built-in _FilterDatabase name).
        var names = new DefinedNames();
        for (int i = 0; i < sheets.Count; i++)
        {
            names.Append(new DefinedName($"'{sheets[i].Name}'!{Range(sheets[i], absolute: true)}") { Name = "_xlnm._FilterDatabase", LocalSheetId = (uint)i, Hidden = true });
        }

        workbookPart.Workbook.Append(names);
    }

    private static Worksheet Worksheet(WorkbookSheet sheet, StyleTable styles, bool selected)
    {
        var view = new SheetView { WorkbookViewId = 0, TabSelected = selected };
        view.Append(new Pane { VerticalSplit = 1, TopLeftCell = "A2", ActivePane = PaneValues.BottomLeft, State = PaneStateValues.Frozen });
        view.Append(new Selection { Pane = PaneValues.BottomLeft, ActiveCell = "A2", SequenceOfReferences = new ListValue<StringValue> { InnerText = "A2" } });

        var columns = new Columns();
        for (int c = 0; c < sheet.Headings.Count; c++)
        {
            double width = Math.Clamp(Math.Max(sheet.Headings[c].Length, WidestText(sheet, c)) + 2, 8, 48);
            columns.Append(new Column { Min = (uint)(c + 1), Max = (uint)(c + 1), Width = width, CustomWidth = true });
        }

        var data = new SheetData();
        var heading = new Row { RowIndex = 1 };
        for (int c = 0; c < sheet.Headings.Count; c++)
        {
            heading.Append(Text(Reference(c, 1), sheet.Headings[c], StyleTable.HeadingStyle));
        }

        data.Append(heading);
        for (int r = 0; r < sheet.Rows.Count; r++)
        {
            uint index = (uint)(r + 2);
            var row = new Row { RowIndex = index };
            for (int c = 0; c < sheet.Headings.Count; c++)
            {
                string at = Reference(c, index);
                switch (sheet.Rows[r][c])
                {
                    case string s:
                        row.Append(Text(at, s, 0));
                        break;
                    case double d when double.IsFinite(d):
                        row.Append(Number(at, d, styles.Of(sheet.Formats[c] ?? ExcelNumberFormat.General)));
                        break;
                    case int n:
                        row.Append(Number(at, n, styles.Of(sheet.Formats[c] ?? ExcelNumberFormat.General)));
                        break;
                    case WorkbookNumber w when double.IsFinite(w.Value):
                        row.Append(Number(at, w.Value, styles.Of(w.Format)));
                        break;
                }
            }

            data.Append(row);
        }

        var worksheet = new Worksheet();
        worksheet.Append(new SheetViews(view), columns, data, new AutoFilter { Reference = Range(sheet, absolute: false) });
        return worksheet;
    }

    private static int WidestText(WorkbookSheet sheet, int column) =>
        sheet.Rows.Take(200).Select(r => r[column] is string s ? Math.Min(s.Length, 40) : 12).DefaultIfEmpty(0).Max();

    private static Cell Text(string reference, string text, uint style) => new(new InlineString(new DocumentFormat.OpenXml.Spreadsheet.Text(text) { Space = SpaceProcessingModeValues.Preserve }))
    {
        CellReference = reference,
        DataType = CellValues.InlineString,
        StyleIndex = style,
    };

    private static Cell Number(string reference, double value, uint style) => new(new CellValue(value.ToString("R", CultureInfo.InvariantCulture)))
    {
        CellReference = reference,
        StyleIndex = style,
    };

    /// <summary>The heading row and the data below it: <c>A1:K20</c> (or <c>$A$1:$K$20</c>).</summary>
    private static string Range(WorkbookSheet sheet, bool absolute)
    {
        string last = ColumnName(sheet.Headings.Count - 1);
        int lastRow = Math.Max(1, sheet.Rows.Count + 1);
        return absolute ? $"$A$1:${last}${lastRow}" : $"A1:{last}{lastRow}";
    }

    private static string Reference(int column, uint row) => ColumnName(column) + row.ToString(CultureInfo.InvariantCulture);

    /// <summary>The letters of a column, from 0: A ... Z, AA, AB, ...</summary>
    internal static string ColumnName(int column)
    {
        string name = string.Empty;
        for (int n = column + 1; n > 0; n = (n - 1) / 26)
        {
            name = (char)('A' + ((n - 1) % 26)) + name;
        }

        return name;
    }

    /// <summary>The workbook's cell styles: the default, the bold heading, then one per number format.</summary>
    private sealed class StyleTable
    {
        public const uint HeadingStyle = 1;

        private const uint FirstCustomFormat = 164; // ids below are Excel's built-in formats (ECMA-376 part 1, 18.8.30)

        private readonly List<string> formats;

        public StyleTable(IEnumerable<string> used) => formats = [.. used.Where(f => f != ExcelNumberFormat.General).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal)];

        /// <summary>The style index of a number format.</summary>
        public uint Of(string format) => format == ExcelNumberFormat.General ? 2u : 3u + (uint)formats.IndexOf(format);

        public Stylesheet Stylesheet()
        {
            var numberFormats = new NumberingFormats();
            for (int i = 0; i < formats.Count; i++)
            {
                numberFormats.Append(new NumberingFormat { NumberFormatId = FirstCustomFormat + (uint)i, FormatCode = formats[i] });
            }

            numberFormats.Count = (uint)formats.Count;
            var cellFormats = new CellFormats(
                new CellFormat { FontId = 0, FillId = 0, BorderId = 0, NumberFormatId = 0 },
                new CellFormat { FontId = 1, FillId = 0, BorderId = 0, NumberFormatId = 0, ApplyFont = true, Alignment = new Alignment { WrapText = true, Vertical = VerticalAlignmentValues.Top }, ApplyAlignment = true },
                new CellFormat { FontId = 0, FillId = 0, BorderId = 0, NumberFormatId = 0, ApplyNumberFormat = true });
            for (int i = 0; i < formats.Count; i++)
            {
                cellFormats.Append(new CellFormat { FontId = 0, FillId = 0, BorderId = 0, NumberFormatId = FirstCustomFormat + (uint)i, ApplyNumberFormat = true });
            }

            cellFormats.Count = (uint)cellFormats.ChildElements.Count;
            return new Stylesheet(
                numberFormats,
                new Fonts(new Font(new FontSize { Val = 11 }, new FontName { Val = "Calibri" }), new Font(new Bold(), new FontSize { Val = 11 }, new FontName { Val = "Calibri" })) { Count = 2 },
                new Fills(new Fill(new PatternFill { PatternType = PatternValues.None }), new Fill(new PatternFill { PatternType = PatternValues.Gray125 })) { Count = 2 },
                new Borders(new Border(new LeftBorder(), new RightBorder(), new TopBorder(), new BottomBorder(), new DiagonalBorder())) { Count = 1 },
                cellFormats);
        }
    }
}
