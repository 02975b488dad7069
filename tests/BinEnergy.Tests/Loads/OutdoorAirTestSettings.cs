using BinEnergy.Core.Loads;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;

namespace BinEnergy.Tests.Loads;

/// <summary>Settings used across the load tests: 1,000 cfm, heat to 70 F, cool to 75 F, 60 % RH, every hour.</summary>
internal static class OutdoorAirTestSettings
{
    public static OutdoorAirSettings Typical(FlowBasis basis = FlowBasis.Site, double cfm = 1000) => new()
    {
        Airflow = VolumeFlow.FromCfm(cfm),
        FlowBasis = basis,
        Operation = VentilationOperation.Always,
        HeatTo = Temperature.FromFahrenheit(70),
        CoolTo = Temperature.FromFahrenheit(75),
        MaxRelativeHumidity = 0.60,
    };
}
