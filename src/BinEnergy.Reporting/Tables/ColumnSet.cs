using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// The columns of a result table, each with its name, unit, heading and the value it takes from a
/// row of <typeparamref name="T"/> (numbers in SI, converted to the column's display unit when the
/// table is filled). One set serves every table that shows the same figures: <see cref="Over"/>
/// reuses it for a wider row.
/// </summary>
/// <typeparam name="T">What one row of the table is made from.</typeparam>
public sealed class ColumnSet<T>
{
    private readonly List<(ResultColumnSpec Spec, Func<T, object> Value)> columns = [];

    /// <summary>The column names, in order.</summary>
    public IEnumerable<string> Names => columns.Select(c => c.Spec.Name);

    /// <summary>A text column.</summary>
    public ColumnSet<T> Text(string name, string label, Func<T, string> value, bool detail = false)
    {
        columns.Add((new(name, ColumnKind.Text, null, label, detail), r => value(r)));
        return this;
    }

    /// <summary>An integer column (whole hours, months).</summary>
    public ColumnSet<T> Integer(string name, string label, Func<T, int> value, bool detail = false)
    {
        columns.Add((new(name, ColumnKind.Integer, null, label, detail), r => value(r)));
        return this;
    }

    /// <summary>A number column named <paramref name="baseName"/> with the unit's suffix; <paramref name="si"/> gives the SI value.</summary>
    public ColumnSet<T> Number(string baseName, DisplayUnit unit, string label, Func<T, double> si, bool detail = false)
    {
        columns.Add((new(unit.NameFor(baseName), ColumnKind.Number, unit, label, detail), r => unit.FromSi(si(r))));
        return this;
    }

    /// <summary>The columns of <paramref name="other"/>, taking their rows from <paramref name="pick"/>, appended to these.</summary>
    public ColumnSet<T> Add<TInner>(ColumnSet<TInner> other, Func<T, TInner> pick)
    {
        foreach (var (spec, value) in other.columns)
        {
            columns.Add((spec, r => value(pick(r))));
        }

        return this;
    }

    /// <summary>These columns for a row type from which <paramref name="pick"/> takes this set's rows.</summary>
    public ColumnSet<TOuter> Over<TOuter>(Func<TOuter, T> pick) => new ColumnSet<TOuter>().Add(this, pick);

    /// <summary>These columns with every name and heading prefixed (e.g. <c>hourly_</c>, "Hourly ").</summary>
    public ColumnSet<T> Prefixed(string namePrefix, string labelPrefix, bool detail)
    {
        var copy = new ColumnSet<T>();
        foreach (var (spec, value) in columns)
        {
            copy.columns.Add((spec with { Name = namePrefix + spec.Name, Label = labelPrefix + spec.Label, Detail = detail || spec.Detail }, value));
        }

        return copy;
    }

    /// <summary>A new table with these columns, filled from <paramref name="rows"/>.</summary>
    public ResultTable Fill(ResultTable table, IEnumerable<T> rows)
    {
        foreach (var (spec, _) in columns)
        {
            _ = spec.Kind switch
            {
                ColumnKind.Text => table.Text(spec.Name, spec.Label, spec.Detail),
                ColumnKind.Number => table.Number(spec.Name, spec.Unit, spec.Label, spec.Detail),
                _ => table.Integer(spec.Name, spec.Label, spec.Detail),
            };
        }

        foreach (var row in rows)
        {
            table.AddRow([.. columns.Select(c => c.Value(row))]);
        }

        return table;
    }
}

/// <summary>What declares one column of a <see cref="ColumnSet{T}"/>.</summary>
internal sealed record ResultColumnSpec(string Name, ColumnKind Kind, DisplayUnit? Unit, string Label, bool Detail);
