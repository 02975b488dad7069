namespace BinEnergy.Core.Psychrometrics;

/// <summary>How a volume flow of air turns into a mass flow of dry air (DESIGN 7.1).</summary>
public enum FlowBasis
{
    /// <summary>Standard air: 0.075 lb/ft3 (1.2014 kg/m3) whatever the site and weather.</summary>
    Standard,

    /// <summary>Dry air at 70 F (21.1 C) at the site's pressure: the flow a fan moves, measured at indoor conditions.</summary>
    Site,

    /// <summary>The outdoor state of each hour (or of the coil-entering air).</summary>
    Actual,
}
