using BinEnergy.Core.Study;
using BinEnergy.Tests.Support;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Reporting.Batch;

/// <summary>
/// A study over the six real check files (five TMY3, one PVGIS) and the four invented demo climates, two
/// variants (with and without energy recovery), run once in-process per test run and shared by the
/// climates-table and cross-climate report tests.
/// </summary>
internal static class CrossClimateStudy
{
    private static readonly Lazy<StudyRunResult> Shared = new(() => StudyRunner.Run(Definition()));

    /// <summary>The run (climates in the order of <see cref="Climates"/>).</summary>
    public static StudyRunResult Run => Shared.Value;

    /// <summary>The climates: name, weather file and map (null for the open layout).</summary>
    public static IReadOnlyList<(string Name, string Weather, string? Map)> Climates { get; } =
    [
        .. TestData.Tmy3Files.Select(f => ("tmy3-" + f[..6], TestData.Open(f), (string?)"tmy3")),
        ("pvgis-45n-8e", TestData.Open(TestData.PvgisFile), "pvgis"),
        .. new[] { "port-verrin", "frostmere", "alcor-mesa", "kelpwick" }
            .Select(n => (n, Path.Combine(RepoPaths.Root, "weather-samples", n + "-hourly.csv"), (string?)null)),
    ];

    /// <summary>The study text: an invented office's outdoor air on every climate.</summary>
    public static string Text => string.Concat(
        """
        [study]
        name = "Cross-climate check"
        units = "ip"
        bin_width_f = 5

        """,
        string.Concat(Climates.Select(c => $"[[climate]]\nname = \"{c.Name}\"\nweather = \"{c.Weather}\"\n" + (c.Map is null ? string.Empty : $"map = \"{c.Map}\"\n") + "\n")),
        Settings);

    /// <summary>The settings and the two variants (recovery, no-recovery), without the header and climates: a batch study is this alone.</summary>
    public const string Settings =
        """
        [schedule]
        occupied = "Mon-Fri 07:00-19:00"

        [ventilation]
        airflow_cfm = 2000
        heat_to_f = 70
        cool_to_f = 75
        max_rh_pct = 50

        [recovery]
        sensible_effectiveness = 0.70
        latent_effectiveness = 0.55

        [plant]
        heating_fuel = "gas"
        heating_efficiency = 0.85
        cooling_cop = 3.5
        price_gas_per_therm = 1.10
        price_electricity_per_kwh = 0.14

        [[variant]]
        name = "recovery"

        [[variant]]
        name = "no-recovery"
        recovery.enabled = false

        """;

    /// <summary>The study, parsed from <see cref="Text"/> as if it were a file in the repository root.</summary>
    public static StudyDefinition Definition() => StudyFileReader.Parse(Text, Path.Combine(RepoPaths.Root, "cross-climate-check.toml"), RepoPaths.Root);
}
