using System.Collections.Concurrent;
using System.Text;
using BinEnergy.Core.Errors;
using BinEnergy.Core.Study;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Study;
using BinEnergy.Tests.Weather;
using CsCheck;
using Xunit.Abstractions;

namespace BinEnergy.Tests.Fuzz;

/// <summary>
/// Property-based fuzzing (CsCheck, fixed seeds): real and invented weather files, the shipped column maps and the
/// example study, each mutated a few times (bytes flipped, lines dropped, doubled or swapped, fields replaced with
/// awkward tokens), must either read or fail with the project's own input exception (<see cref="InputDataException"/>:
/// a message naming the file and the fix, exit code 3) — never anything else. CsCheck shrinks a failure to a small
/// case and prints it; put the input into tests/data/fuzz-corpus so <see cref="CorpusReplayTests"/> keeps it.
/// A long run: <c>BINENERGY_FUZZ_CASES=100000 ./test.sh --filter Fuzz</c>.
/// </summary>
public sealed class InputFuzzTests(ITestOutputHelper output)
{
    /// <summary>Cases per input kind: a few thousand in CI; set BINENERGY_FUZZ_CASES for a long run.</summary>
    private static readonly long Cases = long.TryParse(Environment.GetEnvironmentVariable("BINENERGY_FUZZ_CASES"), out long n) && n > 0 ? n : 2000;

    /// <summary>Fields and fragments that have broken readers before, or might.</summary>
    private static readonly string[] Tokens =
    [
        "", " ", "NA", "nan", "NaN", "null", "-9900", "-9999", "1e308", "-1e308", "Infinity", "1,5", "0x10", "+", "-", ".", "..",
        "\"", "\"\"", "\"a,b\"", ",", ",,", "\n", "\r", "\r\n", "\0", "\t", ";", "|", "#", "# name: x", "# elevation_m: 1e9",
        "# typical_year: maybe", "# humidity_over: steam", "9999-12-31T24:00", "9999-12-31T23:00", "0001-01-01T00:00",
        "2026-02-29T00:00", "2024-02-29T00:00", "2026-01-01T24:00", "2026-01-01T24:30", "2026-13-01T00:00", "12/31/9999", "24:00",
        "25:00", "00:60", "02/30/2026", "60", "-70.1", "103.5", "0.051", "200", "-273.15", "1e-320", "99999999999999999999",
        "\u00e9", "\uFEFF", "\u2212" + "5", "time", "drybulb_c", "dewpoint_f", "rh_pct", "humidity_ratio", "wetbulb_c", "pressure_pa",
        "[time]", "[columns]", "= ", "[[climate]]", "[variant]", "name = \"x\"", "{", "}", "[", "]", "'''", "true", "1979-05-27T07:32:00Z",
    ];

    private static readonly Lazy<(byte[] Data, string Name, WeatherReadOptions Options)[]> WeatherSeeds = new(() =>
    {
        var seeds = new List<(byte[], string, WeatherReadOptions)>();
        foreach (var name in TestData.Tmy3Files.Append(TestData.PvgisFile))
        {
            // The first 200 rows of each real file (and the PVGIS file's legend lines), to keep each case fast.
            var lines = TestData.Lines(name);
            var kept = name == TestData.PvgisFile ? lines.Take(220).Concat(lines.SkipWhile(l => l.Length > 0)) : lines.Take(202);
            var map = ColumnMap.Load(name == TestData.PvgisFile ? "pvgis" : "tmy3");
            seeds.Add((Encoding.UTF8.GetBytes(string.Join('\n', kept) + "\n"), name, new WeatherReadOptions { Map = map }));
        }

        // Invented open-layout files with each humidity measure.
        foreach (var (header, edit) in new (string, Func<string, string>)[]
        {
            (OpenLayoutText.Header + ",rh_pct", r => r + ",80"),
            ("time,drybulb_f,humidity_ratio", r => r.Split(',')[0] + ",50.1,0.006"),
            ("time,drybulb_c,wetbulb_c", r => r.Split(',')[0] + ",10.5,8.2"),
            ("time,drybulb_c,rh_pct,pressure_hpa", r => r.Split(',')[0] + ",-5.5,95,1001.2"),
        })
        {
            seeds.Add((Encoding.UTF8.GetBytes(OpenLayoutText.File(72, (_, r) => edit(r), header)), "invented.csv", WeatherReadOptions.Default));
        }

        return seeds.ToArray();
    });

    /// <summary>One mutation: what to do, where (a fraction of the input) and with which token.</summary>
    public readonly record struct Mutation(int Kind, double At, int Token, int Length);

    private static readonly Gen<Mutation[]> Mutations =
        Gen.Select(Gen.Int[0, 6], Gen.Double.Unit, Gen.Int[0, Tokens.Length - 1], Gen.Int[1, 40], (k, at, t, len) => new Mutation(k, at, t, len)).Array[1, 5];

