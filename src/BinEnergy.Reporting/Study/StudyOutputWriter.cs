using BinEnergy.Core.Study;
using BinEnergy.Reporting.Tables;

namespace BinEnergy.Reporting.Study;

/// <summary>
/// Writes a study run into its output folder atomically: <c>tables/NAME.parquet</c> and
/// <c>tables/NAME.csv</c> for every table, the workbook <c>summary.xlsx</c> (a sheet per table and the inputs) and <c>summary.json</c>. Extra content (charts,
/// report) is added through the <c>extra</c> callback before the folder is committed.
/// </summary>
public static class StudyOutputWriter
{
    /// <summary>Writes the run into <paramref name="folder"/>; returns the tables written.</summary>
    /// <exception cref="OutputFolderException">The folder exists and is not empty, and <paramref name="force"/> is false.</exception>
    /// <remarks>The study file, weather files and map files are the run's inputs: a folder holding one is refused. What the
    /// folder recovered from an earlier, stopped run is passed to <paramref name="recovered"/>.</remarks>
    public static async Task<IReadOnlyList<ResultTable>> WriteAsync(StudyRunResult run, string folder, bool force, bool hourly,
        Action<OutputFolder>? extra = null, CancellationToken ct = default, Action<string>? recovered = null)
    {
        var inputs = run.Study.Climates.SelectMany(c => c.Map is { } m && File.Exists(m) ? new[] { c.WeatherPath, m } : [c.WeatherPath]).Append(run.Study.File);
        using var output = OutputFolder.Begin(folder, force, inputs);
        foreach (string note in output.Recovered)
        {
            recovered?.Invoke(note);
        }

        var tables = StudyTables.Build(run, hourly);
        var metadata = new Dictionary<string, string>
        {
            ["binenergy.study"] = run.Study.Name,
            ["binenergy.units"] = StudyTables.Units(run).Name,
            ["binenergy.engine_version"] = run.EngineVersion,
            ["binenergy.study_sha256"] = run.Study.Hash,
            ["binenergy.currency"] = run.Study.Currency,
        };
        foreach (var table in tables)
        {
            var meta = new Dictionary<string, string>(metadata) { ["binenergy.table"] = table.Name };
            await ParquetTableWriter.WriteAsync(table, output.PathFor("tables", table.Name + ".parquet"), meta, ct);
            CsvTableWriter.Write(table, output.PathFor("tables", table.Name + ".csv"));
        }

        Workbook.SummaryWorkbook.Write(run, tables, output.PathFor(Workbook.SummaryWorkbook.FileName));
        await File.WriteAllTextAsync(output.PathFor("summary.json"), StudySummary.ToJson(run), ct);
        extra?.Invoke(output);
        output.Commit();
        return tables;
    }
}
