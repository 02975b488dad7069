using System.Text.RegularExpressions;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// A columnar result table in long format (one row per climate x variant x bin, month,
/// control, ...): ordered, typed, unit-suffixed columns. Filled row by row with
/// <see cref="AddRow"/> after the columns are declared; tables with the same columns append.
/// Reporting only carries and writes these values; the engine computes them.
/// </summary>
public sealed partial class ResultTable
{
    private readonly List<ResultColumn> columns = [];
    private readonly Dictionary<string, int> index = new(StringComparer.Ordinal);

    /// <summary>Creates an empty table.</summary>
    /// <param name="name">Table name, used as the file name (<c>annual</c> gives annual.parquet, annual.csv).</param>
    public ResultTable(string name)
    {
        if (!ColumnNamePattern().IsMatch(name))
        {
            throw new ArgumentException($"table name '{name}' must be lower snake case");
        }

        Name = name;
    }

    /// <summary>Table name.</summary>
    public string Name { get; }

    /// <summary>The heading of the table in the terminal and the report.</summary>
    public string? Title { get; init; }

    /// <summary>How the table is laid out in text outputs and JSON.</summary>
    public TableLayout Layout { get; init; } = TableLayout.Rows;

    /// <summary>
    /// For <see cref="TableLayout.Keyed"/>: the text column whose values key the JSON object
    /// (and head the columns of the terminal's transposed view).
    /// </summary>
    public string? KeyColumn { get; init; }

    /// <summary>In terminal text, show the table transposed: one line per column, one column per row (keyed tables of figures).</summary>
    public bool Transpose { get; init; }

    /// <summary>False for a table kept in JSON and files but left out of terminal text (a long form of a table shown compactly).</summary>
    public bool ShowInTerminal { get; init; } = true;

    /// <summary>In terminal text, show every n-th row only (a long curve); JSON and files keep every row.</summary>
    public int TerminalEvery { get; init; } = 1;

    /// <summary>Lines said under the table (what it shows, how to read it).</summary>
    public List<string> Notes { get; } = [];

    /// <summary>The columns in order.</summary>
    public IReadOnlyList<ResultColumn> Columns => columns;

    /// <summary>Number of rows.</summary>
    public int RowCount => columns.Count == 0 ? 0 : columns[0].Count;

    /// <summary>The column with this name.</summary>
    public ResultColumn this[string name] =>
        index.TryGetValue(name, out int i) ? columns[i] : throw new KeyNotFoundException($"table '{Name}' has no column '{name}'");

    /// <summary>True when a column of that name exists.</summary>
    public bool HasColumn(string name) => index.ContainsKey(name);

    /// <summary>Declares a text column.</summary>
    public ResultTable Text(string name, string? label = null, bool detail = false) => Declare(new ResultColumn(name, ColumnKind.Text, null, label, detail));

    /// <summary>Declares a floating-point column; the name must end with its unit (e.g. <c>_kbtu</c>).</summary>
    public ResultTable Number(string name, DisplayUnit? unit = null, string? label = null, bool detail = false) =>
        Declare(new ResultColumn(name, ColumnKind.Number, unit, label, detail));

    /// <summary>Declares an integer column (whole hours, months).</summary>
    public ResultTable Integer(string name, string? label = null, bool detail = false) => Declare(new ResultColumn(name, ColumnKind.Integer, null, label, detail));

    /// <summary>Adds one row, values in column order (string, double or int as declared).</summary>
    public void AddRow(params object[] values)
    {
        if (values.Length != columns.Count)
        {
            throw new ArgumentException($"table '{Name}' has {columns.Count} columns; a row of {values.Length} values was given");
        }

        // Check every value first, so a bad row leaves the table as it was.
        for (int i = 0; i < values.Length; i++)
        {
            if (!columns[i].Accepts(values[i]))
            {
                throw columns[i].WrongValue(values[i]);
            }
        }

        for (int i = 0; i < values.Length; i++)
        {
            columns[i].Add(values[i]);
        }
    }

    /// <summary>
    /// Appends rows given column by column, in column order (string[], double[] or int[] as declared, all of one
    /// length): a table read from a columnar file, without a row of boxed values each.
    /// </summary>
    public void AddColumns(IReadOnlyList<Array> values)
    {
        if (values.Count != columns.Count || values.Any(v => v.Length != values[0].Length))
        {
            throw new ArgumentException($"table '{Name}' has {columns.Count} columns; {values.Count} columns of values (of equal length) are needed");
        }

        for (int i = 0; i < values.Count; i++)
        {
            columns[i].AddRange(values[i]);
        }
    }

    /// <summary>Appends the rows of a table with the same columns (same names, kinds and order).</summary>
    public void Append(ResultTable other)
    {
        if (other.columns.Count != columns.Count ||
            other.columns.Zip(columns).Any(p => p.First.Name != p.Second.Name || p.First.Kind != p.Second.Kind))
        {
            throw new ArgumentException($"table '{other.Name}' does not have the columns of '{Name}'");
        }

        for (int i = 0; i < columns.Count; i++)
        {
            columns[i].AddRange(other.columns[i]);
        }
    }

    /// <summary>A copy with text columns of one value each added at the end (a batch's station attributes on every row).</summary>
    public ResultTable WithConstantText(IReadOnlyList<KeyValuePair<string, string>> extra)
    {
        var copy = new ResultTable(Name) { Title = Title, Layout = Layout, KeyColumn = KeyColumn };
        foreach (var c in columns)
        {
            copy.Declare(new ResultColumn(c.Name, c.Kind, c.Unit, c.Label, c.Detail));
        }

        foreach (var (name, _) in extra)
        {
            copy.Text(name);
        }

        for (int i = 0; i < columns.Count; i++)
        {
            copy.columns[i].AddRange(columns[i]);
        }

        int rows = RowCount;
        for (int j = 0; j < extra.Count; j++)
        {
            var column = copy.columns[columns.Count + j];
            for (int r = 0; r < rows; r++)
            {
                column.Add(extra[j].Value);
            }
        }

        return copy;
    }

    private ResultTable Declare(ResultColumn column)
    {
        string name = column.Name;
        if (RowCount > 0)
        {
            throw new InvalidOperationException($"declare the columns of '{Name}' before adding rows");
        }

        if (!ColumnNamePattern().IsMatch(name))
        {
            throw new ArgumentException($"column name '{name}' must be lower snake case");
        }

        if (!index.TryAdd(name, columns.Count))
        {
            throw new ArgumentException($"table '{Name}' already has a column '{name}'");
        }

        columns.Add(column);
        return this;
    }

    [GeneratedRegex("^[a-z][a-z0-9_]*$")]
    private static partial Regex ColumnNamePattern();
}
