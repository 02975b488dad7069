namespace BinEnergy.Core.Weather;

/// <summary>
/// What the parser took from a weather file, before calendar and quality rules: the time of
/// each row as written, its line, the values in internal units (NaN where missing) and the
/// metadata. Internal to the reader.
/// </summary>
internal sealed class RawWeatherTable(string file, ColumnMap map, bool openLayout, string[] headers, int headerLine)
{
    private readonly List<DateTime> times = new(8784);
    private readonly List<int> writtenYears = new(8784);
    private readonly List<int> lines = new(8784);
    private readonly Dictionary<WeatherQuantity, List<double>> values = [];

    /// <summary>The file as the user named it.</summary>
    public string File { get; } = file;

    /// <summary>The map the file was read with (for the open layout, one built from its header).</summary>
    public ColumnMap Map { get; } = map;

    /// <summary>True for the project's open layout.</summary>
    public bool IsOpenLayout { get; } = openLayout;

    /// <summary>The column names as the header line writes them (trimmed).</summary>
    public string[] Headers { get; } = headers;

    /// <summary>1-based line of the column names.</summary>
    public int HeaderLine { get; } = headerLine;

    /// <summary>Time of each row as written ("24:00" resolved to midnight of the next day), before any shift.</summary>
    public IReadOnlyList<DateTime> Times => times;

    /// <summary>The year of each row's written date (for "24:00" the date before midnight).</summary>
    public IReadOnlyList<int> WrittenYears => writtenYears;

    /// <summary>1-based file line of each row.</summary>
    public IReadOnlyList<int> Lines => lines;

    /// <summary>Values per quantity in internal units (C, %, kg/kg, Pa), NaN where missing.</summary>
    public IReadOnlyDictionary<WeatherQuantity, List<double>> Values => values;

    /// <summary>The file's own name for each quantity's column.</summary>
    public Dictionary<WeatherQuantity, string> ColumnNames { get; } = [];

    /// <summary>Metadata values as written, with their lines.</summary>
    public Dictionary<string, (string Value, int? Line)> Metadata { get; } = new(StringComparer.Ordinal);

    /// <summary>Whether the file says it is a typical year (null: detect).</summary>
    public bool? TypicalYear { get; set; }

    /// <summary>Repairs and notices collected while parsing.</summary>
    public QualityReport Quality { get; } = new();

    /// <summary>Number of rows.</summary>
    public int Count => times.Count;

    /// <summary>A new, empty column for a quantity; the parser adds one value to it per row.</summary>
    public List<double> AddColumn(WeatherQuantity q) => values[q] = new List<double>(8784);

    /// <summary>A row's time, written year and line (its values go to the columns).</summary>
    public void AddRow(DateTime time, int writtenYear, int line)
    {
        times.Add(time);
        writtenYears.Add(writtenYear);
        lines.Add(line);
    }
}
