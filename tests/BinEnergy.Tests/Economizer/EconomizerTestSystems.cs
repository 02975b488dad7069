using BinEnergy.Core.Economizer;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Tests.Economizer;

/// <summary>The invented air systems the economizer tests share.</summary>
internal static class EconomizerTestSystems
{
    /// <summary>Standard-atmosphere pressure at sea level, Pa.</summary>
    public const double SeaLevel = 101_325.0;

    /// <summary>
    /// A small hand-workable system: constant volume with reheat, 1,000 L/s supply, 200 L/s minimum outdoor air
    /// (x_min = 0.2), standard flow basis (1.2014 kg/m3), T_s 13 C, T_r 24 C at 50 % RH,
    /// load line 50 kW at 35 C from a 10 C balance point, coil-leaving RH 90 %, limits
    /// 20 C dry-bulb, 40 kJ/kg enthalpy, 10 C dew point.
    /// </summary>
    public static EconomizerSettings HandWorked(bool integrated = true) => new EconomizerSettings
    {
        System = AirSystemType.ConstantVolumeReheat,
        SupplyAirflow = VolumeFlow.FromLitresPerSecond(1000),
        MinOutdoorAirflow = VolumeFlow.FromLitresPerSecond(200),
        FlowBasis = FlowBasis.Standard,
        SupplyTemperature = Temperature.FromCelsius(13),
        ReturnTemperature = Temperature.FromCelsius(24),
        ReturnRelativeHumidity = 0.50,
        LoadLine = new BuildingLoadLine(Power.FromKilowatts(50), Temperature.FromCelsius(35), Temperature.FromCelsius(10)),
        Limits = new HighLimits(Temperature.FromCelsius(20), SpecificEnthalpy.FromKilojoulesPerKilogram(40), Temperature.FromCelsius(10)),
        Controls = AllControls(integrated),
    };

    /// <summary>The five economizer controls plus the baseline, all integrated or all not.</summary>
    public static EconomizerControl[] AllControls(bool integrated) =>
        [.. EconomizerControl.EconomizerKinds.Select(k => new EconomizerControl(k, integrated))];

    /// <summary>A typical office system in IP (invented): 10,000 cfm, 2,000 cfm outdoor air, 55 F supply, 75 F / 50 % return.</summary>
    public static EconomizerSettings Office(bool variable = false, FlowBasis basis = FlowBasis.Site) => new EconomizerSettings
    {
        SupplyAirflow = VolumeFlow.FromCfm(10_000),
        System = variable ? AirSystemType.VariableVolume : AirSystemType.ConstantVolumeReheat,
        SupplyAirflowMin = variable ? VolumeFlow.FromCfm(4_000) : null,
        MinOutdoorAirflow = VolumeFlow.FromCfm(2_000),
        FlowBasis = basis,
        SupplyTemperature = Temperature.FromFahrenheit(55),
        ReturnTemperature = Temperature.FromFahrenheit(75),
        ReturnRelativeHumidity = 0.50,
        LoadLine = new BuildingLoadLine(Power.FromBtuPerHour(216_000), Temperature.FromFahrenheit(95), Temperature.FromFahrenheit(55)),
        Controls = [.. AllControls(true), .. AllControls(false)],
    };
}
