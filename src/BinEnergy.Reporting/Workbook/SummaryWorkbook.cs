using BinEnergy.Core.Loads;
using BinEnergy.Core.Study;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Study;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Workbook;

/// <summary>
/// <c>summary.xlsx</c> of a study run: one sheet per result table (<c>annual</c>, <c>monthly</c>, <c>bins</c>,
/// <c>economizer</c>, <c>peaks</c>; the same rows and full-precision values as the Parquet tables, headed by label and
/// unit) and an <c>inputs</c> sheet (the study, each climate's weather file and site, each variant's changes against the
/// base), written by <see cref="WorkbookWriter"/>.
/// </summary>
public static class SummaryWorkbook
{
    /// <summary>The file name in the output folder.</summary>
    public const string FileName = "summary.xlsx";

    /// <summary>The result tables that get a sheet, in sheet order; <c>inputs</c> follows them.</summary>
    public static IReadOnlyList<string> TableSheets { get; } = ["annual", "monthly", "bins", "economizer", "peaks"];

    /// <summary>The sheets of a run whose tables are <paramref name="tables"/> (<see cref="StudyTables.Build(StudyRunResult, bool)"/>).</summary>
    public static IReadOnlyList<WorkbookSheet> Sheets(StudyRunResult run, IReadOnlyList<ResultTable> tables)
    {
        var sheets = TableSheets.Select(name => WorkbookSheet.From(tables.Single(t => t.Name == name))).ToList();
        sheets.Add(Inputs(run, tables.Single(t => t.Name == "climates")));
        return sheets;
    }

    /// <summary>Writes the workbook of a run to <paramref name="path"/>, stamped with the run's time (<see cref="RunClock"/>: <c>SOURCE_DATE_EPOCH</c> when set).</summary>
    public static void Write(StudyRunResult run, IReadOnlyList<ResultTable> tables, string path) => WorkbookWriter.Write(Sheets(run, tables), path, RunClock.Now());

    /// <summary>
    /// The inputs in long form, one row per item: <c>Section</c> (study, climate, variant), <c>Name</c> (of the climate
    /// or variant), <c>Item</c>, <c>Value</c> (a number in its unit's format, or text) and <c>Unit</c>.
    /// </summary>
    public static WorkbookSheet Inputs(StudyRunResult run, ResultTable climates)
    {
        var u = StudyTables.Units(run);
        var rows = new List<IReadOnlyList<object?>>();
        void Add(string section, string name, string item, object? value, string unit = "") =>
            rows.Add([section, PrintableText.Of(name), item, value is string s ? PrintableText.Of(s) : value, unit]);

        var study = run.Study;
        Add("study", study.Name, "Study file", study.File);
        Add("study", study.Name, "Study SHA-256", study.Hash);
        Add("study", study.Name, "Engine version", run.EngineVersion);
        Add("study", study.Name, "Units", u.Description);
        Add("study", study.Name, "Currency", study.Currency.ToUpperInvariant());
        Add("study", study.Name, "Headline method", IntegrationMethods.Label(study.HeadlineMethod));
        Add("study", study.Name, "Climates x variants", $"{study.Climates.Count} x {study.Variants.Count}");

        for (int r = 0; r < climates.RowCount; r++)
        {
            string name = climates["climate"].Texts[r];
            foreach (var column in climates.Columns.Where(c => c.Name != "climate"))
            {
                object? value = column.Kind switch
                {
                    ColumnKind.Text => column.Texts[r],
                    ColumnKind.Number => double.IsFinite(column.Numbers[r]) ? new WorkbookNumber(column.Numbers[r], ExcelNumberFormat.From(column.Unit?.Format)) : null,
                    _ => new WorkbookNumber(column.Integers[r], ExcelNumberFormat.WholeNumber),
                };
                Add("climate", name, column.Label, value, column.Unit?.Symbol ?? string.Empty);
            }
        }

        foreach (var variant in study.Variants)
        {
            Add("variant", variant.Name, "Changes against the base", variant.Overrides.Count == 0 ? "none (the base)" : string.Join(", ", variant.Overrides));
            if (run.Cases.FirstOrDefault(c => c.Case.Variant.Name == variant.Name) is { } first)
            {
                Add("variant", variant.Name, "Outdoor airflow", new WorkbookNumber(u.Airflow.FromSi(first.Case.OutdoorAir.EffectiveAirflow.CubicMetresPerSecond), ExcelNumberFormat.From(u.Airflow.Format)), u.Airflow.Symbol);
            }
        }

        return new WorkbookSheet("inputs", ["Section", "Name", "Item", "Value", "Unit"], [null, null, null, ExcelNumberFormat.General, null], rows);
    }
}
