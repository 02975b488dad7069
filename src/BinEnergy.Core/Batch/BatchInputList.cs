using System.Globalization;
using System.IO.Enumeration;
using System.Security.Cryptography;
using System.Text;
using BinEnergy.Core.Weather;
using CsvHelper;

namespace BinEnergy.Core.Batch;

/// <summary>
/// Lists a batch's weather files from what the user gave: a folder (its weather files, not its subfolders), a glob
/// (<c>*</c> and <c>?</c> in a name, <c>**</c> for any depth of folders), or a station list (a CSV file whose header
/// has a <c>weather</c> column: the file's path relative to the list, and optionally <c>name</c>, <c>map</c>,
/// <c>elevation_m</c> and any other columns, carried into the tables as text attributes).
/// </summary>
public static class BatchInputList
{
    /// <summary>The file endings taken from a folder: weather files as CSV or text, optionally gzipped.</summary>
    public static IReadOnlyList<string> WeatherEndings { get; } = [".csv", ".txt", ".csv.gz", ".txt.gz"];

    private static readonly string[] Known = ["weather", "name", "map", "elevation_m"];

    /// <summary>Reads the inputs named by <paramref name="spec"/> (relative to the current folder).</summary>
    /// <param name="spec">A folder, a glob, a single file or a station list.</param>
    /// <param name="map">The column map of every file that does not name its own (a station list's <c>map</c> column wins), or null for the open layout.</param>
    /// <exception cref="BatchInputException">Nothing to run: the folder, glob or list names no weather file, or the list has no <c>weather</c> column; or the map is not a shipped name or a file.</exception>
    public static BatchInputs Read(string spec, string? map = null)
    {
        string? defaultMap = null;
        if (map is not null)
        {
            var (resolved, problem) = ResolveMap(map, Directory.GetCurrentDirectory());
            defaultMap = problem is null ? resolved : throw new BatchInputException($"--{problem}");
        }

        if (string.IsNullOrWhiteSpace(spec))
        {
            throw new BatchInputException("--weather is empty: give a folder of weather files, a glob such as 'weather/*.csv', or a station list (CSV with a weather column)");
        }

        if (Directory.Exists(spec))
        {
            var files = Directory.EnumerateFiles(spec).Where(IsWeatherFile).ToList();
            return FromFiles(files, Path.GetFullPath(spec), spec, defaultMap, "no weather file (" + string.Join(", ", WeatherEndings) + ") in the folder");
        }

        if (File.Exists(spec) && IsStationList(spec))
        {
            return FromList(spec, defaultMap);
        }

        if (File.Exists(spec))
        {
            return FromFiles([spec], Path.GetDirectoryName(Path.GetFullPath(spec))!, spec, defaultMap, "no file");
        }

        if (spec.IndexOfAny(['*', '?']) >= 0)
        {
            var (root, files) = Glob(spec);
            return FromFiles(files, root, spec, defaultMap, "no file matches the glob");
        }

        throw new BatchInputException($"--weather {spec}: no such folder or file; give a folder of weather files, a glob such as 'weather/*.csv' (quoted), or a station list (CSV with a weather column)");
    }

    /// <summary>
    /// A column map as written: a path (it holds a slash or ends in .toml; relative to <paramref name="folder"/>) made absolute, or a
    /// shipped map's name; the problem (worded after "map ...") when it is neither, or when <paramref name="mustExist"/> and the file is missing.
    /// </summary>
    private static (string Map, string? Problem) ResolveMap(string map, string folder, bool mustExist = true)
    {
        string hint = $"give a shipped name ({string.Join(", ", ColumnMap.ShippedNames)}) or the path of a TOML map file";
        if (map.Contains('/', StringComparison.Ordinal) || map.EndsWith(".toml", StringComparison.OrdinalIgnoreCase))
        {
            string full = Path.GetFullPath(Path.Combine(folder, map));
            return (full, mustExist && !File.Exists(full) ? $"map {map}: no such map file; {hint}" : null);
        }

        return (map, ColumnMap.ShippedText(map) is null ? $"map {map}: not a shipped column map (shipped: {string.Join(", ", ColumnMap.ShippedNames)}); {hint}" : null);
    }

    private static bool IsWeatherFile(string path) =>
        WeatherEndings.Any(e => path.EndsWith(e, StringComparison.OrdinalIgnoreCase)) && !Path.GetFileName(path).StartsWith('.');

