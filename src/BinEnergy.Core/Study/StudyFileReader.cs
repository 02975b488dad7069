using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using BinEnergy.Core.Units;

using BinEnergy.Core.Weather;

namespace BinEnergy.Core.Study;

/// <summary>
/// Reads and validates a study file (TOML, DESIGN 10): every key known and spelled with its
/// unit, every value of the right kind and in its physical range, climates with existing
/// weather files (paths relative to the study file), variants with unique names whose
/// overrides name known keys. Any problem is a <see cref="StudyFileException"/> naming the
/// file, line and key; nothing is repaired silently.
/// </summary>
public static class StudyFileReader
{
    /// <summary>Reads the study file at <paramref name="path"/>.</summary>
    /// <param name="path">The study file.</param>
    /// <param name="climatesElsewhere">The climates come from elsewhere (a batch's weather files): the study's own
    /// <c>[[climate]]</c> tables are not read and may be absent; <see cref="StudyDefinition.Climates"/> is empty.</param>
    /// <exception cref="StudyFileException">The file is missing, not TOML, or not a valid study.</exception>
    public static StudyDefinition Read(string path, bool climatesElsewhere = false)
    {
        if (!System.IO.File.Exists(path) && !Directory.Exists(path))
        {
            throw new StudyFileException(path, null, null, "the study file does not exist; check the path");
        }

        // A study is a few kilobytes: 16 MiB is far more than any needs, and stops a device or a wrong file early.
        var (text, problem) = Errors.InputFiles.ReadText(path, 16L << 20, "a smaller study file");
        if (problem is not null)
        {
            throw new StudyFileException(path, null, null, "the study file " + problem.Text + "; " + char.ToLowerInvariant(problem.Fix[0]) + problem.Fix[1..]);
        }

        var entries = TomlEntryReader.Read(text!, path);
        return new Reader(path, Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".") { ClimatesElsewhere = climatesElsewhere }.Build(entries, Hash(text!));
    }

    /// <summary>
    /// Reads a study that a command line describes (<see cref="StudyInput"/>); relative paths
    /// resolve against <paramref name="baseFolder"/>. Errors name <paramref name="source"/> and the
    /// line the input gave the value (<see cref="StudyInput.OriginOf"/> turns it back into the option).
    /// </summary>
    /// <exception cref="StudyFileException">A value is not valid.</exception>
    public static StudyDefinition FromInput(StudyInput input, string source, string baseFolder)
    {
        ArgumentNullException.ThrowIfNull(input);
        var reader = new Reader(source, baseFolder);
        return reader.Build(input.Entries(), input.Hash());
    }

    /// <summary>Reads a study from its text; relative paths resolve against <paramref name="baseFolder"/>.</summary>
    public static StudyDefinition Parse(string text, string file, string baseFolder)
    {
        var entries = TomlEntryReader.Read(text, file);
        var reader = new Reader(file, baseFolder);
        return reader.Build(entries, Hash(text));
    }

