namespace BinEnergy.Core.Loads;

/// <summary>When the outdoor air is supplied (DESIGN 7.1).</summary>
public enum VentilationOperation
{
    /// <summary>In the hours the occupancy schedule marks occupied (the default).</summary>
    Occupied,

    /// <summary>Every hour of the record.</summary>
    Always,
}
