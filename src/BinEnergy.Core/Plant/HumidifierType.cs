namespace BinEnergy.Core.Plant;

/// <summary>How the plant humidifies the outdoor air (DESIGN 15, air systems).</summary>
public enum HumidifierType
{
    /// <summary>Electric steam generator (the default): electricity for raising steam from supply water, over its efficiency.</summary>
    SteamElectric,

    /// <summary>Gas-fired steam generator: gas for raising steam from supply water, over its efficiency.</summary>
    SteamGas,

    /// <summary>
    /// Adiabatic (evaporative, spray or wetted media): the water evaporates into the air and takes
    /// its latent heat from it, so the air must be heated by that much; the load moves onto the
    /// heating source.
    /// </summary>
    Adiabatic,
}
