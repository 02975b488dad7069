using BinEnergy.Core.Binning;
using BinEnergy.Core.Economizer;
using BinEnergy.Core.Schedules;
using BinEnergy.Core.Units;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Economizer;

/// <summary>
/// The six real check files read once through the shipped maps, with the reference office
/// system of docs/economizer.md evaluated on each (shared by the real-file test classes).
/// </summary>
public sealed class EconomizerRealFiles
{
    /// <summary>File, map and climate of each site, in the order of the docs table.</summary>
    public static readonly (string File, string Map, string Climate)[] Sites =
    [
        ("722040TYA.CSV", "tmy3", "hot-humid"),
        ("725300TYA.CSV", "tmy3", "cold continental"),
        ("723650TYA.CSV", "tmy3", "hot-dry, high altitude"),
        ("725945TYA.CSV", "tmy3", "mild marine"),
        ("703165TY.csv", "tmy3", "subarctic marine"),
        (TestData.PvgisFile, "pvgis", "mixed"),
    ];

    /// <summary>The schedule of the reference system (invented office hours).</summary>
    public static readonly OccupancySchedule Office = OccupancySchedule.Parse("Mon-Fri 07:00-19:00");

    public EconomizerRealFiles()
    {
        foreach (var (file, map, _) in Sites)
        {
            var weather = WeatherReader.Read(TestData.Open(file), new WeatherReadOptions { Map = ColumnMap.Load(map) });
            var occupied = Office.Flags(weather);
            var bins = BinTable.Build(weather, DryBulbBinScale.Default(UnitSystem.IP), occupied);
            Weather[file] = weather;
            Occupied[file] = occupied;
            Integrated[file] = EconomizerEvaluation.Evaluate(weather, occupied, bins, Reference(true));
            NonIntegrated[file] = EconomizerEvaluation.Evaluate(weather, occupied, bins, Reference(false));
        }
    }

    public Dictionary<string, HourlyWeather> Weather { get; } = [];

    public Dictionary<string, bool[]> Occupied { get; } = [];

    public Dictionary<string, EconomizerEvaluation> Integrated { get; } = [];

    public Dictionary<string, EconomizerEvaluation> NonIntegrated { get; } = [];

    /// <summary>
    /// The reference system of docs/economizer.md (invented): variable volume 10,000 cfm down to
    /// 3,000 cfm, 2,000 cfm minimum outdoor air, site flow basis, 55 F supply, 75 F / 50 % return,
    /// 216,000 Btu/h sensible at 95 F from a 50 F balance point, suggested high limits.
    /// </summary>
    public static EconomizerSettings Reference(bool integrated) => new EconomizerSettings
    {
        SupplyAirflow = VolumeFlow.FromCfm(10_000),
        SupplyAirflowMin = VolumeFlow.FromCfm(3_000),
        MinOutdoorAirflow = VolumeFlow.FromCfm(2_000),
        SupplyTemperature = Temperature.FromFahrenheit(55),
        ReturnTemperature = Temperature.FromFahrenheit(75),
        ReturnRelativeHumidity = 0.50,
        LoadLine = new BuildingLoadLine(Power.FromBtuPerHour(216_000), Temperature.FromFahrenheit(95), Temperature.FromFahrenheit(50)),
        Controls = [EconomizerControl.None, .. EconomizerTestSystems.AllControls(integrated)],
    };

    /// <summary>The result of one control by name.</summary>
    public static EconomizerControlResult Control(EconomizerEvaluation e, HighLimitKind kind) =>
        e.Controls.Single(c => c.Control.Kind == kind);
}
