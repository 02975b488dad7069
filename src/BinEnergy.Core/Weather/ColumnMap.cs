using System.Reflection;

namespace BinEnergy.Core.Weather;

/// <summary>
/// Describes a weather layout other than the open one (DESIGN 5.2): where the column names
/// are, which column holds which quantity in which unit, how time is written, which codes mean
/// "missing", what ends the data, and where the site metadata sits. Maps are TOML files; the
/// project ships maps selectable by name (<see cref="ShippedNames"/>), and users write their own.
/// </summary>
public sealed record ColumnMap
{
    /// <summary>The resource-name prefix of the shipped maps.</summary>
    private const string ResourcePrefix = "BinEnergy.Core.Weather.Maps.";

    /// <summary>The map's name (the shipped name, or the file name without extension).</summary>
    public required string Name { get; init; }

    /// <summary>Where the map came from, for messages: "shipped map tmy3" or the file path.</summary>
    public required string Source { get; init; }

    /// <summary>One line saying what the map reads.</summary>
    public string Description { get; init; } = "";

    /// <summary>1-based line holding the column names, when fixed.</summary>
    public int? HeaderLine { get; init; }

    /// <summary>Text the column-name line starts with, when its position varies (searched from the top).</summary>
    public string? HeaderStartsWith { get; init; }

    /// <summary>The field separator.</summary>
    public char Separator { get; init; } = ',';

    /// <summary>Field values that mean "missing" (an empty field always does).</summary>
    public IReadOnlyList<string> MissingCodes { get; init; } = [];

    /// <summary>How time is written.</summary>
    public required TimeLayout Time { get; init; }

    /// <summary>Which column holds each quantity.</summary>
    public required IReadOnlyDictionary<WeatherQuantity, ColumnSpec> Columns { get; init; }

    /// <summary>Where each metadata value is found; keys are <c>name</c>, <c>station_id</c>, <c>elevation_m</c>, <c>latitude</c>, <c>longitude</c>, <c>utc_offset_h</c>.</summary>
    public IReadOnlyDictionary<string, MetadataSource> Metadata { get; init; } = new Dictionary<string, MetadataSource>();

    /// <summary>When true the data end at the first blank line and the rest (legends, notices) is ignored.</summary>
    public bool EndAtBlankLine { get; init; }

    /// <summary>True or false to say whether the file is a typical year; null to detect it from the dates.</summary>
    public bool? TypicalYear { get; init; }

    /// <summary>What the file's dew points and RH are relative to below 0 C (key <c>humidity_over</c>): liquid water unless the map says ice.</summary>
    public Psychrometrics.HumidityOver HumidityOver { get; init; } = Psychrometrics.HumidityOver.Water;

    /// <summary>Names of the maps shipped with the project.</summary>
    public static IReadOnlyList<string> ShippedNames { get; } = typeof(ColumnMap).Assembly.GetManifestResourceNames()
        .Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal) && n.EndsWith(".toml", StringComparison.Ordinal))
        .Select(n => n[ResourcePrefix.Length..^".toml".Length])
        .Order(StringComparer.Ordinal)
        .ToArray();

    /// <summary>The TOML text of a shipped map, or null when no shipped map has that name.</summary>
    public static string? ShippedText(string name)
    {
        using var stream = typeof(ColumnMap).Assembly.GetManifestResourceStream(ResourcePrefix + name.ToLowerInvariant() + ".toml");
        if (stream is null)
        {
            return null;
        }

        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>The shipped maps read so far (a batch reads thousands of files through one map); maps do not change once read.</summary>
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, ColumnMap> Shipped = new(StringComparer.Ordinal);

    /// <summary>
    /// A shipped map by name (e.g. <c>tmy3</c>, <c>pvgis</c>) or a map file by path.
    /// </summary>
    /// <exception cref="WeatherDataException">No such map, or the map is invalid (<see cref="WeatherErrorKind.MapNotFound"/>, <see cref="WeatherErrorKind.BadMap"/>).</exception>
    public static ColumnMap Load(string nameOrPath)
    {
        if (ShippedText(nameOrPath) is string shipped)
        {
            string name = nameOrPath.ToLowerInvariant();
            return Shipped.GetOrAdd(name, _ => Parse(shipped, "shipped map " + name, name));
        }

        if (!File.Exists(nameOrPath) && !Directory.Exists(nameOrPath))
        {
            throw new WeatherDataException(WeatherErrorKind.MapNotFound, nameOrPath,
                "no shipped column map has this name and no map file is at this path",
                "Use one of the shipped maps (" + string.Join(", ", ShippedNames) + ") or the path of a TOML map file (see docs/weather.md)");
        }

        // A map is a few hundred bytes: 1 MiB is far more than any needs, and stops a device or a wrong file early.
        var (text, problem) = Errors.InputFiles.ReadText(nameOrPath, 1L << 20, "a smaller map file");
        if (problem is not null)
        {
            throw new WeatherDataException(problem.Kind == Errors.InputFiles.ProblemKind.Path ? WeatherErrorKind.MapNotFound : WeatherErrorKind.BadMap, nameOrPath,
                "the column map " + problem.Text, problem.Kind == Errors.InputFiles.ProblemKind.TooLarge ? "A column map is a short TOML file (see docs/weather.md); check the path" : problem.Fix);
        }

        return Parse(text!, nameOrPath, Path.GetFileNameWithoutExtension(nameOrPath));
    }

    /// <summary>Parses a map from TOML text; <paramref name="source"/> names it in messages.</summary>
    /// <exception cref="WeatherDataException">The map is invalid (<see cref="WeatherErrorKind.BadMap"/>).</exception>
    public static ColumnMap Parse(string toml, string source, string? name = null) => ColumnMapToml.Parse(toml, source, name);

    /// <summary>The column spec of a quantity, or null.</summary>
    internal ColumnSpec? Column(WeatherQuantity q) => Columns.TryGetValue(q, out var c) ? c : null;

    /// <summary>The assembly holding the shipped maps (for tests that list them).</summary>
    internal static Assembly ResourceAssembly => typeof(ColumnMap).Assembly;
}