    private static string Hash(string text) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.Replace("\r\n", "\n", StringComparison.Ordinal))));

    private sealed class Reader(string file, string baseFolder)
    {
        private UnitSystem units = UnitSystem.IP;

        /// <summary>Leave the [[climate]] tables unread (a batch supplies the climates).</summary>
        public bool ClimatesElsewhere { get; init; }

        public StudyDefinition Build(List<TomlEntry> entries, string hash)
        {
            CheckTables(entries);
            var unitsEntry = entries.FirstOrDefault(e => e.Table == "study" && e.Key == "units");
            var groups = entries.GroupBy(e => (e.Table, e.Index)).ToList();

            // Units first: a rating curve without a temperature suffix reads in the display unit.
            if (unitsEntry is not null)
            {
                var sv = Validate(unitsEntry, StudySchema.Get("study"), "units", string.Empty);
                units = (string)sv.Value.Value == "si" ? UnitSystem.SI : UnitSystem.IP;
            }

            var study = Section("study", 0, groups, string.Empty);
            var baseSections = StudySchema.Overridable.ToDictionary(s => s.Name, s => Section(s.Name, 0, groups, string.Empty), StringComparer.Ordinal);
            baseSections["study"] = study;

            string name = study.Present ? study.RequiredText("name") : throw new StudyFileException(file, null, "study",
                "the file has no [study] table; start it with [study] and name = \"...\"");
            if (string.IsNullOrWhiteSpace(name))
            {
                throw study.ErrorAt("name", "the study name is empty; give it a name such as \"Harbor office ventilation options\"");
            }

            var climates = ClimatesElsewhere ? [] : ReadClimates(groups);
            var variants = ReadVariants(groups, baseSections);
            string currency = study.Text("currency") ?? "usd";
            if (currency.Length is < 1 or > 8 || !currency.All(char.IsAsciiLetterLower))
            {
                throw study.ErrorAt("currency", $"currency \"{currency}\" must be a short lower-case code such as \"usd\" or \"eur\" (it becomes part of column names)");
            }

            Loads.IntegrationMethods.TryParse(study.Text("headline_method") ?? "hourly", out var headline);
            Climate.DegreeDayMethods.TryParse(study.Text("degree_days") ?? "daily-mean", out var degreeDays);
            var settings = baseSections.Values.Where(s => s.Present)
                .SelectMany(s => s.Values.Values.Select(v => (v.Line, Setting: new StudySetting(s.Definition.Name + "." + v.WrittenKey, v.Written))))
                .OrderBy(x => x.Line).Select(x => x.Setting).ToList();
            return new StudyDefinition(file, name, units, currency, hash, climates, variants)
            {
                HeadlineMethod = headline,
                DegreeDayMethod = degreeDays,
                Settings = settings,
                DetailVariants = DetailVariants(groups, variants),
            };
        }

        /// <summary>The variants named by <c>[report] detail_variants</c> (default: all), each checked against the study's variants.</summary>
        private List<string> DetailVariants(List<IGrouping<(string Table, int Index), TomlEntry>> groups, List<StudyVariant> variants)
        {
            var report = Section("report", 0, groups, string.Empty);
            var named = report.TextList("detail_variants");
            if (named is null)
            {
                return [.. variants.Select(v => v.Name)];
            }

            var names = variants.Select(v => v.Name).ToList();
            foreach (string n in named.Where(n => !names.Contains(n, StringComparer.Ordinal)))
            {
                string? near = KeySuggester.Nearest(n, names);
                throw report.ErrorAt("detail_variants", $"no variant is named \"{n}\"" + (near is null ? string.Empty : $"; did you mean \"{near}\"?")
                    + " (the variants: " + string.Join(", ", names) + ")");
            }

            return [.. named.Distinct(StringComparer.Ordinal)];
        }

        private void CheckTables(List<TomlEntry> entries)
        {
            foreach (var e in entries.Where(e => e.Key.Length == 0))
            {
                var def = StudySchema.Find(e.Table);
                if (def is null)
                {
                    string? near = KeySuggester.Nearest(e.Table, StudySchema.Sections.Select(s => s.Name));
                    string hint = near is null
                        ? "the tables are " + string.Join(", ", StudySchema.Sections.Select(s => s.IsArray ? $"[[{s.Name}]]" : $"[{s.Name}]"))
                        : $"did you mean [{(StudySchema.Get(near).IsArray ? "[" + near + "]" : near)}]?";
                    throw new StudyFileException(file, e.Line, e.Table, $"unknown table [{e.Table}]; {hint}");
                }

                if (!def.IsArray && e.Index > 0)
                {
                    throw new StudyFileException(file, e.Line, e.Table, $"[{e.Table}] may appear once; merge the two tables");
                }
            }
        }

        private StudySection Section(string table, int index, List<IGrouping<(string Table, int Index), TomlEntry>> groups, string origin)
        {
            var def = StudySchema.Get(table);
            var group = groups.FirstOrDefault(g => g.Key.Table == table && g.Key.Index == index);
            if (group is null)
            {
                return new StudySection(def, file, null, false);
            }

            var header = group.FirstOrDefault(e => e.Key.Length == 0);
            var values = new Dictionary<string, StudyValue>(StringComparer.Ordinal);
            foreach (var e in group.Where(e => e.Key.Length > 0))
            {
                if (e.Key.Contains('.', StringComparison.Ordinal))
                {
                    throw new StudyFileException(file, e.Line, table + "." + e.Key,
                        $"[{table}] has no sub-tables; write the key without dots (only variants override keys of other tables with dotted names)");
                }

                var (name, value) = Validate(e, def, e.Key, origin);
                if (values.TryGetValue(name, out var other))
                {
                    throw new StudyFileException(file, e.Line, table + "." + e.Key,
                        $"{other.WrittenKey} (line {other.Line}) already sets this value; give it once, in one unit");
                }

                values[name] = value;
            }

            return new StudySection(def, file, header?.Line ?? group.Min(e => e.Line), true, values);
        }

        /// <summary>Looks up, type-checks, converts and range-checks one key of a table.</summary>
        private (string Name, StudyValue Value) Validate(TomlEntry e, SectionDefinition section, string key, string origin)
        {
            string fullKey = section.Name + "." + key;
            var found = section.Find(key) ?? throw Unknown(e, section, key, fullKey);
            var (def, alt) = found;
            object value = def.Kind switch
            {
                ValueKind.Number => ToNumber(e, fullKey, def, alt, e.Value),
                ValueKind.Text => e.Value as string ?? throw Wrong(e, fullKey, "text in quotes"),
                ValueKind.Choice => ToChoice(e, fullKey, def),
                ValueKind.Bool => e.Value is bool b ? b : throw Wrong(e, fullKey, "true or false"),
                ValueKind.TextList => ToTextList(e, fullKey, def),
                ValueKind.NumberList => ToNumberList(e, fullKey, def, alt),
                ValueKind.NumberOrPoints => e.Value is List<object> list ? ToPoints(e, fullKey, def, alt, list) : ToNumber(e, fullKey, def, alt, e.Value),
                _ => throw new InvalidOperationException("unknown kind"),
            };
            return (def.Name, new StudyValue(value, key, e.Line, origin) { Written = StudySetting.Format(e.Value) });
        }

        private StudyFileException Unknown(TomlEntry e, SectionDefinition section, string key, string fullKey)
        {
            string? near = KeySuggester.Nearest(key, section.AllKeys);
            string hint = near is null
                ? $"the keys of [{section.Name}] are {string.Join(", ", section.AllKeys)}"
                : $"did you mean {near}?";
            var unknown = new StudyFileException(file, e.Line, fullKey, $"unknown key '{key}' in [{section.Name}]; {hint} (see docs/study.md)");
            if (near is not null && KeySuggester.Distance(key, near) <= 1)
            {
                return unknown;
            }

            // A known quantity with a wrong or missing unit suffix.
            foreach (var d in section.Keys.Where(d => !d.IsUnitless && d.Alternatives.Count > 0))
            {
                if (key == d.Name || (key.StartsWith(d.Name + "_", StringComparison.Ordinal) && section.Keys.All(o => o == d || !key.StartsWith(o.Name + "_", StringComparison.Ordinal) || o.Name.Length < d.Name.Length)))
                {
                    string spellings = string.Join(", ", d.Alternatives.Select(a => a.Key + (a.Unit.Length > 0 ? $" ({a.Unit})" : string.Empty)));
                    string what = key == d.Name ? $"'{key}' needs its unit in its name" : $"'{key[(d.Name.Length + 1)..]}' is not a unit this key accepts";
                    return new StudyFileException(file, e.Line, fullKey, $"{what}: write one of {spellings}");
                }
            }

            return unknown;
        }

        private static bool IsKeyProblem(string problem) =>
            problem.StartsWith("unknown key", StringComparison.Ordinal) || problem.Contains("is not a unit this key accepts", StringComparison.Ordinal) ||
            problem.Contains("needs its unit in its name", StringComparison.Ordinal);

        private StudyFileException Wrong(TomlEntry e, string fullKey, string expected) =>
            new(file, e.Line, fullKey, $"expected {expected}, not {Describe(e.Value)}");

        private static string Describe(object value) => value switch
        {
            string s => $"the text \"{s}\"",
            bool b => b ? "true" : "false",
            List<object> => "a list",
            IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
            _ => value.ToString() ?? "nothing",
        };

        private double ToNumber(TomlEntry e, string fullKey, KeyDefinition def, KeyAlternative alt, object raw)
        {
            double v = raw switch
            {
                long l => l,
                double d => d,
                string s when double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out _) =>
                    throw new StudyFileException(file, e.Line, fullKey, $"write the number without quotes: {fullKey.Split('.')[^1]} = {s}"),
                _ => throw Wrong(e, fullKey, def.Kind == ValueKind.NumberOrPoints ? "a number or a list of [temperature, value] pairs" : "a number"),
            };
            if (!double.IsFinite(v))
            {
                throw new StudyFileException(file, e.Line, fullKey, "the value must be a finite number");
            }

            double si = alt.ToSi(v, units);
            CheckRange(e, fullKey, def, alt, v, si);
            return si;
        }

        private void CheckRange(TomlEntry e, string fullKey, KeyDefinition def, KeyAlternative alt, double written, double si)
        {
            bool low = def.Min is double min && (def.MinExclusive ? si <= min : si < min);
            bool high = def.Max is double max && si > max;
            if (!low && !high)
            {
                return;
            }

            string writtenText = written.ToString(CultureInfo.InvariantCulture) + (alt.Unit.Length > 0 ? " " + alt.Unit : string.Empty);
            string limit;
            if (def.RangeHint is not null)
            {
                limit = def.RangeHint;
            }
            else if (low && def.Min == 0)
            {
                limit = def.MinExclusive ? "a value above zero" : "zero or more";
            }
            else
            {
                limit = $"a value between {Show(def.Min, alt)} and {Show(def.Max, alt)}";
            }

            string sign = low && written < 0 && def.Min >= 0 ? " (negative values have no physical meaning here)" : string.Empty;

            // A unit slip: the number is in range read in another of the key's units (21 for a heating setpoint in F is 21 C).
            var other = def.Alternatives.FirstOrDefault(a => a.Unit != alt.Unit && a.Unit.Length > 0 && InRange(def, a.ToSi(written, units)));
            string slip = other is null ? string.Empty
                : $"; {written.ToString(CultureInfo.InvariantCulture)} would be in range in {other.Unit}: if that is what you meant, write {other.Key}";
            throw new StudyFileException(file, e.Line, fullKey, $"{writtenText} is out of range{sign}: expected {limit}{slip}");
        }

        private static bool InRange(KeyDefinition def, double si) =>
            !(def.Min is double min && (def.MinExclusive ? si <= min : si < min)) && !(def.Max is double max && si > max);

        private string Show(double? siBound, KeyAlternative alt)
        {
            if (siBound is not double b)
            {
                return "any";
            }

            // Convert back to the written unit by solving ToSi(x) = b (all conversions are affine).
            double at0 = alt.ToSi(0, units), at1 = alt.ToSi(1, units);
            double x = Math.Abs(at1 - at0) < 1e-300 ? b : (b - at0) / (at1 - at0);
            return x.ToString("G4", CultureInfo.InvariantCulture) + (alt.Unit.Length > 0 ? " " + alt.Unit : string.Empty);
        }

        private string ToChoice(TomlEntry e, string fullKey, KeyDefinition def)
        {
            if (e.Value is not string s)
            {
                throw Wrong(e, fullKey, "one of " + string.Join(", ", def.Choices!.Select(c => $"\"{c}\"")));
            }

            string lower = s.ToLowerInvariant();
            if (def.Choices!.Contains(lower))
            {
                return lower;
            }

            string? near = KeySuggester.Nearest(lower, def.Choices!, Math.Max(3, lower.Length / 2));
            throw new StudyFileException(file, e.Line, fullKey,
                $"\"{s}\" is not one of {string.Join(", ", def.Choices!.Select(c => $"\"{c}\""))}" + (near is null ? string.Empty : $"; did you mean \"{near}\"?"));
        }

        private List<string> ToTextList(TomlEntry e, string fullKey, KeyDefinition def)
        {
            if (e.Value is not List<object> list || list.Any(x => x is not string))
            {
                throw Wrong(e, fullKey, "a list of text in quotes, e.g. [\"a\", \"b\"]");
            }

            var items = list.Cast<string>().ToList();
            if (def.Choices is { } choices)
            {
                foreach (var item in items.Where(i => !choices.Contains(i)))
                {
                    string? near = KeySuggester.Nearest(item, choices, Math.Max(3, item.Length / 2));
                    throw new StudyFileException(file, e.Line, fullKey,
                        $"\"{item}\" is not one of {string.Join(", ", choices)}" + (near is null ? string.Empty : $"; did you mean \"{near}\"?"));
                }

                var dup = items.GroupBy(i => i).FirstOrDefault(g => g.Count() > 1);
                if (dup is not null)
                {
                    throw new StudyFileException(file, e.Line, fullKey, $"\"{dup.Key}\" is listed twice");
                }
            }

            return items;
        }

        private List<double> ToNumberList(TomlEntry e, string fullKey, KeyDefinition def, KeyAlternative alt)
        {
            if (e.Value is not List<object> list || list.Any(x => x is not (long or double)))
            {
                throw Wrong(e, fullKey, "a list of numbers");
            }

            return list.Select(x => ToNumber(e, fullKey, def, alt, x)).ToList();
        }

        private List<(double OutdoorC, double Value)> ToPoints(TomlEntry e, string fullKey, KeyDefinition def, KeyAlternative alt, List<object> list)
        {
            var points = new List<(double, double)>();
            foreach (var item in list)
            {
                if (item is not List<object> pair || pair.Count != 2 || pair.Any(x => x is not (long or double)))
                {
                    throw new StudyFileException(file, e.Line, fullKey,
                        "each point must be a pair [outdoor temperature, value], e.g. [[65, 4.2], [95, 3.2]]");
                }

                double t = Convert.ToDouble(pair[0], CultureInfo.InvariantCulture);
                double tc = alt.PointX!(t, units);
                if (def.PointXRange is var (lo, hi) && (tc < lo || tc > hi))
                {
                    throw new StudyFileException(file, e.Line, fullKey,
                        units == UnitSystem.IP
                            ? $"outdoor temperature {t.ToString(CultureInfo.InvariantCulture)} F is outside {Fmt(lo * 1.8 + 32)} to {Fmt(hi * 1.8 + 32)} F ({Fmt(lo)} to {Fmt(hi)} C; the study's units are ip); pairs are [outdoor temperature, value]"
                            : $"outdoor temperature {t.ToString(CultureInfo.InvariantCulture)} C is outside {Fmt(lo)} to {Fmt(hi)} C; pairs are [outdoor temperature, value]");
                }

                points.Add((tc, ToNumber(e, fullKey, def, alt, pair[1])));
            }

            if (points.Count == 0)
            {
                throw new StudyFileException(file, e.Line, fullKey, "the list of points is empty; give at least one [temperature, value] pair or one number");
            }

            if (points.GroupBy(p => p.Item1).Any(g => g.Count() > 1))
            {
                throw new StudyFileException(file, e.Line, fullKey, "two points have the same outdoor temperature");
            }

            return points;
        }

        private static string Fmt(double v) => v.ToString(CultureInfo.InvariantCulture);

        private List<StudyClimate> ReadClimates(List<IGrouping<(string Table, int Index), TomlEntry>> groups)
        {
            var list = new List<StudyClimate>();
            foreach (var g in groups.Where(g => g.Key.Table == "climate").OrderBy(g => g.Key.Index))
            {
                var s = Section("climate", g.Key.Index, groups, string.Empty);
                string name = s.RequiredText("name");
                CheckName(s, name, "climate");
                string weather = s.RequiredText("weather");
                string full = Path.GetFullPath(Path.Combine(baseFolder, weather));
                if (!System.IO.File.Exists(full))
                {
                    throw s.ErrorAt("weather", $"weather file not found: {full} (paths are relative to the study file's folder)");
                }

                string? map = s.Text("map");
                if (map is not null && (map.Contains('/', StringComparison.Ordinal) || map.EndsWith(".toml", StringComparison.OrdinalIgnoreCase)))
                {
                    map = Path.GetFullPath(Path.Combine(baseFolder, map));
                    if (!System.IO.File.Exists(map))
                    {
                        throw s.ErrorAt("map", $"column map file not found: {map} (paths are relative to the study file's folder)");
                    }
                }
                else if (map is not null && ColumnMap.ShippedText(map) is null)
                {
                    throw s.ErrorAt("map", $"\"{map}\" is not a shipped column map (shipped: {string.Join(", ", ColumnMap.ShippedNames)})"
                        + (KeySuggester.Nearest(map.ToLowerInvariant(), ColumnMap.ShippedNames, 2) is string near ? $"; did you mean \"{near}\"?" : "; give a shipped name or the path of a TOML map file"));
                }

                var dup = list.FirstOrDefault(c => c.Name == name);
                if (dup is not null)
                {
                    throw s.ErrorAt("name", $"climate \"{name}\" is already defined on line {dup.Line}; climate names must be unique");
                }

                list.Add(new StudyClimate(name, full, map, s.Number("elevation"), s.Get("name")!.Line)
                {
                    DropLongGaps = s.Bool("drop_long_gaps") ?? false,
                    CalendarYear = s.Number("calendar_year") is double y ? (int)Math.Round(y) : null,
                    HumidityOver = s.Text("humidity_over") switch
                    {
                        "water" => Psychrometrics.HumidityOver.Water,
                        "ice" => Psychrometrics.HumidityOver.Ice,
                        _ => null,
                    },
                });
            }

            if (list.Count == 0)
            {
                throw new StudyFileException(file, null, "climate",
                    "the study has no climate; add a [[climate]] table with name = \"...\" and weather = \"file.csv\"");
            }

            return list;
        }

        private void CheckName(StudySection s, string name, string what)
        {
            if (string.IsNullOrWhiteSpace(name) || name.Any(c => char.IsControl(c) || c is '/' or '\\' or '=' or '%'))
            {
                throw s.ErrorAt("name", $"{what} name \"{name}\" must not be empty or contain / \\ = % (names become table values and folder names)");
            }
        }

        private List<StudyVariant> ReadVariants(List<IGrouping<(string Table, int Index), TomlEntry>> groups, Dictionary<string, StudySection> baseSections)
        {
            var variantGroups = groups.Where(g => g.Key.Table == "variant").OrderBy(g => g.Key.Index).ToList();
            var list = new List<StudyVariant>();
            if (variantGroups.Count == 0)
            {
                list.Add(new StudyVariant("base", null, baseSections, []));
                return list;
            }

            foreach (var g in variantGroups)
            {
                var nameEntry = g.FirstOrDefault(e => e.Key == "name");
                int headerLine = g.First(e => e.Key.Length == 0).Line;
                if (nameEntry?.Value is not string name)
                {
                    throw new StudyFileException(file, nameEntry?.Line ?? headerLine, "variant.name",
                        nameEntry is null ? "every [[variant]] needs name = \"...\"" : "the variant name must be text in quotes");
                }

                var nameSection = new StudySection(StudySchema.Get("variant"), file, headerLine, true,
                    new Dictionary<string, StudyValue> { ["name"] = new(name, "name", nameEntry.Line, string.Empty) });
                CheckName(nameSection, name, "variant");
                var dup = list.FirstOrDefault(v => v.Name == name);
                if (dup is not null)
                {
                    throw new StudyFileException(file, nameEntry.Line, "variant.name",
                        $"variant \"{name}\" is already defined on line {dup.Line}; variant names must be unique");
                }

                string origin = $"variant \"{name}\"";
                var overrides = new Dictionary<string, Dictionary<string, StudyValue>>(StringComparer.Ordinal);
                var written = new List<string>();
                var changes = new List<StudySetting>();
                foreach (var e in g.Where(e => e.Key.Length > 0 && e.Key != "name"))
                {
                    int dot = e.Key.IndexOf('.', StringComparison.Ordinal);
                    if (dot < 0)
                    {
                        string? near = StudySchema.Overridable
                            .Select(s => (Section: s, Key: KeySuggester.Nearest(e.Key, s.AllKeys)))
                            .Where(p => p.Key is not null)
                            .OrderBy(p => KeySuggester.Distance(e.Key, p.Key!))
                            .Select(p => p.Section.Name + "." + p.Key)
                            .FirstOrDefault();
                        throw new StudyFileException(file, e.Line, "variant." + e.Key,
                            $"a variant overrides keys of other tables by their dotted name, e.g. ventilation.airflow_cfm = 2600" + (near is null ? string.Empty : $"; did you mean {near}?"));
                    }

                    string table = e.Key[..dot];
                    string key = e.Key[(dot + 1)..];
                    var section = StudySchema.Find(table);
                    if (section is null || !section.Overridable)
                    {
                        string reason = table == "climate"
                            ? "climates are the other axis of the run: every variant runs on every climate, so a variant cannot change them"
                            : table == "study" ? "a variant can override study.bin_width_f / _c and study.bin_point only"
                            : $"unknown table '{table}'" + (KeySuggester.Nearest(table, StudySchema.Overridable.Select(s => s.Name)) is string n ? $"; did you mean {n}?" : string.Empty);
                        if (!(table == "study" && (key.StartsWith("bin_width", StringComparison.Ordinal) || key == "bin_point")))
                        {
                            throw new StudyFileException(file, e.Line, "variant." + e.Key, $"this variant overrides an unknown key: {reason}");
                        }

                        section = StudySchema.Get("study");
                    }

                    if (key.Contains('.', StringComparison.Ordinal))
                    {
                        throw new StudyFileException(file, e.Line, "variant." + e.Key, $"this variant overrides an unknown key: [{table}] has no sub-tables");
                    }

                    (string defName, StudyValue value) validated;
                    try
                    {
                        validated = Validate(e with { Table = table }, section, key, origin);
                    }
                    catch (StudyFileException ex) when (ex.Key == table + "." + key && IsKeyProblem(ex.Problem))
                    {
                        throw new StudyFileException(file, e.Line, "variant." + e.Key, "this variant overrides an unknown key: " + ex.Problem);
                    }

                    var forTable = overrides.TryGetValue(table, out var d) ? d : overrides[table] = new Dictionary<string, StudyValue>(StringComparer.Ordinal);
                    if (forTable.TryGetValue(validated.defName, out var prev))
                    {
                        throw new StudyFileException(file, e.Line, "variant." + e.Key, $"{table}.{prev.WrittenKey} (line {prev.Line}) already overrides this value in this variant");
                    }

                    forTable[validated.defName] = validated.value;
                    written.Add(e.Key);
                    changes.Add(new StudySetting(e.Key, validated.value.Written));
                }

                var sections = new Dictionary<string, StudySection>(baseSections, StringComparer.Ordinal);
                foreach (var (table, values) in overrides)
                {
                    var baseSection = sections[table];
                    bool present = baseSection.Present || values.Keys.Any(k => k != "enabled");
                    sections[table] = baseSection.With(values, present);
                }

                list.Add(new StudyVariant(name, nameEntry.Line, sections, written) { Changes = changes });
            }

            return list;
        }
    }
}
