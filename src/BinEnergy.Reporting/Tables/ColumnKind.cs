namespace BinEnergy.Reporting.Tables;

/// <summary>The value type of a result column: names are strings, quantities doubles, hour counts integers.</summary>
public enum ColumnKind
{
    /// <summary>Text (climate, variant, method, control, ...).</summary>
    Text,

    /// <summary>A 64-bit floating-point quantity with its unit in the column name.</summary>
    Number,

    /// <summary>A 32-bit integer (whole hours, months).</summary>
    Integer,
}