    /// <summary>The text with the mutations applied, in order.</summary>
    internal static string Mutate(string text, Mutation[] mutations)
    {
        foreach (var m in mutations)
        {
            var lines = text.Split('\n').ToList();
            int at = Math.Clamp((int)(m.At * text.Length), 0, text.Length);
            int line = Math.Clamp((int)(m.At * lines.Count), 0, lines.Count - 1);
            string token = Tokens[m.Token];
            text = m.Kind switch
            {
                0 => text[..at] + token + text[at..], // insert a token
                1 => text[..at] + text[Math.Min(text.Length, at + m.Length)..], // delete a run of characters
                2 => text[..at] + token + text[Math.Min(text.Length, at + m.Length)..], // replace a run with a token
                3 => string.Join('\n', lines.Take(line).Concat(lines.Skip(line + 1))), // drop a line
                4 => string.Join('\n', lines.Take(line + 1).Concat(lines.Skip(line))), // double a line
                5 => string.Join('\n', Swap(lines, line, Math.Clamp(line + m.Length % 5 + 1, 0, lines.Count - 1))), // swap two lines
                _ => ReplaceField(lines, line, m.Length, token), // replace one field of a line
            };
        }

        return text;
    }

    private static List<string> Swap(List<string> lines, int a, int b)
    {
        (lines[a], lines[b]) = (lines[b], lines[a]);
        return lines;
    }

    private static string ReplaceField(List<string> lines, int line, int field, string token)
    {
        var fields = lines[line].Split(',');
        fields[field % fields.Length] = token;
        lines[line] = string.Join(',', fields);
        return string.Join('\n', lines);
    }

    /// <summary>Runs the reader on a case and records what came out: the record, or the input error's kind.</summary>
    private static string Outcome(Action read)
    {
        try
        {
            read();
            return "read";
        }
        catch (WeatherDataException e)
        {
            return e.Kind.ToString();
        }
        catch (InputDataException e)
        {
            return e.GetType().Name;
        }
    }

    private void Report(string what, ConcurrentDictionary<string, int> outcomes)
    {
        output.WriteLine($"{what}: {outcomes.Values.Sum()} cases; " + string.Join(", ", outcomes.OrderByDescending(o => o.Value).Select(o => $"{o.Key} {o.Value}")));
    }

    [Fact]
    public void MutatedWeatherFiles_ReadOrFailWithAnInputError()
    {
        var seeds = WeatherSeeds.Value;
        var outcomes = new ConcurrentDictionary<string, int>();
        Gen.Select(Gen.Int[0, seeds.Length - 1], Mutations).Sample((k, mutations) =>
        {
            var (data, name, options) = seeds[k];
            byte[] mutated = Encoding.UTF8.GetBytes(Mutate(Encoding.UTF8.GetString(data), mutations));
            outcomes.AddOrUpdate(Outcome(() => WeatherReader.Read(mutated, name, options)), 1, (_, c) => c + 1);
        }, iter: Cases, seed: "0000weather1");
        Report("weather files", outcomes);
        Assert.True(outcomes.GetValueOrDefault("read") > 0 && outcomes.Count > 5, "the mutations should reach both good reads and several kinds of error");
    }

    [Fact]
    public void MutatedColumnMaps_LoadOrFailWithAnInputError()
    {
        var maps = ColumnMap.ShippedNames.Select(n => ColumnMap.ShippedText(n)!).ToArray();
        var outcomes = new ConcurrentDictionary<string, int>();
        Gen.Select(Gen.Int[0, maps.Length - 1], Mutations).Sample((k, mutations) =>
        {
            string text = Mutate(maps[k], mutations);
            outcomes.AddOrUpdate(Outcome(() => ColumnMap.Parse(text, "fuzzed map")), 1, (_, c) => c + 1);
        }, iter: Cases, seed: "0000columnm1");
        Report("column maps", outcomes);
        Assert.True(outcomes.GetValueOrDefault("read") > 0 && outcomes.GetValueOrDefault(nameof(WeatherErrorKind.BadMap)) > 0);
    }

    [Fact]
    public void MutatedStudies_ReadOrFailWithAnInputError()
    {
        string folder = Directory.CreateTempSubdirectory("binenergy-fuzz-study-").FullName;
        try
        {
            File.WriteAllText(Path.Combine(folder, "harbor.csv"), OpenLayoutText.File(48));
            var outcomes = new ConcurrentDictionary<string, int>();
            Mutations.Sample(mutations =>
            {
                string text = Mutate(ExampleStudy.Text, mutations);
                outcomes.AddOrUpdate(Outcome(() => StudyCaseBuilder.Build(StudyFileReader.Parse(text, Path.Combine(folder, "fuzzed.toml"), folder))), 1, (_, c) => c + 1);
            }, iter: Cases, seed: "0000studies1");
            Report("studies", outcomes);
            Assert.True(outcomes.GetValueOrDefault("read") > 0 && outcomes.GetValueOrDefault(nameof(StudyFileException)) > 0);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
