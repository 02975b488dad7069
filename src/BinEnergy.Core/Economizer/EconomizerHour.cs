namespace BinEnergy.Core.Economizer;

/// <summary>
/// The air system in one hour (or at one bin state), in SI: the mode, the outdoor-air mass
/// fraction of the supply air, the mixed (coil-entering) state, the supply mass flow, the
/// coil-leaving humidity ratio and the coil load split into sensible and latent parts.
/// </summary>
/// <param name="Mode">What the system does.</param>
/// <param name="OutdoorFraction">Mass of outdoor air over mass of supply air, x (0 to 1).</param>
/// <param name="MixedDryBulbC">Mixed-air dry-bulb, C.</param>
/// <param name="MixedHumidityRatio">Mixed-air humidity ratio, kg/kg.</param>
/// <param name="MixedEnthalpyJPerKg">Mixed-air enthalpy, J/kg dry air.</param>
/// <param name="LeavingHumidityRatio">Coil-leaving humidity ratio, kg/kg.</param>
/// <param name="SupplyMassFlowKgPerS">Supply air, kg of dry air per second.</param>
/// <param name="CoilSensibleW">Sensible coil load, W.</param>
/// <param name="CoilLatentW">Latent coil load, W.</param>
public readonly record struct EconomizerHour(
    EconomizerMode Mode,
    double OutdoorFraction,
    double MixedDryBulbC,
    double MixedHumidityRatio,
    double MixedEnthalpyJPerKg,
    double LeavingHumidityRatio,
    double SupplyMassFlowKgPerS,
    double CoilSensibleW,
    double CoilLatentW)
{
    /// <summary>Supply-air dry-bulb delivered to the zones before any reheat, C.</summary>
    public double SupplyDryBulbC { get; init; }

    /// <summary>Terminal reheat, W: what brings the supply back to what the load needs (variable volume at minimum airflow, constant volume with reheat).</summary>
    public double ReheatW { get; init; }

    /// <summary>Preheat, W: the mixed air below the coil-leaving temperature warmed up to it.</summary>
    public double PreheatW { get; init; }

    /// <summary>Building sensible load the supply cannot meet, W (supply at its coolest and largest).</summary>
    public double UnmetW { get; init; }

    /// <summary>Electric power of the supply and return fans, W (all of it heat in the air).</summary>
    public double FanW { get; init; }

    /// <summary>Total coil load, W: sensible plus latent.</summary>
    public double CoilTotalW => CoilSensibleW + CoilLatentW;

    /// <summary>True when the coil removes heat in this hour.</summary>
    public bool CoilRuns => CoilSensibleW > 0 || CoilLatentW > 0;
}
