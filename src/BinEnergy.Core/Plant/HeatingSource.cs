namespace BinEnergy.Core.Plant;

/// <summary>What heats the outdoor air (DESIGN 9).</summary>
public enum HeatingSource
{
    /// <summary>A natural-gas furnace or boiler with a seasonal efficiency.</summary>
    Gas,

    /// <summary>An oil furnace or boiler with a seasonal efficiency.</summary>
    Oil,

    /// <summary>Electric resistance (efficiency 1 unless the user says otherwise).</summary>
    Electric,

    /// <summary>An electric heat pump with a COP that depends on the outdoor temperature.</summary>
    HeatPump,
}
