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
    // Each column's value as its own type (exactly one of the three set), so filling a table boxes nothing.
    private readonly List<(ResultColumnSpec Spec, Func<T, string>? Text, Func<T, double>? Number, Func<T, int>? Integer)> columns = [];

    /// <summary>The column names, in order.</summary>
    public IEnumerable<string> Names => columns.Select(c => c.Spec.Name);

    /// <summary>A text column.</summary>
    public ColumnSet<T> Text(string name, string label, Func<T, string> value, bool detail = false)
    {
        columns.Add((new(name, ColumnKind.Text, null, label, detail), value, null, null));
        return this;
    }

    /// <summary>An integer column (whole hours, months).</summary>
    public ColumnSet<T> Integer(string name, string label, Func<T, int> value, bool detail = false)
    {
        columns.Add((new(name, ColumnKind.Integer, null, label, detail), null, null, value));
        return this;
    }

    /// <summary>A number column named <paramref name="baseName"/> with the unit's suffix; <paramref name="si"/> gives the SI value.</summary>
    public ColumnSet<T> Number(string baseName, DisplayUnit unit, string label, Func<T, double> si, bool detail = false)
    {
        columns.Add((new(unit.NameFor(baseName), ColumnKind.Number, unit, label, detail), null, r => unit.FromSi(si(r)), null));
        return this;
    }

    /// <summary>The columns of <paramref name="other"/>, taking their rows from <paramref name="pick"/>, appended to these.</summary>
    public ColumnSet<T> Add<TInner>(ColumnSet<TInner> other, Func<T, TInner> pick)
    {
        foreach (var (spec, text, number, integer) in other.columns)
        {
            columns.Add((spec,
                text is null ? null : r => text(pick(r)),
                number is null ? null : r => number(pick(r)),
                integer is null ? null : r => integer(pick(r))));
        }

        return this;
    }

    /// <summary>These columns for a row type from which <paramref name="pick"/> takes this set's rows.</summary>
    public ColumnSet<TOuter> Over<TOuter>(Func<TOuter, T> pick) => new ColumnSet<TOuter>().Add(this, pick);

    /// <summary>These columns with every name and heading prefixed (e.g. <c>hourly_</c>, "Hourly ").</summary>
    public ColumnSet<T> Prefixed(string namePrefix, string labelPrefix, bool detail)
    {
        var copy = new ColumnSet<T>();
        foreach (var c in columns)
        {
            copy.columns.Add(c with { Spec = c.Spec with { Name = namePrefix + c.Spec.Name, Label = labelPrefix + c.Spec.Label, Detail = detail || c.Spec.Detail } });
        }

        return copy;
    }

    /// <summary>A new table with these columns, filled from <paramref name="rows"/>.</summary>
    public ResultTable Fill(ResultTable table, IEnumerable<T> rows)
    {
        if (table.Columns.Count != 0)
        {
            throw new ArgumentException($"table '{table.Name}' already has columns; a column set fills a new table", nameof(table));
        }

        foreach (var (spec, _, _, _) in columns)
        {
            _ = spec.Kind switch
            {
                ColumnKind.Text => table.Text(spec.Name, spec.Label, spec.Detail),
                ColumnKind.Number => table.Number(spec.Name, spec.Unit, spec.Label, spec.Detail),
                _ => table.Integer(spec.Name, spec.Label, spec.Detail),
            };
        }

        var targets = table.Columns;
        foreach (var row in rows)
        {
            for (int i = 0; i < columns.Count; i++)
            {
                var (_, text, number, integer) = columns[i];
                if (text is not null)
                {
                    targets[i].AddText(text(row) ?? throw new InvalidOperationException($"column '{targets[i].Name}' of table '{table.Name}' got no text"));
                }
                else if (number is not null)
                {
                    targets[i].AddNumber(number(row));
                }
                else
                {
                    targets[i].AddInteger(integer!(row));
                }
            }
        }

        return table;
    }
}

/// <summary>What declares one column of a <see cref="ColumnSet{T}"/>.</summary>
internal sealed record ResultColumnSpec(string Name, ColumnKind Kind, DisplayUnit? Unit, string Label, bool Detail);
