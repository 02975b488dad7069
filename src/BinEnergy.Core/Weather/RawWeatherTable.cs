namespace BinEnergy.Core.Weather;

/// <summary>
/// What the parser took from a weather file, before calendar and quality rules: the time of
/// each row as written, its line, the values in internal units (NaN where missing) and the
/// metadata. Internal to the reader.
/// </summary>
internal sealed class RawWeatherTable
{
    public RawWeatherTable(string file, ColumnMap map, bool openLayout)
    {
        File = file;
        Map = map;
        IsOpenLayout = openLayout;
    }

    /// <summary>The file as the user named it.</summary>
    public string File { get; }

    /// <summary>The map the file was read with (for the open layout, one built from its header).</summary>
    public ColumnMap Map { get; }

    /// <summary>True for the project's open layout.</summary>
    public bool IsOpenLayout { get; }

    /// <summary>Time of each row as written ("24:00" resolved to midnight of the next day), before any shift; the first <see cref="Count"/> entries.</summary>
    public DateTime[] Times { get; private set; } = [];

    /// <summary>The year of each row's written date (for "24:00" the date before midnight); the first <see cref="Count"/> entries.</summary>
    public int[] WrittenYears { get; private set; } = [];

    /// <summary>1-based file line of each row; the first <see cref="Count"/> entries.</summary>
    public int[] Lines { get; private set; } = [];

    /// <summary>Values per quantity in internal units (C, %, kg/kg, Pa), NaN where missing; the first <see cref="Count"/> entries.</summary>
    public Dictionary<WeatherQuantity, double[]> Values { get; } = [];

    /// <summary>The file's own name for each quantity's column.</summary>
    public Dictionary<WeatherQuantity, string> ColumnNames { get; } = [];

    /// <summary>Metadata values as written, with their lines.</summary>
    public Dictionary<string, (string Value, int? Line)> Metadata { get; } = new(StringComparer.Ordinal);

    /// <summary>Whether the file says it is a typical year (null: detect).</summary>
    public bool? TypicalYear { get; set; }

    /// <summary>Repairs and notices collected while parsing.</summary>
    public QualityReport Quality { get; } = new();

    /// <summary>The rows' moist-air states as the parser solved them, for the builder to use where they hold; null when not solved.</summary>
    public RowStates? States { get; set; }

    /// <summary>Number of rows.</summary>
    public int Count { get; private set; }

    /// <summary>The rows as parsed: arrays at least <paramref name="count"/> long (the parser sizes them from the line count).</summary>
    public void SetRows(DateTime[] times, int[] writtenYears, int[] lines, int count)
    {
        (Times, WrittenYears, Lines, Count) = (times, writtenYears, lines, count);
    }
}
