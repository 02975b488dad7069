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

    /// <summary>Time of each row as written ("24:00" resolved to midnight of the next day), before any shift.</summary>
    public List<DateTime> Times { get; } = new(8784);

    /// <summary>The year of each row's written date (for "24:00" the date before midnight).</summary>
    public List<int> WrittenYears { get; } = new(8784);

    /// <summary>1-based file line of each row.</summary>
    public List<int> Lines { get; } = new(8784);

    /// <summary>Values per quantity in internal units (C, %, kg/kg, Pa), NaN where missing.</summary>
    public Dictionary<WeatherQuantity, List<double>> Values { get; } = [];

    /// <summary>The file's own name for each quantity's column.</summary>
    public Dictionary<WeatherQuantity, string> ColumnNames { get; } = [];

    /// <summary>Metadata values as written, with their lines.</summary>
    public Dictionary<string, (string Value, int? Line)> Metadata { get; } = new(StringComparer.Ordinal);

    /// <summary>Whether the file says it is a typical year (null: detect).</summary>
    public bool? TypicalYear { get; set; }

    /// <summary>Repairs and notices collected while parsing.</summary>
    public QualityReport Quality { get; } = new();

    /// <summary>Number of rows.</summary>
    public int Count => Times.Count;
}