    /// <summary>True when the file's first line is a CSV header with a <c>weather</c> column.</summary>
    private static bool IsStationList(string path)
    {
        using var reader = new StreamReader(path);
        string? first = reader.ReadLine();
        return first is not null && first.Split(',').Any(f => f.Trim().Trim('"').Equals("weather", StringComparison.OrdinalIgnoreCase));
    }

    private static BatchInputs FromFiles(List<string> files, string root, string spec, string? map, string none)
    {
        if (files.Count == 0)
        {
            throw new BatchInputException($"--weather {spec}: {none}; give a folder of weather files, a glob such as 'weather/*.csv' (quoted), or a station list");
        }

        var stations = files.Select(Path.GetFullPath).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).Select(full =>
        {
            string id = IdOf(full, root);
            return new BatchStation(id, full, null, map, null, [], spec, null) { Id = id };
        }).ToList();
        return new BatchInputs(stations, [], [], Hash(stations));
    }

    /// <summary>The file's path relative to <paramref name="root"/>, with forward slashes and without its weather ending.</summary>
    private static string IdOf(string full, string root)
    {
        string rel = Path.GetRelativePath(root, full).Replace(Path.DirectorySeparatorChar, '/');
        string? ending = WeatherEndings.OrderByDescending(e => e.Length).FirstOrDefault(e => rel.EndsWith(e, StringComparison.OrdinalIgnoreCase));
        return ending is null ? rel : rel[..^ending.Length];
    }

    private static BatchInputs FromList(string list, string? defaultMap)
    {
        string folder = Path.GetDirectoryName(Path.GetFullPath(list))!;
        using var reader = CsvReader.FromText(File.ReadAllText(list), new CsvReaderOptions { HasHeader = true, TrackLineNumbers = true, TrimWhitespace = true, FormatProvider = CultureInfo.InvariantCulture });
        string[] headers = [.. reader.Headers.Select(h => h.Trim())];
        var lower = headers.Select(h => h.ToLowerInvariant()).ToArray();
        foreach (var dup in lower.GroupBy(h => h).Where(g => g.Count() > 1))
        {
            throw new BatchInputException($"{list}, line 1: the column '{dup.Key}' appears {dup.Count()} times; give each column once");
        }

        var attributes = headers.Where((h, i) => !Known.Contains(lower[i])).ToList();
        foreach (string a in attributes.Where(a => !IsColumnName(a)))
        {
            throw new BatchInputException($"{list}, line 1: the column '{a}' cannot be a table column; name it with lower-case letters, digits and underscores, such as climate_zone");
        }

        var stations = new List<BatchStation>();
        var problems = new List<BatchProblem>();
        while (reader.Read())
        {
            int line = (int)reader.LineNumber;
            if (reader.FieldCount == 1 && reader.IsEmpty(0))
            {
                continue;
            }

            if (reader.FieldCount != headers.Length)
            {
                problems.Add(Bad(list, line, $"the row has {reader.FieldCount} fields, the header {headers.Length}; give one value per column (quote a value that holds a comma)"));
                continue;
            }

            string Get(string column) => Array.IndexOf(lower, column) is int i and >= 0 ? reader.GetString(i).Trim() : string.Empty;
            string weather = Get("weather");
            if (weather.Length == 0)
            {
                problems.Add(Bad(list, line, "the weather column is empty; give the weather file's path, relative to the station list"));
                continue;
            }

            double? elevation = null;
            string e = Get("elevation_m");
            if (e.Length > 0)
            {
                if (!double.TryParse(e, NumberStyles.Float, CultureInfo.InvariantCulture, out double m) || !double.IsFinite(m) || m is < -500 or > 9000)
                {
                    problems.Add(Bad(list, line, $"elevation_m '{e}' is not an elevation in metres between -500 and 9000 (a number with a dot, such as 1609.3); leave it empty to use the file's"));
                    continue;
                }

                elevation = m;
            }

            string written = Get("map");
            string? map = defaultMap;
            if (written.Length > 0)
            {
                var (resolved, problem) = ResolveMap(written, folder, mustExist: false);
                if (problem is not null)
                {
                    problems.Add(Bad(list, line, problem));
                    continue;
                }

                map = resolved;
            }

            string full = Path.GetFullPath(Path.Combine(folder, weather));
            string name = Get("name");
            string id = IdOf(full, folder);
            var attrs = attributes.Select(a => new KeyValuePair<string, string>(a, reader.GetString(Array.IndexOf(headers, a)).Trim())).ToList();
            stations.Add(new BatchStation(name.Length > 0 ? name : id, full, name.Length > 0 ? name : null, map, elevation, attrs, list, line) { Id = id });
        }

        // A duplicate key (two rows with the same name, or the same file twice without names) stops the later row.
        var kept = new List<BatchStation>();
        foreach (var g in stations.GroupBy(s => s.Key, StringComparer.Ordinal))
        {
            var first = g.First();
            kept.Add(first);
            foreach (var dup in g.Skip(1))
            {
                problems.Add(new BatchProblem(dup.Key, list, dup.Line, BatchProblemKinds.DuplicateName,
                    $"{list}, line {dup.Line}: the name '{dup.Key}' is already given on line {first.Line}; names must be unique (give this row its own name)", true));
            }
        }

        if (kept.Count == 0 && problems.Count == 0)
        {
            throw new BatchInputException($"{list}: the station list has no rows; add one row per weather file under the header");
        }

        kept.Sort((a, b) => string.CompareOrdinal(a.Key, b.Key));
        problems.Sort((a, b) => (a.Line ?? 0).CompareTo(b.Line ?? 0));
        return new BatchInputs(kept, problems, attributes, Hash(kept, problems));
    }

    private static BatchProblem Bad(string list, int line, string problem) =>
        new(FormattableString.Invariant($"line {line}"), list, line, BatchProblemKinds.BadStationRow, FormattableString.Invariant($"{list}, line {line}: {problem}"), true);

    private static bool IsColumnName(string name) => name.Length > 0 && char.IsAsciiLetterLower(name[0]) && name.All(c => char.IsAsciiLetterLower(c) || char.IsAsciiDigit(c) || c == '_');

    /// <summary>The files a glob matches: the folders before its first wildcard are the root, then one pattern per folder level (<c>**</c> any number).</summary>
    private static (string Root, List<string> Files) Glob(string spec)
    {
        string full = Path.GetFullPath(spec);
        var parts = full.Split(Path.DirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries);
        int first = Array.FindIndex(parts, p => p.IndexOfAny(['*', '?']) >= 0);
        string root = Path.DirectorySeparatorChar + string.Join(Path.DirectorySeparatorChar, parts[..first]);
        var files = new List<string>();
        if (Directory.Exists(root))
        {
            Match(root, parts[first..], files);
        }

        return (root, files);
    }

    private static void Match(string folder, string[] patterns, List<string> files)
    {
        string pattern = patterns[0];
        if (pattern == "**")
        {
            Match(folder, patterns[1..], files);
            foreach (string sub in Directory.EnumerateDirectories(folder))
            {
                Match(sub, patterns, files);
            }

            return;
        }

        if (patterns.Length == 1)
        {
            files.AddRange(Directory.EnumerateFiles(folder).Where(f => FileSystemName.MatchesSimpleExpression(pattern, Path.GetFileName(f), ignoreCase: false)));
            return;
        }

        foreach (string sub in Directory.EnumerateDirectories(folder).Where(d => FileSystemName.MatchesSimpleExpression(pattern, Path.GetFileName(d), ignoreCase: false)))
        {
            Match(sub, patterns[1..], files);
        }
    }

    private static string Hash(IEnumerable<BatchStation> stations, IEnumerable<BatchProblem>? problems = null)
    {
        var text = new StringBuilder();
        foreach (var s in stations)
        {
            long size = File.Exists(s.WeatherPath) ? new FileInfo(s.WeatherPath).Length : -1;
            text.Append(CultureInfo.InvariantCulture, $"{s.Key}\t{s.WeatherPath}\t{size}\t{s.Map}\t{s.ElevationM?.ToString("R", CultureInfo.InvariantCulture)}\t");
            text.AppendJoin('\t', s.Attributes.Select(a => a.Key + "=" + a.Value)).Append('\n');
        }

        foreach (var p in problems ?? [])
        {
            text.Append(CultureInfo.InvariantCulture, $"problem\t{p.Line}\t{p.Kind}\n");
        }

        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.ToString())));
    }
}
