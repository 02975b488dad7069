using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// One column of a <see cref="ResultTable"/>: a name (with its unit suffix, e.g.
/// <c>heating_kbtu</c>), a kind and the values, one per row.
/// </summary>
public sealed class ResultColumn
{
    private readonly List<string> texts = [];
    private readonly List<double> numbers = [];
    private readonly List<int> integers = [];

    internal ResultColumn(string name, ColumnKind kind, DisplayUnit? unit = null, string? label = null, bool detail = false)
    {
        Name = name;
        Kind = kind;
        Unit = unit;
        Label = label ?? name;
        Detail = detail;
    }

    /// <summary>The display unit of a number column (its values are already converted to it); null for text and plain counts.</summary>
    public DisplayUnit? Unit { get; }

    /// <summary>The heading people read, without the unit (e.g. "Heating").</summary>
    public string Label { get; }

    /// <summary>True for a column kept in JSON, CSV and Parquet but left out of terminal and report tables.</summary>
    public bool Detail { get; }

    /// <summary>An integer column of amounts (hours, counts), shown with thousands separators; false for labels that are numbers (a year, a line of a file) and for other kinds.</summary>
    public bool IsCount => Kind == ColumnKind.Integer && Name is not ("year" or "line");

    /// <summary>The heading with its unit symbol, e.g. "Heating, kBtu".</summary>
    public string Heading => Unit is { Symbol.Length: > 0 } u ? Label + ", " + u.Symbol : Label;

    /// <summary>The value of row <paramref name="row"/> as an object: string, double or int.</summary>
    public object ValueAt(int row) => Kind switch
    {
        ColumnKind.Text => texts[row],
        ColumnKind.Number => numbers[row],
        _ => integers[row],
    };

    /// <summary>Column name, lower snake case, unit-suffixed for quantities.</summary>
    public string Name { get; }

    /// <summary>Value type.</summary>
    public ColumnKind Kind { get; }

    /// <summary>Number of values.</summary>
    public int Count => Kind switch
    {
        ColumnKind.Text => texts.Count,
        ColumnKind.Number => numbers.Count,
        _ => integers.Count,
    };

    /// <summary>The values of a text column.</summary>
    public IReadOnlyList<string> Texts => Kind == ColumnKind.Text ? texts : throw WrongKind(ColumnKind.Text);

    /// <summary>The values of a number column.</summary>
    public IReadOnlyList<double> Numbers => Kind == ColumnKind.Number ? numbers : throw WrongKind(ColumnKind.Number);

    /// <summary>The values of an integer column.</summary>
    public IReadOnlyList<int> Integers => Kind == ColumnKind.Integer ? integers : throw WrongKind(ColumnKind.Integer);

    /// <summary>True when <paramref name="value"/> can be stored in this column.</summary>
    internal bool Accepts(object value) => Kind switch
    {
        ColumnKind.Text => value is string,
        ColumnKind.Number => value is double or int,
        _ => value is int,
    };

    internal ArgumentException WrongValue(object value) =>
        new($"column '{Name}' holds {Kind} values; got {value?.GetType().Name ?? "null"}");

    /// <summary>Appends a text (the column is a text column; <see cref="ColumnSet{T}"/> declares it so).</summary>
    internal void AddText(string value) => texts.Add(value);

    /// <summary>Appends a number (the column is a number column).</summary>
    internal void AddNumber(double value) => numbers.Add(value);

    /// <summary>Appends an integer (the column is an integer column).</summary>
    internal void AddInteger(int value) => integers.Add(value);

    internal void Add(object value)
    {
        switch (Kind)
        {
            case ColumnKind.Text:
                texts.Add(value as string ?? throw WrongValue(value));
                break;
            case ColumnKind.Number:
                numbers.Add(value switch
                {
                    double d => d,
                    int i => i,
                    _ => throw WrongValue(value),
                });
                break;
            default:
                integers.Add(value is int n ? n : throw WrongValue(value));
                break;
        }
    }

    /// <summary>Appends values of the column's kind (string[], double[] or int[]) without boxing each one.</summary>
    internal void AddRange(Array values)
    {
        switch (values)
        {
            case string[] t when Kind == ColumnKind.Text:
                texts.AddRange(t);
                break;
            case double[] d when Kind == ColumnKind.Number:
                numbers.AddRange(d);
                break;
            case int[] i when Kind == ColumnKind.Integer:
                integers.AddRange(i);
                break;
            default:
                throw new ArgumentException($"column '{Name}' holds {Kind} values, not {values.GetType().Name}", nameof(values));
        }
    }

    internal void AddRange(ResultColumn other)
    {
        switch (Kind)
        {
            case ColumnKind.Text:
                texts.AddRange(other.texts);
                break;
            case ColumnKind.Number:
                numbers.AddRange(other.numbers);
                break;
            default:
                integers.AddRange(other.integers);
                break;
        }
    }

    private InvalidOperationException WrongKind(ColumnKind asked) =>
        new($"column '{Name}' holds {Kind} values, not {asked}");
}
